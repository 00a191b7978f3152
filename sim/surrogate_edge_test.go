package sim

import (
	"context"
	"testing"
)

// TestSurrogateEdges: a median member that fails (pf = Phi(1) = 0.841 for
// g = x - 1, closed form) and a limit state where FORM cannot start (zero
// gradient at the median: g = 4 - x1^2 - x2^2, pf = exp(-2) = 0.135, the
// chi-square tail with 2 degrees of freedom) still give trusted
// estimates whose interval holds the exact pf.
func TestSurrogateEdges(t *testing.T) {
	n := func() Dist { return mustDist(NewNormal(0, 1)) }
	cases := []struct {
		name string
		m    *Model
		pf   float64
	}{
		{"median fails", &Model{Vars: []Variable{{Name: "x", Dist: n()}, {Name: "y", Dist: n()}},
			G: func(x, _ []float64) float64 { return x[0] - 1 + 0*x[1] }}, PfFromBeta(-1)},
		{"no gradient at the median", &Model{Vars: []Variable{{Name: "x", Dist: n()}, {Name: "y", Dist: n()}},
			G: func(x, _ []float64) float64 { return 4 - x[0]*x[0] - x[1]*x[1] }}, 0.1353352832366127},
	}
	for _, c := range cases {
		r, err := Run(context.Background(), c.m, &Settings{Method: Surrogate, Samples: 300, Seed: 1, Workers: 2, AuxSamples: -1, Confidence: 0.99})
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		t.Logf("%s: pf %.4g in %.4g, %d evaluations, %s", c.name, r.Pf, r.PfCI, r.Evaluations, r.Status)
		if !r.Status.Trusted() || !(r.PfCI[0] <= c.pf && c.pf <= r.PfCI[1]) {
			t.Errorf("%s: pf %.4g in %.4g (%s), want %.4g inside", c.name, r.Pf, r.PfCI, r.Status, c.pf)
		}
	}
}
