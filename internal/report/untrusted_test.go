package report

import (
	"encoding/json"
	"strings"
	"testing"
)

// untrustedVariantBundle is a study with two variants, the second of
// which the engine does not trust (a subset-simulation-like reason, made
// up for the test).
func untrustedVariantBundle() *Bundle {
	beta := Index(3.2)
	yes, no := true, false
	doc := &Document{Beta: &beta, PfCI: []float64{5e-4, 9e-4}, Trusted: &yes, Variants: []Variant{
		{Name: "bow L/500", Pf: 2e-3, Beta: 2.88, PfCI: [2]float64{1.8e-3, 2.2e-3}, Status: "converged", Trusted: &yes},
		{Name: "curve b", Pf: 1e-2, Beta: 2.33, PfCI: [2]float64{0.9e-2, 1.1e-2}, Status: "imprecise",
			StatusReason: "CoV of pf 0.81 above 0.5", Trusted: &no},
	}}
	tb := 3.0
	doc.TargetBeta = &tb
	return &Bundle{Doc: doc, Cases: &CaseTable{StudyName: "perry-robertson"}}
}

// TestUntrustedVariantMarked: a variant whose estimate is not trusted
// reads as such in the summary, summary.md, the HTML report, cases.csv,
// results.json and the variants picture, with its reason; the trusted
// one is not marked.
func TestUntrustedVariantMarked(t *testing.T) {
	t.Parallel()
	b := untrustedVariantBundle()
	const reason = "CoV of pf 0.81 above 0.5"
	lineOf := func(text, name string) string {
		for _, l := range strings.Split(text, "\n") {
			if strings.Contains(l, name) && !strings.Contains(l, "? "+name) {
				return l
			}
		}
		return ""
	}
	text := SummaryText(b)
	if l := lineOf(text, "curve b"); !strings.Contains(l, untrustedMark) {
		t.Errorf("summary: the untrusted variant's row %q is not marked", l)
	}
	if l := lineOf(text, "bow L/500"); l == "" || strings.Contains(l, untrustedMark) {
		t.Errorf("summary: the trusted variant's row %q", l)
	}
	if !strings.Contains(text, "? curve b: the estimate is not trusted") || !strings.Contains(text, reason) {
		t.Errorf("summary says not why the variant is not trusted:\n%s", text)
	}
	md := Markdown(b)
	if l := lineOf(md, "curve b"); !strings.Contains(l, untrustedMark) || !strings.Contains(l, reason) {
		t.Errorf("summary.md: row %q", l)
	}
	if l := lineOf(md, "| variant"); !strings.Contains(l, "trust") {
		t.Errorf("summary.md: head %q has no trust column", l)
	}
	html, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	if l := lineOf(string(html), "<td>curve b</td>"); !strings.Contains(l, untrustedMark) || !strings.Contains(l, reason) {
		t.Errorf("HTML: row %q", l)
	}
	if l := lineOf(string(html), "<td>bow L/500</td>"); strings.Contains(l, untrustedMark) {
		t.Errorf("HTML: the trusted variant is marked: %q", l)
	}
	csv, err := casesCSV(b)
	if err != nil {
		t.Fatal(err)
	}
	if l := lineOf(string(csv), "curve b"); !strings.HasSuffix(l, ",false") {
		t.Errorf("cases.csv: row %q, want trusted false", l)
	}
	js, err := json.Marshal(b.Doc.Variants[1])
	if err != nil || !strings.Contains(string(js), `"status":"imprecise","status_reason":"CoV of pf 0.81 above 0.5","trusted":false`) {
		t.Errorf("results.json variant %s, %v", js, err)
	}
	f := variantsFigure(b)
	if f == nil {
		t.Fatal("no variants picture")
	}
	if !strings.Contains(f.Caption, "hollow grey ring marked ?") {
		t.Errorf("caption %q says not how an untrusted variant is drawn", f.Caption)
	}
	svg, err := f.render("svg")
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(svg), "estimate not trusted") {
		t.Error("the picture's legend does not name the untrusted mark")
	}
	// Trusted, the same variant is not marked anywhere.
	yes := true
	b.Doc.Variants[1].Trusted = &yes
	if text := SummaryText(b); strings.Contains(text, untrustedMark) {
		t.Errorf("summary marks a trusted variant:\n%s", text)
	}
	if f := variantsFigure(b); f == nil || strings.Contains(f.Caption, "hollow grey") {
		t.Error("the picture marks a trusted variant")
	}
}

// TestUntrustedSweepCaseMarked: a sweep case whose estimate is not
// trusted is marked in the summary's sweep table (beta followed by ?,
// with the statement below it) and in the report's table of a sweep of
// several keys; a trusted one is not.
func TestUntrustedSweepCaseMarked(t *testing.T) {
	t.Parallel()
	pts := []*Point{
		{Value: 3000, Pf: 2.1e-5, Beta: 4.10, PfCI: [2]float64{1.6e-5, 2.7e-5}},
		{Value: 4000, Pf: 2.4e-4, Beta: 3.49, PfCI: [2]float64{2.1e-4, 2.7e-4}, Doubtful: true},
	}
	b := &Bundle{Doc: &Document{}, SweepLabel: "member length (mm)",
		Cases: &CaseTable{StudyName: "perry-robertson", Values: []float64{3000, 4000}, Grid: [][]*Point{pts}}}
	text := casesText(b, b.Doc)
	if !strings.Contains(text, "3.49?") || !strings.Contains(text, "beta followed by ?: the case's estimate is not trusted") {
		t.Errorf("summary's sweep table:\n%s", text)
	}
	for _, l := range strings.Split(text, "\n") {
		if strings.Contains(l, "3000") && strings.Contains(l, "?") {
			t.Errorf("summary marks a trusted case: %q", l)
		}
	}
	b.Cases = &CaseTable{StudyName: "perry-robertson", Keys: []string{"member.length (mm)", "imperfection.bow (mm)"},
		Points: [][]float64{{3000, 1}, {4000, 1}}, Grid: [][]*Point{pts}}
	tab := gridCasesTable(b)
	if tab == nil || len(tab.Rows) != 2 {
		t.Fatalf("grid table %+v", tab)
	}
	last := func(r []string) string { return r[len(r)-1] }
	if strings.Contains(last(tab.Rows[0]), untrustedMark) || !strings.Contains(last(tab.Rows[1]), untrustedMark) {
		t.Errorf("grid table rows %q", tab.Rows)
	}
}
