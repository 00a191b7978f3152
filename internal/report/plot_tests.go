package report

import (
	"math"
	"strconv"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// TestsPicture draws the r_e - r_t diagram of EN 1990 Annex D, D.8.2.2
// step 1: each test's measured resistance re against the model's
// theoretical resistance rt (both in N), the line r_e = b r_t of the
// mean-value correction and the line of equality, in kN. It returns the
// PNG.
func TestsPicture(re, rt []float64, b float64) ([]byte, error) {
	const kN = 1e-3
	pts := make(plotter.XYs, 0, len(re))
	hi := 0.0
	for i := range re {
		pts = append(pts, plotter.XY{X: rt[i] * kN, Y: re[i] * kN})
		hi = math.Max(hi, math.Max(rt[i], re[i])*kN)
	}
	hi *= 1.08
	p := newPlot("Tests against the model (EN 1990 D.8)", "theoretical resistance r_t (kN)", "measured resistance r_e (kN)")
	addGridLines(p, true, true)
	for _, l := range []struct {
		slope  float64
		name   string
		col    int
		dashed bool
	}{{1, "r_e = r_t", 5, true}, {b, "r_e = b r_t, b = " + strconv.FormatFloat(b, 'f', 3, 64), 0, false}} {
		ln, err := plotter.NewLine(plotter.XYs{{X: 0, Y: 0}, {X: hi / math.Max(1, l.slope), Y: hi / math.Max(1, l.slope) * l.slope}})
		if err != nil {
			return nil, err
		}
		ln.LineStyle = lineStyle(seriesColor(l.col), 1.4, l.dashed)
		p.Add(ln)
		p.Legend.Add(l.name, ln)
	}
	sc, err := plotter.NewScatter(pts)
	if err != nil {
		return nil, err
	}
	sc.GlyphStyle = draw.GlyphStyle{Color: colFailure, Radius: vg.Points(2.6), Shape: draw.CircleGlyph{}}
	p.Add(sc)
	p.Legend.Add("tests ("+strconv.Itoa(len(pts))+")", sc)
	p.Legend.Top, p.Legend.Left = true, true
	p.X.Min, p.Y.Min, p.X.Max, p.Y.Max = 0, 0, hi, hi
	f := &figure{Name: "model-factor", W: 13 * vg.Centimeter, H: 12 * vg.Centimeter, Plots: []*plot.Plot{p}}
	return f.render("png")
}
