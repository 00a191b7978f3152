package report

import (
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// lifeFigure draws the reliability index over the remaining life: the
// annual β (failure within each year) and the cumulative β (failure at
// any time from now), the annual target as a dashed line and the end of
// life, when there is one, as a vertical line.
func lifeFigure(b *Bundle) *figure {
	d := doc(b)
	if len(d.Life) == 0 {
		return nil
	}
	p := newPlot("Reliability over the remaining life", "years from now", "reliability index β (–)")
	addGrid(p, false)
	var annual, cum plotter.XYs
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, pt := range d.Life {
		x := float64(pt.Year)
		if y := float64(pt.Beta); finite(y) {
			annual = append(annual, plotter.XY{X: x, Y: y})
			lo, hi = math.Min(lo, y), math.Max(hi, y)
		}
		if y := float64(pt.BetaCumulative); finite(y) {
			cum = append(cum, plotter.XY{X: x, Y: y})
			lo, hi = math.Min(lo, y), math.Max(hi, y)
		}
	}
	if len(annual) == 0 && len(cum) == 0 {
		return nil
	}
	x0, x1 := 0.0, float64(d.Life[len(d.Life)-1].Year)
	for _, s := range []struct {
		xy    plotter.XYs
		name  string
		col   int
		shape draw.GlyphDrawer
	}{
		{annual, "annual β (failure within the year)", 0, draw.CircleGlyph{}},
		{cum, "cumulative β (failure from now to the year)", 1, draw.SquareGlyph{}},
	} {
		if len(s.xy) == 0 {
			continue
		}
		ln, sc, err := plotter.NewLinePoints(s.xy)
		if err != nil {
			continue
		}
		ln.LineStyle = lineStyle(seriesColor(s.col), 1.5, false)
		sc.GlyphStyle = draw.GlyphStyle{Color: seriesColor(s.col), Radius: vg.Points(2), Shape: s.shape}
		if len(s.xy) > 40 {
			sc.GlyphStyle.Radius = vg.Points(1)
		}
		p.Add(ln, sc)
		p.Legend.Add(s.name, ln, sc)
	}
	if lb := d.LifeBasis; lb != nil && lb.TargetBeta != nil && finite(*lb.TargetBeta) {
		t := *lb.TargetBeta
		if ln, err := plotter.NewLine(plotter.XYs{{X: x0, Y: t}, {X: x1, Y: t}}); err == nil {
			ln.LineStyle = lineStyle(colFailure, 1, true)
			p.Add(ln)
			p.Legend.Add("annual target β = "+fixed(t, 2), ln)
			lo, hi = math.Min(lo, t), math.Max(hi, t)
		}
	}
	if d.LifeEnd != nil && finite(lo) {
		x := float64(*d.LifeEnd)
		if ln, err := plotter.NewLine(plotter.XYs{{X: x, Y: lo}, {X: x, Y: hi}}); err == nil {
			ln.LineStyle = lineStyle(colMuted, 1, true)
			p.Add(ln)
			p.Legend.Add("end of life: year "+sig(x, 4), ln)
		}
	}
	p.X.Min, p.X.Max = x0, x1
	if finite(lo) && finite(hi) {
		span := math.Max(hi-lo, 0.5)
		p.Y.Min, p.Y.Max = lo-0.1*span, hi+0.45*span // headroom for the legend
	}
	p.Legend.Top = true
	caption := "Reliability index β (dimensionless) against the years from now (years): the annual β of failure within each year under that year's maxima of the variable loads, and the cumulative β of failure at any time from now to that year (the same member every year); dashed red: the annual target"
	if d.LifeEnd != nil {
		caption += "; dashed grey: the first year the annual β is below it"
	}
	return &figure{Name: "life", Caption: caption + ".", W: 16 * vg.Centimeter, H: 9 * vg.Centimeter, Plots: []*plot.Plot{p}}
}
