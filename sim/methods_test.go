package sim

import (
	"context"
	"strings"
	"testing"
)

func TestParseMethod(t *testing.T) {
	for _, m := range Methods() {
		got, err := ParseMethod(string(m))
		if err != nil || got != m {
			t.Errorf("ParseMethod(%q) = %q, %v", m, got, err)
		}
	}
	for _, s := range []string{"", "Auto", "montecarlo", "sorm"} {
		if _, err := ParseMethod(s); err == nil || !strings.Contains(err.Error(), "monte-carlo") {
			t.Errorf("ParseMethod(%q): error %v, want one listing the methods", s, err)
		}
	}
}

// TestRunKnowsEveryMethod checks that Run accepts each listed method (none
// is refused as unknown) and refuses a name that is not listed.
func TestRunKnowsEveryMethod(t *testing.T) {
	m := &Model{Vars: []Variable{{Name: "r", Dist: mustDist(NewNormal(3, 1))}},
		G: func(x, _ []float64) float64 { return x[0] }}
	for _, meth := range Methods() {
		_, err := Run(context.Background(), m, &Settings{Method: meth, Samples: 4000, Workers: 1, AuxSamples: -1})
		if err != nil && strings.Contains(err.Error(), "unknown method") {
			t.Errorf("Run refuses listed method %q: %v", meth, err)
		}
	}
	if _, err := Run(context.Background(), m, &Settings{Method: "nope"}); err == nil || !strings.Contains(err.Error(), "unknown method") {
		t.Errorf("Run with an unlisted method: %v", err)
	}
	if got := MethodNames(); len(got) != len(Methods()) || got[0] != "auto" {
		t.Errorf("MethodNames() = %v", got)
	}
}
