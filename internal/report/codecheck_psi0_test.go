package report

import (
	"strings"
	"testing"
)

// TestCodeCheckPsi0ByLoad: the code check's sentence in the summaries and
// its rows give each load's own combination factor when code_check.psi_0
// names it (EN 1990 Table A1.1, from memory: storage 1.0, snow 0.5 below
// 1000 m), not the one factor of the others alone.
func TestCodeCheckPsi0ByLoad(t *testing.T) {
	t.Parallel()
	for _, tc := range []struct {
		loads map[string]float64
		want  string
	}{
		{nil, "psi_0 0.7)"},
		{map[string]float64{"loads.stock": 1, "loads.snow": 0.5}, "psi_0 of loads.snow 0.5, loads.stock 1, of the other loads 0.7)"},
	} {
		c := &CodeCheck{Utilisation: 0.9, DesignLoad: 915.6e3, Resistance: 1017e3, GammaM0: 1, GammaM1: 1, GammaG: 1.35, GammaQ: 1.5, Psi0: 0.7, Psi0Loads: tc.loads}
		if line := CodeCheckLine(c); !strings.Contains(line, tc.want) {
			t.Errorf("summary line %q, want %q in it", line, tc.want)
		}
		want := strings.TrimSuffix(tc.want, ")")
		found := false
		for _, r := range CodeCheckRows(c) {
			if r.Key == "load factors" {
				found = strings.HasSuffix(r.Value, want)
				if !found {
					t.Errorf("load factors %q, want it to end %q", r.Value, want)
				}
			}
		}
		if !found && !t.Failed() {
			t.Error("no load factors row")
		}
	}
}
