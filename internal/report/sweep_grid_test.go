package report

import (
	"bytes"
	"encoding/csv"
	"strings"
	"testing"
)

// TestCasesCSVKeys: with several swept keys cases.csv has one column per
// key, its unit in the head, each row the values of its point (empty for
// the rows at the study's own values), and the relative slenderness of
// each point; the summary tabulates every point.
func TestCasesCSVKeys(t *testing.T) {
	b := heatBundle(2, 2, 1, false)
	beta := Index(3.1)
	pf := 1e-3
	b.Doc.Beta, b.Doc.Pf = &beta, &pf
	b.Cases.Lambda = []float64{0.8, 0.8, 1.1, 1.1}
	b.Cases.BaseLambda = 0.95
	b.Cases.Names = []string{"study (perry-robertson)", "thicker"}
	b.SweepLambdaAxis = "minor"
	data, err := casesCSV(b)
	if err != nil {
		t.Fatal(err)
	}
	rows, err := csv.NewReader(bytes.NewReader(data)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	head := []string{"variant", "member.length (mm)", "imperfection.bow (fraction of L)", "relative_slenderness (nominal, minor axis) (-)", "pf (-)", "pf_low (-)", "pf_high (-)", "beta (-)", "trusted"}
	if strings.Join(rows[0], "|") != strings.Join(head, "|") {
		t.Fatalf("head %q\nwant %q", rows[0], head)
	}
	// The study, then 4 points of the study and 4 of the variant.
	want := [][]string{
		{"study (perry-robertson)", "", "", "0.9500"},
		{"study (perry-robertson)", "3000", "0.001", "0.8000"},
		{"study (perry-robertson)", "3000", "0.002", "0.8000"},
		{"study (perry-robertson)", "4000", "0.001", "1.1000"},
		{"study (perry-robertson)", "4000", "0.002", "1.1000"},
		{"thicker", "3000", "0.001", "0.8000"},
	}
	if len(rows) != 1+1+8 {
		t.Fatalf("%d rows, want 10:\n%s", len(rows), data)
	}
	for i, w := range want {
		if got := rows[i+1][:4]; strings.Join(got, "|") != strings.Join(w, "|") {
			t.Errorf("row %d = %q, want %q", i+1, got, w)
		}
	}
	text := casesText(b, b.Doc)
	for _, w := range []string{"beta at 4 points of member.length (mm) and imperfection.bow (fraction of L)", "(2) thicker", "key 2: imperfection.bow (fraction of L)"} {
		if !strings.Contains(text, w) {
			t.Errorf("summary %q\nwant %q in it", text, w)
		}
	}
}
