package analysis

import (
	"context"
	"encoding/csv"
	"math"
	"strings"
	"testing"

	"strutrisk/internal/report"
)

// invCodeStudy is a solid square column, 100 x 100 mm, fixed yield 275
// MPa, E 210 GPa, buckling curve c, a fixed dead load of 600 kN and an
// imposed load whose characteristic value the code check takes as 350
// kN; gamma_M0 1.1 so that a stocky member's cross-section governs. The
// inventory sets the length.
const invCodeStudy = `
title = "inventory code check"
[member]
length = "2 m"
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = "100 mm"
width = "100 mm"
[material]
modulus = "210 GPa"
yield = "275 MPa"
[capacity]
model = "curve"
curve = "c"
[loads]
dead = "600 kN"
imposed = { dist = "normal", mean = "300 kN", cov = 0.2 }
[code_check]
gamma_m0 = 1.1
characteristic = { "loads.imposed" = "350 kN" }
[analysis]
method = "form"
samples = 10_000
seed = 5
[sensitivity]
tornado = false
sobol = false
[inventory]
file = "members.csv"
`

// TestInventoryCodeCheckColumns runs an inventory of a long and a stocky
// member and checks each member's code check in the result document and
// in inventory.csv against a hand computation of EN 1993-1-1.
func TestInventoryCodeCheckColumns(t *testing.T) {
	l := loadInventory(t, invCodeStudy, "name, member.length (mm)\nlong, 3000\nstocky, 500\n")
	s := l.Settings(2)
	r, err := Run(context.Background(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	// Hand computation. N_Ed = 1.35 x 600 + 1.5 x 350 = 1335 kN (EN 1990
	// 6.10, Table A1.2(B) factors; the imposed load leads).
	// long, EN 1993-1-1 6.3.1: I = 100^4/12 mm4, N_cr = pi^2 E I / L^2 =
	// 1919.09 kN, lambda = sqrt(A fy / N_cr) = 1.19707 (6.3.1.2 (6.50)),
	// curve c alpha 0.49 (Table 6.1), Phi = 0.5 (1 + 0.49 (lambda - 0.2)
	// + lambda^2) = 1.46077, chi = 1 / (Phi + sqrt(Phi^2 - lambda^2)) =
	// 0.435171 (6.49), N_b,Rd = chi A fy / gamma_M1 = 1196.72 kN (6.47,
	// gamma_M1 1.0) below N_c,Rd = A fy / gamma_M0 = 2500 kN (6.10):
	// utilisation 1335 / 1196.72 = 1.11555, not satisfied.
	// stocky: L = 500 mm, lambda = 0.19951 <= 0.2, chi = 1, N_b,Rd = 2750
	// kN above N_c,Rd = 2500 kN (6.2.4): utilisation 0.534, satisfied.
	want := map[string]report.MemberCodeCheck{
		"long":   {Resistance: 1196.72e3, DesignLoad: 1335e3, Utilisation: 1.11555, Verdict: "not satisfied", Clause: "EN 1993-1-1 6.3.1.2", Axis: "major", Mode: "flexural-major"},
		"stocky": {Resistance: 2500e3, DesignLoad: 1335e3, Utilisation: 0.534, Verdict: "satisfied", Clause: "EN 1993-1-1 6.2.4"},
	}
	near := func(got, want float64) bool { return math.Abs(got-want) <= 1e-5*want }
	inv := r.Document().Inventory
	for _, m := range inv.Members {
		w, c := want[m.Name], m.CodeCheck
		if c == nil {
			t.Fatalf("%s: no code check (%q)", m.Name, m.CodeCheckNotMade)
		}
		if !near(c.Resistance, w.Resistance) || !near(c.DesignLoad, w.DesignLoad) || !near(c.Utilisation, w.Utilisation) || c.Verdict != w.Verdict || c.Clause != w.Clause {
			t.Errorf("%s: code check %+v, want %+v", m.Name, *c, w)
		}
	}
	// The run's check of each member is the one check gives.
	for _, mc := range l.InventoryCheck().Members {
		for _, m := range inv.Members {
			if m.Name == mc.Name && (mc.CodeCheck == nil || *m.CodeCheck != *report.ShortCodeCheck(mc.CodeCheck)) {
				t.Errorf("%s: the run's code check %+v differs from check's %+v", m.Name, *m.CodeCheck, mc.CodeCheck)
			}
		}
	}
	files, err := report.Files(r.Bundle(), []string{"json"})
	if err != nil {
		t.Fatal(err)
	}
	for _, f := range files {
		if f.Name != "inventory.csv" {
			continue
		}
		rows, err := csv.NewReader(strings.NewReader(string(f.Data))).ReadAll()
		if err != nil {
			t.Fatal(err)
		}
		col := map[string]int{}
		for j, h := range rows[0] {
			col[h] = j
		}
		for _, row := range rows[1:] {
			w := want[row[0]]
			for _, c := range []struct{ head, want string }{
				{"design_load (kN)", "1335"},
				{"design_resistance (kN)", map[string]string{"long": "1196.72", "stocky": "2500"}[row[0]]},
				{"code_check_verdict", w.Verdict},
				{"code_check_clause", w.Clause},
				{"member.length", map[string]string{"long": "3000", "stocky": "500"}[row[0]]},
			} {
				j, ok := col[c.head]
				if !ok || row[j] != c.want {
					t.Errorf("inventory.csv, %s, column %q: %v, want %q\n%s", row[0], c.head, row, c.want, f.Data)
				}
			}
		}
		return
	}
	t.Error("no inventory.csv")
}

// TestInventoryCodeCheckNotMade checks that an inventory whose code check
// cannot be made (stainless steel: the check is EN 1993-1-1's for carbon
// steel) gives its members no code check, no reason each, and
// inventory.csv no code-check columns.
func TestInventoryCodeCheckNotMade(t *testing.T) {
	text := strings.Replace(strings.Replace(invCodeStudy, `curve = "c"`, "", 1), "[material]", "[material]\nkind = \"stainless\"", 1)
	l := loadInventory(t, text, "name, member.length (mm)\nlong, 3000\nstocky, 500\n")
	s := l.Settings(2)
	r, err := Run(context.Background(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, m := range r.Document().Inventory.Members {
		if m.Error != "" || m.CodeCheck != nil || m.CodeCheckNotMade != "" {
			t.Errorf("%s: error %q, code check %v, not made %q; want a result without a code check", m.Name, m.Error, m.CodeCheck, m.CodeCheckNotMade)
		}
	}
	files, err := report.Files(r.Bundle(), []string{"json"})
	if err != nil {
		t.Fatal(err)
	}
	for _, f := range files {
		if f.Name == "inventory.csv" && strings.Contains(string(f.Data), "code_check") {
			t.Errorf("inventory.csv has code-check columns:\n%s", f.Data)
		}
	}
}
