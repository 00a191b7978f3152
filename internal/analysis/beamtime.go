package analysis

import (
	"fmt"
	"runtime"
	"time"

	"strutrisk/sim"
)

// slowRun is the expected run time above which run warns.
const slowRun = time.Minute

// BeamTimeNote measures a few evaluations of a beam-column study at the
// means of its inputs and, when the sample budget of s would take longer
// than slowRun, returns a warning with the expected time and what to do
// instead; else "".
func BeamTimeNote(l *Loaded, s *sim.Settings) string {
	if !l.Study.ModelTraits().Expensive {
		return ""
	}
	switch s.Method {
	case sim.FORMMethod, sim.Subset, sim.Importance, sim.Surrogate:
		return "" // these need few evaluations whatever the budget
	}
	per := evalTime(l.Model.Sim, 3)
	workers := s.Workers
	if workers <= 0 {
		workers = runtime.NumCPU()
	}
	n := s.Samples
	if n <= 0 {
		n = sim.DefaultSamples
	}
	total := time.Duration(float64(per) * float64(n) / float64(workers))
	if total < slowRun {
		return ""
	}
	return fmt.Sprintf("%s: one evaluation takes about %s here, so %d samples on %d workers could take up to %s (less if the target cov is reached first); "+
		"for a quicker answer use --method surrogate, --method form or --method subset, or lower analysis.samples",
		l.Study.Model, per.Round(10*time.Microsecond), n, workers, total.Round(time.Second))
}

// evalTime is the mean time of k evaluations of m at the means of its
// variables.
func evalTime(m *sim.Model, k int) time.Duration {
	x := make([]float64, len(m.Vars))
	for i, v := range m.Vars {
		x[i] = v.Dist.Mean()
	}
	out := make([]float64, len(m.Outputs))
	start := time.Now()
	for range k {
		m.G(x, out)
	}
	return time.Since(start) / time.Duration(k)
}
