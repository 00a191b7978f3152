package analysis

import (
	"strings"
	"testing"

	"strutrisk/internal/report"
	"strutrisk/sim"
)

// TestDesignValuesNotConverged: a design point FORM did not converge to
// gives no design values, and the document says why.
func TestDesignValuesNotConverged(t *testing.T) {
	l := mustLoad(t, stocky)
	n := len(l.Model.Sim.Vars)
	p := sim.DesignPoint{Beta: 3, U: make([]float64, n), X: l.Model.Medians(), Alpha: make([]float64, n), Importance: make([]float64, n)}
	p.Alpha[0] = 1
	for _, converged := range []bool{false, true} {
		r := &Result{l: l, form: &sim.FORMResult{Beta: 3, Points: []sim.DesignPoint{p}, Converged: converged}}
		ff := &report.FORM{}
		r.fillDesign(ff)
		if got := len(ff.DesignValues) > 0; got != converged {
			t.Errorf("converged %v: design values given %v", converged, got)
		}
		if !converged && !strings.Contains(ff.DesignNote, "did not converge") {
			t.Errorf("no note on the missing design values: %q", ff.DesignNote)
		}
	}
}
