package study

import (
	"math"
	"testing"
)

// TestSecantRoot: the secant search finds the roots of smooth falling
// functions whose roots are known in closed form within ReserveTol of
// f, in a few evaluations, and gives up on a function that jumps across
// zero, or whose root lies beyond the bounds, for the caller to bracket.
func TestSecantRoot(t *testing.T) {
	cases := []struct {
		name  string
		f     func(float64) float64
		root  float64 // NaN: no root the secant may report
		steps int
	}{
		{"linear, slope -3.5", func(x float64) float64 { return 2 - 3.5*x }, 2 / 3.5, 2},
		// 3 (1 - e^x): root 0 from x0 = -1.
		{"exponential", func(x float64) float64 { return 3 * (1 - math.Exp(x)) }, 0, 6},
		// Falling, convex: 4/(1+x) - 3 for x > -1, root 1/3, from 0.1.
		{"hyperbola", func(x float64) float64 { return 4/(1+x) - 3 }, 1.0 / 3, 6},
		{"jump across zero", func(x float64) float64 {
			if x < 0.5 {
				return 0.4
			}
			return -0.4
		}, math.NaN(), 0},
		{"root beyond the bound", func(x float64) float64 { return 40 - x }, math.NaN(), 0},
	}
	for _, c := range cases {
		x0 := map[string]float64{"exponential": -1, "hyperbola": 0.1}[c.name]
		n := 0
		f := func(x float64) (float64, error) { n++; return c.f(x), nil }
		x, ok, err := secantRoot(f, x0, c.f(x0), math.Log(1e-3), math.Log(1e3))
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if math.IsNaN(c.root) {
			if ok {
				t.Errorf("%s: root %v reported, want none", c.name, x)
			}
			continue
		}
		if !ok || math.Abs(c.f(x)) >= ReserveTol || math.Abs(x-c.root) > 1e-3 || n > c.steps {
			t.Errorf("%s: x %v (ok %v) in %d evaluations, want %v in at most %d", c.name, x, ok, n, c.root, c.steps)
		}
	}
}
