package sim

import "fmt"

// Status says how far a Result can be trusted. Callers branch on it (and
// on Trusted), never on the text of Result.Warnings; Result.StatusReason
// says in words why a result has its status.
type Status int

// The statuses of a Result. Those up to FewFailures are trusted: the
// estimate and its interval stand and a verdict may be drawn from them
// (with a warning when the precision asked for was not reached). The
// others are not: no verdict may be drawn from such a result.
const (
	// Converged: the method ran to its end, its own checks passed and the
	// CoV of pf reached the target (or no target was set).
	Converged Status = iota
	// BudgetSpent: the budget of evaluations ended before the CoV of pf
	// reached the target; the interval is wider than asked for.
	BudgetSpent
	// FewFailures: crude sampling saw fewer than MinFailures failures; its
	// binomial interval stands but the point estimate is rough.
	FewFailures
	// Interrupted: the run was cancelled before it finished.
	Interrupted
	// WeightsDegenerate: the weights of importance sampling degenerated
	// (a few samples carry the estimate): the design points do not
	// describe the failure domain.
	WeightsDegenerate
	// DesignPointUnreliable: the FORM design point the estimate rests on
	// did not converge, or lies where it cannot guide sampling (beta below
	// zero: the median member already fails).
	DesignPointUnreliable
	// Imprecise: the CoV of pf is so large (above MaxTrustedCoV) that the
	// normal approximation behind the interval fails; for conditional
	// quasi-Monte Carlo, above twice the target CoV, or pf exactly zero
	// (flagRoughConditional): pf is then only an order of magnitude.
	Imprecise
	// Unsettled: the surrogate's budget, or its cap on the learning
	// (SurrogateSettings.MaxLearning), ended before its Kriging model
	// settled (some candidate's predicted sign still in doubt, U below
	// 2): the interval rests on the model's own, unverified, predictive
	// spread.
	Unsettled
)

// MinFailures is the number of failed samples below which a crude
// estimate is flagged FewFailures (about 10; common practice).
const MinFailures = 10

// MaxTrustedCoV is the CoV of pf above which an estimate whose interval
// rests on a normal approximation (importance sampling, subset simulation,
// conditional quasi-Monte Carlo) is flagged Imprecise: at CoV 0.5 the 95 %
// interval pf(1 ± 1.96 CoV) already reaches zero.
const MaxTrustedCoV = 0.5

// Trusted reports whether a verdict may be drawn from a result with this
// status.
func (s Status) Trusted() bool { return s <= FewFailures }

// String returns the status's name as the result document writes it.
func (s Status) String() string {
	switch s {
	case Converged:
		return "converged"
	case BudgetSpent:
		return "budget-spent"
	case FewFailures:
		return "few-failures"
	case Interrupted:
		return "interrupted"
	case WeightsDegenerate:
		return "weights-degenerate"
	case DesignPointUnreliable:
		return "design-point-unreliable"
	case Imprecise:
		return "imprecise"
	case Unsettled:
		return "unsettled"
	}
	return fmt.Sprintf("Status(%d)", int(s))
}

// flag sets the status of r and its reason unless r already carries a
// status that is less trusted.
func (r *Result) flag(s Status, reason string) {
	if s > r.Status {
		r.Status, r.StatusReason = s, reason
	}
}

// assess sets the status of a finished result from its numbers: an
// interrupted run, too few failures for crude sampling, a conditional
// quasi-Monte Carlo estimate too rough to decide anything
// (flagRoughConditional), a CoV too large for the interval's normal
// approximation, a CoV above the target. A
// method's own, more specific status (degenerate weights, an unreliable
// design point) is kept. It adds a warning for each trusted status short
// of Converged that no warning of the method states already.
func assess(r *Result, targetCoV float64) {
	crude := r.Method == MonteCarlo || r.Method == LatinHypercube
	warn := true
	switch {
	case r.Incomplete:
		r.flag(Interrupted, fmt.Sprintf("the run was interrupted after %d evaluations", r.Evaluations))
	case r.Method == FORMMethod:
		// FORM has no sampling precision; its design point is checked
		// where it is run.
	case crude && r.Failures < MinFailures && r.Pf < 0.5:
		r.flag(FewFailures, fmt.Sprintf("the estimate rests on %d failed samples of %d (fewer than %d): the point estimate of pf is rough; its binomial interval stands and a verdict rests on the interval alone", r.Failures, r.Evaluations, MinFailures))
		warn = r.Failures > 0 // no failure at all has its own warning
	case r.Method == ConditionalQMC && (r.Pf == 0 || r.PfCoV > conditionalRoughCoV(targetCoV)):
		flagRoughConditional(r, targetCoV, "")
	case !crude && r.Pf == 0:
		r.flag(BudgetSpent, fmt.Sprintf("%s saw no failure within the budget: pf is only bounded from above", r.Method))
		warn = false // the method says so
	case !crude && r.PfCoV > MaxTrustedCoV:
		r.flag(Imprecise, fmt.Sprintf("the CoV of pf is %.2g, above %.2g: the interval of %s cannot be trusted", r.PfCoV, MaxTrustedCoV, r.Method))
	case targetCoV > 0 && r.PfCoV > targetCoV:
		r.flag(BudgetSpent, fmt.Sprintf("the budget ended at CoV %.3g of pf, above the target %.3g", r.PfCoV, targetCoV))
	}
	if warn && r.Status != Converged && r.Status.Trusted() {
		r.Warnings = append(r.Warnings, r.StatusReason)
	}
}
