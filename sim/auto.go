package sim

import (
	"context"
	"fmt"
	"math"
)

// autoCrudeLimit is the largest number of samples auto spends on plain
// Monte Carlo; a target that needs more goes to importance sampling.
const autoCrudeLimit = 5e6

// auto chooses an estimator. For a Model marked Expensive with at most
// surrogateMaxDim (10) inputs it learns a surrogate (the surrogate
// method: FORM, then active-learning Kriging) and keeps its result when
// that is trusted. Otherwise, and for every other model, FORM runs first
// (its design point and importance factors are reported whatever
// follows). Then:
//   - conditional quasi-Monte Carlo when the model states a usable linear
//     input, since it is exact in that input and smooth in the others;
//   - plain Monte Carlo when FORM's pf is large enough for the budget to
//     reach the target CoV, n >= (1 - pf)/(pf CoV^2), and that n is at most
//     autoCrudeLimit (beyond it importance sampling is far quicker);
//   - importance sampling around the design points otherwise;
//   - subset simulation when FORM fails or importance sampling fails or
//     flags its own result.
//
// Result.Reason says which was used and why.
func auto(ctx context.Context, m *Model, t *Transform, s *Settings) (*Result, error) {
	if m.Expensive && t.Dim() <= surrogateMaxDim {
		res, spent, note, err := autoSurrogate(ctx, m, t, s)
		if err != nil || res != nil {
			return res, err
		}
		res, err = autoSampling(ctx, m, t, s, note)
		if res != nil {
			res.Evaluations += spent
		}
		return res, err
	}
	return autoSampling(ctx, m, t, s, "")
}

// autoSurrogate runs the surrogate for an expensive model. It returns the
// result when it can be trusted (or the run was interrupted), else the
// evaluations it spent and a note that says why auto goes on to the other
// estimators.
func autoSurrogate(ctx context.Context, m *Model, t *Transform, s *Settings) (*Result, int64, string, error) {
	why := fmt.Sprintf("each evaluation of the model is expensive (a numerical analysis) and it has %d random inputs (the surrogate takes at most %d)", t.Dim(), surrogateMaxDim)
	res, err := surrogate(ctx, m, t, s)
	switch {
	case err != nil:
		return nil, 0, fmt.Sprintf("%s, but the surrogate failed (%v)", why, err), nil
	case res.Incomplete || res.Status.Trusted():
		res.Reason = why + ": an active-learning Kriging surrogate of the limit state (AK-MCS/AK-IS) classified the candidates"
		return res, 0, "", nil
	}
	return nil, res.Evaluations, fmt.Sprintf("%s, but the surrogate's result was not trusted (%s)", why, res.StatusReason), nil
}

// autoSampling is auto without the surrogate; note, when not empty, says
// why the surrogate was not used and starts Result.Reason.
func autoSampling(ctx context.Context, m *Model, t *Transform, s *Settings, note string) (*Result, error) {
	target := s.TargetCoV
	if target == 0 {
		target = autoTargetCoV
	}
	f, ferr := FORMContext(ctx, m, s.formFor(m))
	var formEvals int64
	formOK := ferr == nil && f != nil && f.Converged
	if ferr == nil && f != nil {
		formEvals = int64(f.Evaluations)
	} else {
		f = nil
	}
	finish := func(res *Result, reason string) *Result {
		res.Reason = reason
		if note != "" {
			res.Reason = note + "; " + reason
		}
		if f != nil {
			res.FORM = f
			res.Evaluations += formEvals
		}
		return res
	}
	formNote := ""
	switch {
	case ferr != nil:
		formNote = fmt.Sprintf("FORM failed (%v)", ferr)
	case !formOK:
		formNote = fmt.Sprintf("FORM did not converge (%s)", f.Status)
	default:
		formNote = fmt.Sprintf("FORM beta = %.3f, pf = %.3g", f.Beta, f.Pf)
	}

	// Conditional QMC needs one point per replicate at least; a smaller
	// budget goes to the other estimators.
	if why := linearUsable(m, t); why == "" && s.Samples >= int64(s.replicates()) {
		res, err := conditionalQMC(ctx, m, t, s)
		if err != nil {
			return nil, err
		}
		reason := fmt.Sprintf("the limit state is linear in %q, which is integrated exactly; the other inputs are drawn by randomised quasi-Monte Carlo (%s)", m.Vars[m.Linear.Index].Name, formNote)
		if res.Incomplete || !formOK || !(res.PfCoV > 2*target) {
			return finish(res, reason), nil
		}
		// Far in the tail the conditional integrand is a narrow spike that
		// the quasi-random points rarely hit: try importance sampling and
		// keep whichever estimate is the more precise.
		alt, aerr := importanceSampling(ctx, m, t, f, s)
		if aerr == nil && !importanceDegenerate(alt) && !math.IsNaN(alt.Pf) && alt.PfCoV < res.PfCoV {
			alt.Method = Importance
			alt.Evaluations += res.Evaluations
			return finish(alt, fmt.Sprintf("%s: conditional quasi-Monte Carlo reached only CoV %.2g within the budget, so importance sampling around the design point was used", formNote, res.PfCoV)), nil
		}
		res.flag(BudgetSpent, fmt.Sprintf("conditional quasi-Monte Carlo reached CoV %.2g, above the target %.2g, and importance sampling did no better; treat pf as an order of magnitude", res.PfCoV, target)) // assess adds it to the warnings
		return finish(res, reason), nil
	}

	mc := func(why string) (*Result, error) {
		e := &crudeEngine{m: m, t: t, seed: s.Seed, stream: streamMC, n: s.Samples}
		res, err := e.run(ctx, s, MonteCarlo)
		if err != nil {
			return nil, err
		}
		return finish(res, why), nil
	}
	subset := func(why string) (*Result, error) {
		res, err := subsetSimulation(ctx, m, t, s)
		if err != nil {
			return mc(why + fmt.Sprintf("; subset simulation failed (%v), so plain Monte Carlo was used", err))
		}
		res.Method = Subset
		return finish(res, why+"; subset simulation was used"), nil
	}

	if !formOK {
		return subset(formNote)
	}
	need := (1 - f.Pf) / (f.Pf * target * target)
	if f.Pf > 0 && need <= float64(s.Samples) && need <= autoCrudeLimit {
		return mc(fmt.Sprintf("%s: plain Monte Carlo reaches CoV %.3g within about %.3g of the %d samples allowed", formNote, target, need, s.Samples))
	}
	res, err := importanceSampling(ctx, m, t, f, s)
	switch {
	case err != nil:
		return subset(fmt.Sprintf("%s: plain Monte Carlo would need about %.3g samples; importance sampling failed (%v)", formNote, need, err))
	case importanceDegenerate(res):
		return subset(fmt.Sprintf("%s: importance sampling flagged a poor design point (degenerate weights)", formNote))
	}
	res.Method = Importance
	if math.IsNaN(res.Pf) {
		return subset(formNote + ": importance sampling returned no estimate")
	}
	return finish(res, fmt.Sprintf("%s: plain Monte Carlo would need about %.3g samples (budget %d, and auto spends at most %.0g on it); importance sampling around the design point", formNote, need, s.Samples, autoCrudeLimit)), nil
}
