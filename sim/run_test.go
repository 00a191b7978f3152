package sim

import (
	"context"
	"math"
	"testing"
)

// caseA is R - S with R ~ N(200, 20), S ~ N(100, 30): Cornell's
// beta = (muR - muS)/sqrt(sR^2 + sS^2) = 100/sqrt(1300) = 2.773501,
// pf = Phi(-beta) = 2.77283e-3 (Cornell 1969, "A probability-based
// structural code", ACI Journal 66(12)).
func caseA() *Model {
	return &Model{
		Vars: []Variable{
			{Name: "R", Dist: mustDist(NewNormal(200, 20))},
			{Name: "S", Dist: mustDist(NewNormal(100, 30))},
		},
		G:       func(x, out []float64) float64 { return x[0] - x[1] },
		Linear:  &Linear{Index: 1, Split: func(x []float64) (float64, float64) { return x[0], 1 }},
		Outputs: nil,
	}
}

// caseB is R - S with lognormal R (mean 150, V 0.10) and S (mean 100,
// V 0.20); ln R - ln S is normal, so
// beta = ln[(muR/muS) sqrt((1+VS^2)/(1+VR^2))]/sqrt(ln[(1+VR^2)(1+VS^2)])
// exactly (the standard lognormal-format result, e.g. Rosenblueth and
// Esteva 1972; here evaluated in closed form by caseBBeta).
func caseB() *Model {
	return &Model{
		Vars: []Variable{
			{Name: "R", Dist: mustDist(NewLognormal(150, 15))},
			{Name: "S", Dist: mustDist(NewLognormal(100, 20))},
		},
		G: func(x, out []float64) float64 {
			if out != nil {
				out[0], out[1] = x[0], x[1]
			}
			return x[0] - x[1]
		},
		Outputs: []string{"capacity", "demand"},
		Linear:  &Linear{Index: 1, Split: func(x []float64) (float64, float64) { return x[0], 1 }},
	}
}

func caseBBeta() float64 {
	vr, vs := 0.10, 0.20
	return math.Log(150.0/100*math.Sqrt((1+vs*vs)/(1+vr*vr))) / math.Sqrt(math.Log((1+vr*vr)*(1+vs*vs)))
}

func TestMonteCarloCaseA(t *testing.T) {
	t.Parallel()
	want := PfFromBeta(100 / math.Sqrt(1300))
	res, err := Run(context.Background(), caseA(), &Settings{Method: MonteCarlo, Samples: 2_000_000, Seed: 7, Confidence: 0.99})
	if err != nil {
		t.Fatal(err)
	}
	if want < res.PfCI[0] || want > res.PfCI[1] {
		t.Errorf("exact pf %v outside the 99%% interval %v (pf %v)", want, res.PfCI, res.Pf)
	}
	t.Logf("pf %v ci %v cov %v evals %d", res.Pf, res.PfCI, res.PfCoV, res.Evaluations)
}
