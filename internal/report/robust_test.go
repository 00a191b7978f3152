package report

import (
	"math"
	"strings"
	"testing"

	"strutrisk/sim"
)

// degenerate returns a bundle whose picture data are all missing, empty,
// constant or not finite.
func degenerate() *Bundle {
	nan, inf := math.NaN(), math.Inf(1)
	return &Bundle{
		Doc: &Document{Title: "degenerate", Pf: ptr(0.0), PfCI: []float64{0, 3e-6}, Beta: ptr(Index(inf)), BetaCI: []Index{4.5, Index(inf)},
			Tornado: []Tornado{{Variable: "a", Low: nan, High: 1}, {Variable: "b", Low: 2, High: 2}},
			Sobol:   []Sobol{{Variable: "a", First: nan, Total: nan}},
			FORM:    &FORM{Beta: nan, Pf: nan, DesignPoint: map[string]float64{"a": nan}},
			Sweep:   []Point{{Value: nan, Pf: 0, Beta: Index(inf)}}},
		Capacity:        &sim.OutputStats{Mean: nan, SD: 0, Hist: sim.Histogram{Lo: nan, Width: 1, Counts: []float64{1, 2}}},
		Demand:          &sim.OutputStats{Hist: sim.Histogram{Lo: 0, Width: 0, Counts: []float64{1}}},
		Margin:          &sim.OutputStats{Hist: sim.Histogram{Lo: 0, Width: 1, Counts: []float64{0, 0, 0}}},
		NominalCapacity: inf,
		Convergence:     []sim.ConvergencePoint{{Evaluations: 0, Pf: nan}, {Evaluations: 10, Pf: inf}},
		TornadoBase:     nan,
		Slenderness:     &SlendernessChart{Curves: []Curve{{Name: "x", X: []float64{nan}, Y: []float64{1, 2}}}, Cloud: [][2]float64{{nan, 1}}},
		Series:          []Series{{Name: "s", Points: []Point{{Value: 1, Pf: nan, Beta: Index(nan), PfCI: [2]float64{nan, nan}}}}},
		Updates:         []Update{{Variable: "fy", Prior: testNormal{1, 0}, After: testNormal{nan, 1}, Data: []float64{nan}}},
		Trace:           &Trace{Deflection: []float64{inf}, Load: []float64{nan}},
	}
}

func TestDegenerateDataSkipsPictures(t *testing.T) {
	b := degenerate()
	pics, notes := renderPictures(b, true, true)
	for _, p := range pics {
		// A picture may survive only if its data had something drawable.
		if p.fig.Name != "tornado" {
			t.Errorf("picture %s drawn from degenerate data", p.fig.Name)
		}
	}
	for _, n := range notes {
		t.Logf("note: %s", n)
	}
	out, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	for _, text := range []string{string(out), Markdown(b), SummaryText(b)} {
		if strings.Contains(text, "NaN") || strings.Contains(text, "Inf") {
			t.Errorf("text holds NaN or Inf")
		}
	}
	// The degenerate document cannot be JSON (beta is +Inf): Write says so
	// and leaves nothing behind.
	dir := t.TempDir()
	if _, err := Write(dir, b, nil); err == nil {
		t.Error("Write accepted a document with an infinite beta")
	}
}

func TestEmptyBundle(t *testing.T) {
	b := &Bundle{Doc: &Document{Title: "check only"}}
	dir := t.TempDir()
	paths, err := Write(dir, b, nil)
	if err != nil {
		t.Fatal(err)
	}
	// No samples and no pictures: the document, both summaries and the HTML.
	if len(paths) != 4 {
		t.Errorf("wrote %v", paths)
	}
}
