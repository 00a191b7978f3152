package report

import (
	"strings"
	"testing"
)

// verdictInventory is a document of a study that meets its target and an
// inventory of five members: two not met, one whose estimate is not
// trusted (shown undecided whatever its verdict), one met and one not run.
func verdictInventory() *Document {
	tb, met, trusted, beta := 3.8, true, true, Index(4.2)
	return &Document{TargetBeta: &tb, MeetsTarget: &met, Trusted: &trusted, Beta: &beta, BetaCI: Indices(4.1, 4.3), Inventory: &Inventory{File: "m.csv", Members: []Member{
		{Name: "A", Verdict: "not met", Status: "converged"},
		{Name: "B", Verdict: "not met", Status: "budget-spent"},
		{Name: "C", Verdict: "met", Status: "not-converged"},
		{Name: "D", Verdict: "met", Status: "converged"},
		{Name: "E", Error: "member.section: no section"},
	}}}
}

// TestInventoryVerdict checks the inventory's verdict beside the study's:
// the members by their shown verdict, the banner's class, and that it is
// absent without a target.
func TestInventoryVerdict(t *testing.T) {
	d := verdictInventory()
	text, class := inventoryVerdict(d)
	want := "Inventory: target NOT met by 2 of 5 members (A, B); undecided for 1 (C); 1 not run (E)."
	if text != want || class != "not-met" {
		t.Errorf("inventoryVerdict = %q, %q; want %q, %q", text, class, want, "not-met")
	}
	d.Inventory.Members = d.Inventory.Members[2:4]
	if text, class := inventoryVerdict(d); text != "Inventory: target undecided for 1 (C)." || class != "undecided" {
		t.Errorf("one untrusted, one met: %q, %q", text, class)
	}
	d.Inventory.Members = d.Inventory.Members[1:]
	if text, class := inventoryVerdict(d); text != "Inventory: target met by all 1 member." || class != "met" {
		t.Errorf("one met: %q, %q", text, class)
	}
	d.TargetBeta = nil
	if text, _ := inventoryVerdict(d); text != "" {
		t.Errorf("no target: %q, want none", text)
	}
}

// TestInventoryVerdictInReports checks that the summary, the Markdown and
// the HTML report put the members' verdict beside the study's, the
// study's said to be of the study as written.
func TestInventoryVerdictInReports(t *testing.T) {
	b := &Bundle{Doc: verdictInventory()}
	sum := SummaryText(b)
	md := Markdown(b)
	html, err := htmlReport(b, nil, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct{ where, text, want string }{
		{"summary", sum, "members' target    NOT met by 2 of 5 members (A, B)"},
		{"summary.md", md, "**Inventory: target NOT met by 2 of 5 members (A, B); undecided for 1 (C); 1 not run (E).**"},
		{"summary.md", md, "**The study as written (a typical member): target met.**"},
		{"report.html", string(html), `<p class="verdict not-met">Inventory: target NOT met by 2 of 5 members (A, B)`},
		{"report.html", string(html), "The study as written (a typical member): target met."},
	} {
		if !strings.Contains(c.text, c.want) {
			t.Errorf("%s lacks %q:\n%s", c.where, c.want, c.text)
		}
	}
}
