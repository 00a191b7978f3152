package study

import (
	"strings"
	"testing"
)

// TestCellText: a CSV cell under a header with a unit. The units'
// spellings are those of DEVELOPERS.md ("Units").
func TestCellText(t *testing.T) {
	for _, c := range []struct {
		cell, unit, want, err string
	}{
		{"3.6", "m", "3.6 m", ""},
		{"1_000", "kN", "1_000 kN", ""}, // a TOML number, not read in the study's units
		{"3.6", "", "3.6", ""},
		{"0.3", "-", "0.3", ""},
		{"3.6 m", "m", "3.6 m", ""},
		{"5 N/mm^2", "N/mm2", "5 N/mm^2", ""}, // the same unit spelt otherwise
		{"L/500", "mm", "L/500", ""},
		{"Lcr/1000", "mm", "Lcr/1000", ""},
		{"3 furlong", "m", "3 furlong", ""}, // the study's reading names the unknown unit
		{"3600 mm", "m", "", `"3600 mm" gives the unit mm but the column's header gives m`},
		{"210 MPa", "GPa", "", "gives the unit MPa"},
		{"5 kN", "m", "", "gives the unit kN"},
	} {
		got, err := CellText(c.cell, c.unit)
		switch {
		case c.err == "" && (err != nil || got != c.want):
			t.Errorf("CellText(%q, %q) = %q, %v; want %q", c.cell, c.unit, got, err, c.want)
		case c.err != "" && (err == nil || !strings.Contains(err.Error(), c.err)):
			t.Errorf("CellText(%q, %q) error %v; want one saying %q", c.cell, c.unit, err, c.err)
		}
	}
}
