package report

import (
	"strings"
	"testing"

	"strutrisk/sim"
)

// A band narrower than its line is still drawn, one a series, and the
// legend and caption say that it may be hidden behind the line.
func TestSweepNarrowBands(t *testing.T) {
	t.Parallel()
	series := func(name string, shift float64) Series {
		s := Series{Name: name}
		for i, beta := range []float64{4.5, 4, 3.5, 3} {
			beta -= shift
			// A precise estimate: a band of ±0.005 in β.
			pf, lo, hi := sim.PfFromBeta(beta), sim.PfFromBeta(beta+0.005), sim.PfFromBeta(beta-0.005)
			s.Points = append(s.Points, Point{Value: 1000 * float64(i+1), Pf: pf, Beta: Index(beta), PfCI: [2]float64{lo, hi}})
		}
		return s
	}
	b := &Bundle{Doc: &Document{}, Series: []Series{series("a", 0), series("b", 0.5)}, SweepLabel: "member length (mm)"}
	f := sweepFigure(b)
	if f == nil {
		t.Fatal("no picture")
	}
	svg, err := f.render("svg")
	if err != nil {
		t.Fatal(err)
	}
	if n := strings.Count(string(svg), "fill-opacity"); n != 3 {
		t.Errorf("%d translucent fills in the picture, want 3: a band for each of the 2 series and the legend's swatch", n)
	}
	for _, s := range bandLegend {
		if !strings.Contains(string(svg), s) {
			t.Errorf("legend lacks %q", s)
		}
	}
	if !strings.Contains(f.Caption, "narrower than the line") {
		t.Errorf("caption %q does not say a band may be hidden behind its line", f.Caption)
	}
}
