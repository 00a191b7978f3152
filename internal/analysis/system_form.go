package analysis

import (
	"context"
	"fmt"
	"math"
	"sync"

	"strutrisk/sim"
)

// memberLinearForm is how a member enters the first-order system.
type memberLinearForm int

const (
	// linearPoint: the member's one design point.
	linearPoint memberLinearForm = iota
	// linearEquivalent: an equivalent plane of its several design points.
	linearEquivalent
	// linearFallback: FORM failed; the member's sampled pf, taken as
	// independent of the other members.
	linearFallback
)

// memberForms returns every member's FORM result: that of its estimate
// when its method ran one, else a search of its own (in parallel over
// workers; each member's search is its own, so the results do not depend
// on them).
func memberForms(ctx context.Context, sys []systemMember, fs *sim.FORMSettings, workers int) []*sim.FORMResult {
	return memberFormsOf(ctx, sys, fs, workers, nil)
}

// memberFormsOf is memberForms of the members i with todo[i] (all when
// todo is nil); the others' results are nil.
func memberFormsOf(ctx context.Context, sys []systemMember, fs *sim.FORMSettings, workers int, todo []bool) []*sim.FORMResult {
	out := make([]*sim.FORMResult, len(sys))
	var search []int
	for i := range sys {
		switch {
		case todo != nil && !todo[i]:
		case sys[i].form != nil:
			out[i] = sys[i].form
		default:
			search = append(search, i)
		}
	}
	next := make(chan int)
	var wg sync.WaitGroup
	for range max(1, min(workers, len(search))) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := range next {
				if r, err := sim.FORMContext(ctx, sys[i].m, fs); err == nil {
					out[i] = r
				}
			}
		}()
	}
	for _, i := range search {
		next <- i
	}
	close(next)
	wg.Wait()
	return out
}

// linearise returns the member's linearised margin from its FORM result
// fr, shared[k] being the index of the shared normal the member's k-th
// standard normal is (-1: its own). One design point gives its beta and
// alpha; several give an equivalent plane (equivalentPlane); a FORM
// that did not converge gives the fallback, with ok false.
func linearise(fr *sim.FORMResult, shared []int) (linearMember, memberLinearForm, bool) {
	if fr == nil || !fr.Converged || len(fr.Points) == 0 || math.IsNaN(fr.Beta) {
		return linearMember{}, linearFallback, false
	}
	var idx []int
	var a []float64
	how := linearPoint
	beta := fr.Points[0].Beta
	var dBeta []float64
	if len(fr.Points) > 1 {
		how = linearEquivalent
		beta = fr.Beta
		dBeta = pointSensitivities(fr)
	}
	for k, j := range shared {
		if j < 0 {
			continue
		}
		idx = append(idx, j)
		if how == linearPoint {
			a = append(a, fr.Points[0].Alpha[k])
		} else {
			a = append(a, equivalentAlpha(fr, dBeta, k))
		}
	}
	return newLinearMember(beta, idx, a), how, true
}

// pointSensitivities are d beta_e / d beta_j of the index beta_e of the
// member's series system of design points to the index of each point j:
// exact for up to three points (sim.SeriesPfGradient), else by central
// differences.
func pointSensitivities(fr *sim.FORMResult) []float64 {
	const eps = 1e-4
	beta := make([]float64, len(fr.Points))
	alpha := make([][]float64, len(fr.Points))
	for j, p := range fr.Points {
		beta[j], alpha[j] = p.Beta, p.Alpha
	}
	d := make([]float64, len(fr.Points))
	if g, ok := sim.SeriesPfGradient(beta, alpha); ok {
		// d beta_e / d beta_j = -(d pf / d beta_j) / phi(beta_e).
		be := sim.BetaFromPf(sim.SeriesPf(beta, alpha))
		phi := math.Exp(-be*be/2) / math.Sqrt(2*math.Pi)
		for j := range d {
			d[j] = -g[j] / phi
		}
		return d
	}
	for j, p := range fr.Points {
		beta[j] = p.Beta + eps
		hi := sim.BetaFromPf(sim.SeriesPf(beta, alpha))
		beta[j] = p.Beta - eps
		lo := sim.BetaFromPf(sim.SeriesPf(beta, alpha))
		beta[j] = p.Beta
		d[j] = (hi - lo) / (2 * eps)
	}
	return d
}

// equivalentAlpha is component k of the unit direction of the plane
// equivalent to the member's series system of design points
// (Gollwitzer & Rackwitz, "Equivalent components in first-order system
// reliability", Reliability Engineering 5, 1983, from memory): the
// sensitivity d beta_e / d eps of the system's index to a shift eps of
// the mean of U_k, under which point j's index becomes beta_j + eps
// alpha_jk, so by the chain rule the sum over the points of
// dBeta[j] alpha_jk, dBeta being pointSensitivities: one pair of system
// evaluations per design point, not per shared input.
func equivalentAlpha(fr *sim.FORMResult, dBeta []float64, k int) float64 {
	var a float64
	for j, p := range fr.Points {
		a += dBeta[j] * p.Alpha[k]
	}
	return a
}

// fallbackMember is a member without a usable design point, taken as
// independent of the others with the index of its sampled pf (the upper
// end of its interval when no sample failed).
func fallbackMember(pf, pfHigh float64) linearMember {
	if !(pf > 0) {
		pf = pfHigh
	}
	return linearMember{Beta: sim.BetaFromPf(pf), SD: 1}
}

// formSystem is the first-order system of the members.
type formSystem struct {
	seriesIntegral
	// Equivalent and Fallback name the members with several design
	// points and those whose FORM failed.
	Equivalent, Fallback []string
}

// linearSystem integrates the members' margins, linearised at the
// design points of their FORM results forms, over the shared normals;
// names, pf and pfHigh are the members' names and sampled pf and upper
// bounds, in the order of sys.
func linearSystem(sys []systemMember, forms []*sim.FORMResult, nShared int, names []string, pf, pfHigh []float64, seed uint64, workers int) formSystem {
	lin := make([]linearMember, len(sys))
	hows := make([]memberLinearForm, len(sys))
	parallelFor(len(sys), workers, func(i int) {
		m, how, ok := linearise(forms[i], sys[i].shared)
		if !ok {
			m, how = fallbackMember(pf[i], pfHigh[i]), linearFallback
		}
		lin[i], hows[i] = m, how
	})
	var out formSystem
	for i, how := range hows {
		switch how {
		case linearFallback:
			out.Fallback = append(out.Fallback, names[i])
		case linearEquivalent:
			out.Equivalent = append(out.Equivalent, names[i])
		}
	}
	out.seriesIntegral = linearSeriesPf(lin, nShared, seed, workers)
	return out
}

// describe is the sentence of the document's form_method.
func (f *formSystem) describe() string {
	s := "FORM per member, each margin linearised at its design point; " + f.Method
	if n := len(f.Equivalent); n > 0 {
		s += fmt.Sprintf("; %d member(s) with several design points by an equivalent plane", n)
	}
	if n := len(f.Fallback); n > 0 {
		s += fmt.Sprintf("; %d member(s) without a converged FORM taken as independent with their sampled pf", n)
	}
	return s
}

// parallelFor calls f(i) for i in 0..n-1 on up to workers goroutines;
// f must write only to its own index.
func parallelFor(n, workers int, f func(i int)) {
	next := make(chan int)
	var wg sync.WaitGroup
	for range max(1, min(workers, n)) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := range next {
				f(i)
			}
		}()
	}
	for i := range n {
		next <- i
	}
	close(next)
	wg.Wait()
}
