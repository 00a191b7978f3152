package analysis

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/sim"
)

// twoPointForm is a member's FORM result with two design points at
// index beta in its space (shared U_0, own U_1, U_2): alpha (a, b, 0) and
// (a, 0, b), b = sqrt(1 - a^2), as two failure modes that share the
// load's direction and differ in their own.
func twoPointForm(beta, a float64) *sim.FORMResult {
	b := math.Sqrt(1 - a*a)
	p1 := sim.DesignPoint{Beta: beta, Alpha: []float64{a, b, 0}}
	p2 := sim.DesignPoint{Beta: beta, Alpha: []float64{a, 0, b}}
	pf := sim.SeriesPf([]float64{beta, beta}, [][]float64{p1.Alpha, p2.Alpha})
	return &sim.FORMResult{Beta: sim.BetaFromPf(pf), Pf: pf, Points: []sim.DesignPoint{p1, p2}, Converged: true}
}

// TestEquivalentPlane checks members with two design points each,
// entered as equivalent planes, against the first-order system of all
// their points. Given the shared U_0 = s each member's two modes are
// independent (their own directions are orthogonal), so the members'
// points as a whole give exactly
//
//	P(system) = 1 - integral of phi(s) (1 - Phi(-(beta + a s)/b))^(2n) ds,
//
// by the Simpson rule. The equivalent plane is an approximation
// (Gollwitzer & Rackwitz 1983, from memory): it must hold that value to
// 1 % (measured: 0.4 %, see the log), and one member alone must keep its own
// series pf exactly.
func TestEquivalentPlane(t *testing.T) {
	const beta, a, n = 3.0, 0.7, 4
	b := math.Sqrt(1 - a*a)
	fr := twoPointForm(beta, a)
	m, how, ok := linearise(fr, []int{0, -1, -1})
	if !ok || how != linearEquivalent {
		t.Fatalf("linearise: how %v, ok %v", how, ok)
	}
	if alone := linearSeriesPf([]linearMember{m}, 1, 0, 1); !relClose(alone.Pf, fr.Pf, 1e-6) {
		t.Errorf("one member: %.6g, its series pf %.6g", alone.Pf, fr.Pf)
	}
	ms := make([]linearMember, n)
	for i := range ms {
		ms[i], _, _ = linearise(fr, []int{0, -1, -1})
	}
	got := linearSeriesPf(ms, 1, 0, 1).Pf
	want := simpson(func(s float64) float64 {
		q := distuv.UnitNormal.CDF(-(beta + a*s) / b)
		return distuv.UnitNormal.Prob(s) * -math.Expm1(2*n*math.Log1p(-q))
	})
	t.Logf("equivalent planes %.6g, all points %.6g, alpha_0 %.4f", got, want, m.A[0])
	if !relClose(got, want, 0.01) {
		t.Errorf("equivalent planes give %.6g, the points %.6g", got, want)
	}
}

// TestFallbackMember checks a member without a converged FORM: taken as
// independent (no shared component) with its sampled pf, or the upper
// end of its interval when its pf is zero.
func TestFallbackMember(t *testing.T) {
	if _, how, ok := linearise(&sim.FORMResult{Converged: false, Points: []sim.DesignPoint{{Beta: 2}}}, []int{0}); ok || how != linearFallback {
		t.Errorf("a FORM that did not converge is used: how %v", how)
	}
	cases := []struct{ pf, hi, want float64 }{
		{1e-3, 2e-3, 1e-3},
		{0, 3e-6, 3e-6},
	}
	for _, c := range cases {
		m := fallbackMember(c.pf, c.hi)
		if len(m.Idx) != 0 || m.SD != 1 || !relClose(distuv.UnitNormal.CDF(-m.Beta), c.want, 1e-9) {
			t.Errorf("pf %g, high %g: %+v, want Phi(-beta) = %g", c.pf, c.hi, m, c.want)
		}
	}
}

// TestEquivalentAlphaChainRule checks the equivalent plane's direction,
// taken per design point by the chain rule, against its definition
// (Gollwitzer & Rackwitz 1983, from memory): the central difference of
// the series system's index under a shift of the mean of U_k, on three
// design points in four dimensions, to 1e-3 (the exact gradient against
// differences of the lattice rule of sim.SeriesPf).
func TestEquivalentAlphaChainRule(t *testing.T) {
	unit := func(v ...float64) []float64 {
		var n float64
		for _, x := range v {
			n += x * x
		}
		for i := range v {
			v[i] /= math.Sqrt(n)
		}
		return v
	}
	pts := []sim.DesignPoint{
		{Beta: 3.1, Alpha: unit(0.6, 0.5, 0.3, 0.2)},
		{Beta: 3.3, Alpha: unit(0.5, -0.2, 0.7, 0.1)},
		{Beta: 3.6, Alpha: unit(0.7, 0.1, -0.1, 0.6)},
	}
	fr := &sim.FORMResult{Points: pts, Converged: true}
	d := pointSensitivities(fr)
	for k := range 4 {
		const eps = 1e-4
		at := func(e float64) float64 {
			beta := make([]float64, len(pts))
			alpha := make([][]float64, len(pts))
			for j, p := range pts {
				beta[j], alpha[j] = p.Beta+e*p.Alpha[k], p.Alpha
			}
			return sim.BetaFromPf(sim.SeriesPf(beta, alpha))
		}
		want := (at(eps) - at(-eps)) / (2 * eps)
		if got := equivalentAlpha(fr, d, k); math.Abs(got-want) > 1e-3 {
			t.Errorf("component %d: %.9f by the chain rule, %.9f by its definition", k, got, want)
		}
	}
}
