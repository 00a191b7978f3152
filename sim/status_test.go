package sim

import (
	"context"
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// normalRSModel is g = R - S with R ~ N(mr, sr) and S ~ N(ms, ss): pf =
// Phi(-(mr - ms)/sqrt(sr^2 + ss^2)) in closed form (e.g. Melchers,
// Structural Reliability Analysis and Prediction, 2nd ed., 1999, §3.2).
func normalRSModel(t *testing.T, mr, sr, ms, ss float64) (*Model, float64) {
	t.Helper()
	r, err := NewNormal(mr, sr)
	if err != nil {
		t.Fatal(err)
	}
	s, err := NewNormal(ms, ss)
	if err != nil {
		t.Fatal(err)
	}
	m := &Model{
		Vars: []Variable{{Name: "R", Dist: r}, {Name: "S", Dist: s}},
		G:    func(x, _ []float64) float64 { return x[0] - x[1] },
	}
	beta := (mr - ms) / math.Hypot(sr, ss)
	return m, distuv.UnitNormal.CDF(-beta)
}

// sumExpModel is g = c - sum of n unit exponentials (gamma, shape 1):
// pf = Q(n, c), the regularised upper incomplete gamma function, taken
// from gonum's gamma distribution.
func sumExpModel(t *testing.T, n int, c float64) (*Model, float64) {
	t.Helper()
	e, err := NewGammaShape(1, 1)
	if err != nil {
		t.Fatal(err)
	}
	m := &Model{G: func(x, _ []float64) float64 {
		s := 0.0
		for _, v := range x {
			s += v
		}
		return c - s
	}}
	for i := 0; i < n; i++ {
		m.Vars = append(m.Vars, Variable{Name: "x" + string(rune('a'+i)), Dist: e})
	}
	return m, distuv.Gamma{Alpha: float64(n), Beta: 1}.Survival(c)
}

func TestImportanceFallsBackWhenItCannotBeTrusted(t *testing.T) {
	heavy, heavyPf := normalRSModel(t, 100, 10, 800, 64) // beta -10.8: pf ~ 1
	over, overPf := normalRSModel(t, 100, 10, 110, 10)   // beta -0.71: pf 0.760
	curved, curvedPf := sumExpModel(t, 20, 40)           // FORM beta 4.93, true 3.57
	cases := []struct {
		name string
		m    *Model
		pf   float64
		n    int64
	}{
		{"member at 8x its capacity", heavy, heavyPf, 200_000},
		{"median member fails", over, overPf, 200_000},
		{"weights degenerate", curved, curvedPf, 400_000},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			r, err := Run(context.Background(), c.m, &Settings{Method: Importance, Samples: c.n, TargetCoV: 0.1, Seed: 7, AuxSamples: -1})
			if err != nil {
				t.Fatal(err)
			}
			t.Logf("pf %.4g %v (exact %.4g), %s: %s; %s", r.Pf, r.PfCI, c.pf, r.Method, r.Status, r.Reason)
			if r.Method != MonteCarlo || r.Reason == "" {
				t.Errorf("method %s (reason %q), want the fallback to monte-carlo", r.Method, r.Reason)
			}
			if !r.Status.Trusted() {
				t.Errorf("status %s (%s) after the fallback", r.Status, r.StatusReason)
			}
			if !(r.PfCI[0] <= c.pf && c.pf <= r.PfCI[1]) {
				t.Errorf("interval %v misses the exact pf %.5g", r.PfCI, c.pf)
			}
			if r.Evaluations > c.n+int64(r.FORM.Evaluations) {
				t.Errorf("%d evaluations, budget %d", r.Evaluations, c.n)
			}
		})
	}
}

func TestImportanceRefusesWithoutBudgetLeft(t *testing.T) {
	// The whole budget goes to importance sampling before the weights are
	// seen to degenerate: nothing is left for plain sampling, so the
	// result must say it cannot be trusted.
	m, _ := sumExpModel(t, 20, 40)
	r, err := Run(context.Background(), m, &Settings{Method: Importance, Samples: isEarlyCheck, Seed: 7, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	if r.Status != WeightsDegenerate || r.Status.Trusted() || r.StatusReason == "" {
		t.Errorf("status %s (%q), want weights-degenerate", r.Status, r.StatusReason)
	}
}

func TestStatusOfCrudeSampling(t *testing.T) {
	m, pf := normalRSModel(t, 100, 10, 50, 10) // beta 3.54, pf 2.0e-4
	cases := []struct {
		n         int64
		targetCoV float64
		want      Status
	}{
		{3000, 0, FewFailures},       // about 0.6 failures expected
		{200_000, 0.01, BudgetSpent}, // about 40 failures: CoV 0.16
		{2_000_000, 0.2, Converged},  // stops at CoV 0.2, 25 failures
		{20_000, 0.5, FewFailures},   // few failures outrank the CoV
	}
	for _, c := range cases {
		r, err := Run(context.Background(), m, &Settings{Method: MonteCarlo, Samples: c.n, TargetCoV: c.targetCoV, Seed: 1, AuxSamples: -1})
		if err != nil {
			t.Fatal(err)
		}
		if r.Status != c.want || !r.Status.Trusted() {
			t.Errorf("n %d: status %s (%s, %d failures, CoV %.3g), want %s (pf %.3g)", c.n, r.Status, r.StatusReason, r.Failures, r.PfCoV, c.want, pf)
		}
	}
}

func TestFORMNotConvergedIsNotTrusted(t *testing.T) {
	// A limit state the design-point search cannot settle on:
	// g undefined (NaN) beyond the median makes the search fail.
	r0, err := NewNormal(0, 1)
	if err != nil {
		t.Fatal(err)
	}
	m := &Model{Vars: []Variable{{Name: "a", Dist: r0}}, G: func(x, _ []float64) float64 {
		if x[0] > 0.5 {
			return math.NaN()
		}
		return 1 - x[0]
	}}
	r, err := Run(context.Background(), m, &Settings{Method: FORMMethod, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	if r.FORM.Converged || r.Status != DesignPointUnreliable || r.Status.Trusted() {
		t.Errorf("FORM converged %v (%s): status %s", r.FORM.Converged, r.FORM.Status, r.Status)
	}
}

// TestAssessKeepsTheMethodsReason: a method that flags its own result
// short of its target keeps its reason, and the reader gets it once as a
// warning, not twice in other words.
func TestAssessKeepsTheMethodsReason(t *testing.T) {
	r := &Result{Method: Importance, Pf: 1e-4, PfCoV: 0.2}
	r.flag(BudgetSpent, "the method's own words")
	assess(r, 0.05)
	if r.Status != BudgetSpent || r.StatusReason != "the method's own words" || len(r.Warnings) != 1 || r.Warnings[0] != r.StatusReason {
		t.Errorf("status %s (%q), warnings %q", r.Status, r.StatusReason, r.Warnings)
	}
	// A worse status found by assess replaces a milder one.
	r = &Result{Method: ConditionalQMC, Pf: 1e-4, PfCoV: 0.9}
	r.flag(BudgetSpent, "short of the target")
	assess(r, 0.05)
	if r.Status != Imprecise || r.Status.Trusted() {
		t.Errorf("CoV 0.9: status %s", r.Status)
	}
}
