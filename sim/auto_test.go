package sim

import (
	"context"
	"fmt"
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

// TestAutoLeavesImpreciseConditionalQMC checks that auto does not settle
// for a conditional quasi-Monte Carlo estimate far short of its target CoV:
// far in the tail, with several inputs beside the linear one, it tries
// importance sampling and keeps the more precise estimate. R is a product of
// lognormals, so ln R - ln S is normal and beta is exact (the lognormal
// closed form of the R-S benchmark family).
func TestAutoLeavesImpreciseConditionalQMC(t *testing.T) {
	t.Parallel()
	const k = 8
	m := &Model{}
	meanLog, varLog := 0.0, 0.0
	add := func(name string, mean, cov float64) {
		m.Vars = append(m.Vars, Variable{Name: name, Dist: mustDist(NewLognormal(mean, cov*mean))})
		s2 := math.Log1p(cov * cov)
		meanLog += math.Log(mean) - s2/2
		varLog += s2
	}
	add("r", 500, 0.08)
	for i := range k {
		add(fmt.Sprintf("theta%d", i), 1, 0.08)
	}
	lnR, vR := meanLog, varLog
	meanLog, varLog = 0, 0
	add("S", 100, 0.15)
	beta := (lnR - meanLog) / math.Sqrt(vR+varLog)
	r := func(x []float64) float64 {
		p := x[0]
		for _, v := range x[1 : k+1] {
			p *= v
		}
		return p
	}
	m.G = func(x, out []float64) float64 { return r(x) - x[k+1] }
	m.Linear = &Linear{Index: k + 1, Split: func(x []float64) (float64, float64) { return r(x), 1 }}
	res, err := Run(context.Background(), m, &Settings{Samples: 100_000, Seed: 3, TargetCoV: 0.05})
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("exact beta %.4f: %v, beta %.4f, CoV %.3g; %s", beta, res.Method, res.Beta, res.PfCoV, res.Reason)
	if res.PfCoV > 0.1 {
		t.Errorf("auto returned CoV %.3g, target 0.05 (method %v)", res.PfCoV, res.Method)
	}
	if math.Abs(res.Beta-beta) > 0.05 {
		t.Errorf("beta %v, exact %v", res.Beta, beta)
	}
}

// TestAutoPrefersImportanceForLongCrudeRuns checks that auto does not spend
// millions of plain Monte Carlo samples when importance sampling gets there
// in thousands: lognormal R/S with beta about 3.5 (pf about 2e-4, exact by
// the lognormal closed form) at CoV 0.025 needs about 7e6 crude samples,
// within the budget of 1e7 but above auto's limit for plain sampling.
func TestAutoPrefersImportanceForLongCrudeRuns(t *testing.T) {
	t.Parallel()
	m, beta := lnRS(214, 0.10, 100, 0.20)
	res, err := Run(context.Background(), m, &Settings{Samples: 10_000_000, Seed: 4, TargetCoV: 0.025})
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("exact beta %.4f: %v, beta %.4f, %d evaluations; %s", beta, res.Method, res.Beta, res.Evaluations, res.Reason)
	if res.Method != Importance || res.Evaluations > 1_000_000 {
		t.Errorf("auto used %v with %d evaluations, want importance sampling", res.Method, res.Evaluations)
	}
	if math.Abs(res.Beta-beta) > 0.05 {
		t.Errorf("beta %v, exact %v", res.Beta, beta)
	}
}

// TestAutoCrudeLimit checks Settings.AutoCrudeLimit: lognormal R/S with
// beta about 2.46 (pf about 7e-3, exact by the lognormal closed form) at
// CoV 0.05 needs about 5.7e4 crude samples, which auto spends by default;
// with a limit of 25,000 it samples around the design point instead, and
// its pf holds the exact one in its interval.
func TestAutoCrudeLimit(t *testing.T) {
	t.Parallel()
	m, beta := lnRS(170, 0.10, 100, 0.20)
	want := math.Erfc(beta/math.Sqrt2) / 2
	for _, c := range []struct {
		limit  int64
		method Method
	}{{0, MonteCarlo}, {25_000, Importance}} {
		res, err := Run(context.Background(), m, &Settings{Samples: 1_000_000, Seed: 5, TargetCoV: 0.05, AutoCrudeLimit: c.limit})
		if err != nil {
			t.Fatal(err)
		}
		t.Logf("limit %d, exact pf %.4g: %v, pf %.4g, %d evaluations; %s", c.limit, want, res.Method, res.Pf, res.Evaluations, res.Reason)
		if res.Method != c.method {
			t.Errorf("limit %d: auto used %v, want %v", c.limit, res.Method, c.method)
		}
		if !(res.PfCI[0] <= want && want <= res.PfCI[1]) {
			t.Errorf("limit %d: pf interval %v misses the exact %v", c.limit, res.PfCI, want)
		}
	}
}
