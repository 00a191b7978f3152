package sim

import (
	"context"
	"fmt"
	"math"
)

// autoCrudeLimit is the largest number of samples auto spends on plain
// Monte Carlo by default (Settings.AutoCrudeLimit); a target that needs
// more goes to importance sampling.
const autoCrudeLimit = 5e6

// crudeLimit is the largest number of samples auto spends on plain Monte
// Carlo with settings s.
func (s *Settings) crudeLimit() float64 {
	if s.AutoCrudeLimit > 0 {
		return float64(s.AutoCrudeLimit)
	}
	return autoCrudeLimit
}

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
//     Settings.AutoCrudeLimit, default autoCrudeLimit (beyond it importance
//     sampling is far quicker);
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
	a := newAutoRun(ctx, m, t, s, note)
	// Conditional QMC needs one point per replicate at least; a smaller
	// budget goes to the other estimators.
	if why := linearUsable(m, t); why == "" && s.Samples >= int64(s.replicates()) {
		return a.conditional()
	}
	if !a.formOK {
		return a.subset(a.formNote)
	}
	need := (1 - a.f.Pf) / (a.f.Pf * a.target * a.target)
	if a.f.Pf > 0 && need <= float64(s.Samples) && need <= s.crudeLimit() {
		return a.mc(fmt.Sprintf("%s: plain Monte Carlo reaches CoV %.3g within about %.3g of the %d samples allowed", a.formNote, a.target, need, s.Samples))
	}
	return a.importance(need)
}

// autoRun is one choice of estimator by auto after FORM: the FORM result
// the choice rests on and what Result.Reason says of it.
type autoRun struct {
	ctx context.Context
	m   *Model
	t   *Transform
	s   *Settings
	// note, when not empty, starts Result.Reason.
	note string
	// target is the CoV of pf aimed at.
	target float64
	// f is FORM's result (nil when FORM failed), formOK whether it
	// converged, formEvals its evaluations, formNote what it found.
	f         *FORMResult
	formOK    bool
	formEvals int64
	formNote  string
}

// newAutoRun runs FORM for auto and says what it found.
func newAutoRun(ctx context.Context, m *Model, t *Transform, s *Settings, note string) *autoRun {
	a := &autoRun{ctx: ctx, m: m, t: t, s: s, note: note, target: s.TargetCoV}
	if a.target == 0 {
		a.target = autoTargetCoV
	}
	f, ferr := FORMContext(ctx, m, s.formFor(m))
	a.formOK = ferr == nil && f != nil && f.Converged
	if ferr == nil && f != nil {
		a.f, a.formEvals = f, int64(f.Evaluations)
	}
	switch {
	case ferr != nil:
		a.formNote = fmt.Sprintf("FORM failed (%v)", ferr)
	case !a.formOK:
		a.formNote = fmt.Sprintf("FORM did not converge (%s)", f.Status)
	default:
		a.formNote = fmt.Sprintf("FORM beta = %.3f, pf = %.3g", f.Beta, f.Pf)
	}
	return a
}

// finish gives res its reason and FORM's result and evaluations.
func (a *autoRun) finish(res *Result, reason string) *Result {
	res.Reason = reason
	if a.note != "" {
		res.Reason = a.note + "; " + reason
	}
	if a.f != nil {
		res.FORM = a.f
		res.Evaluations += a.formEvals
	}
	return res
}

// conditional runs conditional quasi-Monte Carlo on the model's linear
// input; far in the tail, where the conditional integrand is a narrow
// spike that the quasi-random points rarely hit, it tries importance
// sampling too and keeps whichever estimate is the more precise. A
// conditional estimate still more than twice the target CoV is not
// trusted (flagRoughConditional).
func (a *autoRun) conditional() (*Result, error) {
	m, s := a.m, a.s
	res, err := conditionalQMC(a.ctx, m, a.t, s)
	if err != nil {
		return nil, err
	}
	reason := fmt.Sprintf("the limit state is linear in %q, which is integrated exactly; the other inputs are drawn by randomised quasi-Monte Carlo (%s)", m.Vars[m.Linear.Index].Name, a.formNote)
	if res.Incomplete || !(res.PfCoV > conditionalRoughCoV(a.target)) {
		return a.finish(res, reason), nil
	}
	if !a.formOK {
		flagRoughConditional(res, a.target, "and FORM found no design point for importance sampling")
		return a.finish(res, reason), nil
	}
	alt, aerr := importanceSampling(a.ctx, m, a.t, a.f, s)
	if aerr == nil && !importanceDegenerate(alt) && !math.IsNaN(alt.Pf) && alt.PfCoV < res.PfCoV {
		alt.Method = Importance
		alt.Evaluations += res.Evaluations
		return a.finish(alt, fmt.Sprintf("%s: conditional quasi-Monte Carlo reached only CoV %.2g within the budget, so importance sampling around the design point was used", a.formNote, res.PfCoV)), nil
	}
	flagRoughConditional(res, a.target, "and importance sampling did no better")
	return a.finish(res, reason), nil
}

// mc runs plain Monte Carlo on the whole budget; why is its reason.
func (a *autoRun) mc(why string) (*Result, error) {
	e := &crudeEngine{m: a.m, t: a.t, seed: a.s.Seed, stream: streamMC, n: a.s.Samples}
	res, err := e.run(a.ctx, a.s, MonteCarlo)
	if err != nil {
		return nil, err
	}
	return a.finish(res, why), nil
}

// subset runs subset simulation, or plain Monte Carlo when it fails; why
// says why it was chosen.
func (a *autoRun) subset(why string) (*Result, error) {
	res, err := subsetSimulation(a.ctx, a.m, a.t, a.s)
	if err != nil {
		return a.mc(why + fmt.Sprintf("; subset simulation failed (%v), so plain Monte Carlo was used", err))
	}
	res.Method = Subset
	return a.finish(res, why+"; subset simulation was used"), nil
}

// importance runs importance sampling around FORM's design points, where
// plain Monte Carlo would need about need samples, and subset simulation
// when it fails or flags its own result.
func (a *autoRun) importance(need float64) (*Result, error) {
	res, err := importanceSampling(a.ctx, a.m, a.t, a.f, a.s)
	switch {
	case err != nil:
		return a.subset(fmt.Sprintf("%s: plain Monte Carlo would need about %.3g samples; importance sampling failed (%v)", a.formNote, need, err))
	case importanceDegenerate(res):
		return a.subset(fmt.Sprintf("%s: importance sampling flagged a poor design point (degenerate weights)", a.formNote))
	}
	res.Method = Importance
	if math.IsNaN(res.Pf) {
		return a.subset(a.formNote + ": importance sampling returned no estimate")
	}
	return a.finish(res, fmt.Sprintf("%s: plain Monte Carlo would need about %.3g samples (budget %d, and auto spends at most %.3g on it); importance sampling around the design point", a.formNote, need, a.s.Samples, a.s.crudeLimit())), nil
}
