package sim

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// TestKronrodExact checks the Gauss-Kronrod rule's nodes and weights: the
// 15-point Kronrod rule integrates polynomials up to degree 22 exactly,
// its embedded 7-point Gauss rule up to degree 13 (Piessens et al.,
// QUADPACK, 1983; degree 3n+1 and 2n-1 for n = 7), so their difference
// vanishes up to degree 13 and not at degree 14.
func TestKronrodExact(t *testing.T) {
	for d := 0; d <= 22; d++ {
		f := func(x float64) float64 { return math.Pow(x, float64(d)) }
		got, diff := kronrod15(f, 0, 1)
		if want := 1 / float64(d+1); math.Abs(got-want) > 1e-15 {
			t.Errorf("x^%d on [0, 1]: %.17g, want %.17g", d, got, want)
		}
		if d <= 13 && diff > 1e-15 {
			t.Errorf("x^%d: the Gauss rule differs by %g", d, diff)
		}
		if d == 14 && !(diff > 1e-10) {
			t.Errorf("x^14: the Gauss rule differs by %g only: not a 7-point rule", diff)
		}
	}
	// An integrand that needs halving: int_0^1 sqrt(x) dx = 2/3.
	if got := kronrodAdaptive(math.Sqrt, 0, 1, 1e-12); math.Abs(got-2.0/3) > 1e-11 {
		t.Errorf("sqrt on [0, 1]: %.15g, want 2/3", got)
	}
}

// equicorrelatedUnion is P(Z_i > b for some i of 3) for equicorrelated
// standard normals, correlation rho >= 0, from the one-dimensional
// representation Z_i = sqrt(rho) T + sqrt(1 - rho) E_i (Dunnett and
// Sobel, Biometrika 42, 1955; from memory):
//
//	1 - Phi_3 = ∫ phi(t) (1 - (1 - c(t))^3) dt,  c(t) = Phi(-(b - sqrt(rho) t) / sqrt(1 - rho)),
//
// the bracket expanded as 3c - 3c^2 + c^3 to keep its tail accuracy,
// integrated here by adaptive Simpson quadrature.
func equicorrelatedUnion(b, rho float64) float64 {
	f := func(x float64) float64 {
		c := formTail((b - math.Sqrt(rho)*x) / math.Sqrt(1-rho))
		return distuv.UnitNormal.Prob(x) * (3*c - 3*c*c + c*c*c)
	}
	return formSimpson(f, -12, 12, 1e-13*formTail(b))
}

func TestFORMUnion3(t *testing.T) {
	orthant := func(r [][]float64) float64 {
		// P(all Z_i > 0) = 1/8 + sum asin(r_ij) / (4 pi) (Steck 1962,
		// the classical trivariate orthant formula; from memory).
		return 0.125 + (math.Asin(r[0][1])+math.Asin(r[0][2])+math.Asin(r[1][2]))/(4*math.Pi)
	}
	// Two correlation matrices of a member's three design points (a
	// column with two variable loads), and one with a negative entry.
	members := [][][]float64{
		{{1, 0.2764, 0.7941}, {0.2764, 1, 0.7941}, {0.7941, 0.7941, 1}},
		{{1, 0.5159, 0.8553}, {0.5159, 1, 0.8553}, {0.8553, 0.8553, 1}},
		{{1, 0.5, 0.2}, {0.5, 1, -0.3}, {0.2, -0.3, 1}},
	}
	type tc struct {
		name string
		b    []float64
		r    [][]float64
		want float64
		rel  float64
	}
	var cases []tc
	for _, r := range members {
		// At b = 0, by symmetry P(union) = 1 - P(all <= 0) = 1 - P(all > 0).
		cases = append(cases, tc{"orthant", []float64{0, 0, 0}, r, 1 - orthant(r), 1e-10})
	}
	for _, rho := range []float64{0.3, 0.8, 0.95} {
		for _, b := range []float64{2, 3.8, 5, 6.5} {
			cases = append(cases, tc{"equicorrelated", []float64{b, b, b}, eq3(rho), equicorrelatedUnion(b, rho), 1e-8})
		}
	}
	// Independent points: 1 - prod (1 - p_i), far in the tail.
	p := []float64{formTail(3), formTail(4.5), formTail(6)}
	cases = append(cases, tc{"independent", []float64{3, 4.5, 6}, eq3(0), 1 - (1-p[0])*(1-p[1])*(1-p[2]), 1e-10})
	for _, c := range cases {
		got, ok := formUnion3(c.b, c.r)
		if !ok || math.Abs(got-c.want) > c.rel*c.want {
			t.Errorf("%s b %v r %v: %.12g (ok %v), want %.12g", c.name, c.b, c.r, got, ok, c.want)
		}
	}
}

