package report

import (
	"fmt"
	"strings"
)

// InventoryCheck is the deterministic check of every member of a
// study's inventory (strutrisk check): each member's nominal picture
// and code check, as the check gives them for the study itself.
type InventoryCheck struct {
	// File is the inventory's CSV as the study names it.
	File    string        `json:"file"`
	Members []MemberCheck `json:"members"`
}

// MemberCheck is one member's deterministic check, in the order of the
// inventory file. Slenderness (K L / r), RelativeSlenderness,
// GoverningAxis and Mode are the code check's governing ones when it
// was made, else those of the nominal capacity. Capacity (N), Demand (N,
// at the mean loads) and Utilisation are the nominal picture at mean
// values; LoadFactor is the nominal factor on every action of a study
// with bending. CodeCheck is EN 1993-1-1 6.3.1 at characteristic values
// (as the study's code_check), CodeCheckVerdict "satisfied", "not
// satisfied" or "no verdict" (axial buckling only), or "not made" with
// the reason in CodeCheckNotMade.
type MemberCheck struct {
	Name string `json:"name"`
	// Line is the member's line in the inventory file.
	Line                int        `json:"line"`
	Slenderness         float64    `json:"slenderness"`
	RelativeSlenderness float64    `json:"relative_slenderness"`
	GoverningAxis       string     `json:"governing_axis"`
	Mode                string     `json:"mode"`
	Capacity            float64    `json:"capacity"`
	Demand              float64    `json:"demand"`
	Utilisation         float64    `json:"utilisation"`
	LoadFactor          float64    `json:"load_factor,omitempty"`
	CodeCheck           *CodeCheck `json:"code_check,omitempty"`
	CodeCheckVerdict    string     `json:"code_check_verdict,omitempty"`
	CodeCheckNotMade    string     `json:"code_check_not_made,omitempty"`
	// Warnings are the member's own warnings (the study's are the
	// document's).
	Warnings []string `json:"warnings,omitempty"`
	// Error, when not empty, says why the member could not be built; the
	// other fields are then empty.
	Error string `json:"error,omitempty"`
}

// CodeCheckVerdictOf is the short verdict of a code check: "satisfied"
// (utilisation at most 1), "not satisfied", or "no verdict" when only
// axial buckling was checked of a member that also bends.
func CodeCheckVerdictOf(c *CodeCheck) string {
	switch {
	case c.AxialOnly:
		return "no verdict"
	case c.Utilisation <= 1:
		return "satisfied"
	}
	return "not satisfied"
}

// InventoryCheckText is the check of the inventory's members as check
// prints it: a table of every member in the order of the file (the code
// check's design load, design resistance, utilisation and verdict when
// any member has one, else the nominal capacity, demand and
// utilisation), the members not built with their reason, a count of the
// verdicts and the members' warnings. Empty without an inventory.
func InventoryCheckText(ic *InventoryCheck) string {
	if ic == nil {
		return ""
	}
	var b strings.Builder
	code := false
	nw := len("member")
	for _, m := range ic.Members {
		code = code || m.CodeCheck != nil
		nw = max(nw, min(len(m.Name), 24))
	}
	fmt.Fprintf(&b, "\nInventory %s: %d members, each the study with its row's keys set\n", ic.File, len(ic.Members))
	if code {
		b.WriteString("  code check at characteristic values (EN 1993-1-1 6.3.1, EN 1990 6.10) with the study's [code_check] factors:\n")
		fmt.Fprintf(&b, "  %-*s %5s %7s %6s  %-5s  %-18s %9s %9s %6s  %s\n", nw, "member", "line", "KL/r", "lambda", "axis", "mode", "N_Ed (kN)", "N_Rd (kN)", "util.", "code check")
	} else {
		b.WriteString("  nominal values (means), as the check of the study gives them:\n")
		fmt.Fprintf(&b, "  %-*s %5s %7s %6s  %-5s  %-18s %12s %11s %6s\n", nw, "member", "line", "KL/r", "lambda", "axis", "mode", "capacity", "demand (kN)", "util.")
	}
	var notMet []string
	counts := map[string]int{}
	for _, m := range ic.Members {
		b.WriteString(memberCheckLine(m, nw, code))
		switch {
		case m.Error != "":
			counts["not built"]++
		case code:
			counts[m.CodeCheckVerdict]++
			if m.CodeCheckVerdict == "not satisfied" {
				notMet = append(notMet, m.Name)
			}
		}
	}
	b.WriteString(checkCounts(counts, notMet, code))
	var warns []string
	for _, m := range ic.Members {
		for _, w := range m.Warnings {
			warns = append(warns, m.Name+": "+w)
		}
	}
	if len(warns) > 0 {
		b.WriteString("  member warnings:\n")
		for _, w := range warns {
			fmt.Fprintf(&b, "  - %s\n", w)
		}
	}
	return b.String()
}

// memberCheckLine is one member's row of InventoryCheckText.
func memberCheckLine(m MemberCheck, nw int, code bool) string {
	name := clipName(m.Name, 24)
	if m.Error != "" {
		return fmt.Sprintf("  %-*s %5d  not built: %s\n", nw, name, m.Line, m.Error)
	}
	head := fmt.Sprintf("  %-*s %5d %7s %6s  %-5s  %-18s", nw, name, m.Line, fixed(m.Slenderness, 1), fixed(m.RelativeSlenderness, 3), m.GoverningAxis, m.Mode)
	switch {
	case code && m.CodeCheck != nil:
		c := m.CodeCheck
		v := m.CodeCheckVerdict
		if v == "not satisfied" {
			v = "NOT satisfied"
		}
		return fmt.Sprintf("%s %9s %9s %6s  %s\n", head, fixed(c.DesignLoad/1e3, 1), fixed(c.Resistance/1e3, 1), fixed(c.Utilisation, 3), v)
	case code:
		return fmt.Sprintf("%s  code check not made: %s\n", head, m.CodeCheckNotMade)
	}
	capacity := fixed(m.Capacity/1e3, 1) + " kN"
	if m.LoadFactor > 0 {
		capacity = "factor " + fixed(m.LoadFactor, 3)
	}
	return fmt.Sprintf("%s %12s %11s %6s\n", head, capacity, fixed(m.Demand/1e3, 1), fixed(m.Utilisation, 3))
}

// checkCounts counts the members by their code check's verdict and names
// those that fail it.
func checkCounts(counts map[string]int, notMet []string, code bool) string {
	var parts []string
	for _, k := range []string{"satisfied", "not satisfied", "no verdict", "not made", "not built"} {
		if n := counts[k]; n > 0 {
			label := k
			if k == "not satisfied" {
				label = "NOT satisfied"
			}
			parts = append(parts, fmt.Sprintf("%s %d", label, n))
		}
	}
	if len(parts) == 0 {
		return ""
	}
	what := "  code check: "
	if !code {
		what = "  members: "
	}
	s := what + strings.Join(parts, ", ")
	if len(notMet) > 0 {
		names := notMet[:min(len(notMet), maxListedMembers)]
		s += " (" + strings.Join(names, ", ")
		if len(notMet) > len(names) {
			s += fmt.Sprintf(" and %d more", len(notMet)-len(names))
		}
		s += ")"
	}
	return s + "\n"
}
