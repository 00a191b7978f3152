package report

import "strconv"

// MemberCodeCheck is an inventory member's code check in the result
// document: the fields of the study's code_check that a table of members
// needs, under the same names (forces in N), with the check's verdict and
// the clause that governs.
type MemberCodeCheck struct {
	// Resistance is the design resistance N_Rd, DesignLoad the design
	// load N_Ed, Utilisation N_Ed / N_Rd.
	Resistance  float64 `json:"resistance"`
	DesignLoad  float64 `json:"design_load"`
	Utilisation float64 `json:"utilisation"`
	// Verdict is CodeCheckVerdictOf the check: "satisfied", "not
	// satisfied" or "no verdict" (axial buckling only of a member that
	// also bends).
	Verdict string `json:"verdict"`
	// Clause is the clause of EN 1993-1-1 whose resistance governs
	// (CodeCheck.Clause); Axis and Mode are those of the governing
	// buckling resistance.
	Clause string `json:"clause"`
	Axis   string `json:"axis"`
	Mode   string `json:"mode"`
}

// Clause names the clause of EN 1993-1-1 whose resistance is the check's
// design resistance: "EN 1993-1-1 6.2.4" when the cross-section's
// resistance N_c,Rd is not above the buckling resistance (to rounding:
// chi = 1 at a relative slenderness of 0.2 or less, 6.3.1.2(4), with
// gamma_M0 = gamma_M1), "EN 1993-1-1 6.3.1.4" when a mode that
// twists governs the buckling resistance, else "EN 1993-1-1 6.3.1.2"
// (flexural buckling, chi of eq. 6.49).
func (c *CodeCheck) Clause() string {
	switch {
	case c.CrossSectionResistance <= c.BucklingResistance*(1+1e-9):
		return "EN 1993-1-1 6.2.4"
	case c.Mode == "torsional" || c.Mode == "flexural-torsional":
		return "EN 1993-1-1 6.3.1.4"
	}
	return "EN 1993-1-1 6.3.1.2"
}

// ShortCodeCheck is the member's form of code check c; nil for nil.
func ShortCodeCheck(c *CodeCheck) *MemberCodeCheck {
	if c == nil {
		return nil
	}
	return &MemberCodeCheck{
		Resistance: c.Resistance, DesignLoad: c.DesignLoad, Utilisation: c.Utilisation,
		Verdict: CodeCheckVerdictOf(c), Clause: c.Clause(), Axis: c.Axis, Mode: c.Mode,
	}
}

// codeCheckHead are the columns of inventory.csv that give a member's
// code check, units in the head.
var codeCheckHead = []string{"design_load (kN)", "design_resistance (kN)", "utilisation (-)", "code_check_verdict", "code_check_clause", "code_check_axis", "code_check_mode"}

// codeCheckCells are member m's cells under codeCheckHead: empty but for
// the reason when its check was not made.
func codeCheckCells(m *Member) []string {
	c := m.CodeCheck
	if c == nil {
		cells := make([]string, len(codeCheckHead))
		if m.CodeCheckNotMade != "" {
			cells[3] = "not made: " + m.CodeCheckNotMade
		}
		return cells
	}
	g := func(x float64) string { return strconv.FormatFloat(x, 'g', 6, 64) }
	return []string{g(c.DesignLoad / 1e3), g(c.Resistance / 1e3), g(c.Utilisation), c.Verdict, c.Clause, c.Axis, c.Mode}
}

// hasCodeCheck reports whether any member of inv has a code check.
func hasCodeCheck(inv *Inventory) bool {
	for i := range inv.Members {
		if inv.Members[i].CodeCheck != nil {
			return true
		}
	}
	return false
}
