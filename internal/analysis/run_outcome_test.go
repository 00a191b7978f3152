package analysis

import (
	"context"
	"strings"
	"testing"

	"strutrisk/internal/report"
	"strutrisk/sim"
)

// RunSettings gives the overrides over the study's [analysis] settings,
// a zero override keeping the study's and a seed of 0 counting as given,
// and refuses a study with nothing uncertain, saying what to do.
func TestRunSettings(t *testing.T) {
	l := mustLoad(t, stocky) // samples 2_000_000, seed 7
	s, _, err := l.RunSettings(Overrides{})
	if err != nil || s.Samples != 2_000_000 || s.Seed != 7 {
		t.Fatalf("no overrides: samples %d, seed %d, %v; want the study's 2e6 and 7", s.Samples, s.Seed, err)
	}
	zero := uint64(0)
	s, _, err = l.RunSettings(Overrides{Method: sim.LatinHypercube, Samples: 5000, Seed: &zero, Workers: 3})
	if err != nil || s.Method != sim.LatinHypercube || s.Samples != 5000 || s.Seed != 0 || s.Workers != 3 {
		t.Errorf("overrides: %+v, %v; want latin-hypercube, 5000, seed 0, 3 workers", s, err)
	}
	fixed := strings.ReplaceAll(strings.ReplaceAll(strings.ReplaceAll(good,
		`{ dist = "lognormal", mean = 250, cov = 0.1 }`, "250"),
		`{ dist = "normal", mean = "100 kN", cov = 0.1 }`, `"100 kN"`),
		`{ dist = "gumbel", mean = "80 kN", cov = 0.3 }`, `"80 kN"`)
	_, _, err = mustLoad(t, fixed).RunSettings(Overrides{})
	if err == nil || !strings.Contains(err.Error(), "nothing in the study is uncertain") {
		t.Errorf("a study with no distribution: error %v, want it refused", err)
	}
}

// MarkInterrupted says why a run is not complete, naming the signal and
// the step, and leaves a complete run as it is.
func TestMarkInterrupted(t *testing.T) {
	cancelled, cancel := context.WithCancel(context.Background())
	cancel()
	for _, c := range []struct {
		name       string
		incomplete bool
		ctx        context.Context
		phase      string
		want       string
	}{
		{"complete", false, context.Background(), "", ""},
		{"main run cut", true, cancelled, "main run", "interrupted by SIGTERM after 1234 evaluations of the main run"},
		{"during a step", false, cancelled, "Sobol indices", "interrupted by SIGTERM during Sobol indices: the main estimate is complete"},
		{"between steps", false, cancelled, "", "during the steps after the main run"},
	} {
		r := &Result{Estimate: &sim.Result{Incomplete: c.incomplete, Evaluations: 1234}}
		got := r.MarkInterrupted(c.ctx, "SIGTERM", c.phase)
		if got != r.Incomplete || (c.want == "") != (got == "") || !strings.Contains(got, c.want) {
			t.Errorf("%s: %q (Incomplete %q), want it to hold %q", c.name, got, r.Incomplete, c.want)
		}
	}
}

// TargetShortfall: a met target gives nothing; not met, undecided (with
// the reason of an untrusted estimate) and no target at all each say why.
func TestTargetShortfall(t *testing.T) {
	yes, no, beta := true, false, 3.8
	for _, c := range []struct {
		name   string
		doc    report.Document
		status sim.Status
		want   string
	}{
		{"met", report.Document{TargetBeta: &beta, MeetsTarget: &yes}, sim.Converged, ""},
		{"not met", report.Document{TargetBeta: &beta, MeetsTarget: &no}, sim.Converged, "3.80 is not met"},
		{"undecided", report.Document{TargetBeta: &beta, Target: &report.TargetCheck{Reason: "straddles"}}, sim.BudgetSpent, "not shown to be met: undecided at this sample size"},
		{"untrusted", report.Document{TargetBeta: &beta, Target: &report.TargetCheck{Reason: "weights degenerate"}}, sim.WeightsDegenerate, "not shown to be met: undecided: weights degenerate"},
		{"no target", report.Document{}, sim.Converged, "no [target] beta"},
	} {
		r := &Result{Estimate: &sim.Result{Status: c.status}}
		got := r.TargetShortfall(&c.doc)
		if (c.want == "") != (got == "") || !strings.Contains(got, c.want) {
			t.Errorf("%s: %q, want it to hold %q", c.name, got, c.want)
		}
	}
}
