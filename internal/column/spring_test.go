package column

import (
	"errors"
	"math"
	"testing"
)

// Theoretical effective length factors of the classic ends (Timoshenko &
// Gere, Theory of Elastic Stability, ch. 2; the "theoretical K" column
// of AISC 360-22 Commentary Table C-A-7.1: 0.5, 0.7, 1.0, 2.0).
func TestEndsK(t *testing.T) {
	tests := []struct {
		name string
		k    float64
	}{
		{"pinned-pinned", 1}, {"fixed-free", 2}, {"free-fixed", 2}, {"fixed-fixed", 0.5},
		{"fixed-pinned", 0.699156}, {"pinned-fixed", 0.699156},
	}
	for _, tt := range tests {
		k, err := EndsK(tt.name)
		if err != nil || math.Abs(k-tt.k) > 5e-7 {
			t.Errorf("EndsK(%q) = %v, %v; want %v", tt.name, k, err, tt.k)
		}
	}
	// Fixed-pinned: u = pi/K is the first positive root of tan u = u.
	k, _ := EndsK("fixed-pinned")
	if u := math.Pi / k; math.Abs(math.Tan(u)-u) > 1e-9 || u < math.Pi || u > 1.5*math.Pi {
		t.Errorf("fixed-pinned K = %.15g: tan u - u = %g", k, math.Tan(u)-u)
	}
	for _, bad := range []string{"", "pinned", "fixed-fixed ", "Pinned-Pinned", "free-free"} {
		if _, err := EndsK(bad); err == nil {
			t.Errorf("EndsK(%q): no error", bad)
		}
	}
}

// Braced member with rotational end springs, R = k L/(E I): the exact
// roots of the stability equation (Timoshenko & Gere, ch. 2), tabulated in
// the project's references from an independent 4x4 determinant solution.
func TestSpringKTable(t *testing.T) {
	inf := math.Inf(1)
	tests := []struct {
		ra, rb, k float64
	}{
		// Both ends R.
		{0.5, 0.5, 0.91565}, {1, 1, 0.85528}, {5, 5, 0.65982}, {10, 10, 0.59194}, {20, 20, 0.54870}, {100, 100, 0.50999},
		// R at one end, pinned at the other.
		{0.5, 0, 0.95605}, {1, 0, 0.92248}, {5, 0, 0.80377}, {0, 10, 0.76024}, {20, 0, 0.73204}, {100, 0, 0.70607},
		// Unequal springs.
		{4, 0.5, 0.789245}, {2, 7, 0.695012}, {0.5, 4, 0.789245},
		// Classic limits: exact.
		{0, 0, 1}, {inf, inf, 0.5}, {inf, 0, kFixedPinned}, {0, inf, kFixedPinned},
	}
	for _, tt := range tests {
		k, err := SpringK(tt.ra, tt.rb)
		tol := 5e-6
		if tt.ra == 0 && tt.rb == 0 || math.IsInf(tt.ra, 1) && math.IsInf(tt.rb, 1) {
			tol = 1e-15
		}
		if err != nil || math.Abs(k-tt.k) > tol {
			t.Errorf("SpringK(%g, %g) = %.8f, %v; want %g", tt.ra, tt.rb, k, err, tt.k)
		}
	}
	// Equal springs: the symmetric mode satisfies tan(u/2) = -u/R.
	for _, r := range []float64{0.1, 1, 3, 30, 1e3} {
		k, _ := SpringK(r, r)
		u := math.Pi / k
		if res := math.Tan(u/2) + u/r; math.Abs(res) > 1e-9*(1+u/r) {
			t.Errorf("R = %g: tan(u/2) + u/R = %g at K = %.12f", r, res, k)
		}
	}
}

