package sim

import (
	"fmt"
	"math"
	"sync"
)

// learn is the active-learning loop of the surrogate (see surrogate).
// After each model evaluation only the active candidates, those whose U
// was below surrogateActiveU when all were last predicted, are predicted
// again; before the loop may stop every candidate is predicted again
// (and the loop goes on if any is then uncertain), so the stop rests on
// all of them.
func (a *akRun) learn() error {
	target := a.target()
	if _, err := a.refit(); err != nil {
		return err
	}
	a.phase(0)
	a.predictAll()
	for {
		best, minU := a.argminU()
		e := a.estimate()
		settled := minU >= surrogateU
		switch {
		case a.ctx.Err() != nil:
			a.res.Incomplete = true
			a.finish(e, minU)
			return nil
		case settled && e.cov > target && len(a.cw) < a.ss.MaxPopulation:
			// More candidates first: the check of all comes last.
			a.phase(minU)
			a.growPredicted(e.cov, target)
			continue
		case settled && a.stale:
			a.phase(minU)
			a.predictAll()
			continue
		case settled:
			if e.cov > target {
				a.res.flag(BudgetSpent, fmt.Sprintf("the surrogate settled but its %d candidates give pf a CoV of %.3g, above the target %.3g (Surrogate.MaxPopulation)", len(a.cw), e.cov, target))
			}
			a.finish(e, minU)
			return nil
		case a.evals >= a.stop || best < 0:
			if a.stale {
				a.phase(minU)
				a.predictAll()
				best, minU = a.argminU()
				e = a.estimate()
			}
			a.res.flag(Unsettled, a.unsettledReason(minU))
			a.finish(e, minU)
			return nil
		}
		a.evaluate(best)
		if _, err := a.refit(); err != nil {
			return err
		}
		a.predict(a.active)
		a.stale = true
		e = a.estimate()
		a.tr.point(ConvergencePoint{Evaluations: int64(a.evals), Pf: e.pf, PfCI: [2]float64{e.lo, e.hi}, PfCoV: e.cov})
		if a.tr.watching() {
			a.tr.report(Progress{Done: int64(a.evals), Total: int64(a.stop), Pf: e.pf, CoV: e.cov, Phase: fmt.Sprintf("learning, least U %.2f of %.0f, %d active", minU, surrogateU, len(a.active))})
		}
	}
}

// phase reports that every candidate is being predicted (classified),
// after learning to least U minU (0 before the learning).
func (a *akRun) phase(minU float64) {
	if !a.tr.watching() {
		return
	}
	p := fmt.Sprintf("classifying %d candidates", len(a.cw))
	if minU > 0 {
		p = fmt.Sprintf("least U %.2f, classifying the candidates", minU)
	}
	a.tr.report(Progress{Done: int64(a.evals), Total: int64(a.stop), Phase: p})
}

// unsettledReason says why the learning ended before the model settled
// at least U minU: the budget of model evaluations, or the cap on the
// learning's own (Surrogate.MaxLearning), which more samples do not lift.
func (a *akRun) unsettledReason(minU float64) string {
	if a.stop < int(a.cfg.Samples) {
		return fmt.Sprintf("the surrogate's learning reached its cap of %d model evaluations after FORM's before its Kriging model settled (least U %.2f, below %.0f): the signs of some candidates are in doubt and more samples do not lift the cap; use another method (importance or subset) for this limit state", a.ss.MaxLearning, minU, surrogateU)
	}
	return fmt.Sprintf("the budget of %d model evaluations ended before the surrogate settled (least U %.2f, below %.0f): the signs of some candidates are in doubt; raise samples", a.cfg.Samples, minU, surrogateU)
}

// predictAll predicts every candidate and sets the active ones.
func (a *akRun) predictAll() {
	a.predict(nil)
	a.active = a.activeIn(a.active[:0], 0)
	a.stale = false
}

// growPredicted draws the further blocks of candidates that should bring
// the CoV of pf from cov to the target (the CoV falls as one over the
// root of their number; a tenth more for safety), at least one and within
// MaxPopulation, and predicts them with the current model.
func (a *akRun) growPredicted(cov, target float64) {
	from := len(a.cw)
	want := float64(from) * (cov / target) * (cov / target) * 1.1
	want = math.Min(want, float64(a.ss.MaxPopulation))
	for len(a.cw) == from || float64(len(a.cw)) < want {
		a.grow()
	}
	list := make([]int, len(a.cw)-from)
	for j := range list {
		list[j] = from + j
	}
	a.predict(list)
	a.active = a.activeIn(a.active, from)
}

// target returns the CoV of pf the surrogate aims at.
func (a *akRun) target() float64 {
	if a.cfg.TargetCoV > 0 {
		return a.cfg.TargetCoV
	}
	return autoTargetCoV
}

// surrogateActiveU is the U below which a candidate stays active between
// predictions of all.
const surrogateActiveU = 4.0

// refit fits the Kriging model to the training points, tuning its length
// scales and nugget when the points have grown by half since the last
// tuning; it reports whether it tuned.
func (a *akRun) refit() (bool, error) {
	n := a.k.n()
	if n < a.dim+2 {
		return false, fmt.Errorf("sim: the surrogate has %d usable model evaluations, needs at least %d: give a larger budget (samples)", n, a.dim+2)
	}
	tune := a.tuned == 0 || n >= a.tuned+max(5, a.tuned/2)
	err := a.k.fit(tune, 30*(a.dim+1))
	for err != nil && a.k.logL[a.dim] < krigMaxLogT {
		// Raise the nugget until the correlation matrix factorises.
		a.k.logL[a.dim] = math.Min(krigMaxLogT, a.k.logL[a.dim]+2.3)
		err = a.k.fit(false, 0)
	}
	if err != nil {
		return false, err
	}
	if tune {
		a.tuned = n
	}
	return tune, nil
}

