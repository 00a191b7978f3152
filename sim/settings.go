package sim

import "fmt"

// ImportanceSettings control importance sampling, whether it runs as the
// importance method or under auto. The zero value means the defaults.
type ImportanceSettings struct {
	// MinFailures is the number of failed samples needed before the
	// target CoV may stop sampling; default 10 (common practice: a CoV
	// estimated from fewer failures is itself unreliable).
	MinFailures int
}

// SubsetSettings control subset simulation, whether it runs as the subset
// method or under auto. The zero value means the defaults.
type SubsetSettings struct {
	// LevelSize is the number of samples per level, rounded down to a
	// multiple of 10 and at least 100; default Samples/6 within
	// [500, 10000].
	LevelSize int
}

// ConditionalQMCSettings control conditional quasi-Monte Carlo, whether it
// runs as the conditional-qmc method or under auto. The zero value means
// the defaults.
type ConditionalQMCSettings struct {
	// Replicates is the number of independent randomisations; default
	// Settings.Replicates, else 16.
	Replicates int
}

// SurrogateSettings control the surrogate method (active-learning
// Kriging), whether it runs as the surrogate method or under auto. The
// zero value means the defaults. Its budget of model evaluations, FORM's
// included, is Settings.Samples.
type SurrogateSettings struct {
	// Population is the number of candidates drawn at a time; default
	// 10000.
	Population int
	// MaxPopulation bounds the candidates; default 200000.
	MaxPopulation int
	// MaxLearning bounds the model evaluations the learning adds after
	// FORM's, each followed by a refit of the Kriging model whose cost
	// grows with the cube of its points; default 600
	// (DefaultSurrogateMaxLearning). A run that reaches it before the
	// model settles is Unsettled, as one whose budget ends.
	MaxLearning int
}

// surrogate returns the surrogate settings with defaults.
func (s *Settings) surrogate() SurrogateSettings {
	var c SurrogateSettings
	if s.Surrogate != nil {
		c = *s.Surrogate
	}
	if c.Population <= 0 {
		c.Population = DefaultSurrogatePopulation
	}
	if c.MaxPopulation <= 0 {
		c.MaxPopulation = DefaultSurrogateMaxPopulation
	}
	if c.MaxLearning <= 0 {
		c.MaxLearning = DefaultSurrogateMaxLearning
	}
	return c
}

// formFor returns the FORM settings of s for model m: for a Model marked
// Expensive, each gradient's evaluations spread over s.Workers.
func (s *Settings) formFor(m *Model) *FORMSettings {
	if !m.Expensive || s.Workers <= 1 {
		return s.FORM
	}
	var c FORMSettings
	if s.FORM != nil {
		c = *s.FORM
	}
	c.Workers = s.Workers
	return &c
}

// DefaultISMinFailures is the default of ImportanceSettings.MinFailures.
const DefaultISMinFailures = 10

// isMinFailures returns the failures importance sampling needs before it
// may stop at the target CoV.
func (s *Settings) isMinFailures() int64 {
	if s.Importance != nil && s.Importance.MinFailures > 0 {
		return int64(s.Importance.MinFailures)
	}
	return DefaultISMinFailures
}

// subsetLevel returns the samples per level of subset simulation for the
// budget of s.
func (s *Settings) subsetLevel() int {
	if s.Subset != nil && s.Subset.LevelSize > 0 {
		return s.Subset.LevelSize / 10 * 10
	}
	return subsetLevelSize(s.Samples)
}

// replicates returns the randomisations of conditional quasi-Monte Carlo.
func (s *Settings) replicates() int {
	if s.ConditionalQMC != nil && s.ConditionalQMC.Replicates != 0 {
		return s.ConditionalQMC.Replicates
	}
	if s.Replicates != 0 {
		return s.Replicates
	}
	return DefaultReplicates
}

// checkMethods checks the per-method settings of s.
func (s *Settings) checkMethods() error {
	switch {
	case s.replicates() < 2:
		return fmt.Errorf("sim: ConditionalQMC.Replicates must be at least 2, got %d", s.replicates())
	case s.Importance != nil && s.Importance.MinFailures < 0:
		return fmt.Errorf("sim: Importance.MinFailures must be zero (default) or positive, got %d", s.Importance.MinFailures)
	case s.Surrogate != nil && (s.Surrogate.Population < 0 || s.Surrogate.MaxPopulation < 0 || s.Surrogate.MaxLearning < 0):
		return fmt.Errorf("sim: Surrogate.Population, MaxPopulation and MaxLearning must be zero (default) or positive, got %d, %d and %d", s.Surrogate.Population, s.Surrogate.MaxPopulation, s.Surrogate.MaxLearning)
	case s.Subset != nil && s.Subset.LevelSize != 0 && s.Subset.LevelSize < 100:
		return fmt.Errorf("sim: Subset.LevelSize must be zero (default) or at least 100, got %d", s.Subset.LevelSize)
	}
	return nil
}
