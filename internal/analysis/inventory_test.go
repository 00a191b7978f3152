package analysis

import (
	"context"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/internal/report"
)

// loadInventory writes the study text with its members CSV next to it and
// loads it.
func loadInventory(t *testing.T, text, members string) *Loaded {
	t.Helper()
	p := writeStudy(t, text)
	if err := os.WriteFile(filepath.Join(filepath.Dir(p), "members.csv"), []byte(members), 0o644); err != nil {
		t.Fatal(err)
	}
	l, err := Load(p)
	if err != nil {
		t.Fatalf("load: %v", err)
	}
	return l
}

// lognormalBeta is the exact reliability index of lognormal R and S
// (Melchers & Beck, Structural Reliability Analysis and Prediction, 3rd
// ed., 2018, chapter 3; from memory), as in the comment of stocky.
func lognormalBeta(muR, vR, muS, vS float64) float64 {
	a, b := 1+vR*vR, 1+vS*vS
	return math.Log(muR/muS*math.Sqrt(b/a)) / math.Sqrt(math.Log(a*b))
}

// TestInventoryIndependentMembers runs three stocky members that differ
// in their mean load and share nothing: each member's pf must hold the
// closed form of lognormal R and S in its interval, and the members come
// sorted by beta, lowest first.
func TestInventoryIndependentMembers(t *testing.T) {
	text := stocky + "[inventory]\nfile = \"members.csv\"\n"
	members := "name, loads.axial.mean (kN)\nA, 1500\nB, 1800\nC, 1300\n"
	l := loadInventory(t, text, members)
	l.Study.Sensitivity.Tornado, l.Study.Sensitivity.Sobol = false, false
	s := l.Settings(2)
	r, err := Run(context.Background(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	d := r.Document()
	if d.Inventory == nil || len(d.Inventory.Members) != 3 {
		t.Fatalf("inventory = %+v, want 3 members", d.Inventory)
	}
	muR := 100 * 100 * 300.0
	vR := math.Sqrt((1+0.1*0.1)*(1+0.05*0.05) - 1)
	mean := map[string]float64{"A": 1500e3, "B": 1800e3, "C": 1300e3}
	want := []string{"B", "A", "C"} // beta rises as the mean load falls
	for i, m := range d.Inventory.Members {
		if m.Name != want[i] {
			t.Errorf("member %d is %s, want %s (sorted by beta)", i, m.Name, want[i])
		}
		pf := distuv.UnitNormal.CDF(-lognormalBeta(muR, vR, mean[m.Name], 0.20))
		// The 95 % interval widened to four standard errors: a 95 %
		// interval misses one member in twenty.
		half := (m.PfCI[1] - m.PfCI[0]) / 2 * 4 / 1.96
		if math.Abs(m.Pf-pf) > half {
			t.Errorf("member %s: pf %.4g, interval [%.4g, %.4g], is more than four standard errors from the closed form %.4g", m.Name, m.Pf, m.PfCI[0], m.PfCI[1], pf)
		}
		if m.Verdict != "not met" || m.GoverningAxis == "" || m.Mode == "" || m.ReserveFactor == nil {
			t.Errorf("member %s: verdict %q, axis %q, mode %q, reserve %v", m.Name, m.Verdict, m.GoverningAxis, m.Mode, m.ReserveFactor)
		}
	}
}

// TestInventoryMemberSeed checks that a member's seed depends on the
// seed and the member's index only, and differs between members.
func TestInventoryMemberSeed(t *testing.T) {
	seen := map[uint64]bool{}
	for i := 0; i < 1000; i++ {
		s := MemberSeed(7, i)
		if seen[s] || s != MemberSeed(7, i) {
			t.Fatalf("member %d: seed %d repeats", i, s)
		}
		seen[s] = true
	}
	if MemberSeed(7, 0) == MemberSeed(8, 0) {
		t.Error("two seeds give member 0 the same stream")
	}
}

// TestInventoryCSV checks inventory.csv: a row a member in the order of
// the document, with the member's cells.
func TestInventoryCSV(t *testing.T) {
	text := stocky + "[inventory]\nfile = \"members.csv\"\n"
	l := loadInventory(t, text, "name, loads.axial.mean (kN)\nA, 1500\nB, 1800\n")
	l.Study.Sensitivity.Tornado, l.Study.Sensitivity.Sobol = false, false
	s := l.Settings(1)
	r, err := Run(context.Background(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	files, err := report.Files(r.Bundle(), []string{"json"})
	if err != nil {
		t.Fatal(err)
	}
	for _, f := range files {
		if f.Name != "inventory.csv" {
			continue
		}
		lines := strings.Split(strings.TrimSpace(string(f.Data)), "\n")
		if len(lines) != 3 || !strings.HasPrefix(lines[1], "B,") || !strings.HasSuffix(lines[0], "loads.axial.mean") {
			t.Errorf("inventory.csv:\n%s", f.Data)
		}
		return
	}
	t.Error("no inventory.csv")
}
