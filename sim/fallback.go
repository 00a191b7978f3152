package sim

import (
	"context"
	"fmt"
)

// minFallbackSamples is the smallest budget left for which an estimator
// that cannot be trusted falls back to plain Monte Carlo; with less, the
// flagged result is returned as it is (not Trusted).
const minFallbackSamples = 1000

// designPointDoubt says why a FORM result cannot guide importance
// sampling, or "" when it can: the search failed or did not converge, or
// the design point lies at beta below zero (the median member already
// fails; sampling around such a point gives weights that can carry the
// estimate anywhere, while plain sampling finds pf above one half in a
// few hundred samples).
func designPointDoubt(f *FORMResult, err error) string {
	switch {
	case err != nil:
		return fmt.Sprintf("FORM failed (%v)", err)
	case f == nil || len(f.Points) == 0:
		return "FORM found no design point"
	case !f.Converged:
		return fmt.Sprintf("the FORM design-point search did not converge (%s)", f.Status)
	case f.Beta < 0:
		return fmt.Sprintf("FORM gives beta = %.3g, below zero: the median member fails, so the design point cannot guide importance sampling", f.Beta)
	}
	return ""
}

// importanceChecked runs importance sampling as Run's Importance method:
// FORM first, then sampling around its design points. When the design
// point is in doubt (designPointDoubt) or the weights degenerate, it falls
// back to plain Monte Carlo with the budget left, and Result.Reason and a
// warning say so; when too little budget is left, the flagged result is
// returned with its status.
func importanceChecked(ctx context.Context, m *Model, t *Transform, s *Settings) (*Result, error) {
	f, ferr := FORMContext(ctx, m, s.formFor(m))
	var formEvals int64
	if f != nil {
		formEvals = int64(f.Evaluations)
	}
	if why := designPointDoubt(f, ferr); why != "" {
		return crudeFallback(ctx, m, t, s, f, formEvals, &Result{Method: Importance, Evaluations: formEvals}, DesignPointUnreliable, why)
	}
	res, err := importanceSampling(ctx, m, t, f, s)
	if err != nil {
		return nil, err
	}
	res.FORM = f
	res.Evaluations += formEvals
	if res.Status == WeightsDegenerate && !res.Incomplete {
		return crudeFallback(ctx, m, t, s, f, res.Evaluations, res, WeightsDegenerate, res.StatusReason)
	}
	return res, nil
}

// crudeFallback replaces an estimate that cannot be trusted (flagged with
// status and why) by plain Monte Carlo with the budget left after spent
// evaluations. With less than minFallbackSamples left it returns flagged,
// with its status set.
func crudeFallback(ctx context.Context, m *Model, t *Transform, s *Settings, f *FORMResult, spent int64, flagged *Result, status Status, why string) (*Result, error) {
	if ctx.Err() != nil {
		res := interruptedResult(flagged.Method, spent)
		res.FORM = f
		return res, nil
	}
	left := s.Samples - spent
	if left < minFallbackSamples {
		flagged.FORM = f
		flagged.flag(status, fmt.Sprintf("%s; plain Monte Carlo could not take over: only %d evaluations of the budget were left (give more samples)", why, max(left, 0)))
		return flagged, nil
	}
	e := &crudeEngine{m: m, t: t, seed: s.Seed, stream: streamMC, n: left}
	res, err := e.run(ctx, s, MonteCarlo)
	if err != nil {
		return nil, err
	}
	res.FORM = f
	res.Evaluations += spent
	res.Reason = fmt.Sprintf("%s was asked for, but %s; plain Monte Carlo was used instead, with the %d evaluations left of the budget", flagged.Method, why, left)
	res.Warnings = append(res.Warnings, res.Reason)
	return res, nil
}
