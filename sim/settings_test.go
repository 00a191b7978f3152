package sim

import (
	"context"
	"math"
	"reflect"
	"strings"
	"testing"
)

// recorder is an Observer that keeps what it is told.
type recorder struct {
	progress []Progress
	points   []ConvergencePoint
	methods  []Method
}

func (r *recorder) Progress(p Progress) { r.progress = append(r.progress, p) }
func (r *recorder) Point(m Method, p ConvergencePoint) {
	r.points = append(r.points, p)
	r.methods = append(r.methods, m)
}

// linearModel is g = b - x with x standard normal: pf = Phi(-b) exactly.
func linearModel(b float64, linear bool) *Model {
	m := &Model{Vars: []Variable{{Name: "s", Dist: mustDist(NewNormal(0, 1))}, {Name: "r", Dist: mustDist(NewNormal(0, 1))}},
		G: func(x, _ []float64) float64 { return b - x[0] + 0*x[1] }}
	if linear {
		m.Linear = &Linear{Index: 0, Split: func([]float64) (float64, float64) { return b, 1 }}
	}
	return m
}

// TestObserverChangesNothing: each sampling method tells the observer
// every point of the trace it returns, in order, and its progress, and
// the result is the same as without an observer.
func TestObserverChangesNothing(t *testing.T) {
	for _, meth := range []Method{MonteCarlo, LatinHypercube, Importance, Subset, ConditionalQMC} {
		m := linearModel(2, meth == ConditionalQMC)
		s := Settings{Method: meth, Samples: 20000, Seed: 4, Workers: 2, AuxSamples: -1}
		plain, err := Run(context.Background(), m, &s)
		if err != nil {
			t.Fatal(meth, err)
		}
		var rec recorder
		s.Observer = &rec
		seen, err := Run(context.Background(), m, &s)
		if err != nil {
			t.Fatal(meth, err)
		}
		if seen.Pf != plain.Pf || !reflect.DeepEqual(seen.Convergence, plain.Convergence) {
			t.Errorf("%s: the observer changed the result: pf %v and %v", meth, seen.Pf, plain.Pf)
		}
		if !reflect.DeepEqual(rec.points, seen.Convergence) {
			t.Errorf("%s: the observer saw %d points, the trace has %d", meth, len(rec.points), len(seen.Convergence))
		}
		for _, pm := range rec.methods {
			if pm != meth {
				t.Errorf("%s: a point reported as of %s", meth, pm)
			}
		}
		if len(rec.progress) == 0 || rec.progress[len(rec.progress)-1].Done > seen.Evaluations {
			t.Errorf("%s: progress %v, %d evaluations", meth, rec.progress, seen.Evaluations)
		}
	}
}

// TestMethodSettingsReachAuto: the per-method settings reach the
// estimators auto picks.
func TestMethodSettingsReachAuto(t *testing.T) {
	ctx := context.Background()
	// A linear input: auto takes conditional quasi-Monte Carlo.
	r, err := Run(ctx, linearModel(2, true), &Settings{Samples: 4096, Workers: 1, AuxSamples: -1,
		ConditionalQMC: &ConditionalQMCSettings{Replicates: 4}})
	if err != nil || r.Method != ConditionalQMC || len(r.Replicates) != 4 {
		t.Fatalf("auto with 4 replicates: method %s, %d replicates, %v", r.Method, len(r.Replicates), err)
	}
	// Far in the tail without a linear input: importance sampling, which
	// may stop at the target CoV only after MinFailures failures.
	base := Settings{Samples: 200000, Workers: 1, AuxSamples: -1, TargetCoV: 0.3}
	few, err := Run(ctx, linearModel(4.5, false), &base)
	if err != nil || few.Method != Importance {
		t.Fatalf("auto far in the tail: %s, %v", few.Method, err)
	}
	base.Importance = &ImportanceSettings{MinFailures: 5000}
	many, err := Run(ctx, linearModel(4.5, false), &base)
	if err != nil || many.Method != Importance {
		t.Fatalf("auto far in the tail: %s, %v", many.Method, err)
	}
	// About half the samples around the design point fail: 5000 failures
	// need about 10000 samples, where the default stops after a block.
	if !(many.Evaluations > few.Evaluations+5000) {
		t.Errorf("Importance.MinFailures 5000: %d evaluations, default %d", many.Evaluations, few.Evaluations)
	}
	// Subset simulation: the first level has LevelSize samples.
	ss, err := Run(ctx, linearModel(3, false), &Settings{Method: Subset, Samples: 20000, Workers: 1, AuxSamples: -1,
		Subset: &SubsetSettings{LevelSize: 1200}})
	if err != nil || ss.Convergence[0].Evaluations != 1200 {
		t.Fatalf("subset with 1200 per level: first level %d evaluations, %v", ss.Convergence[0].Evaluations, err)
	}
	if math.Abs(ss.Beta-3) > 0.3 {
		t.Errorf("subset beta %.3f, want 3 (closed form of g = 3 - x)", ss.Beta)
	}
}

