package sim

import (
	"context"
	"errors"
	"fmt"
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// importanceBlockSize is the number of samples in one block of importance
// sampling; the target CoV is checked after each block, in block order.
const importanceBlockSize = 1000

// ImportancePoorPrefix starts the warning that importance sampling adds to
// Result.Warnings when its weights degenerate, a sign that the design
// points do not describe the failure domain; auto then falls back to
// subset simulation.
const ImportancePoorPrefix = "importance sampling: poor design point"

// importanceDegenerate reports whether r is an importance sampling whose
// weights degenerated.
func importanceDegenerate(r *Result) bool {
	return r != nil && r.Status == WeightsDegenerate
}

// importanceSampling estimates Pf by sampling around the FORM design points.
//
// The sampling density in standard normal space is the mixture
//
//	h(u) = sum_k pi_k phi_n(u - u_k),  pi_k proportional to Phi(-beta_k),
//
// of unit-variance normals centred at the design points u_k (one point:
// the classical design-point importance sampling, e.g. Melchers,
// Structural Reliability Analysis and Prediction, 2nd ed., 1999, §3.5; the
// mixture for several points, e.g. Au and Beck, Structural Safety 21,
// 1999, from memory). The estimate is the mean of I(g < 0) w with
// w = phi_n(u)/h(u); its CoV and interval use the normal approximation of
// that mean. Samples come in blocks of 1000, each seeded from (seed,
// block) and combined in block order; sampling stops after the block at
// which the CoV reaches s.TargetCoV (at least 10 failures), or at
// s.Samples. Result.Evaluations counts the sampling only (Run adds FORM's).
func importanceSampling(ctx context.Context, m *Model, t *Transform, form *FORMResult, s *Settings) (*Result, error) {
	if form == nil || !form.Converged || len(form.Points) == 0 {
		status := "no FORM result"
		if form != nil {
			status = form.Status
		}
		return nil, fmt.Errorf("sim: importance sampling needs converged FORM design points (FORM: %s)", status)
	}
	res, err := importanceRun(ctx, modelSpace(m, t), form.Points, s)
	if err != nil {
		return nil, err
	}
	res.FORM = form
	return res, nil
}

// isBlock holds the sums of one block of importance sampling.
type isBlock struct {
	n, fails int64
	nan      int64   // samples where g was NaN (counted as safe)
	sw, sw2  float64 // sums of the weights of failed samples and of their squares
	maxw     float64 // largest weight of a failed sample
}

// isWorker is the scratch memory of one goroutine.
type isWorker struct {
	g   func(u []float64) float64
	u   []float64
	a   []float64
	rng *blockRNG
}

// importanceRun is importance sampling in standard normal space around
// the given design points (their U and Beta are used).
func importanceRun(ctx context.Context, sp *uSpace, points []DesignPoint, s *Settings) (*Result, error) {
	cfg := rareDefaults(s)
	n := sp.dim
	if len(points) == 0 {
		return nil, errors.New("sim: importance sampling needs at least one design point")
	}
	for i, p := range points {
		if len(p.U) != n {
			return nil, fmt.Errorf("sim: design point %d has %d coordinates, the model %d", i, len(p.U), n)
		}
	}
	k := len(points)
	mix := isSetup(sp, points)
	centres, logPi, cum := mix.centres, mix.logPi, mix.cum

	nb := int((cfg.Samples + importanceBlockSize - 1) / importanceBlockSize)
	blocks := make([]isBlock, nb)
	workers := make([]*isWorker, max(1, min(cfg.Workers, nb)))
	work := func(w, b int) {
		ws := workers[w]
		if ws == nil {
			ws = &isWorker{g: sp.newG(), u: make([]float64, n), a: make([]float64, k), rng: newBlockRNG()}
			workers[w] = ws
		}
		ws.rng.seed(cfg.Seed, streamImportance, uint64(b))
		size := int(min(int64(importanceBlockSize), cfg.Samples-int64(b)*importanceBlockSize))
		blocks[b] = importanceBlock(ws, size, centres, logPi, cum)
	}

	var tot2 isBlock
	res := &Result{Method: Importance, Confidence: cfg.Confidence}
	tr := newTracer(&cfg, res)
	stride := max(1, nb/100)
	z := distuv.UnitNormal.Quantile(0.5 + cfg.Confidence/2)
	merge := func(b int) bool {
		blk := blocks[b]
		tot2.n += blk.n
		tot2.fails += blk.fails
		tot2.nan += blk.nan
		tot2.sw += blk.sw
		tot2.sw2 += blk.sw2
		tot2.maxw = math.Max(tot2.maxw, blk.maxw)
		pf, cov := isEstimate(&tot2)
		if (b+1)%stride == 0 || b == nb-1 {
			lo, hi := isInterval(pf, cov, z)
			tr.point(ConvergencePoint{Evaluations: tot2.n, Pf: pf, PfCI: [2]float64{lo, hi}, PfCoV: cov})
		}
		tr.report(Progress{Done: tot2.n, Total: cfg.Samples, Pf: pf, CoV: cov})
		if cfg.TargetCoV > 0 && tot2.fails >= cfg.isMinFailures() && cov <= cfg.TargetCoV {
			return false
		}
		// Degenerate weights do not recover: stop early and leave the
		// budget to an estimator that can be trusted.
		return !(tot2.n >= isEarlyCheck && isPoor(&tot2) != "")
	}
	_, cancelled := rareParallel(ctx, cfg.Workers, nb, work, merge)

	pf, cov := isEstimate(&tot2)
	if pf > 1 {
		// Weights above 1 can carry the estimate past certainty: the
		// design point does not describe a failure domain this large.
		why := fmt.Sprintf("%s: the estimate %.3g exceeds 1 (failure is likely; use monte-carlo)", ImportancePoorPrefix, pf)
		res.Warnings = append(res.Warnings, why)
		res.flag(WeightsDegenerate, why)
		pf = 1
	}
	lo, hi := isInterval(pf, cov, z)
	res.Evaluations = tot2.n
	res.Pf, res.PfCoV, res.PfCI = pf, cov, [2]float64{lo, hi}
	res.Beta = BetaFromPf(pf)
	res.BetaCI = [2]float64{BetaFromPf(hi), BetaFromPf(lo)}
	res.Incomplete = cancelled
	if poor := isPoor(&tot2); poor != "" {
		res.flag(WeightsDegenerate, ImportancePoorPrefix+": "+poor)
	}
	res.Warnings = append(res.Warnings, isDiagnose(&tot2)...)
	return res, nil
}

// isMixture is the sampling density of importance sampling.
type isMixture struct {
	centres [][]float64 // the design points u_k
	logPi   []float64   // ln pi_k - |u_k|^2/2
	cum     []float64   // cumulative mixture weights, the last 1
}

// isSetup returns the mixture of unit normals centred at the points, with
// weights pi_k proportional to Phi(-beta_k) (taken relative to the most
// probable point, so that nothing underflows).
func isSetup(sp *uSpace, points []DesignPoint) *isMixture {
	k := len(points)
	mix := &isMixture{centres: make([][]float64, k), logPi: make([]float64, k), cum: make([]float64, k)}
	ref := math.Inf(1)
	for _, p := range points {
		ref = math.Min(ref, p.Beta)
	}
	var tot float64
	w := make([]float64, k)
	for i, p := range points {
		mix.centres[i] = p.U
		w[i] = distuv.UnitNormal.CDF(-p.Beta) / distuv.UnitNormal.CDF(-ref)
		tot += w[i]
	}
	var acc float64
	for i := range w {
		acc += w[i] / tot
		mix.logPi[i] = math.Log(w[i]/tot) - 0.5*formDot(mix.centres[i], mix.centres[i])
		mix.cum[i] = acc
	}
	mix.cum[k-1] = 1
	return mix
}

// importanceBlock draws size samples from the mixture and sums the weights
// of the failed ones. It does not allocate.
func importanceBlock(ws *isWorker, size int, centres [][]float64, logPi, cum []float64) isBlock {
	r := ws.rng.r
	u, a := ws.u, ws.a
	var blk isBlock
	blk.n = int64(size)
	for s := 0; s < size; s++ {
		c := 0
		if len(cum) > 1 {
			v := r.Float64()
			for c < len(cum)-1 && v >= cum[c] {
				c++
			}
		}
		for i := range u {
			u[i] = centres[c][i] + r.NormFloat64()
		}
		gv := ws.g(u)
		if !(gv < 0) {
			if gv != gv {
				blk.nan++
			}
			continue
		}
		// w = phi(u)/h(u) = 1 / sum_k pi_k exp(u·u_k - |u_k|^2/2),
		// by log-sum-exp.
		amax := math.Inf(-1)
		for j, ck := range centres {
			a[j] = logPi[j] + formDot(u, ck)
			amax = math.Max(amax, a[j])
		}
		var sum float64
		for _, v := range a {
			sum += math.Exp(v - amax)
		}
		w := math.Exp(-amax - math.Log(sum))
		blk.fails++
		blk.sw += w
		blk.sw2 += w * w
		blk.maxw = math.Max(blk.maxw, w)
	}
	return blk
}

// isEstimate returns the weighted mean and its coefficient of variation
// (sample variance of I w over n, normal approximation).
func isEstimate(t *isBlock) (pf, cov float64) {
	if t.n == 0 {
		return 0, math.Inf(1)
	}
	nf := float64(t.n)
	pf = t.sw / nf
	if pf == 0 {
		return 0, math.Inf(1)
	}
	v := (t.sw2 - nf*pf*pf) / math.Max(nf-1, 1) // sample variance of I w
	if v < 0 {
		v = 0
	}
	return pf, math.Sqrt(v/nf) / pf
}

// isInterval is pf ± z pf cov, the lower end clipped at 0.
func isInterval(pf, cov, z float64) (lo, hi float64) {
	if math.IsInf(cov, 1) {
		return 0, 1
	}
	d := z * pf * cov
	return math.Max(0, pf-d), math.Min(1, pf+d)
}

// isEarlyCheck is the number of samples after which importance sampling
// stops early when its weights are already degenerate.
const isEarlyCheck = 10 * importanceBlockSize

// isPoor says why the sums of an importance sampling show a design point
// that does not describe the failure domain, or "" when they do not: no
// failed sample; fewer than 1 % of the samples failed (about half fail
// around a good design point of a flat limit state); an effective sample
// size below 1 % of the failed samples, with at least 50 of them; or one
// weight carrying more than half of the estimate, with at least 100
// failed samples. The effective sample size is (sum w)^2 / sum w^2 (Kish,
// Survey Sampling, Wiley 1965).
func isPoor(t *isBlock) string {
	switch {
	case t.n == 0:
	case t.fails == 0:
		return fmt.Sprintf("none of %d samples failed", t.n)
	case t.n >= 1000 && float64(t.fails) < 0.01*float64(t.n):
		return fmt.Sprintf("only %d of %d samples failed", t.fails, t.n)
	case t.fails >= 50 && t.sw*t.sw/t.sw2 < 0.01*float64(t.fails):
		return fmt.Sprintf("weights degenerate (effective sample size %.1f of %d failed samples)", t.sw*t.sw/t.sw2, t.fails)
	case t.fails >= 100 && t.maxw > 0.5*t.sw:
		return fmt.Sprintf("one sample carries %.0f %% of the estimate", 100*t.maxw/t.sw)
	}
	return ""
}

// isDiagnose returns the warnings of a finished importance sampling: the
// ImportancePoorPrefix warning when isPoor finds the design point poor,
// and a count of NaN limit states.
func isDiagnose(t *isBlock) []string {
	var out []string
	if poor := isPoor(t); poor != "" {
		out = append(out, ImportancePoorPrefix+": "+poor)
	}
	if t.nan > 0 {
		out = append(out, fmt.Sprintf("the limit state was NaN for %d of %d importance samples; they were counted as safe", t.nan, t.n))
	}
	return out
}
