package analysis

import (
	"context"
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// targetRun is the margin of a study against its target: the reserve
// factor found by FORM, corrected and confirmed by sampling runs.
type targetRun struct {
	reserve *study.Reserve // FORM alone
	// factor is the reserve factor after correction, formBeta the FORM
	// index there and confirm the sampling run there.
	factor, formBeta float64
	confirm          *sim.Result
	// confirmed is set when the last sampling run's interval of beta
	// holds the target and the run can be trusted to say so
	// (confirmation).
	confirmed bool
	// added is the largest added load after correction (NaN: none).
	added float64
	notes []string
	// cut, when not empty, is the warning that a confirmation run was
	// cut before its estimator settled (cutWarning).
	cut string
}

// maxConfirm bounds the sampling runs that correct the reserve factor.
const maxConfirm = 3

// runTarget finds the reserve factor and the largest added load by FORM,
// then confirms the factor by a sampling run of the study's method with
// the reserve loads multiplied by it. When the sampled beta there misses
// the target (its interval does not hold it), FORM is taken to be off by
// the same amount d = beta_FORM - beta_sampled near the factor, the factor
// is found again for the FORM index target + d and confirmed again, at
// most maxConfirm runs in all. The largest added load is the FORM root
// for target + d of the last run. It returns nil without a target.
func runTarget(ctx context.Context, l *Loaded, s *sim.Settings, obs Observer) *targetRun {
	st := l.Study
	if !st.HasTarget || len(l.Model.Sim.Vars) == 0 {
		return nil
	}
	t := &targetRun{added: math.NaN()}
	obs.Stage("reserve factor (FORM)")
	rv, err := l.Model.Reserve(ctx, st.Target, s.FORM)
	if err != nil {
		t.notes = append(t.notes, "no reserve factor: "+err.Error())
		return t
	}
	t.reserve = rv
	t.factor, t.formBeta, t.added = rv.Factor, rv.FactorBeta, rv.Added
	if rv.AddedErr != nil {
		t.notes = append(t.notes, "no "+rv.AddedErr.Error())
	}
	d := 0.0
	for k := range maxConfirm {
		if ctx.Err() != nil {
			return t
		}
		obs.Stage(fmt.Sprintf("reserve confirmation (sampling run %d of at most %d)", k+1, maxConfirm))
		cs := *s
		res, err := sim.Run(ctx, l.Model.Loaded(t.factor, 0), &cs)
		if err != nil || res.Incomplete {
			t.notes = append(t.notes, "the reserve factor was not confirmed by sampling")
			return t
		}
		t.confirm = res
		ok, usable, why := confirmation(res, st.Target)
		if ok {
			t.confirmed = true
			break
		}
		if res.Status == sim.Unsettled {
			t.cut = cutWarning(res, t.factor, k > 0)
			t.notes = append(t.notes, "the reserve factor is not confirmed: its confirmation was cut (see the warnings)")
			break
		}
		if !usable {
			// Too little to correct FORM by: say what was found.
			t.notes = append(t.notes, fmt.Sprintf("the reserve factor is not confirmed: the sampling run there (%s) %s", res.Method, why))
			break
		}
		d = t.formBeta - res.Beta
		if k == maxConfirm-1 {
			t.notes = append(t.notes, fmt.Sprintf("after %d sampling runs the sampled beta at the reserve factor is %.3f, not the target: the factor is approximate", maxConfirm, res.Beta))
			break
		}
		f, b, _, err := l.Model.FactorFor(ctx, st.Target+d, s.FORM)
		if err != nil {
			t.notes = append(t.notes, "the reserve factor could not be corrected for the offset of FORM: "+err.Error())
			break
		}
		t.factor, t.formBeta = f, b
	}
	if c := t.confirm; c != nil {
		if _, usable, _ := confirmation(c, st.Target); usable {
			d = t.formBeta - c.Beta
		}
	}
	if d != 0 && rv.AddedErr == nil {
		if a, _, err := l.Model.AddedFor(ctx, st.Target+d, s.FORM); err == nil {
			t.added = a
		} else {
			t.notes = append(t.notes, "no largest added load after the correction: "+err.Error())
			t.added = math.NaN()
		}
	}
	if math.Abs(d) > 0.05 {
		t.notes = append(t.notes, fmt.Sprintf("FORM and sampling differ by %.2f in beta here; the reserve factor and the added load are corrected for it (FORM alone gives a factor of %.3f)", d, rv.Factor))
	}
	return t
}

// cutWarning says that the confirmation run res at the reserve factor
// was cut (the surrogate's learning ended, at its cap or the budget,
// before its Kriging model settled) and what the factor then is: FORM's,
// corrected by an earlier run when corrected, unconfirmed, so that no
// verdict may rest on it.
func cutWarning(res *sim.Result, factor float64, corrected bool) string {
	whose := "FORM's alone"
	if corrected {
		whose = "FORM's, corrected by an earlier sampling run"
	}
	return fmt.Sprintf("reserve confirmation cut after %d model evaluations: the %s run at the reserve factor %.3f ended before it settled (%s); the factor is %s and unconfirmed: it says roughly how far the reserve loads may grow, not that the member meets the target there",
		res.Evaluations, res.Method, factor, res.StatusReason, whose)
}

// confirmation says whether the sampling run res at the reserve factor
// confirms it: its estimate is trusted, rests on enough failures, and its
// interval of beta holds the target (or its beta is within 0.005 of it).
// usable reports whether res is precise enough to correct FORM by (a
// trusted estimate with a finite beta and at least sim.MinFailures failed
// samples when crude); why says what was found when it does not confirm.
func confirmation(res *sim.Result, target float64) (ok, usable bool, why string) {
	found := fmt.Sprintf("beta %s, 95 %% interval [%s, %s]", report.BetaText(res.Beta), report.BetaText(res.BetaCI[0]), report.BetaText(res.BetaCI[1]))
	switch {
	case !res.Status.Trusted():
		return false, false, "cannot be trusted: " + res.StatusReason
	case math.IsInf(res.Beta, 0) || math.IsNaN(res.Beta):
		return false, false, "found " + found + ", no finite index to compare with the target"
	case res.Status == sim.FewFailures:
		return false, false, fmt.Sprintf("found %s from only %d failed samples of %d; give more samples", found, res.Failures, res.Evaluations)
	case res.BetaCI[0] <= target && target <= res.BetaCI[1], math.Abs(res.Beta-target) < 0.005:
		return true, true, ""
	}
	return false, true, "found " + found + ", which does not hold the target"
}

// samplesToDecide estimates the evaluations after which the interval of
// pf would clear the target's pf, if the estimate stayed where it is: the
// CoV of the estimate falls as 1/sqrt(n), so n_needed = n (CoV /
// CoV_needed)^2, with CoV_needed = |pt - pf| / (z pf) the CoV at which
// the half-width z CoV pf of the interval equals the distance to the
// target (z = 1.96 at 95 %, normal approximation of the interval). With
// no failure seen, the rule of three (an upper 95 % bound of about 3/n
// on pf when no failure is seen in n samples; common practice) gives
// n = 3 / pt.
func samplesToDecide(res *sim.Result, target float64) float64 {
	pt := sim.PfFromBeta(target)
	if res.Pf == 0 || math.IsInf(res.PfCoV, 1) {
		return math.Ceil(3 / pt)
	}
	need := math.Abs(pt-res.Pf) / (1.96 * res.Pf)
	if need == 0 {
		return math.Inf(1)
	}
	n := float64(res.Evaluations) * (res.PfCoV / need) * (res.PfCoV / need)
	return math.Ceil(n)
}

// baseTarget is the target part of the document before sampling.
func baseTarget(st *study.Study) *report.TargetCheck {
	if !st.HasTarget {
		return nil
	}
	t := &report.TargetCheck{Beta: st.Target, Pf: sim.PfFromBeta(st.Target), Source: st.TargetSource, ReferencePeriod: st.ReferencePeriod, ReserveOn: st.ReserveOn}
	if y := st.ReferenceYears; y > 0 {
		t.ReferenceYears = &y
	}
	for _, q := range st.ReserveActions() {
		t.ReserveLoads = append(t.ReserveLoads, q.Path)
	}
	return t
}

// fillTarget writes the verdict and the margin into d. MeetsTarget stays
// absent when the verdict is undecided.
func (r *Result) fillTarget(d *report.Document) {
	st := r.l.Study
	if !st.HasTarget || d.TargetBeta == nil {
		return
	}
	t := baseTarget(st)
	d.Target = t
	v := report.TargetVerdict(d) // one rule for the document, summary and reports
	t.Verdict = v.String()
	switch {
	case v == report.Undecided && !r.Estimate.Status.Trusted():
		t.Reason = "the estimate cannot be trusted: " + r.Estimate.StatusReason
	case v == report.Undecided:
		t.Reason = "the interval of beta straddles the target at this sample size"
	}
	switch {
	case v == report.Undecided && r.Estimate.Status.Trusted():
		n := samplesToDecide(r.Estimate, st.Target)
		if !math.IsInf(n, 0) {
			t.SamplesToDecide = &n
		}
	case v == report.Met, v == report.NotMet:
		meets := v == report.Met
		d.MeetsTarget = &meets
	}
	tr := r.target
	if tr == nil {
		return
	}
	t.Notes = append(t.Notes, tr.notes...)
	if rv := tr.reserve; rv != nil {
		f, b, ff := tr.factor, tr.formBeta, rv.Factor
		d.ReserveFactor, t.ReserveFORMBeta, t.ReserveFORMFactor = &f, &b, &ff
		if !math.IsNaN(tr.added) {
			a := tr.added
			t.LargestAddedLoad = &a
		}
	}
	if c := tr.confirm; c != nil {
		t.Confirmation = &report.Confirmation{
			Confirmed: tr.confirmed, Status: c.Status.String(),
			Method: string(c.Method), Evaluations: c.Evaluations,
			Pf: c.Pf, PfCI: c.PfCI, Beta: report.Index(c.Beta),
			BetaCI: [2]report.Index{report.Index(c.BetaCI[0]), report.Index(c.BetaCI[1])},
		}
	}
}

// targetCheckText says, in check, what the reserve factor will multiply.
func targetCheckText(st *study.Study) string {
	if !st.HasTarget {
		return ""
	}
	var names []string
	for _, q := range st.ReserveActions() {
		names = append(names, q.Path)
	}
	s := fmt.Sprintf("  target from %s\n", st.TargetSource)
	if st.ReferencePeriod != "" {
		s += fmt.Sprintf("  reference period %s\n", st.ReferencePeriod)
	}
	on := "the variable loads"
	if st.ReserveOn == "all" {
		on = "all loads"
	}
	s += fmt.Sprintf("  the reserve factor multiplies %s: %s\n", on, strings.Join(names, ", "))
	return s
}
