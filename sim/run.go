package sim

import (
	"context"
	"fmt"
	"math"
	"runtime"
)

// Progress reports the state of a running estimate.
type Progress struct {
	// Done and Total count evaluations (Total is the budget, or the
	// method's own bound on them when sooner; 0 when not known yet).
	Done, Total int64
	Pf, CoV     float64
	// Phase names the step of the method under way when it has several
	// (the surrogate: "FORM", its learning with the least U, the
	// classification of its candidates); empty otherwise.
	Phase string
}

// Settings control Run. The zero value of each field means its default.
type Settings struct {
	// Method is the estimator; the default is Auto.
	Method Method
	// Samples is the budget of limit-state evaluations; default 1e6.
	Samples int64
	// TargetCoV stops sampling once the CoV of Pf is this small; 0 never.
	TargetCoV float64
	// AutoCrudeLimit is the most samples Auto spends on plain Monte Carlo:
	// a target CoV that needs more goes to importance sampling; default
	// 5e6. A caller running many small studies (an inventory's members)
	// sets it lower.
	AutoCrudeLimit int64
	// Seed seeds every random stream.
	Seed uint64
	// Workers is the number of goroutines; default runtime.NumCPU().
	Workers int
	// Confidence is the level of the intervals; default 0.95.
	Confidence float64
	// Keep is the number of sample points kept in Result.Kept; default
	// 2000, negative for none.
	Keep int
	// Progress, if not nil, is called from time to time (never
	// concurrently); Observer receives the same and the convergence trace.
	Progress func(Progress)
	// Observer, if not nil, follows the run: its progress and each point
	// of its convergence trace.
	Observer Observer
	// Replicates is the number of independent randomisations of
	// conditional quasi-Monte Carlo; default 16.
	//
	// Deprecated: set ConditionalQMC.Replicates, which wins when both are
	// given.
	Replicates int
	// AuxSamples is the size of the crude sample that describes the
	// outputs when the estimator's own samples cannot (conditional
	// quasi-Monte Carlo, FORM, importance sampling, subset simulation, the
	// surrogate); default 20000, negative for none. Its evaluations are not
	// counted in Result.Evaluations.
	AuxSamples int64
	// FORM are the settings of every FORM analysis Run makes: the form
	// method, the design-point search that starts auto and importance
	// sampling. Nil means the defaults of FORMSettings.
	FORM *FORMSettings
	// Importance, Subset and ConditionalQMC are the settings of those
	// estimators wherever Run uses them, auto included. Nil means their
	// defaults.
	Importance     *ImportanceSettings
	Subset         *SubsetSettings
	ConditionalQMC *ConditionalQMCSettings
	Surrogate      *SurrogateSettings
	// Shard, when not nil, splits sampling across machines or replays
	// the blocks they recorded (see Shard); only monte-carlo,
	// latin-hypercube and conditional-qmc (conditional_shard.go) can be
	// split.
	Shard *Shard
}

// Defaults of Settings.
const (
	DefaultSamples    = 1_000_000
	DefaultConfidence = 0.95
	DefaultKeep       = 2000
	DefaultReplicates = 16
	DefaultAuxSamples = 20000
	// autoTargetCoV is the precision auto plans for when TargetCoV is 0.
	autoTargetCoV = 0.05
)

// withDefaults returns a copy of s with zero fields set to their defaults.
func (s *Settings) withDefaults() Settings {
	var c Settings
	if s != nil {
		c = *s
	}
	if c.Method == "" {
		c.Method = Auto
	}
	if c.Samples == 0 {
		c.Samples = DefaultSamples
	}
	if c.Workers <= 0 {
		c.Workers = runtime.NumCPU()
	}
	if c.Confidence == 0 {
		c.Confidence = DefaultConfidence
	}
	if c.Keep == 0 {
		c.Keep = DefaultKeep
	}
	if c.AuxSamples == 0 {
		c.AuxSamples = DefaultAuxSamples
	}
	return c
}

func (s *Settings) check() error {
	switch {
	case s.Samples < 0:
		return fmt.Errorf("sim: Samples must be positive, got %d", s.Samples)
	case !(s.Confidence > 0 && s.Confidence < 1):
		return fmt.Errorf("sim: Confidence must be in (0, 1), got %v", s.Confidence)
	case s.TargetCoV < 0 || math.IsNaN(s.TargetCoV):
		return fmt.Errorf("sim: TargetCoV must be zero or positive, got %v", s.TargetCoV)
	}
	return s.checkMethods()
}

