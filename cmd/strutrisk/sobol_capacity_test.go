package main

import (
	"encoding/json"
	"strings"
	"testing"

	"strutrisk/internal/report"
)

// loadFree is a slender strut (minor-axis L/r = 2000/(50/sqrt 12) = 139)
// whose capacity depends on the yield and the modulus, and whose demand
// is two random loads that do not act on the capacity.
const loadFree = `title = "capacity without the loads"
[member]
length = 2000
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = 100
width = 50
[material]
modulus = { dist = "normal", mean = 200000, cov = 0.08 }
yield = { dist = "lognormal", mean = 250, cov = 0.1 }
[imperfection]
bow = 2
[loads]
dead = { dist = "normal", mean = "60 kN", cov = 0.1 }
imposed = { dist = "gumbel", mean = "40 kN", cov = 0.3 }
[analysis]
seed = 3
[sensitivity]
sobol = { samples = 2000 }
`

// TestRunSobolCapacity: the Sobol indices of a quantity with respect to an
// input it does not depend on are zero, both first-order and total, since
// E[Y | X_i] and the variance of Y given all but X_i are constant in X_i
// (Sobol', Mathematics and Computers in Simulation 55, 2001, 271-280,
// definitions of S_i and S_Ti; from memory). The capacity depends on yield
// and modulus only; the margin depends on the loads too.
func TestRunSobolCapacity(t *testing.T) {
	code, out, errs := invoke(t, "run", writeStudy(t, loadFree), "--json", "--out", t.TempDir(), "--method", "form")
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	if !strings.Contains(out, `"sobol_capacity"`) {
		t.Fatalf("no sobol_capacity in the document:\n%s", out)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatal(err)
	}
	byName := func(rows []report.Sobol) map[string]report.Sobol {
		m := map[string]report.Sobol{}
		for _, r := range rows {
			m[r.Variable] = r
		}
		return m
	}
	capIdx, margin := byName(d.SobolCapacity), byName(d.Sobol)
	for _, name := range []string{"loads.dead", "loads.imposed"} {
		s, ok := capIdx[name]
		if !ok {
			t.Errorf("%s missing from sobol_capacity", name)
			continue
		}
		for _, c := range []struct {
			what string
			v    float64
			ci   [2]float64
		}{{"first", s.First, s.FirstCI}, {"total", s.Total, s.TotalCI}} {
			if !(c.ci[0] <= 0 && 0 <= c.ci[1]) || c.v < -0.01 || c.v > 0.01 {
				t.Errorf("capacity %s index of %s = %.4f, interval [%.4f, %.4f]; want ~0 inside it", c.what, name, c.v, c.ci[0], c.ci[1])
			}
		}
		// The loads do act on the margin.
		if m := margin[name]; !(m.Total > 0.01) {
			t.Errorf("margin total index of %s = %.4f, want clearly above 0", name, m.Total)
		}
	}
	for _, name := range []string{"material.yield", "material.modulus"} {
		if s := capIdx[name]; !(s.Total > 0.05 && s.TotalCI[0] > 0) {
			t.Errorf("capacity total index of %s = %.4f, interval %v; want clearly above 0", name, s.Total, s.TotalCI)
		}
	}
}
