package sim

// Method names an estimator of the failure probability.
type Method string

// The estimators Run knows.
const (
	Auto           Method = "auto"
	MonteCarlo     Method = "monte-carlo"
	LatinHypercube Method = "latin-hypercube"
	FORMMethod     Method = "form"
	Importance     Method = "importance"
	Subset         Method = "subset"
	// ConditionalQMC integrates the Model's Linear input exactly and draws
	// the others by randomised quasi-Monte Carlo.
	ConditionalQMC Method = "conditional-qmc"
	// Surrogate learns a Kriging model of the limit state where its sign
	// is uncertain and classifies a population of candidates with it.
	Surrogate Method = "surrogate"
)

// Result is the outcome of Run.
type Result struct {
	// Method is the estimator that produced Pf; Reason says why auto chose it.
	Method Method
	Reason string
	// Evaluations counts calls of the limit state, FORM's included.
	Evaluations int64
	// Failures counts failed samples (crude sampling methods only).
	Failures int64
	// Pf is the failure probability, PfCI its interval at Confidence and
	// PfCoV the coefficient of variation of the estimator (+Inf when no
	// failure was seen; Beta is then +Inf and PfCI[0] = 0).
	Pf, PfCoV float64
	PfCI      [2]float64
	// Beta = -Phi^-1(Pf); BetaCI maps PfCI (BetaCI[0] from PfCI[1]).
	Beta   float64
	BetaCI [2]float64
	// Confidence is the level of the intervals, e.g. 0.95.
	Confidence float64
	// FORM holds the first-order analysis when one was run.
	FORM *FORMResult
	// Outputs summarises the Model's outputs over the samples (for
	// rare-event methods, over an auxiliary crude sample).
	Outputs []OutputStats
	// Convergence traces the estimate as evaluations grow; Trace says
	// what its points are.
	Convergence []ConvergencePoint
	Trace       Trace
	// Replicates are independent estimates of pf whose mean is Pf, when
	// the method has them: the randomisations of conditional quasi-Monte
	// Carlo (final round) or the independent runs of subset simulation.
	Replicates []float64
	// Kept is a bounded, reproducible subsample of evaluated points.
	Kept *Samples
	// Incomplete is set when the run was cancelled before it finished.
	Incomplete bool
	// Status says how far the result can be trusted; StatusReason says
	// why in words. No verdict may be drawn from a result whose Status is
	// not Trusted.
	Status       Status
	StatusReason string
	// Warnings are diagnostics a reader should see.
	Warnings []string
	// boundStated is set when a warning of the method already says that
	// no sample failed and pf is only bounded (BetaStatement is then "").
	boundStated bool
}

// Trace names what Result.Convergence holds.
type Trace int

const (
	// TraceEstimates: the estimate of pf and its interval after a growing
	// number of evaluations.
	TraceEstimates Trace = iota
	// TraceLevels: subset simulation's intermediate levels, the
	// probabilities P(g <= b_k) of its falling thresholds b_k; only the
	// last point is an estimate of pf.
	TraceLevels
)

// ConvergencePoint is the estimate after a number of evaluations.
type ConvergencePoint struct {
	Evaluations int64
	Pf          float64
	PfCI        [2]float64
	PfCoV       float64
}

// OutputStats describes the distribution of one Model output (or of the
// limit state itself, named "g") over the samples, in constant memory.
type OutputStats struct {
	Name     string
	N        int64
	Mean, SD float64
	// Min and Max are the extreme sampled values.
	Min, Max float64
	// Quantiles holds the values at the probabilities in QuantileLevels.
	Quantiles []float64
	// Hist is a fixed-bin histogram of the values.
	Hist Histogram
}

// QuantileLevels are the probabilities of OutputStats.Quantiles.
var QuantileLevels = []float64{0.01, 0.05, 0.50, 0.95, 0.99}

// Histogram is a fixed-bin histogram: bin i covers
// [Lo + i*Width, Lo + (i+1)*Width). Values outside are counted in Under and
// Over.
type Histogram struct {
	Lo, Width   float64
	Counts      []float64
	Under, Over float64
}

// Samples is a table of kept sample points: one row per point, columns
// named by Names (the inputs, then the outputs, then "g").
type Samples struct {
	Names []string
	Rows  [][]float64
}

// DesignPoint is a most probable failure point found by FORM.
type DesignPoint struct {
	// Beta is the distance of U from the origin of standard normal space.
	Beta float64
	// U and X are the point in standard normal and physical space.
	U, X []float64
	// Alpha is the unit vector -U/Beta; Importance holds Alpha[i]^2.
	Alpha, Importance []float64
}

// FORMResult is the outcome of a first-order reliability analysis.
type FORMResult struct {
	// Beta and Pf are for the whole (series) system of design points.
	Beta, Pf float64
	// Points lists the design points found, the most probable first.
	Points []DesignPoint
	// Evaluations counts limit-state calls.
	Evaluations int
	// Converged reports success; Status says how the search ended.
	Converged bool
	Status    string
}
