package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// cheapInventory writes the inventory demo (studies/building-inventory
// .toml and its CSV) into a fresh folder, sampled by Monte Carlo with a
// budget of samples, which its joint sample takes too (blocks of 1000),
// its text then changed by edit when not nil, and returns the study's
// path. For tests of what the command does with an inventory, not of the
// demo's numbers (TestDemoGolden runs the demo as it stands).
func cheapInventory(t *testing.T, samples string, edit func(string) string) string {
	t.Helper()
	text, err := os.ReadFile("../../studies/building-inventory.toml")
	if err != nil {
		t.Fatal(err)
	}
	s := strings.Replace(string(text), "samples    = 1_000_000", "samples    = "+samples, 1)
	s = strings.Replace(s, `method     = "auto"`, `method     = "monte-carlo"`, 1)
	if !strings.Contains(s, "samples    = "+samples+"\n") || !strings.Contains(s, `method     = "monte-carlo"`) {
		t.Fatal("the demo's [analysis] lines moved: update the test")
	}
	csv, err := os.ReadFile("../../studies/building-inventory.csv")
	if err != nil {
		t.Fatal(err)
	}
	if edit != nil {
		s = edit(s)
	}
	study := writeStudy(t, s)
	if err := os.WriteFile(filepath.Join(filepath.Dir(study), "building-inventory.csv"), csv, 0o644); err != nil {
		t.Fatal(err)
	}
	return study
}
