package analysis

import (
	"context"
	"testing"
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
