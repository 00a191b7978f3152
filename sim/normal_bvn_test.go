package sim

import (
	"math"
	"testing"
)

// TestLegendreRules checks the Gauss-Legendre rules of bvnUpper: an
// n-point rule integrates x^d over [-1, 1] exactly up to degree 2n - 1
// (2/(d+1) for even d, 0 for odd d).
func TestLegendreRules(t *testing.T) {
	for g, n := range []int{6, 12, 20} {
		for d := 0; d < 2*n; d++ {
			var s float64
			for i, x := range legendreX[g] {
				s += legendreW[g][i] * (math.Pow(x, float64(d)) + math.Pow(-x, float64(d)))
			}
			want := 0.0
			if d%2 == 0 {
				want = 2 / float64(d+1)
			}
			if math.Abs(s-want) > 1e-14 {
				t.Errorf("%d points, x^%d: %.16g, want %.16g", n, d, s, want)
			}
		}
	}
}

// TestBVNUpper checks bvnUpper against Sheppard's formula at h = k = 0,
// P = 1/4 + asin(r)/(2 pi) (Sheppard 1899), the limits r = 0 and ±1, and
// against formJoint2, an independent adaptive quadrature of the exact
// conditional integral, over a grid of limits and correlations on every
// branch (|r| below 0.3, 0.75, 0.925 and above), to formJoint2's own
// accuracy (its tolerance is 1e-12 of the tail of the larger limit; it
// is met within 1e-11 of it) and 1e-15.
func TestBVNUpper(t *testing.T) {
	for _, r := range []float64{-0.99, -0.93, -0.8, -0.5, -0.1, 0, 0.2, 0.6, 0.9, 0.95, 0.999} {
		if got, want := bvnUpper(0, 0, r), 0.25+math.Asin(r)/(2*math.Pi); math.Abs(got-want) > 1e-15 {
			t.Errorf("h = k = 0, r %v: %.17g, want %.17g", r, got, want)
		}
	}
	if got, want := bvnUpper(1, 2, 0), formTail(1)*formTail(2); math.Abs(got-want) > 1e-16 {
		t.Errorf("r 0: %.17g, want %.17g", got, want)
	}
	if got, want := bvnUpper(1, 2, 1), formTail(2); math.Abs(got-want) > 1e-16 {
		t.Errorf("r 1: %.17g, want %.17g", got, want)
	}
	if got, want := bvnUpper(-1, -0.5, -1), formTail(-1)-formTail(0.5); math.Abs(got-want) > 1e-16 {
		t.Errorf("r -1: %.17g, want %.17g", got, want)
	}
	limits := []float64{-3, -1.2, -0.3, 0, 0.4, 1.5, 2.5, 3.8, 5}
	for _, r := range []float64{-0.99, -0.95, -0.9, -0.6, -0.2, 0.1, 0.5, 0.8, 0.93, 0.97, 0.995} {
		for _, h := range limits {
			for _, k := range limits {
				// formJoint2's tolerance is relative to the tail of its first
				// limit: the larger limit first.
				got, want := bvnUpper(h, k, r), formJoint2(math.Max(h, k), math.Min(h, k), r)
				if math.Abs(got-want) > 1e-11*formTail(math.Max(h, k))+1e-15 {
					t.Errorf("h %v, k %v, r %v: %.17g, want %.17g", h, k, r, got, want)
				}
			}
		}
	}
}
