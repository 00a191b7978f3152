package study

import (
	"context"
	"math"
	"testing"

	"strutrisk/internal/fixture"

	"strutrisk/sim"
)

// TestReserveFactorAlone: ReserveFactor finds the factor of the lognormal
// closed form (lognormalRS, reserve_test.go: lambda = exp((beta(1) -
// target) D), Melchers and Beck, from memory) with the FORM index there,
// the same as Reserve's, without searching the added load; and the root,
// a point the search evaluated, is not analysed a second time: the calls
// counted are those of the root search alone.
func TestReserveFactorAlone(t *testing.T) {
	md, err := Build(parse(t, lognormalRS))
	if err != nil {
		t.Fatal(err)
	}
	for _, target := range []float64{2.5, 3.8, 4.7} {
		ctx := context.Background()
		r, err := md.ReserveFactor(ctx, target, nil, nil)
		if err != nil {
			t.Fatalf("target %g: %v", target, err)
		}
		if want := fixture.StockyFactor(target); !near(r.Factor, want, 1e-4) || math.Abs(r.FactorBeta-target) > ReserveTol {
			t.Errorf("target %g: factor %.6f (FORM beta %.5f), want %.6f", target, r.Factor, r.FactorBeta, want)
		}
		if !math.IsNaN(r.Added) || r.AddedErr != nil {
			t.Errorf("target %g: added load %v (%v), want none searched", target, r.Added, r.AddedErr)
		}
		full, err := md.Reserve(ctx, target, nil)
		if err != nil || full.Factor != r.Factor || full.FactorBeta != r.FactorBeta || full.FORMCalls <= r.FORMCalls {
			t.Errorf("target %g: Reserve %+v (%v), ReserveFactor %+v", target, full, err, r)
		}
		// The search's own count: every evaluation of f in fallingRoot.
		searched := 0
		f := func(t float64) (float64, error) {
			searched++
			b, err := md.formBeta(ctx, math.Exp(t), 0, nil)
			return b - target, err
		}
		if _, err := fallingRoot(f, 0, math.Ln2, math.Log(1e-3), math.Log(1e3)); err != nil {
			t.Fatal(err)
		}
		if r.FORMCalls != searched {
			t.Errorf("target %g: %d FORM analyses, the root search takes %d", target, r.FORMCalls, searched)
		}
		// Given the study's own FORM result, the search takes it for
		// factor 1 and steps by secants: the closed form's factor again,
		// in fewer analyses (FORM is exact here, the index linear in the
		// logarithm of the factor: one step and one secant at most).
		own, err := sim.FORM(md.Sim, nil)
		if err != nil {
			t.Fatal(err)
		}
		r1, err := md.ReserveFactor(ctx, target, nil, own)
		if err != nil {
			t.Fatal(err)
		}
		if want := fixture.StockyFactor(target); !near(r1.Factor, want, 1e-4) || math.Abs(r1.FactorBeta-target) > ReserveTol || r1.FORMCalls > 2 || r1.FORMCalls >= r.FORMCalls {
			t.Errorf("target %g: with the own FORM %+v, want the factor %.6f in at most 2 analyses (%d without)", target, r1, want, r.FORMCalls)
		}
	}
}