// Run estimates the failure probability of m with the method of s (nil s
// means all defaults). The result is the same for any number of workers.
// When ctx is cancelled Run returns what it finished with
// Result.Incomplete set.
func Run(ctx context.Context, m *Model, s *Settings) (*Result, error) {
	cfg := s.withDefaults()
	if err := cfg.check(); err != nil {
		return nil, err
	}
	if m == nil || m.G == nil {
		return nil, fmt.Errorf("sim: the model has no limit-state function G")
	}
	t, err := NewTransform(m)
	if err != nil {
		return nil, err
	}
	if ctx == nil {
		ctx = context.Background()
	}
	if sharding(&cfg) && !Shardable(cfg.Method) {
		return nil, fmt.Errorf("sim: %s: %w", cfg.Method, ErrNotShardable)
	}
	var res *Result
	switch cfg.Method {
	case MonteCarlo, LatinHypercube:
		e := &crudeEngine{m: m, t: t, lhs: cfg.Method == LatinHypercube, seed: cfg.Seed, stream: streamMC, n: cfg.Samples}
		if e.lhs {
			e.stream = streamLHS
		}
		res, err = e.run(ctx, &cfg, cfg.Method)
	case ConditionalQMC:
		res, err = conditionalQMC(ctx, m, t, &cfg)
	case FORMMethod:
		res, err = runFORM(ctx, m, &cfg)
	case Importance:
		res, err = importanceChecked(ctx, m, t, &cfg)
	case Subset:
		res, err = subsetSimulation(ctx, m, t, &cfg)
	case Surrogate:
		res, err = surrogate(ctx, m, t, &cfg)
	case Auto:
		res, err = auto(ctx, m, t, &cfg)
	default:
		_, err := ParseMethod(string(cfg.Method))
		return nil, fmt.Errorf("sim: %w", err)
	}
	if err != nil {
		return nil, err
	}
	res.Confidence = cfg.Confidence
	if res.Method == "" {
		res.Method = cfg.Method
	}
	assess(res, cfg.TargetCoV)
	if res.Outputs == nil && cfg.AuxSamples > 0 && !res.Incomplete {
		out, kept, err := Describe(ctx, m, cfg.AuxSamples, cfg.Keep, cfg.Seed)
		if err != nil {
			return nil, err
		}
		res.Outputs = out
		if res.Kept == nil {
			res.Kept = kept
		}
	}
	return res, nil
}

// interruptedResult is the result of a method stopped before it had an
// estimate: pf unknown (NaN) within [0, 1], marked Incomplete.
func interruptedResult(m Method, evals int64) *Result {
	return &Result{Method: m, Evaluations: evals, Incomplete: true,
		Pf: math.NaN(), PfCoV: math.Inf(1), PfCI: [2]float64{0, 1},
		Beta: math.NaN(), BetaCI: [2]float64{math.Inf(-1), math.Inf(1)}}
}

// runFORM wraps a FORM analysis as a Result.
func runFORM(ctx context.Context, m *Model, s *Settings) (*Result, error) {
	f, err := FORMContext(ctx, m, s.formFor(m))
	if ctx.Err() != nil {
		res := interruptedResult(FORMMethod, 0)
		if f != nil {
			res.Evaluations = int64(f.Evaluations)
		}
		return res, nil
	}
	if err != nil {
		return nil, err
	}
	res := &Result{Method: FORMMethod, FORM: f, Evaluations: int64(f.Evaluations), Pf: f.Pf, Beta: f.Beta,
		PfCI: [2]float64{f.Pf, f.Pf}, BetaCI: [2]float64{f.Beta, f.Beta}, Confidence: s.Confidence}
	if !f.Converged {
		res.Warnings = append(res.Warnings, "FORM did not converge: "+f.Status)
		res.flag(DesignPointUnreliable, "the FORM design-point search did not converge ("+f.Status+")")
	}
	res.Warnings = append(res.Warnings, "FORM is a first-order approximation: its pf has no sampling interval")
	return res, nil
}
