package sim

import (
	"context"
	"math"
	"testing"
)

func TestRunRareMethods(t *testing.T) {
	// Run dispatching to FORM, importance sampling and subset simulation
	// on the beta 4.5 lognormal case (exact formula in lognormalRSBeta).
	m := lognormalRSModel(t, rs45MR, rs45VR, rs45MS, rs45VS)
	exact := lognormalRSBeta(rs45MR, rs45VR, rs45MS, rs45VS)
	cases := []struct {
		method  Method
		samples int64
		tol     float64 // FORM is exact here; one subset run is within 0.1 with high probability (sd 0.03)
	}{
		{FORMMethod, 0, 1e-6},
		{Importance, 20000, 0.05},
		{Subset, 50000, 0.1},
	}
	for _, c := range cases {
		t.Run(string(c.method), func(t *testing.T) {
			r, err := Run(context.Background(), m, &Settings{Method: c.method, Samples: c.samples, Seed: 4, AuxSamples: -1})
			if err != nil {
				t.Fatal(err)
			}
			if r.Method != c.method || math.Abs(r.Beta-exact) > c.tol {
				t.Errorf("method %s, beta %.5f, exact %.5f", r.Method, r.Beta, exact)
			}
			if c.samples > 0 && r.Evaluations > 50000 {
				t.Errorf("%d evaluations", r.Evaluations)
			}
			if c.method != Subset && r.FORM == nil {
				t.Error("no FORM result")
			}
			t.Logf("%s: beta %.4f, CI %.3f..%.3f, %d evaluations, warnings %v", r.Method, r.Beta, r.BetaCI[0], r.BetaCI[1], r.Evaluations, r.Warnings)
		})
	}
}

func TestRareCancelAndProgress(t *testing.T) {
	sp := paraboloidSpace(3, 0.2)
	f := formRun(sp, nil)
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	r, err := importanceRun(ctx, sp, f.Points, &Settings{Samples: 100000})
	if err != nil || !r.Incomplete || r.Evaluations >= 100000 {
		t.Errorf("importance sampling after cancel: err %v, incomplete %v, %d evaluations", err, r.Incomplete, r.Evaluations)
	}
	r, err = subsetRun(ctx, sp, &Settings{Samples: 100000}, 0)
	if err != nil || !r.Incomplete {
		t.Errorf("subset simulation after cancel: err %v, incomplete %v", err, r != nil && r.Incomplete)
	}

	var calls int
	var last Progress
	progress := func(p Progress) {
		calls++
		if p.Done < last.Done || p.Done > p.Total {
			t.Errorf("progress went from %+v to %+v", last, p)
		}
		last = p
	}
	if _, err := importanceRun(context.Background(), sp, f.Points, &Settings{Samples: 5000, Progress: progress}); err != nil {
		t.Fatal(err)
	}
	if calls != 5 || last.Done != 5000 {
		t.Errorf("%d progress calls, last %+v", calls, last)
	}
	calls, last = 0, Progress{}
	if _, err := subsetRun(context.Background(), sp, &Settings{Samples: 50000, Progress: progress}, 0); err != nil {
		t.Fatal(err)
	}
	if calls < 2 {
		t.Errorf("%d progress calls from subset simulation", calls)
	}
}

func TestRareNaN(t *testing.T) {
	// NaN counts as safe, with a warning, in both estimators.
	g := func(u []float64) float64 {
		if u[1] > 2 {
			return math.NaN()
		}
		return 3 - u[0]
	}
	sp := funcSpace(2, g)
	r, err := importanceRun(context.Background(), sp, []DesignPoint{{U: []float64{3, 0}, Beta: 3}}, &Settings{Samples: 5000})
	if err != nil || len(r.Warnings) == 0 {
		t.Errorf("importance: err %v, warnings %v", err, r.Warnings)
	}
	r, err = subsetRun(context.Background(), sp, &Settings{Samples: 20000}, 0)
	if err != nil || len(r.Warnings) == 0 {
		t.Errorf("subset: err %v, warnings %v", err, r.Warnings)
	}
}

