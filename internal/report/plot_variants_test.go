package report

import (
	"strings"
	"testing"
)

// TestVariantsFigure checks when the variants chart is drawn: with
// variants and no sweep curves only.
func TestVariantsFigure(t *testing.T) {
	beta := Index(3.2)
	doc := &Document{Beta: &beta, PfCI: []float64{5e-4, 9e-4}, Variants: []Variant{
		{Name: "bow L/500", Pf: 2e-3, Beta: 2.88, PfCI: [2]float64{1.8e-3, 2.2e-3}},
		{Name: "curve b", Pf: 1e-2, Beta: 2.33, PfCI: [2]float64{0.9e-2, 1.1e-2}},
	}}
	b := &Bundle{Doc: doc}
	f := variantsFigure(b)
	if f == nil || len(f.Plots) != 1 {
		t.Fatalf("no variants figure")
	}
	if _, err := f.render("svg"); err != nil {
		t.Fatal(err)
	}
	html, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(html), `<figure id="fig-variants">`) {
		t.Error("the HTML does not show the variants picture")
	}
	b.Series = []Series{{Name: "study", Points: []Point{{Value: 1, Pf: 1e-3, Beta: 3.1, PfCI: [2]float64{9e-4, 1.1e-3}}}}}
	if variantsFigure(b) != nil {
		t.Error("variants drawn although the sweep draws them as curves")
	}
	csv, err := seriesCSV(b)
	if err != nil || !strings.Contains(string(csv), "study,1,0.001,0.0009,0.0011,3.1") {
		t.Errorf("sweep.csv %q, %v", csv, err)
	}
}
