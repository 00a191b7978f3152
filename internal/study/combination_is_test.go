package study

import (
	"context"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
	"gonum.org/v1/gonum/stat/distuv"
	"strutrisk/sim"
)

// TestTurkstraRareUnion: two cases of equal weight (the loads mirror each
// other), so half of the union's failures come from each. Importance
// sampling of the union model (sim.Run, importance) must find both: its
// estimate lies within 4 of its own standard errors of the exact union
// probability, the one-dimensional integral over the normal model factor
// of unionPf's derivation (Gauss-Legendre quadrature), and plain
// Monte Carlo sampling of the union model agrees with it too.
func TestTurkstraRareUnion(t *testing.T) {
	text := strings.Replace(twoLoads, `imposed = { dist = "normal", mean = 400000, sd = 80000, companion = { dist = "normal", mean = 150000, sd = 50000 } }
snow = { dist = "normal", mean = 350000, sd = 90000, companion = { dist = "normal", mean = 100000, sd = 40000 } }`,
		`imposed = { dist = "normal", mean = 300000, sd = 60000, companion = { dist = "normal", mean = 80000, sd = 30000 } }
snow = { dist = "normal", mean = 300000, sd = 60000, companion = { dist = "normal", mean = 80000, sd = 30000 } }`, 1)
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	nom, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	c0 := nom.Capacity
	m := distuv.Normal{Mu: 1, Sigma: 0.1}
	s := distuv.Normal{Mu: 380000, Sigma: math.Hypot(60000, 30000)} // either case's load sum
	exact := quad.Fixed(func(x float64) float64 {
		q := s.Survival(x*c0 - 300000)
		return m.Prob(x) * (2*q - q*q) // P(S1 > r or S2 > r), S1 and S2 independent given M
	}, 1-1.2, 1+1.2, 2000, nil, 0)
	if exact > 1e-3 || exact < 1e-6 {
		t.Fatalf("exact union pf %g: the check wants a rare event", exact)
	}
	for _, c := range []struct {
		method  sim.Method
		samples int64
	}{{sim.Importance, 40000}, {sim.MonteCarlo, 2000000}} {
		res, err := sim.Run(context.Background(), md.Sim, &sim.Settings{Method: c.method, Samples: c.samples, Seed: 3, Workers: 2})
		if err != nil {
			t.Fatal(err)
		}
		if se := res.Pf * res.PfCoV; math.Abs(res.Pf-exact) > 4*se {
			t.Errorf("%s: union pf %.4g (cov %.3f), exact %.4g", c.method, res.Pf, res.PfCoV, exact)
		}
	}
}
