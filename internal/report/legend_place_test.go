package report

import (
	"testing"

	"gonum.org/v1/plot/plotter"
)

// TestBestLegendCorner: the legend goes to the corner that hides the
// fewest drawn points, the top right on a tie.
func TestBestLegendCorner(t *testing.T) {
	t.Parallel()
	// A falling curve N/Ny = 1/(1+λ²) over λ in [0, 3] and a cloud at the
	// top right.
	var pts plotter.XYs
	for i := 0; i <= 60; i++ {
		l := 3 * float64(i) / 60
		pts = append(pts, plotter.XY{X: l, Y: 1 / (1 + l*l)})
	}
	empty := bestLegendCorner(pts, 3, 1, 0.4, 0.3)
	if !empty.top || empty.left {
		t.Errorf("a falling curve alone: corner %+v, want the top right", empty)
	}
	for i := 0; i < 50; i++ {
		pts = append(pts, plotter.XY{X: 2.5 + 0.01*float64(i), Y: 0.9})
	}
	if c := bestLegendCorner(pts, 3, 1, 0.4, 0.3); c.top == empty.top && c.left == empty.left {
		t.Errorf("the legend stays on the cloud at the top right")
	}
}
