package analysis

import (
	"context"
	"strings"
	"testing"

	"strutrisk/internal/report"
	"strutrisk/sim"
)

// TestInventorySystemTakesRunBudget checks that the joint sample of an
// inventory's system takes the run's budget (--samples over the study's
// analysis.samples), as the members do, not the study's own: the study
// asks for 2,000,000 samples and a CoV of 0.01 that 20,000 samples of
// these members cannot reach, the run gives 20,000.
func TestInventorySystemTakesRunBudget(t *testing.T) {
	text := stocky + "[inventory]\nfile = \"members.csv\"\n"
	l := loadInventory(t, text, "name, loads.axial.mean (kN)\nA, 1700\nB, 1800\n")
	l.Study.Sensitivity.Tornado, l.Study.Sensitivity.Sobol = false, false
	l.Study.Analysis.TargetCoV = 0.01
	seed := uint64(3)
	s, _, err := l.RunSettings(Overrides{Samples: 20_000, Seed: &seed, Workers: 2})
	if err != nil {
		t.Fatal(err)
	}
	r, err := Run(context.Background(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	sys := r.Document().Inventory.System
	if sys == nil {
		t.Fatal("no system")
	}
	if sys.Samples != 20_000 || sys.Status != "budget reached" {
		t.Errorf("system: %d joint samples, status %q; want the run's 20000 and %q", sys.Samples, sys.Status, "budget reached")
	}
}

// TestInventoryTargetShortfall checks that --require-target's shortfall
// of a study that meets its target names the inventory's members that do
// not (the study is a typical member, not the building), and that every
// member meeting it leaves nothing to say.
func TestInventoryTargetShortfall(t *testing.T) {
	tb, met := 3.8, true
	doc := &report.Document{TargetBeta: &tb, MeetsTarget: &met, Inventory: &report.Inventory{Members: []report.Member{
		{Name: "F1-C3", Verdict: "not met", Status: "converged"},
		{Name: "G-C3", Verdict: "undecided", Status: "converged"},
		{Name: "G-B2", Verdict: "met", Status: "converged"},
	}}}
	r := &Result{Estimate: &sim.Result{Status: sim.Converged}}
	why := r.TargetShortfall(doc)
	if !strings.Contains(why, "not shown to be met by every member") || !strings.Contains(why, "NOT met by 1 of 3 members (F1-C3); undecided for 1 (G-C3)") {
		t.Errorf("shortfall %q, want the members named", why)
	}
	doc.Inventory.Members = doc.Inventory.Members[2:]
	if why := r.TargetShortfall(doc); why != "" {
		t.Errorf("every member meets the target, yet the shortfall is %q", why)
	}
}
