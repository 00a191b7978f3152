package sim

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// TestPulseMaximumClosedForms: with one load the maximum of r pulses is
// F^r (Gumbel 1958, Statistics of Extremes, 1.2); with two loads of one
// pulse each the maximum is the sum of two independent normals, normal
// with the variances added. Down to probabilities of 1e-9: the upper
// tail (where loads fail members) to 1e-4 relative, the lower tail, where
// the maximum's z = Phi^-1(F) curves most between grid points, to 1e-3.
func TestPulseMaximumClosedForms(t *testing.T) {
	ln, _ := NewLognormal(100, 30)
	one, err := PulseMaximum([]Dist{ln}, []int{50})
	if err != nil {
		t.Fatal(err)
	}
	exact, _ := MaximumOf(ln, 50)
	n1, _ := NewNormal(100, 20)
	n2, _ := NewNormal(50, 15)
	sum, err := PulseMaximum([]Dist{n1, n2}, []int{1, 1})
	if err != nil {
		t.Fatal(err)
	}
	nsum, _ := NewNormal(150, 25)
	for _, c := range []struct {
		name      string
		got, want Dist
	}{{"one lognormal, 50 pulses", one, exact}, {"two normals, one pulse", sum, nsum}} {
		for _, u := range []float64{-6, -3, -1, 0, 1, 3, 6} {
			x := c.want.FromStdNormal(u)
			if g, w := c.got.CDF(x), c.want.CDF(x); math.Abs(g-w) > 1e-3*w {
				t.Errorf("%s: CDF(%g) %.8g, want %.8g", c.name, x, g, w)
			}
			if g, w := c.got.Survival(x), c.want.Survival(x); math.Abs(g-w) > 1e-4*w {
				t.Errorf("%s: survival(%g) %.8g, want %.8g", c.name, x, g, w)
			}
			if g := c.got.FromStdNormal(u); math.Abs(g-x) > 1e-4*c.want.StdDev() {
				t.Errorf("%s: FromStdNormal(%g) %.8g, want %.8g", c.name, u, g, x)
			}
			if g := c.got.ToStdNormal(x); math.Abs(g-u) > 1e-4 {
				t.Errorf("%s: ToStdNormal(%g) %.8g, want %g", c.name, x, g, u)
			}
		}
		if math.Abs(c.got.Mean()-c.want.Mean()) > 1e-4*c.want.Mean() || math.Abs(c.got.StdDev()-c.want.StdDev()) > 1e-3*c.want.StdDev() {
			t.Errorf("%s: mean %g sd %g, want %g %g", c.name, c.got.Mean(), c.got.StdDev(), c.want.Mean(), c.want.StdDev())
		}
	}
}

// TestPulseMaximumBruteForce: the Ferry Borges-Castanheta maximum against
// a brute-force simulation of the pulses themselves. Three loads: 1 pulse
// of a normal, 5 of a gumbel, 50 of a gamma in the period; each
// realisation draws every pulse and takes the largest sum over the 50
// elementary intervals. At several fractiles of the FBC distribution the
// empirical fraction lies within its 99.9 % binomial interval (normal
// approximation, 3.29 standard errors).
func TestPulseMaximumBruteForce(t *testing.T) {
	q1, _ := NewNormal(200, 20)
	q2, _ := NewGumbel(60, 18)
	q3, _ := NewGamma(30, 15) // shape 4, scale 7.5
	g3 := distuv.Gamma{Alpha: 4, Beta: 1 / 7.5, Src: nil}
	d, err := PulseMaximum([]Dist{q3, q1, q2}, []int{50, 1, 5}) // any order
	if err != nil {
		t.Fatal(err)
	}
	const n = 100000
	r := rand.New(rand.NewPCG(11, 12))
	g3.Src = r
	draw := func(x Dist) float64 { return x.FromStdNormal(r.NormFloat64()) }
	ps := []float64{0.05, 0.3, 0.6, 0.9, 0.99}
	xs := make([]float64, len(ps))
	for i, p := range ps {
		xs[i] = d.Quantile(p)
	}
	below := make([]int, len(ps))
	for range n {
		a := draw(q1)
		top := math.Inf(-1)
		for range 5 {
			b := a + draw(q2)
			for range 10 {
				top = math.Max(top, b+g3.Rand()) // gonum's gamma sampler
			}
		}
		for i, x := range xs {
			if top <= x {
				below[i]++
			}
		}
	}
	for i, p := range ps {
		got := float64(below[i]) / n
		if half := 3.29 * math.Sqrt(p*(1-p)/n); math.Abs(got-p) > half {
			t.Errorf("P(S <= %.1f): brute force %.4f, FBC %.4f (+- %.4f)", xs[i], got, p, half)
		}
	}
	if _, err := PulseMaximum([]Dist{q1, q2}, []int{3, 5}); err == nil {
		t.Error("3 and 5 repetitions accepted: 3 does not divide 5")
	}
}