// TestFORMUnion3Degenerate checks the limits of formUnion3: three points
// in a plane, the third beyond the union of the other two (its half-plane
// (u1 + u2)/sqrt 2 > b3 lies in u1 > b or u2 > b when b3 >= sqrt(2) b: the
// union is that of two independent points, 2p - p^2), whose partial
// correlation is 1; and two parallel points, which it leaves to Genz.
func TestFORMUnion3Degenerate(t *testing.T) {
	s := math.Sqrt(0.5)
	alpha := [][]float64{{1, 0}, {0, 1}, {s, s}}
	p := formTail(3)
	want := 2*p - p*p
	if got := formSeriesPf([]float64{3, 3, 4.5}, alpha); math.Abs(got-want) > 1e-10*want {
		t.Errorf("coplanar, one redundant: %.12g, want %.12g", got, want)
	}
	r := [][]float64{{1, 1, 0}, {1, 1, 0}, {0, 0, 1}}
	if _, ok := formUnion3([]float64{3, 3, 3}, r); ok {
		t.Error("two parallel points: formUnion3 should leave them to Genz")
	}
	if _, ok := formUnion3([]float64{3, math.Inf(1), 3}, eq3(0.5)); ok {
		t.Error("an infinite index: formUnion3 should leave it to Genz")
	}
}

// eq3 is the correlation matrix of three equicorrelated variables.
func eq3(rho float64) [][]float64 { return [][]float64{{1, rho, rho}, {rho, 1, rho}, {rho, rho, 1}} }

// TestSeriesPfThreeCorrelated checks SeriesPf of three design points
// with equicorrelated directions far in the tail against the
// one-dimensional representation (equicorrelatedUnion). Genz's lattice,
// which combined every three points before, was 28 % low at rho 0.8 and
// 51 % low at rho 0.95 for b = 5.
func TestSeriesPfThreeCorrelated(t *testing.T) {
	for _, rho := range []float64{0.8, 0.95} {
		// alpha_i = sqrt(rho) e_0 + sqrt(1 - rho) e_i: alpha_i·alpha_j = rho.
		alpha := make([][]float64, 3)
		for i := range alpha {
			alpha[i] = make([]float64, 4)
			alpha[i][0], alpha[i][i+1] = math.Sqrt(rho), math.Sqrt(1-rho)
		}
		want := equicorrelatedUnion(5, rho)
		if got := SeriesPf([]float64{5, 5, 5}, alpha); math.Abs(got-want) > 1e-8*want {
			t.Errorf("rho %v, b 5: %.10g, want %.10g", rho, got, want)
		}
	}
}

// equicorrelatedUnion4 is equicorrelatedUnion for four variables: the
// bracket 1 - (1 - c)^4 = 4c - 6c^2 + 4c^3 - c^4.
func equicorrelatedUnion4(b, rho float64) float64 {
	f := func(x float64) float64 {
		c := formTail((b - math.Sqrt(rho)*x) / math.Sqrt(1-rho))
		return distuv.UnitNormal.Prob(x) * (4*c - 6*c*c + 4*c*c*c - c*c*c*c)
	}
	return formSimpson(f, -12, 12, 1e-13*formTail(b))
}

// TestFORMUnion4 checks formUnion4 against the equicorrelated
// one-dimensional representation (Genz's lattice, which combined four
// points before, was 35 % low at rho 0.8 and index 5, 73 % at 6.5),
// against 1 - prod (1 - p_i) for independent points, and checks that it
// leaves two parallel points to Genz.
func TestFORMUnion4(t *testing.T) {
	eq4 := func(rho float64) [][]float64 {
		r := make([][]float64, 4)
		for i := range r {
			r[i] = []float64{rho, rho, rho, rho}
			r[i][i] = 1
		}
		return r
	}
	for _, rho := range []float64{0.3, 0.8, 0.95} {
		for _, b := range []float64{0, 2, 3.8, 5, 6.5} {
			want := equicorrelatedUnion4(b, rho)
			if got, ok := formUnion4([]float64{b, b, b, b}, eq4(rho)); !ok || math.Abs(got-want) > 1e-8*want {
				t.Errorf("rho %v, b %v: %.12g (ok %v), want %.12g", rho, b, got, ok, want)
			}
		}
	}
	b := []float64{3, 3.5, 4.5, 6}
	want := 1.0
	for _, x := range b {
		want *= 1 - formTail(x)
	}
	want = 1 - want
	if got, ok := formUnion4(b, eq4(0)); !ok || math.Abs(got-want) > 1e-10*want {
		t.Errorf("independent: %.12g (ok %v), want %.12g", got, ok, want)
	}
	r := eq4(0.5)
	r[1][2], r[2][1] = 1, 1
	if _, ok := formUnion4([]float64{3, 3, 3, 3}, r); ok {
		t.Error("two parallel points: formUnion4 should leave them to Genz")
	}
}