// Pinned and fixed are the limits of the spring solution: K approaches 1
// and 0.5 (within 1e-9), and K falls monotonically as the springs stiffen.
func TestSpringKLimits(t *testing.T) {
	for _, tt := range []struct{ ra, rb, k float64 }{
		{1e-12, 1e-12, 1}, {1e-300, 0, 1}, {math.SmallestNonzeroFloat64, 0, 1},
		{1e12, 1e12, 0.5}, {1e300, 1e300, 0.5}, {math.MaxFloat64, math.MaxFloat64, 0.5},
		{math.Inf(1), 1e-13, kFixedPinned}, {1e13, 0, kFixedPinned},
	} {
		k, err := SpringK(tt.ra, tt.rb)
		if err != nil || math.Abs(k-tt.k) > 1e-9 {
			t.Errorf("SpringK(%g, %g) = %.15f, %v; want %g", tt.ra, tt.rb, k, err, tt.k)
		}
	}
	prev := 1.0
	for r := 1e-6; r < 1e9; r *= 1.7 {
		k, _ := SpringK(r, 0.3*r)
		if !(k <= prev && k >= 0.5) {
			t.Errorf("SpringK(%g, %g) = %.12f, not monotone (previous %.12f)", r, 0.3*r, k, prev)
		}
		prev = k
	}
}

// alignmentBraced is the sidesway-inhibited alignment-chart equation of
// the AISC Specification Commentary (AISC 360-16 Commentary Appendix 7,
// eq. C-A-7-1; equation number from memory; after Julian & Lawrence):
// (GA GB/4)(pi/K)^2 + ((GA+GB)/2)(1 - (pi/K)/tan(pi/K)) +
// 2 tan(pi/(2K))/(pi/K) - 1 = 0.
func alignmentBraced(ga, gb, k float64) float64 {
	u := math.Pi / k
	return ga*gb/4*u*u + (ga+gb)/2*(1-u/math.Tan(u)) + 2*math.Tan(u/2)/u - 1
}

// Alignment-chart G pairs (sidesway inhibited) through R = 2/G: the
// girders bend in single curvature and restrain each end by 2 E I/L.
func TestSpringKAlignmentChart(t *testing.T) {
	tests := []struct{ ga, gb, k float64 }{
		{0.5, 0.5, 0.686258}, {2, 2, 0.855275}, {3, 3, 0.893430}, {10, 10, 0.962501},
		{1, 3, 0.830527}, {0.5, 2, 0.764654}, {1, 10, 0.859922}, {2, 5, 0.891362},
	}
	for _, tt := range tests {
		k, err := SpringK(2/tt.ga, 2/tt.gb)
		if err != nil || math.Abs(k-tt.k) > 1e-6 {
			t.Errorf("G = (%g, %g): K = %.7f, %v; want %.6f", tt.ga, tt.gb, k, err, tt.k)
		}
		if res := alignmentBraced(tt.ga, tt.gb, k); math.Abs(res) > 1e-9 {
			t.Errorf("G = (%g, %g): K = %.9f leaves the chart equation at %g", tt.ga, tt.gb, k, res)
		}
	}
}

func TestSpringKFromStiffness(t *testing.T) {
	const e, i, l = 210000.0, 5e7, 4000.0
	k, err := SpringKFromStiffness(10*e*i/l, 10*e*i/l, e, i, l)
	if err != nil || math.Abs(k-0.59194) > 5e-6 {
		t.Errorf("R = 10 both ends: K = %v, %v; want 0.59194", k, err)
	}
	k, err = SpringKFromStiffness(math.Inf(1), 0, e, i, l)
	if err != nil || math.Abs(k-kFixedPinned) > 1e-12 {
		t.Errorf("fixed-pinned: K = %v, %v", k, err)
	}
	for _, tt := range []struct {
		ka, kb, e, i, l float64
		want            error
	}{
		{-1, 0, e, i, l, ErrSpring}, {0, math.NaN(), e, i, l, ErrSpring},
		{1, 1, 0, i, l, ErrModulus}, {1, 1, e, -i, l, ErrSecond}, {1, 1, e, i, math.NaN(), ErrLength},
	} {
		if _, err := SpringKFromStiffness(tt.ka, tt.kb, tt.e, tt.i, tt.l); !errors.Is(err, tt.want) {
			t.Errorf("SpringKFromStiffness(%g, %g, %g, %g, %g): %v, want %v", tt.ka, tt.kb, tt.e, tt.i, tt.l, err, tt.want)
		}
	}
	for _, r := range [][2]float64{{-1, 0}, {0, -1e-300}, {math.NaN(), 1}, {math.Inf(-1), 0}} {
		if _, err := SpringK(r[0], r[1]); !errors.Is(err, ErrSpring) {
			t.Errorf("SpringK(%g, %g): %v, want ErrSpring", r[0], r[1], err)
		}
	}
}
