package analysis

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"strutrisk/internal/modelerror"
	"strutrisk/internal/report"
)

// The model-factor output of three tests on the stocky strut, whose
// theoretical resistance is A fy = 10,000 mm^2 x fy (chi = 1, see
// fixture.Stocky): the document carries b = sum(r_e r_t) / sum(r_t^2)
// (EN 1990:2002 D.8.2.2 step 2, expression (D.8)), the text ends with the
// caution, and the folder holds the four files with one CSV row a test.
func TestModelFactorOutput(t *testing.T) {
	l := mustLoad(t, stocky)
	csv := "resistance (kN),material.yield (MPa)\n3100,300\n2900,280\n3500,320\n"
	tests, err := modelerror.ReadTests("tests.csv", strings.NewReader(csv), l.Study.Units)
	if err != nil {
		t.Fatal(err)
	}
	ev, err := modelerror.Assess(l.Study, "tests.csv", tests, false)
	if err != nil {
		t.Fatal(err)
	}
	o, err := ModelFactor(ev)
	if err != nil {
		t.Fatal(err)
	}
	var doc struct {
		Count int     `json:"count"`
		B     float64 `json:"b"`
	}
	if err := json.Unmarshal(o.JSON, &doc); err != nil {
		t.Fatal(err)
	}
	re, rt := []float64{3.1e6, 2.9e6, 3.5e6}, []float64{3e6, 2.8e6, 3.2e6}
	var num, den float64
	for i := range re {
		num += re[i] * rt[i]
		den += rt[i] * rt[i]
	}
	if b := num / den; doc.Count != 3 || math.Abs(doc.B-b) > 1e-12*b {
		t.Errorf("document: count %d, b %.15g; want 3, %.15g", doc.Count, doc.B, b)
	}
	if !strings.HasSuffix(string(o.JSON), "}\n") {
		t.Errorf("the document does not end in a newline")
	}
	if !strings.HasSuffix(o.Text, report.CautionText+"\n") || !strings.HasPrefix(o.Text, ev.Text()) {
		t.Errorf("text is not the evaluation then the caution:\n%s", o.Text)
	}
	files, err := o.Files()
	if err != nil {
		t.Fatal(err)
	}
	var names []string
	for _, f := range files {
		names = append(names, f.Name)
		switch f.Name {
		case "model-factor.csv":
			if n := strings.Count(string(f.Data), "\n"); n != 4 {
				t.Errorf("model-factor.csv has %d lines, want a header and 3 tests:\n%s", n, f.Data)
			}
		case "model-factor.png":
			if !strings.HasPrefix(string(f.Data), "\x89PNG") {
				t.Errorf("model-factor.png is not a PNG")
			}
		case "summary.txt":
			if string(f.Data) != o.Text {
				t.Errorf("summary.txt is not the text printed")
			}
		}
	}
	if got := strings.Join(names, " "); got != "model-factor.json model-factor.csv model-factor.png summary.txt" {
		t.Errorf("files %s", got)
	}
}
