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

// TestDesignRolesOfLoads: with two variable loads combined by Turkstra's
// rule, a load and its companion are actions (EN 1990:2002 1.5.3.1, an
// action is a force applied to the structure; from memory) even where
// the design point gives them alpha = 0, as the load that does not enter
// the governing case has; the resistance side keeps its role by alpha.
func TestDesignRolesOfLoads(t *testing.T) {
	l := mustLoad(t, twoLoadsStudy[:strings.Index(twoLoadsStudy, "[inventory]")])
	vars := l.Model.Sim.Vars
	p := sim.DesignPoint{Alpha: make([]float64, len(vars))}
	loads := 0
	for i, v := range vars {
		if v.Name == "material.yield" {
			p.Alpha[i] = 1
		}
	}
	dv, err := l.Model.DesignValues(p, 3.8)
	if err != nil {
		t.Fatal(err)
	}
	for _, d := range dv {
		want := "resistance"
		if strings.HasPrefix(d.Name, "loads.") {
			want = "action"
			loads++
		}
		if (d.Name == "material.yield" || want == "action") && d.Role != want {
			t.Errorf("%s: role %q, want %q", d.Name, d.Role, want)
		}
	}
	if loads < 5 { // dead, stock, snow and the two companions
		t.Errorf("%d load variables, want the dead load, two variable loads and their companions", loads)
	}
}
