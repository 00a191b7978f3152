package sim

import (
	"math"
	"testing"
)

// TestSeriesPfGradient checks the exact gradient of a series system's pf
// against central differences of SeriesPf itself, for one, two and three
// design points, and that more points or parallel ones are left to the
// caller.
func TestSeriesPfGradient(t *testing.T) {
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
	cases := []struct {
		name  string
		beta  []float64
		alpha [][]float64
	}{
		{"one", []float64{2.5}, [][]float64{unit(1, 1)}},
		{"two", []float64{3, 3.4}, [][]float64{unit(0.8, 0.6, 0), unit(0.5, 0.1, 0.8)}},
		{"three", []float64{3.1, 3.3, 3.6}, [][]float64{unit(0.6, 0.5, 0.3, 0.2), unit(0.5, -0.2, 0.7, 0.1), unit(0.7, 0.1, -0.1, 0.6)}},
		{"three, negative correlation", []float64{2.2, 2.9, 3.2}, [][]float64{unit(1, 0.2, 0), unit(-0.6, 0.8, 0.1), unit(0.3, -0.4, 0.9)}},
	}
	for _, c := range cases {
		g, ok := SeriesPfGradient(c.beta, c.alpha)
		if !ok {
			t.Fatalf("%s: refused", c.name)
		}
		for j := range c.beta {
			const h = 1e-4
			b := append([]float64(nil), c.beta...)
			b[j] += h
			hi := SeriesPf(b, c.alpha)
			b[j] -= 2 * h
			lo := SeriesPf(b, c.alpha)
			want := (hi - lo) / (2 * h)
			// Two points: SeriesPf is an adaptive 1-D integral, 1e-4.
			// Three: its lattice rule (8191 points) differentiated at
			// h = 1e-4 agrees to a few parts in 1e4 (measured up to 2.4e-3).
			tol := 1e-4
			if len(c.beta) == 3 {
				tol = 3e-3
			}
			if math.Abs(g[j]-want) > tol*math.Abs(want) {
				t.Errorf("%s: d pf/d beta_%d = %.8g, central difference %.8g", c.name, j, g[j], want)
			}
		}
	}
	four := [][]float64{unit(1, 0), unit(0, 1), unit(1, 1), unit(1, -1)}
	if _, ok := SeriesPfGradient([]float64{3, 3, 3, 3}, four); ok {
		t.Error("four points: want the caller's differences")
	}
	if _, ok := SeriesPfGradient([]float64{3, 3.2}, [][]float64{unit(1, 0), unit(1, 0)}); ok {
		t.Error("parallel points: want the caller's differences")
	}
}
