package analysis

import (
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestBeamTimeNote checks the warning of a long beam-column run: it names
// the expected time and the quicker methods, and stays quiet for FORM,
// for small budgets and for the closed forms.
func TestBeamTimeNote(t *testing.T) {
	l := mustLoad(t, strings.Replace(beamGood, "first-yield", "ultimate", 1))
	s := sim.Settings{Method: sim.MonteCarlo, Samples: 1e9, Workers: 2}
	note := BeamTimeNote(l, &s)
	for _, want := range []string{"one evaluation takes about", "1000000000 samples on 2 workers", "--method form", "--method subset"} {
		if !strings.Contains(note, want) {
			t.Errorf("note %q lacks %q", note, want)
		}
	}
	s.Method = sim.FORMMethod
	if n := BeamTimeNote(l, &s); n != "" {
		t.Errorf("FORM: note %q", n)
	}
	s = sim.Settings{Method: sim.MonteCarlo, Samples: 10, Workers: 2}
	if n := BeamTimeNote(l, &s); n != "" {
		t.Errorf("10 samples: note %q", n)
	}
	pr := mustLoad(t, good)
	s.Samples = 1e10
	if n := BeamTimeNote(pr, &s); n != "" {
		t.Errorf("perry-robertson: note %q", n)
	}
}