func TestMethodSettingsChecked(t *testing.T) {
	m := linearModel(2, false)
	for _, s := range []Settings{
		{ConditionalQMC: &ConditionalQMCSettings{Replicates: 1}},
		{Replicates: 1},
		{Importance: &ImportanceSettings{MinFailures: -1}},
		{Subset: &SubsetSettings{LevelSize: 50}},
	} {
		if _, err := Run(context.Background(), m, &s); err == nil {
			t.Errorf("Run accepted %+v", s)
		}
	}
}

// TestBetaStatementOnce: a crude run without failure states the bound in
// its own warning, so BetaStatement adds nothing; FORM's infinite beta
// has no such warning and BetaStatement states it.
func TestBetaStatementOnce(t *testing.T) {
	r, err := Run(context.Background(), linearModel(6, false), &Settings{Method: MonteCarlo, Samples: 2000, Workers: 1, AuxSamples: -1})
	if err != nil || !math.IsInf(r.Beta, 1) {
		t.Fatalf("no failure expected at beta 6 in 2000 samples: beta %v, %v", r.Beta, err)
	}
	if st := r.BetaStatement(); st != "" || len(r.Warnings) == 0 {
		t.Errorf("crude run without failure: statement %q, warnings %q", st, r.Warnings)
	}
	inf := &Result{Beta: math.Inf(1), PfCI: [2]float64{0, 1e-3}, BetaCI: [2]float64{3.09, math.Inf(1)}}
	if inf.BetaStatement() == "" {
		t.Error("an infinite beta without a warning of the method: no statement")
	}
}

// TestBetaStatementAllFailed: when every evaluation fails the statement
// gives the lower bound of pf with the digits that tell it from 1; with
// 8192 failures of 8192 the Clopper-Pearson bound is 0.025^(1/8192) =
// 0.99955 (Clopper and Pearson 1934, closed form for k = n), which %.3g
// printed as "1".
func TestBetaStatementAllFailed(t *testing.T) {
	lo, _ := ClopperPearson(8192, 8192, 0.95)
	r := &Result{Beta: math.Inf(-1), Evaluations: 8192, PfCI: [2]float64{lo, 1}, BetaCI: [2]float64{math.Inf(-1), BetaFromPf(lo)}}
	st := r.BetaStatement()
	if !strings.Contains(st, "pf is only known to be above 0.99955 ") {
		t.Errorf("statement %q: want the bound 0.99955", st)
	}
	for _, c := range []struct {
		p    float64
		want string
	}{
		{0.5, "0.5"}, {0.999, "0.999"}, {0.99955, "0.99955"}, {1 - 3.7e-6, "0.9999963"},
	} {
		if got := pfNearOne(c.p); got != c.want {
			t.Errorf("pfNearOne(%v) = %q, want %q", c.p, got, c.want)
		}
	}
}
