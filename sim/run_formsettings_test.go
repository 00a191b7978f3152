package sim

import (
	"context"
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// stairModel is g = 3 - q(u1) with q the staircase 0.05 round(u1/0.05)
// of a standard normal u1 (u2 does not enter): flat between its steps, so
// central differences of the default step 1e-4 see no gradient at the
// median, while a step of 0.1 (h = 0.1 max(1, |u|)) spans the stairs.
// Failure is q(u1) > 3, that is u1 >= 3.025, so the exact pf is
// Phi(-3.025) (standard normal tail).
func stairModel() *Model {
	stair := func(v float64) float64 { return 0.05 * math.Floor(v/0.05+0.5) }
	return &Model{
		Vars: []Variable{{Name: "u1", Dist: Normal{mu: 0, sigma: 1}}, {Name: "u2", Dist: Normal{mu: 0, sigma: 1}}},
		G:    func(x, _ []float64) float64 { return 3 - stair(x[0]) },
	}
}

// TestRunFORMSettingsReachMethods checks that Settings.FORM reaches every
// FORM analysis inside Run: on the staircase limit state the default FORM
// finds no gradient and fails, so auto falls to subset simulation and
// importance sampling to plain Monte Carlo; with a step of 0.1 FORM
// converges and both sample around its design point, whose estimates are
// checked against the exact pf Phi(-3.025).
func TestRunFORMSettingsReachMethods(t *testing.T) {
	exact := distuv.UnitNormal.CDF(-3.025)
	step := &FORMSettings{Step: 0.1}
	for _, c := range []struct {
		method   Method
		form     *FORMSettings
		want     Method // the estimator that gave the result
		formConv bool
	}{
		{FORMMethod, nil, FORMMethod, false},
		{FORMMethod, step, FORMMethod, true},
		{Auto, nil, Subset, false},
		{Auto, step, Importance, true},
		{Importance, nil, MonteCarlo, false},
		{Importance, step, Importance, true},
	} {
		s := &Settings{Method: c.method, Samples: 100_000, TargetCoV: 0.05, Seed: 7, Workers: 2, AuxSamples: -1, FORM: c.form}
		res, err := Run(context.Background(), stairModel(), s)
		if err != nil {
			t.Fatalf("%s, FORM %+v: %v", c.method, c.form, err)
		}
		if res.FORM == nil || res.FORM.Converged != c.formConv {
			t.Errorf("%s, FORM %+v: FORM %+v, want converged %v", c.method, c.form, res.FORM, c.formConv)
			continue
		}
		if res.Method != c.want {
			t.Errorf("%s, FORM %+v: estimated by %s (%s), want %s", c.method, c.form, res.Method, res.Reason, c.want)
		}
		if c.formConv && math.Abs(res.FORM.Beta-3) > 0.05 {
			t.Errorf("%s, FORM %+v: FORM beta %v, want within one stair of 3", c.method, c.form, res.FORM.Beta)
		}
		if c.formConv && c.method != FORMMethod && (exact < res.PfCI[0] || exact > res.PfCI[1]) {
			t.Errorf("%s, FORM %+v: pf %.4g, interval %v does not hold the exact %.4g", c.method, c.form, res.Pf, res.PfCI, exact)
		}
		t.Logf("%s, FORM %+v: %s pf %.4g [%.4g, %.4g], exact %.4g; %s", c.method, c.form, res.Method, res.Pf, res.PfCI[0], res.PfCI[1], exact, res.Reason)
	}
}

// TestRunFORMSettingsNilIsDefault checks that nil Settings.FORM gives the
// same numbers, bit for bit, as FORM settings spelled out at their
// documented defaults (MaxIter 100, Tol 1e-6, MaxPoints 4, Step 1e-4), for
// each method that runs FORM, on g = R - S with lognormal R and S.
func TestRunFORMSettingsNilIsDefault(t *testing.T) {
	r, err := NewLognormal(3000, 300)
	if err != nil {
		t.Fatal(err)
	}
	s, err := NewLognormal(1500, 300)
	if err != nil {
		t.Fatal(err)
	}
	m := &Model{
		Vars: []Variable{{Name: "R", Dist: r}, {Name: "S", Dist: s}},
		G:    func(x, _ []float64) float64 { return x[0] - x[1] },
	}
	spelled := &FORMSettings{MaxIter: 100, Tol: 1e-6, MaxPoints: 4, Step: 1e-4}
	for _, method := range []Method{FORMMethod, Auto, Importance} {
		var got [2]*Result
		for i, fs := range []*FORMSettings{nil, spelled} {
			res, err := Run(context.Background(), m, &Settings{Method: method, Samples: 50_000, Seed: 3, Workers: 2, AuxSamples: -1, FORM: fs})
			if err != nil {
				t.Fatal(err)
			}
			got[i] = res
		}
		a, b := got[0], got[1]
		if a.Pf != b.Pf || a.PfCoV != b.PfCoV || a.Beta != b.Beta || a.Evaluations != b.Evaluations || a.Method != b.Method || a.FORM.Beta != b.FORM.Beta {
			t.Errorf("%s: nil FORM settings give pf %v beta %v (%d evaluations, %s), the defaults spelled out pf %v beta %v (%d, %s)",
				method, a.Pf, a.Beta, a.Evaluations, a.Method, b.Pf, b.Beta, b.Evaluations, b.Method)
		}
	}
}
