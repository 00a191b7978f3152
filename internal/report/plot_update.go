package report

import (
	"math"
	"strconv"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// updateFigure draws the prior and the updated (predictive) density of one
// variable with the measurements as marks along the axis.
func updateFigure(u Update, k int) *figure {
	if u.Prior == nil || u.After == nil {
		return nil
	}
	scale, unit := display(u.Unit)
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, d := range []interface{ Quantile(float64) float64 }{u.Prior, u.After} {
		for _, q := range []float64{0.001, 0.999} {
			if v := d.Quantile(q); finite(v) {
				lo, hi = math.Min(lo, v), math.Max(hi, v)
			}
		}
	}
	var data plotter.XYs
	for _, v := range u.Data {
		if finite(v) {
			data = append(data, plotter.XY{X: v * scale})
			lo, hi = math.Min(lo, v), math.Max(hi, v)
		}
	}
	if !(hi > lo) {
		return nil
	}
	xlabel := u.Variable
	if unit != "" {
		xlabel += " (" + unit + ")"
	}
	ylabel := "probability density"
	if unit != "" {
		ylabel += " (1/" + unit + ")"
	}
	p := newPlot("Updating "+u.Variable+" from measurements", xlabel, ylabel)
	drawn := 0
	for _, c := range []struct {
		d      interface{ Prob(float64) float64 }
		name   string
		dashed bool
		col    int
	}{{u.Prior, "prior", true, 5}, {u.After, "updated (predictive)", false, 0}} {
		xy := curve(func(x float64) float64 { return c.d.Prob(x/scale) / scale }, lo*scale, hi*scale, 300)
		if len(xy) < 2 {
			continue
		}
		ln, err := plotter.NewLine(xy)
		if err != nil {
			continue
		}
		ln.LineStyle = lineStyle(seriesColor(c.col), 1.6, c.dashed)
		p.Add(ln)
		p.Legend.Add(c.name, ln)
		drawn++
	}
	if drawn == 0 {
		return nil
	}
	if len(data) > 0 {
		sc, err := plotter.NewScatter(data)
		if err == nil {
			sc.GlyphStyle = draw.GlyphStyle{Color: colFailure, Radius: vg.Points(3), Shape: draw.PyramidGlyph{}}
			p.Add(sc)
			p.Legend.Add("measurements ("+strconv.Itoa(len(data))+")", sc)
		}
	}
	p.Y.Min = 0
	return &figure{Name: "update-" + strconv.Itoa(k+1), Caption: updateCaption(u.Variable, unit), W: 14 * vg.Centimeter, H: 8.5 * vg.Centimeter, Plots: []*plot.Plot{p}}
}

// traceFigure draws the beam-column load-deflection path and the deflected
// shape at the limit, side by side.
func traceFigure(b *Bundle) *figure {
	t := b.Trace
	if t == nil {
		return nil
	}
	var plots []*plot.Plot
	path := finiteXYs(t.Deflection, t.Load)
	for i := range path {
		path[i].Y *= 1e-3
	}
	if len(path) >= 2 {
		p := newPlot("Load-deflection path", "lateral deflection at mid-height (mm)", "axial load (kN)")
		addGrid(p, true)
		ln, sc, err := plotter.NewLinePoints(path)
		if err == nil {
			ln.LineStyle = lineStyle(colCapacity, 1.6, false)
			sc.GlyphStyle = draw.GlyphStyle{Color: colCapacity, Radius: vg.Points(1.6), Shape: draw.CircleGlyph{}}
			p.Add(ln, sc)
			p.X.Min, p.Y.Min = math.Min(0, p.X.Min), 0
			plots = append(plots, p)
		}
	}
	shape := finiteXYs(t.Shape, t.Position)
	for i := range shape {
		shape[i].Y *= 1e-3
	}
	if len(shape) >= 2 {
		p := newPlot("Deflected shape at the limit", "lateral deflection v (mm)", "position along the member (m)")
		addGrid(p, true)
		ln, err := plotter.NewLine(shape)
		if err == nil {
			ln.LineStyle = lineStyle(colFailure, 1.6, false)
			p.Add(ln)
			// The straight member for reference.
			axis, err := plotter.NewLine(plotter.XYs{{X: 0, Y: shape[0].Y}, {X: 0, Y: shape[len(shape)-1].Y}})
			if err == nil {
				axis.LineStyle = lineStyle(colMuted, 0.8, true)
				p.Add(axis)
			}
			plots = append(plots, p)
		}
	}
	if len(plots) == 0 {
		return nil
	}
	w := 12 * vg.Centimeter
	if len(plots) == 2 {
		w = 22 * vg.Centimeter
	}
	return &figure{Name: "beam-column", Caption: "Numerical beam-column: axial load in kN against lateral deflection at mid-height in mm up to the limit, and the deflected shape there, deflection in mm along the member in m (dashed: the straight axis).", W: w, H: 9 * vg.Centimeter, Plots: plots}
}

// updateCaption says what an updating picture shows, in which unit.
func updateCaption(variable, unit string) string {
	if unit == "" {
		return "Prior and updated (predictive) probability density of " + variable + " (dimensionless); triangles mark the measurements."
	}
	return "Prior and updated (predictive) probability density of " + variable + " in " + unit + " (density in 1/" + unit + "); triangles mark the measurements."
}
