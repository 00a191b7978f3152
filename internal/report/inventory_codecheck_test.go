package report

import (
	"strings"
	"testing"
)

// TestCodeCheckClause checks the clause named as governing: the
// cross-section (EN 1993-1-1 6.2.4) when N_c,Rd is not above N_b,Rd,
// even by rounding (chi = 1 computed as 1 - 1 ulp), 6.3.1.4 for the
// modes that twist, 6.3.1.2 for flexural buckling.
func TestCodeCheckClause(t *testing.T) {
	for _, c := range []struct {
		ncrd, nbrd float64
		mode, want string
	}{
		{2500e3, 2750e3, "flexural-major", "EN 1993-1-1 6.2.4"},
		{2750e3, 2750e3 * (1 - 1e-16), "flexural-minor", "EN 1993-1-1 6.2.4"},
		{2750e3, 1196.72e3, "flexural-minor", "EN 1993-1-1 6.3.1.2"},
		{2750e3, 1196.72e3, "torsional", "EN 1993-1-1 6.3.1.4"},
		{2750e3, 1196.72e3, "flexural-torsional", "EN 1993-1-1 6.3.1.4"},
	} {
		cc := &CodeCheck{CrossSectionResistance: c.ncrd, BucklingResistance: c.nbrd, Mode: c.mode}
		if got := cc.Clause(); got != c.want {
			t.Errorf("N_c,Rd %g, N_b,Rd %g, %s: clause %q, want %q", c.ncrd, c.nbrd, c.mode, got, c.want)
		}
	}
}

// TestInventoryCSVCodeCheck checks the code-check columns of
// inventory.csv: present, units in the head, when a member has a check;
// a member whose check was not made says why under the verdict.
func TestInventoryCSVCodeCheck(t *testing.T) {
	inv := &Inventory{File: "m.csv", Members: []Member{
		{Name: "A", Line: 2, CodeCheck: &MemberCodeCheck{Resistance: 1196.72e3, DesignLoad: 1335e3, Utilisation: 1.11555, Verdict: "not satisfied", Clause: "EN 1993-1-1 6.3.1.2", Axis: "major", Mode: "flexural-major"}},
		{Name: "B", Line: 3, CodeCheckNotMade: "at characteristic values: no section"},
	}}
	data, err := inventoryCSV(inv, nil)
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(strings.TrimSpace(string(data)), "\n")
	for i, want := range []string{
		"design_load (kN),design_resistance (kN),utilisation (-),code_check_verdict,code_check_clause,code_check_axis,code_check_mode",
		"1335,1196.72,1.11555,not satisfied,EN 1993-1-1 6.3.1.2,major,flexural-major",
		",,,not made: at characteristic values: no section,,,",
	} {
		if !strings.HasSuffix(lines[i], want) {
			t.Errorf("inventory.csv line %d: %q, want it to end %q", i+1, lines[i], want)
		}
	}
	inv.Members = inv.Members[1:]
	inv.Members[0].CodeCheckNotMade = ""
	if data, _ := inventoryCSV(inv, nil); strings.Contains(string(data), "code_check") {
		t.Errorf("no member has a code check, yet inventory.csv has its columns:\n%s", data)
	}
}

// TestInventoryListingCodeCheck checks that the members listed in the
// summary, the Markdown and the HTML report carry their code check beside
// their beta (the demo's F1-C3 misses beta 3.8 at a utilisation of 0.84).
func TestInventoryListingCodeCheck(t *testing.T) {
	tb, trusted, beta := 3.8, true, Index(3.9)
	d := &Document{TargetBeta: &tb, Trusted: &trusted, Beta: &beta, BetaCI: Indices(3.85, 3.95), Inventory: &Inventory{Members: []Member{
		{Name: "F1-C3", Verdict: "not met", Status: "converged", Beta: 3.76, BetaCI: [2]Index{3.75, 3.77},
			CodeCheck: &MemberCodeCheck{Utilisation: 0.8375, Verdict: "satisfied"}},
		{Name: "X", Verdict: "not met", Status: "converged", Beta: 3.5, BetaCI: [2]Index{3.4, 3.6},
			CodeCheck: &MemberCodeCheck{Utilisation: 1.116, Verdict: "not satisfied"}},
		{Name: "Y", Verdict: "undecided", Status: "converged", Beta: 3.8, BetaCI: [2]Index{3.7, 3.9}, CodeCheckNotMade: "class 4 CHS"},
	}}}
	b := &Bundle{Doc: d}
	html, err := htmlReport(b, nil, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct{ where, text, want string }{
		{"summary", SummaryText(b), "0.838 satisfied"},
		{"summary", SummaryText(b), "1.116 NOT satisfied"},
		{"summary", SummaryText(b), "code check"},
		{"summary.md", Markdown(b), "| F1-C3 | 3.76 | \\[3.75, 3.77\\] | not met | – | 0.838 satisfied |"},
		{"summary.md", Markdown(b), "| not made |"},
		{"report.html", string(html), `<th>code check N_Ed/N_Rd</th>`},
		{"report.html", string(html), `<td class="nw">1.116 NOT satisfied</td>`},
	} {
		if !strings.Contains(c.text, c.want) {
			t.Errorf("%s lacks %q:\n%s", c.where, c.want, c.text)
		}
	}
	for i := range d.Inventory.Members {
		d.Inventory.Members[i].CodeCheck, d.Inventory.Members[i].CodeCheckNotMade = nil, ""
	}
	if s := SummaryText(b); strings.Contains(s, "code check") {
		t.Errorf("no member has a code check, yet the summary has its column:\n%s", s)
	}
}
