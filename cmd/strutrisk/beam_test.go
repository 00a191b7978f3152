package main

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
)

// beamGood is fixture.BeamGood.
var beamGood = fixture.BeamGood

// TestCheckBeamColumnFirstYield: for a pinned member with a half-sine bow
// the elastic beam-column at first yield is the Perry-Robertson load
// (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., 1961, §1.11,
// initially curved bars; from memory), so check gives both models the
// same nominal capacity to 1e-4.
func TestCheckBeamColumnFirstYield(t *testing.T) {
	pr, _ := ctCheckJSON(t, good)
	bc, _ := ctCheckJSON(t, beamGood)
	if pr.Nominal == nil || bc.Nominal == nil {
		t.Fatal("no nominal capacity")
	}
	if got, want := bc.Nominal.Capacity, pr.Nominal.Capacity; math.Abs(got-want) > 1e-4*want {
		t.Errorf("beam-column first yield %.6g N, Perry-Robertson %.6g N (relative difference %.2g)", got, want, math.Abs(got-want)/want)
	}
}

// TestRunBeamColumn runs the numerical beam-column with FORM and checks
// that the report draws its load-deflection path at the design point.
// (The ultimate limit takes seconds here for its auxiliary sample; the
// column package checks its path.)
func TestRunBeamColumn(t *testing.T) {
	for _, limit := range []string{"first-yield"} {
		t.Run(limit, func(t *testing.T) {
			s := strings.Replace(beamGood, "first-yield", limit, 1) + "[sensitivity]\ntornado = false\n"
			dir := t.TempDir()
			code, out, errs := invoke(t, "run", writeStudy(t, s), "--method", "form", "--out", dir)
			if code != 0 {
				t.Fatalf("exit %d\n%s", code, errs)
			}
			if !strings.Contains(out, "reliability beta") {
				t.Errorf("summary:\n%s", out)
			}
			if _, err := os.Stat(filepath.Join(dir, "beam-column.png")); err != nil {
				t.Errorf("no picture of the beam-column trace: %v", err)
			}
		})
	}
}
