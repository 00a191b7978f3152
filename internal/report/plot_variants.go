package report

import (
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"strutrisk/sim"
)

// variantsFigure draws the reliability index of the study and of each
// variant with its 95% interval, one row each, the study on top; the
// target, if any, is a dashed line. It is left out when a sweep draws the
// variants as curves.
func variantsFigure(b *Bundle) *figure {
	d := doc(b)
	if len(d.Variants) == 0 || len(b.Series) > 0 {
		return nil
	}
	type row struct {
		name, model  string
		beta, lo, hi float64
		untrusted    bool
	}
	var rows []row
	if d.Beta != nil && len(d.PfCI) == 2 {
		name := "study"
		if b.StudyModel != "" {
			name += " (" + b.StudyModel + ")"
		}
		rows = append(rows, row{name, b.StudyModel, float64(*d.Beta), sim.BetaFromPf(d.PfCI[1]), sim.BetaFromPf(d.PfCI[0]), d.Trusted != nil && !*d.Trusted})
	}
	for _, v := range d.Variants {
		rows = append(rows, row{v.Name, b.VariantModels[v.Name], float64(v.Beta), sim.BetaFromPf(v.PfCI[1]), sim.BetaFromPf(v.PfCI[0]), v.Untrusted()})
	}
	models := make([]string, len(rows))
	for i, r := range rows {
		models[i] = r.model
	}
	glyphs := seriesGlyphs(models)
	p := newPlot("Reliability index of the variants", "reliability index β (–)", "")
	addGridLines(p, false, true)
	n := len(rows)
	names := make([]string, n)
	xmin, xmax := math.Inf(1), math.Inf(-1)
	drawn := 0
	// The cases the engine does not trust: a hollow grey ring marked ?,
	// without an interval, as in the sweep picture.
	var doubts plotter.XYs
	for i, r := range rows {
		// The study on top, the variants below in the order of the file.
		y := float64(n - 1 - i)
		names[n-1-i] = r.name
		if !finite(r.beta) || r.beta > 1e300 {
			continue
		}
		xmin, xmax = math.Min(xmin, r.beta), math.Max(xmax, r.beta)
		drawn++
		if r.untrusted {
			doubts = append(doubts, plotter.XY{X: r.beta, Y: y})
			continue
		}
		c := modelStyle(r.model).Color
		if finite(r.lo) && finite(r.hi) && r.lo <= r.hi {
			ln, err := plotter.NewLine(plotter.XYs{{X: r.lo, Y: y}, {X: r.hi, Y: y}})
			if err == nil {
				ln.LineStyle = lineStyle(c, 3, false)
				ln.LineStyle.Color = faded(c, 0x60)
				p.Add(ln)
				xmin, xmax = math.Min(xmin, r.lo), math.Max(xmax, r.hi)
			}
		}
		sc, err := plotter.NewScatter(plotter.XYs{{X: r.beta, Y: y}})
		if err != nil {
			return nil
		}
		sc.GlyphStyle = draw.GlyphStyle{Color: c, Radius: vg.Points(3.5), Shape: glyphs[i]}
		p.Add(sc)
	}
	if drawn == 0 {
		return nil
	}
	caption := "Reliability index β (dimensionless) of the study and of each variant (bar: its 95% interval), all from the same random numbers; dashed: the target. The colour is the capacity model's, the same in every picture; a second case of one model takes another mark."
	doubt := addDoubts(p, doubts)
	if doubt != nil {
		caption += " A hollow grey ring marked ? is a case whose estimate the engine does not trust (the warnings and the tables say why): it is no result, it has no interval drawn and it is not judged against the target."
	}
	if d.TargetBeta != nil && finite(*d.TargetBeta) {
		t := *d.TargetBeta
		ln, err := plotter.NewLine(plotter.XYs{{X: t, Y: -0.5}, {X: t, Y: float64(n) - 0.5}})
		if err == nil {
			ln.LineStyle = lineStyle(colFailure, 1, true)
			p.Add(ln)
			p.Legend.Add("target β = "+fixed(t, 2), ln)
			xmin, xmax = math.Min(xmin, t), math.Max(xmax, t)
		}
	}
	if doubt != nil {
		p.Legend.Add(doubtLegend, doubt)
	}
	span := math.Max(xmax-xmin, 0.2)
	p.X.Min, p.X.Max = xmin-0.15*span, xmax+0.15*span
	// A free band above the rows holds the legend, clear of the target line.
	p.Y.Min, p.Y.Max = -0.6, float64(n)+0.3
	p.NominalY(names...)
	p.Y.Tick.Label.Font.Size = 9
	h := vg.Length(3.5+0.9*float64(n)) * vg.Centimeter
	return &figure{Name: "variants", Caption: caption, W: 16 * vg.Centimeter, H: h, Plots: []*plot.Plot{p}}
}
