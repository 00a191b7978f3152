package report

import (
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestInteractionFigure checks the interaction picture of a study with
// bending: drawn with a limit curve, its sampled points split by the sign
// of g, shown in the HTML; absent without a curve; and the load-factor
// histogram replaces the axial capacity and demand.
func TestInteractionFigure(t *testing.T) {
	lf := 2.5
	doc := &Document{Nominal: &Nominal{Capacity: 25e3, LoadFactor: lf, Bending: &NominalBending{Axis: "major", Top: 4e6, Lateral: 1.2}}}
	b := &Bundle{Doc: doc, Interaction: &InteractionChart{
		N: []float64{50e3, 40e3, 20e3, 0}, M: []float64{0, 5e6, 10e6, 12e6}, NominalN: 10e3, NominalM: 4e6, Axis: "major", Model: "curve",
	}}
	b.Samples = &sim.Samples{Names: []string{"loads.dead (N)", "capacity (-)", "demand (-)", "axial (N)", "moment (N*mm)", "g (-)"},
		Rows: [][]float64{{1e4, 2.5, 1, 1e4, 4e6, 1.5}, {1.2e4, 0.9, 1, 1.2e4, 9e6, -0.1}}}
	f := interactionFigure(b)
	if f == nil || len(f.Plots) != 1 {
		t.Fatal("no interaction figure")
	}
	if !strings.Contains(f.Caption, "major axis") {
		t.Errorf("caption %q does not name the axis", f.Caption)
	}
	if _, err := f.render("svg"); err != nil {
		t.Fatal(err)
	}
	b.Capacity = &sim.OutputStats{Name: "capacity", Mean: 2.4, SD: 0.5, Hist: sim.Histogram{Lo: 1, Width: 0.75, Counts: []float64{1, 3, 5, 2}}}
	cd := capacityDemandFigure(b)
	if cd == nil || !strings.Contains(cd.Caption, "load factor") {
		t.Fatalf("the capacity picture of a bending study should be the load factor's: %+v", cd)
	}
	html, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{`<figure id="fig-interaction">`, "nominal load factor"} {
		if !strings.Contains(string(html), want) {
			t.Errorf("the HTML lacks %q", want)
		}
	}
	b.Interaction.N = nil
	if interactionFigure(b) != nil {
		t.Error("an interaction picture without a limit curve")
	}
}