// activeIn appends to list the candidates from index from on that are
// not evaluated and whose U is below surrogateActiveU.
func (a *akRun) activeIn(list []int, from int) []int {
	for i := from; i < len(a.cw); i++ {
		if !a.taken[i] && !(math.Abs(a.mu[i]) >= surrogateActiveU*a.sd[i]) {
			list = append(list, i)
		}
	}
	return list
}

// predict predicts the candidates listed (all for nil), in chunks over
// the workers; each candidate's prediction depends on nothing else, so
// the numbers do not depend on the number of workers.
func (a *akRun) predict(list []int) {
	nc := len(list)
	if list == nil {
		nc = len(a.cw)
	}
	const chunk = 256
	nchunks := (nc + chunk - 1) / chunk
	workers := max(1, min(a.cfg.Workers, nchunks))
	var wg sync.WaitGroup
	for w := 0; w < workers; w++ {
		wg.Add(1)
		go func(w int) {
			defer wg.Done()
			ws := a.k.scratch()
			for c := w; c < nchunks; c += workers {
				for j := c * chunk; j < min(nc, (c+1)*chunk); j++ {
					i := j
					if list != nil {
						i = list[j]
					}
					a.mu[i], a.sd[i] = a.k.predict(a.cu[i*a.dim:(i+1)*a.dim], ws)
				}
			}
		}(w)
	}
	wg.Wait()
}

// argminU returns the active candidate not yet evaluated with the least
// U = |mu|/sigma (the first of equals), or -1, and that U.
func (a *akRun) argminU() (int, float64) {
	best, minU := -1, math.Inf(1)
	for _, i := range a.active {
		if a.taken[i] {
			continue
		}
		u := math.Inf(1)
		if a.sd[i] > 0 {
			u = math.Abs(a.mu[i]) / a.sd[i]
		}
		if u < minU {
			best, minU = i, u
		}
	}
	return best, minU
}

// akEstimate is the surrogate's estimate on the candidates.
type akEstimate struct {
	pf, cov, lo, hi float64
	minus, plus     float64 // pf over the surrogate's z band
}

// estimate returns pf on the candidates with its CoV and interval, both
// carrying the sampling and the surrogate's error (see surrogate).
func (a *akRun) estimate() akEstimate {
	var s, sm, sp weightSums
	var vs float64 // surrogate variance, times N^2
	for i, w := range a.cw {
		mu, sd := a.mu[i], a.sd[i]
		s.add(w, mu < 0)
		sm.add(w, mu+a.z*sd < 0)
		sp.add(w, mu-a.z*sd < 0)
		if sd > 0 {
			p := stdCDF(-math.Abs(mu) / sd)
			vs += w * w * p * (1 - p)
		}
	}
	n := float64(len(a.cw))
	vs /= n * n
	e := akEstimate{pf: s.sw / n, minus: sm.sw / n, plus: sp.sw / n}
	e.cov = math.Sqrt(s.variance(n)+vs) / e.pf
	if e.pf == 0 {
		e.cov = math.Inf(1)
	}
	e.lo = math.Max(0, e.minus-a.z*math.Sqrt(sm.variance(n)+vs))
	e.hi = math.Min(1, e.plus+a.z*math.Sqrt(sp.variance(n)+vs))
	if e.plus == 0 {
		e.hi = 1 // no candidate may fail: pf is not bounded by them
	}
	return e
}

// weightSums sums the importance weights of the candidates counted failed.
type weightSums struct{ sw, sw2 float64 }

func (s *weightSums) add(w float64, failed bool) {
	if failed {
		s.sw += w
		s.sw2 += w * w
	}
}

// variance returns the variance of the mean of the weighted indicator
// over n candidates (as isEstimate).
func (s *weightSums) variance(n float64) float64 {
	pf := s.sw / n
	return math.Max(0, (s.sw2-n*pf*pf)/math.Max(n-1, 1)) / n
}

// finish writes the estimate e into the result.
func (a *akRun) finish(e akEstimate, minU float64) {
	r := a.res
	r.Evaluations = int64(a.evals)
	r.Pf, r.PfCoV, r.PfCI = e.pf, e.cov, [2]float64{e.lo, e.hi}
	r.Beta = BetaFromPf(e.pf)
	r.BetaCI = BetaInterval(r.PfCI)
	form := 0
	if r.FORM != nil {
		form = r.FORM.Evaluations
	}
	space := "around the FORM design point (AK-IS)"
	if a.crude {
		space = "from the inputs' own distribution (AK-MCS)"
	}
	r.Warnings = append(r.Warnings, fmt.Sprintf("surrogate: a Kriging model trained on %d model evaluations (%d of them FORM's) classified %d candidates drawn %s; least U %.2f; over the surrogate's %.0f %% band pf lies between %.3g and %.3g, and the interval includes that band", a.evals, form, len(a.cw), space, minU, 100*a.cfg.Confidence, e.minus, e.plus))
	if a.nan > 0 {
		r.Warnings = append(r.Warnings, fmt.Sprintf("the limit state was NaN at %d of the surrogate's model evaluations; those points were left out", a.nan))
	}
}
