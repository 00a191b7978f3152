package sim

import (
	"context"
	"math"
	"strings"
	"testing"
)

// spikeModel is g = R - S with R lognormal (mean 100, sd 10) and the
// linear input S normal (mean 50, sd sdS): with sdS = 6 the failures lie
// about 4.9 standard deviations out (pf = P(R < S) about 5e-7, the
// one-dimensional integral of F_R against the density of S), where the
// conditional integrand P(S > R) is a narrow spike in the low tail of R.
func spikeModel(sdS float64) *Model {
	r := mustDist(NewLognormal(100, 10))
	s := mustDist(NewNormal(50, sdS))
	return &Model{
		Vars: []Variable{{Name: "R", Dist: r}, {Name: "S", Dist: s}},
		G:    func(x, _ []float64) float64 { return x[0] - x[1] },
		Linear: &Linear{Index: 1, Split: func(x []float64) (float64, float64) {
			return x[0], 1
		}},
	}
}

// TestConditionalRoughIsNotTrusted: conditional quasi-Monte Carlo that
// ends its whole budget more than twice the target CoV (here about 0.48
// with a target of 0.05, below the 0.5 of MaxTrustedCoV) is an order of
// magnitude and must not be trusted, so that no verdict is drawn from it.
// Before the rule such an estimate was budget-spent, trusted, and its
// beta interval (4.6 to +Inf) gave a verdict.
func TestConditionalRoughIsNotTrusted(t *testing.T) {
	t.Parallel()
	res, err := Run(context.Background(), spikeModel(6), &Settings{Method: ConditionalQMC, Samples: 16 * 4096, TargetCoV: 0.05, Seed: 1, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	if !(res.PfCoV > 0.1 && res.PfCoV <= MaxTrustedCoV) {
		t.Fatalf("CoV %v: the case no longer tests the gap between twice the target and %v", res.PfCoV, MaxTrustedCoV)
	}
	if res.Status != Imprecise || res.Status.Trusted() || !strings.Contains(res.StatusReason, "order of magnitude") {
		t.Errorf("CoV %.2g: status %s (%q), want imprecise", res.PfCoV, res.Status, res.StatusReason)
	}
	// Within twice the target the estimate stands (budget spent, trusted).
	ok, err := Run(context.Background(), spikeModel(6), &Settings{Method: ConditionalQMC, Samples: 16 * 4096, TargetCoV: 0.3, Seed: 1, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	if ok.Status != BudgetSpent {
		t.Errorf("CoV %.2g against target 0.3: status %s, want budget-spent", ok.PfCoV, ok.Status)
	}
}

// TestAutoConditionalRoughIsNotTrusted: auto keeps a conditional estimate
// more than twice its target CoV only when importance sampling cannot do
// better (here FORM found no design point, or the design point given is
// on the safe side, where no importance sample fails); it must then say
// the estimate is not trusted, not only warn that pf is an order of
// magnitude.
func TestAutoConditionalRoughIsNotTrusted(t *testing.T) {
	t.Parallel()
	m := spikeModel(6)
	tr, err := NewTransform(m)
	if err != nil {
		t.Fatal(err)
	}
	s := (&Settings{Samples: 16 * 4096, TargetCoV: 0.05, Seed: 1, AuxSamples: -1}).withDefaults()
	safe := DesignPoint{Beta: 5 * math.Sqrt2, U: []float64{5, -5}, Alpha: []float64{-math.Sqrt2 / 2, math.Sqrt2 / 2}, Importance: []float64{0.5, 0.5}}
	safe.X = []float64{m.Vars[0].Dist.FromStdNormal(5), m.Vars[1].Dist.FromStdNormal(-5)}
	for _, c := range []struct {
		name string
		a    *autoRun
	}{
		{"no FORM", &autoRun{ctx: context.Background(), m: m, t: tr, s: &s, target: 0.05, formNote: "FORM failed"}},
		{"useless design point", &autoRun{ctx: context.Background(), m: m, t: tr, s: &s, target: 0.05, formOK: true, formNote: "FORM beta = 7.07",
			f: &FORMResult{Beta: safe.Beta, Pf: stdCDF(-safe.Beta), Points: []DesignPoint{safe}, Converged: true}}},
	} {
		res, err := c.a.conditional()
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if res.Method != ConditionalQMC || res.Status.Trusted() || !strings.Contains(res.StatusReason, "order of magnitude") {
			t.Errorf("%s: method %s, CoV %.2g, status %s (%q): want conditional-qmc not trusted", c.name, res.Method, res.PfCoV, res.Status, res.StatusReason)
		}
	}
}

// TestConditionalZeroIsNotTrusted: a conditional estimate of exactly zero
// (every point's conditional probability underflows or the linear input
// is bounded) has an interval [0, 0] that bounds nothing; it must not be
// trusted (it used to be budget-spent, and its beta interval of +Inf a
// verdict "met").
func TestConditionalZeroIsNotTrusted(t *testing.T) {
	r := &Result{Method: ConditionalQMC, Pf: 0, PfCoV: math.Inf(1)}
	assess(r, 0.05)
	if r.Status.Trusted() {
		t.Errorf("pf 0: status %s (%q)", r.Status, r.StatusReason)
	}
}
