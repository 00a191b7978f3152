package sim

import (
	"context"
	"math"
	"strings"
	"testing"
)

// lnRS is R - S with lognormal R and S, with exact beta from the closed
// form of case B (ln R - ln S is normal).
func lnRS(mr, vr, ms, vs float64) (*Model, float64) {
	m := &Model{
		Vars: []Variable{
			{Name: "R", Dist: mustDist(NewLognormal(mr, vr*mr))},
			{Name: "S", Dist: mustDist(NewLognormal(ms, vs*ms))},
		},
		G: func(x, out []float64) float64 { return x[0] - x[1] },
	}
	beta := math.Log(mr/ms*math.Sqrt((1+vs*vs)/(1+vr*vr))) / math.Sqrt(math.Log((1+vr*vr)*(1+vs*vs)))
	return m, beta
}

func TestAutoChoosesMethod(t *testing.T) {
	t.Parallel()
	// A usable linear input: conditional quasi-Monte Carlo.
	res, err := Run(context.Background(), caseB(), &Settings{Samples: 100_000, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	if res.Method != ConditionalQMC || !strings.Contains(res.Reason, "linear") {
		t.Errorf("linear model: method %v, reason %q", res.Method, res.Reason)
	}
	if b := caseBBeta(); math.Abs(res.Beta-b) > 0.01 {
		t.Errorf("linear model: beta %v, exact %v", res.Beta, b)
	}
	// No linear input, pf about 0.03 (case B): any method auto picks must
	// give beta within 0.05 of exact, and say why it was picked.
	// A rarer case, beta about 5.0, needs importance sampling or subset
	// simulation within the budget.
	m1, b1 := lnRS(150, 0.10, 100, 0.20)
	m2, b2 := lnRS(300, 0.10, 100, 0.20)
	for _, c := range []struct {
		m    *Model
		beta float64
	}{{m1, b1}, {m2, b2}} {
		res, err := Run(context.Background(), c.m, &Settings{Samples: 200_000, Seed: 2})
		if err != nil {
			t.Fatal(err)
		}
		if res.Reason == "" || math.Abs(res.Beta-c.beta) > 0.05 {
			t.Errorf("exact beta %v: auto used %v (%s) and found beta %v", c.beta, res.Method, res.Reason, res.Beta)
		}
		t.Logf("exact beta %.4f: %v, beta %.4f, %d evaluations; %s", c.beta, res.Method, res.Beta, res.Evaluations, res.Reason)
	}
}
