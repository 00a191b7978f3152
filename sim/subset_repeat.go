package sim

import (
	"context"
	"fmt"
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// subsetRepeat honours s.TargetCoV for subset simulation: while the CoV
// of the estimate is above it and the budget left holds another run as
// long as the first, it runs subset simulation again with the same
// samples per level and an independent seed, and combines the runs. The
// K estimates are independent, so their mean has the variance
// sum_k (pf_k delta_k)^2 / K^2, each run's delta_k being its own CoV
// estimate; the interval is lognormal with that CoV, as for one run.
// first is returned unchanged when it is already precise enough, found no
// failure, or was interrupted.
func subsetRepeat(ctx context.Context, sp *uSpace, s *Settings, first *Result) (*Result, error) {
	cfg := rareDefaults(s)
	if cfg.TargetCoV <= 0 || first.Incomplete || !(first.Pf > 0) || !(first.PfCoV > cfg.TargetCoV) {
		return first, nil
	}
	levelSize := cfg.subsetLevel()
	per := first.Evaluations
	runs := []*Result{first}
	spent := first.Evaluations
	pf, cov := first.Pf, first.PfCoV
	conv := []ConvergencePoint{first.Convergence[len(first.Convergence)-1]}
	z := distuv.UnitNormal.Quantile(0.5 + cfg.Confidence/2)
	incomplete := false
	for cov > cfg.TargetCoV && spent+per <= cfg.Samples && ctx.Err() == nil {
		k := uint64(len(runs))
		rs := cfg
		rs.Seed = cfg.Seed ^ (k * 0x9e3779b97f4a7c15) // an independent stream per run
		rs.Samples = cfg.Samples - spent
		// A further run reports its progress as part of the whole; its
		// own levels are not the result's trace.
		outer := newTracer(&cfg, nil)
		rs.Progress, rs.Observer = nil, nil
		if outer.watching() {
			done := spent
			rs.Progress = func(q Progress) {
				outer.report(Progress{Done: done + q.Done, Total: cfg.Samples, Pf: q.Pf, CoV: q.CoV})
			}
		}
		r, err := subsetRun(ctx, sp, &rs, levelSize)
		if err != nil {
			return nil, err
		}
		spent += r.Evaluations
		if r.Incomplete {
			incomplete = true
			break
		}
		if !(r.Pf > 0) || math.IsInf(r.PfCoV, 0) {
			// A run without failure has no CoV to combine: stop here.
			first.Warnings = append(first.Warnings, fmt.Sprintf("subset simulation: independent run %d found no failure; the runs before it are combined", k+1))
			break
		}
		runs = append(runs, r)
		pf, cov = subsetCombine(runs)
		conv = append(conv, subsetPoint(spent, pf, cov*cov, z))
		if cfg.Observer != nil {
			cfg.Observer.Point(Subset, conv[len(conv)-1])
		}
	}
	if len(runs) == 1 && !incomplete {
		// No second run fitted the budget (or it found no failure).
		first.Evaluations = spent
		return first, nil
	}
	res := &Result{Method: Subset, Confidence: cfg.Confidence, Evaluations: spent, Incomplete: incomplete}
	res.Pf, res.PfCoV = pf, cov
	last := conv[len(conv)-1]
	res.PfCI = last.PfCI
	res.Beta = BetaFromPf(pf)
	res.BetaCI = [2]float64{BetaFromPf(res.PfCI[1]), BetaFromPf(res.PfCI[0])}
	res.Convergence = conv // the combined estimate after each run
	for _, r := range runs {
		res.Replicates = append(res.Replicates, r.Pf)
	}
	res.Warnings = append(res.Warnings, first.Warnings...)
	if len(runs) > 1 {
		res.Warnings = append(res.Warnings, fmt.Sprintf("subset simulation: one run reached CoV %.3g, above the target %.3g, so %d independent runs of %d samples per level were combined (CoV %.3g)", first.PfCoV, cfg.TargetCoV, len(runs), levelSize, cov))
	}
	return res, nil
}

// subsetCombine returns the mean of the runs' estimates and its CoV.
func subsetCombine(runs []*Result) (pf, cov float64) {
	var sum, v float64
	for _, r := range runs {
		sum += r.Pf
		sd := r.Pf * r.PfCoV
		v += sd * sd
	}
	k := float64(len(runs))
	pf = sum / k
	return pf, math.Sqrt(v) / k / pf
}