func TestRareColumnModel(t *testing.T) {
	// Importance sampling and subset simulation against conditional
	// quasi-Monte Carlo (Run's own, independent estimator, exact in the
	// imposed load) on the seven-variable column: agreement within three
	// combined standard errors (subset's CoV taken 1.5 times its own
	// estimate, which neglects the correlation between levels).
	for _, dead := range []float64{1.2e6, 0.6e6} { // pf about 9e-3 and 4e-5
		m := columnModel(dead) // the reference column of run_test.go
		mc, err := Run(context.Background(), m, &Settings{Method: ConditionalQMC, Samples: 65536, Seed: 1, AuxSamples: -1})
		if err != nil {
			t.Fatal(err)
		}
		seMC := mc.Pf * mc.PfCoV
		for _, c := range []struct {
			method  Method
			samples int64
			covMul  float64
		}{{Importance, 20000, 1}, {Subset, 50000, 1.5}} {
			r, err := Run(context.Background(), m, &Settings{Method: c.method, Samples: c.samples, Seed: 2, AuxSamples: -1})
			if err != nil {
				t.Fatal(err)
			}
			se := math.Hypot(seMC, c.covMul*r.Pf*r.PfCoV)
			if math.Abs(r.Pf-mc.Pf) > 3*se || len(r.Warnings) > 0 {
				t.Errorf("dead %g, %s: pf %.4g, conditional QMC %.4g (combined se %.2g), warnings %v", dead, c.method, r.Pf, mc.Pf, se, r.Warnings)
			}
			t.Logf("dead %g, %s: pf %.4g (CoV %.3f, %d evaluations); conditional QMC %.4g (CoV %.4f)", dead, c.method, r.Pf, r.PfCoV, r.Evaluations, mc.Pf, mc.PfCoV)
			if r.FORM != nil {
				t.Logf("FORM: beta %.4f, pf %.4g, %d points, %d evaluations: %s", r.FORM.Beta, r.FORM.Pf, len(r.FORM.Points), r.FORM.Evaluations, r.FORM.Status)
			}
		}
	}
}

func TestRareColumnSymmetricBow(t *testing.T) {
	// The reference column with a bow of zero mean, acting by |e0|: FORM
	// finds the two mirrored design points, and importance sampling
	// around both agrees with conditional quasi-Monte Carlo within three
	// combined standard errors.
	m := columnModel(0.6e6)
	m.Vars[2].Dist = mustDist(NewNormal(0, colLength/1000))
	f, err := FORM(m, nil)
	if err != nil || !f.Converged || len(f.Points) != 2 {
		t.Fatalf("FORM: %v, %+v", err, f)
	}
	if p, q := f.Points[0], f.Points[1]; math.Abs(p.Beta-q.Beta) > 1e-4 || math.Abs(p.X[2]+q.X[2]) > 1e-3*math.Abs(p.X[2]) {
		t.Errorf("points not mirrored in e0: beta %v, %v; e0 %v, %v", p.Beta, q.Beta, p.X[2], q.X[2])
	}
	ref, err := Run(context.Background(), m, &Settings{Method: ConditionalQMC, Samples: 65536, Seed: 1, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	r, err := Run(context.Background(), m, &Settings{Method: Importance, Samples: 20000, Seed: 1, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	se := math.Hypot(ref.Pf*ref.PfCoV, r.Pf*r.PfCoV)
	if math.Abs(r.Pf-ref.Pf) > 3*se || importanceDegenerate(r) {
		t.Errorf("importance pf %.4g, conditional QMC %.4g (combined se %.2g), warnings %v", r.Pf, ref.Pf, se, r.Warnings)
	}
	t.Logf("FORM pf %.4g (one point %.4g), importance %.4g ± %.2g, conditional QMC %.4g ± %.2g; FORM %d evaluations",
		f.Pf, PfFromBeta(f.Points[0].Beta), r.Pf, r.Pf*r.PfCoV, ref.Pf, ref.Pf*ref.PfCoV, f.Evaluations)
}
