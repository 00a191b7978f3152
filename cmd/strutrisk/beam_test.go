package main

import (
	"io"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/sim"
)

// beamGood is the good study on the numerical beam-column at first yield.
var beamGood = good + "[capacity]\nmodel = \"beam-column\"\nlimit = \"first-yield\"\n"

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

// TestBeamTimeNote checks the warning of a long beam-column run: it names
// the expected time and the quicker methods, and stays quiet for FORM,
// for small budgets and for the closed forms.
func TestBeamTimeNote(t *testing.T) {
	l, code := load(writeStudy(t, strings.Replace(beamGood, "first-yield", "ultimate", 1)), io.Discard)
	if code != exitOK {
		t.Fatal("load failed")
	}
	s := sim.Settings{Method: sim.MonteCarlo, Samples: 1e9, Workers: 2}
	note := beamTimeNote(l, &s)
	for _, want := range []string{"one evaluation takes about", "1000000000 samples on 2 workers", "--method form", "--method subset"} {
		if !strings.Contains(note, want) {
			t.Errorf("note %q lacks %q", note, want)
		}
	}
	s.Method = sim.FORMMethod
	if n := beamTimeNote(l, &s); n != "" {
		t.Errorf("FORM: note %q", n)
	}
	s = sim.Settings{Method: sim.MonteCarlo, Samples: 10, Workers: 2}
	if n := beamTimeNote(l, &s); n != "" {
		t.Errorf("10 samples: note %q", n)
	}
	pr, _ := load(writeStudy(t, good), io.Discard)
	s.Samples = 1e10
	if n := beamTimeNote(pr, &s); n != "" {
		t.Errorf("perry-robertson: note %q", n)
	}
}
