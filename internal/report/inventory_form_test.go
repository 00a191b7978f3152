package report

import (
	"strings"
	"testing"
)

// TestInventorySummaryFORM checks the first-order system in the summary:
// beside a joint sample that failed, a check on it; where no joint
// sample failed, the estimate to read, called an approximation and not a
// verdict; absent when the document has none.
func TestInventorySummaryFORM(t *testing.T) {
	t.Parallel()
	d := demoInventory()
	if got := SummaryText(&Bundle{Doc: d}); strings.Contains(got, "FORM system pf") {
		t.Errorf("a FORM line without form_pf:\n%s", got)
	}
	pf, beta := 1.91e-4, Index(3.55)
	d.Inventory.System.FormPf, d.Inventory.System.FormBeta, d.Inventory.System.Headline = &pf, &beta, "joint sampling"
	got := SummaryText(&Bundle{Doc: d})
	if want := "FORM system pf     1.91e-4, beta 3.55; a check on the joint sample"; !strings.Contains(got, want) {
		t.Errorf("summary lacks %q:\n%s", want, got)
	}
	s := d.Inventory.System
	s.Pf, s.PfCI, s.Status, s.Headline = 0, [2]float64{0, 3.7e-6}, "no failures", "form"
	rare, rb := 6.69e-7, Index(4.83)
	s.FormPf, s.FormBeta = &rare, &rb
	got = SummaryText(&Bundle{Doc: d})
	for _, want := range []string{"below 3.7e-6 (95% bound)", "FORM system pf", "6.69e-7, beta 4.83", "not a verdict"} {
		if !strings.Contains(got, want) {
			t.Errorf("summary lacks %q:\n%s", want, got)
		}
	}
	md := Markdown(&Bundle{Doc: d})
	if !strings.Contains(md, "system pf by FORM (first order)") || !strings.Contains(md, "not a verdict") {
		t.Errorf("summary.md lacks the FORM row:\n%s", md)
	}
}
