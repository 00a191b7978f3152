package sim

import (
	"context"
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// linearNormalModel is g = beta sqrt(n) - sum of n standard normals:
// pf = Phi(-beta) exactly (a sum of normals is normal).
func linearNormalModel(t *testing.T, n int, beta float64) (*Model, float64) {
	t.Helper()
	d, err := NewNormal(0, 1)
	if err != nil {
		t.Fatal(err)
	}
	m := &Model{G: func(x, _ []float64) float64 {
		s := beta * math.Sqrt(float64(n))
		for _, v := range x {
			s -= v
		}
		return s
	}}
	for i := 0; i < n; i++ {
		m.Vars = append(m.Vars, Variable{Name: "x" + string(rune('a'+i)), Dist: d})
	}
	return m, distuv.UnitNormal.CDF(-beta)
}

func TestSubsetHonoursTargetCoV(t *testing.T) {
	m, exact := linearNormalModel(t, 4, 4.5) // pf 3.40e-6
	var first *Result
	for _, w := range []int{1, 3} {
		r, err := Run(context.Background(), m, &Settings{Method: Subset, Samples: 200_000, TargetCoV: 0.07, Seed: 5, Workers: w, AuxSamples: -1})
		if err != nil {
			t.Fatal(err)
		}
		// One run of 10000 per level (the cap) takes about 6 levels,
		// 55000 evaluations, and reaches CoV 0.11 at this pf.
		one, err := Run(context.Background(), m, &Settings{Method: Subset, Samples: 200_000, Seed: 5, Workers: w, AuxSamples: -1})
		if err != nil {
			t.Fatal(err)
		}
		t.Logf("one run: pf %.4g CoV %.3g, %d evaluations; with target: pf %.4g CoV %.3g %v, %d evaluations, %s", one.Pf, one.PfCoV, one.Evaluations, r.Pf, r.PfCoV, r.PfCI, r.Evaluations, r.Status)
		if !(one.PfCoV > 0.07) {
			t.Fatalf("one run already reaches CoV %.3g: the test needs a rarer event", one.PfCoV)
		}
		if r.PfCoV > 0.07 && r.Status != BudgetSpent {
			t.Errorf("CoV %.3g above the target with status %s", r.PfCoV, r.Status)
		}
		if r.Evaluations <= one.Evaluations {
			t.Errorf("%d evaluations with a target, %d without: no second run", r.Evaluations, one.Evaluations)
		}
		if !(r.PfCI[0] <= exact && exact <= r.PfCI[1]) {
			t.Errorf("interval %v misses the exact %.4g", r.PfCI, exact)
		}
		if first == nil {
			first = r
		} else if r.Pf != first.Pf || r.Evaluations != first.Evaluations {
			t.Errorf("workers %d: pf %v (%d), workers 1: %v (%d)", w, r.Pf, r.Evaluations, first.Pf, first.Evaluations)
		}
	}
}

func TestSubsetWarnsWhenTheBudgetCannotReachTheTarget(t *testing.T) {
	m, _ := linearNormalModel(t, 4, 4.5)
	r, err := Run(context.Background(), m, &Settings{Method: Subset, Samples: 20_000, TargetCoV: 0.05, Seed: 5, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	if r.Status != BudgetSpent || !r.Status.Trusted() {
		t.Errorf("status %s (%s), want budget-spent", r.Status, r.StatusReason)
	}
	// No second run fits: the one run comes back whole, its levels kept.
	if r.Trace != TraceLevels || len(r.Convergence) < 3 {
		t.Errorf("trace %v with %d points, want the levels of the one run", r.Trace, len(r.Convergence))
	}
	found := false
	for _, w := range r.Warnings {
		found = found || w == r.StatusReason
	}
	if !found {
		t.Errorf("no warning says the target was missed: %q", r.Warnings)
	}
}

// TestReplicatesAndTrace: the methods say what their trace is and give
// their independent estimates, whose mean is the estimate.
func TestReplicatesAndTrace(t *testing.T) {
	m, _ := linearNormalModel(t, 4, 4.5)
	one, err := Run(context.Background(), m, &Settings{Method: Subset, Samples: 200_000, Seed: 5, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	if one.Trace != TraceLevels || len(one.Replicates) != 0 {
		t.Errorf("one subset run: trace %v, %d replicates", one.Trace, len(one.Replicates))
	}
	rep, err := Run(context.Background(), m, &Settings{Method: Subset, Samples: 200_000, TargetCoV: 0.07, Seed: 5, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	cqm, _ := normalRSModel(t, 100, 10, 50, 10)
	cqm.Linear = &Linear{Index: 1, Split: func(x []float64) (float64, float64) { return x[0], 1 }}
	cq, err := Run(context.Background(), cqm, &Settings{Method: ConditionalQMC, Samples: 4096, Seed: 5, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range []*Result{rep, cq} {
		if r.Trace != TraceEstimates || len(r.Replicates) < 2 {
			t.Fatalf("%s: trace %v, %d replicates", r.Method, r.Trace, len(r.Replicates))
		}
		mean := 0.0
		for _, v := range r.Replicates {
			mean += v / float64(len(r.Replicates))
		}
		if math.Abs(mean-r.Pf) > 1e-12*r.Pf {
			t.Errorf("%s: mean of the replicates %.10g, pf %.10g", r.Method, mean, r.Pf)
		}
	}
}
