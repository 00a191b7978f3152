package sim

import (
	"context"
	"math"
	"strings"
	"testing"
)

// fourBranch is the four-branch series system of standard normal x1, x2:
//
//	g = min(3 + 0.1 (x1 - x2)^2 - (x1 + x2)/sqrt2, 3 + 0.1 (x1 - x2)^2 + (x1 + x2)/sqrt2,
//	        (x1 - x2) + k/sqrt2, (x2 - x1) + k/sqrt2)
//
// a benchmark of the active-learning methods (Echard, Gayton and Lemaire,
// Structural Safety 33, 2011, after Schueremans and Van Gemert 2005):
// four failure regions, pf = 4.416e-3 for k = 6 by Monte Carlo with 1e6
// samples (their Table 1, from memory).
func fourBranch(k float64) *Model {
	return &Model{Vars: []Variable{{Name: "x1", Dist: mustDist(NewNormal(0, 1))}, {Name: "x2", Dist: mustDist(NewNormal(0, 1))}},
		G: func(x, _ []float64) float64 {
			a, b := x[0], x[1]
			q := 3 + 0.1*(a-b)*(a-b)
			s := (a + b) / math.Sqrt2
			return min(q-s, q+s, a-b+k/math.Sqrt2, b-a+k/math.Sqrt2)
		}}
}

func TestSurrogateFourBranch(t *testing.T) {
	// CoV 0.1: FORM's pf (1.3e-3, one branch) then asks for 7.4e4
	// candidates, within MaxPopulation, so the candidates are drawn from
	// the inputs' own distribution and see all four branches.
	r, err := Run(context.Background(), fourBranch(6), &Settings{Method: Surrogate, Samples: 400, Seed: 2, Workers: 2, AuxSamples: -1,
		TargetCoV: 0.1, Confidence: 0.99})
	if err != nil {
		t.Fatal(err)
	}
	const ref = 4.416e-3 // Echard et al. 2011, Monte Carlo 1e6 samples (CoV 1.5 %)
	t.Logf("pf %.4g CI %.4g CoV %.3g, %d evaluations, status %s: %v", r.Pf, r.PfCI, r.PfCoV, r.Evaluations, r.Status, r.Warnings)
	if !(r.PfCI[0] <= ref && ref <= r.PfCI[1]) || math.Abs(r.Pf/ref-1) > 0.15 {
		t.Errorf("four-branch: pf %.4g in %.4g, want %.4g inside", r.Pf, r.PfCI, ref)
	}
	if r.Evaluations > 200 || !r.Status.Trusted() {
		t.Errorf("%d evaluations, status %s", r.Evaluations, r.Status)
	}
}

// TestSurrogateLinear: g = beta sqrt2 - x1 - x2 with standard normal
// inputs has pf = Phi(-beta) exactly (closed form).
func TestSurrogateLinear(t *testing.T) {
	const beta = 4.5
	m := &Model{Vars: []Variable{{Name: "x1", Dist: mustDist(NewNormal(0, 1))}, {Name: "x2", Dist: mustDist(NewNormal(0, 1))}, {Name: "x3", Dist: mustDist(NewNormal(0, 1))}},
		G: func(x, _ []float64) float64 { return beta*math.Sqrt2 - x[0] - x[1] + 0*x[2] }}
	r, err := Run(context.Background(), m, &Settings{Method: Surrogate, Samples: 200, Seed: 1, Workers: 1, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	ref := PfFromBeta(beta)
	t.Logf("pf %.4g CI %.4g CoV %.3g, %d evaluations, status %s: %v", r.Pf, r.PfCI, r.PfCoV, r.Evaluations, r.Status, r.Warnings)
	if !(r.PfCI[0] <= ref && ref <= r.PfCI[1]) || r.Evaluations > 200 {
		t.Errorf("linear limit state: pf %.4g in %.4g after %d evaluations, want %.4g inside", r.Pf, r.PfCI, r.Evaluations, ref)
	}
}

// TestAutoSurrogateRule: auto learns a surrogate for an expensive model
// with few inputs, says so in Reason, and not for one with more than
// surrogateMaxDim inputs.
func TestAutoSurrogateRule(t *testing.T) {
	for _, c := range []struct {
		dim  int
		want bool
	}{{3, true}, {surrogateMaxDim + 1, false}} {
		vars := make([]Variable, c.dim)
		for i := range vars {
			vars[i] = Variable{Name: "x" + string(rune('a'+i)), Dist: mustDist(NewNormal(0, 1))}
		}
		m := &Model{Vars: vars, Expensive: true, G: func(x, _ []float64) float64 { return 3*math.Sqrt2 - x[0] - x[1] }}
		r, err := Run(context.Background(), m, &Settings{Samples: 20000, Seed: 3, Workers: 1, AuxSamples: -1})
		if err != nil {
			t.Fatal(err)
		}
		got := r.Method == Surrogate
		if got != c.want || got && !strings.Contains(r.Reason, "expensive") {
			t.Errorf("%d inputs: method %s (%s)", c.dim, r.Method, r.Reason)
		}
		ref := PfFromBeta(3) // closed form of the linear limit state
		if !(r.PfCI[0] <= ref && ref <= r.PfCI[1]) {
			t.Errorf("%d inputs: pf %.4g in %.4g, want %.4g inside", c.dim, r.Pf, r.PfCI, ref)
		}
	}
}

// TestSurrogateWorkers: the surrogate's numbers do not depend on the
// number of workers, FORM's gradients spread over them (an expensive
// model) included.
func TestSurrogateWorkers(t *testing.T) {
	var first *Result
	m := fourBranch(6)
	m.Expensive = true
	for _, w := range []int{1, 3} {
		r, err := Run(context.Background(), m, &Settings{Method: Surrogate, Samples: 300, Seed: 5, Workers: w, AuxSamples: -1, TargetCoV: 0.1})
		if err != nil {
			t.Fatal(err)
		}
		if first == nil {
			first = r
			continue
		}
		if r.Pf != first.Pf || r.PfCI != first.PfCI || r.Evaluations != first.Evaluations {
			t.Errorf("%d workers: pf %v %v after %d evaluations; 1 worker: %v %v after %d", w, r.Pf, r.PfCI, r.Evaluations, first.Pf, first.PfCI, first.Evaluations)
		}
	}
}
