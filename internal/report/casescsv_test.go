package report

import (
	"bytes"
	"encoding/csv"
	"testing"
)

// TestCasesCSV: cases.csv has one row per case that ran (the study, each
// variant at the study's values, each series at each swept value it ran
// at), the unit of every column in its head, and the numbers of the
// document.
func TestCasesCSV(t *testing.T) {
	t.Parallel()
	b := lambdaBundle()
	d := b.Doc
	values := []float64{3000, 4000, 5000, 6000}
	grid := [][]*Point{make([]*Point, 4), make([]*Point, 4), make([]*Point, 4)}
	for i := range d.Sweep {
		grid[0][i] = &d.Sweep[i]
	}
	grid[2][1] = &Point{Value: 4000, Pf: 9e-3, Beta: 2.366, PfCI: [2]float64{8e-3, 1e-2}, Doubtful: true}
	yes, no := true, false
	d.Variants[0].Trusted, d.Variants[1].Trusted = &yes, &no
	// 0.6541: the study's own relative slenderness (an invented value).
	b.Cases = &CaseTable{StudyName: "perry-robertson", Values: values, Grid: grid, BaseLambda: 0.6541}
	data, err := casesCSV(b)
	if err != nil {
		t.Fatal(err)
	}
	rows, err := csv.NewReader(bytes.NewReader(data)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	head := []string{"variant", "member length (mm)", "relative_slenderness (nominal, minor axis) (-)", "pf (-)", "pf_low (-)", "pf_high (-)", "beta (-)", "trusted"}
	if len(rows) == 0 || len(rows[0]) != len(head) {
		t.Fatalf("head %q, want %q", rows, head)
	}
	for i, h := range head {
		if rows[0][i] != h {
			t.Errorf("column %d: %q, want %q", i, rows[0][i], h)
		}
	}
	// The study, its 2 variants, the study at 4 values, 1 variant case;
	// the study's trust is unknown here, the second variant's estimate and
	// the variant case are not trusted.
	want := [][]string{
		{"study (perry-robertson)", "", "0.6541", "0.00184", "0.00176", "0.00193", "2.904", ""},
		{"as built", "", "0.6541", "0.00184", "0.00176", "0.00193", "2.904", "true"},
		{"bow L/500", "", "0.6541", "0.0046", "0.0045", "0.0048", "2.605", "false"},
		{"study (perry-robertson)", "3000", "0.5608", "2.1e-05", "1.6e-05", "2.7e-05", "4.1", "true"},
		{"study (perry-robertson)", "4000", "0.7477", "0.00024", "0.00021", "0.00027", "3.49", "true"},
		{"study (perry-robertson)", "5000", "0.9346", "0.0015", "0.0014", "0.0016", "2.97", "true"},
		{"study (perry-robertson)", "6000", "1.1215", "0.008", "0.0077", "0.0083", "2.41", "true"},
		{"bow L/500", "4000", "0.7477", "0.009", "0.008", "0.01", "2.366", "false"},
	}
	if len(rows)-1 != len(want) {
		t.Fatalf("%d rows, want %d:\n%s", len(rows)-1, len(want), data)
	}
	for i, w := range want {
		for j := range w {
			if rows[i+1][j] != w[j] {
				t.Errorf("row %d column %q: %q, want %q", i+1, head[j], rows[i+1][j], w[j])
			}
		}
	}
}
