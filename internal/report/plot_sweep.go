package report

import (
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"strutrisk/sim"
)

// bandLegend names the interval bands of the sweep picture.
// The second line has no swatch: gonum's legend writes one line an entry.
var bandLegend = [2]string{"95% interval band", "(narrower than the line where not visible)"}

// sweepFigure draws, for each series (variant), the reliability index
// against the swept parameter with its interval as a band, and next to it
// the failure probability on a logarithmic axis.
func sweepFigure(b *Bundle) *figure {
	if len(b.Series) == 0 {
		return nil
	}
	xlabel := b.SweepLabel
	if xlabel == "" {
		xlabel = "swept parameter"
	}
	axisLabel := xlabel
	if newLambdaTicks(b, niceTicks{}) != nil {
		axisLabel = lambdaAxisLabel(b, xlabel)
	}
	pb := newPlot("Reliability index", axisLabel, "reliability index β (–)")
	pp := newPlot("Probability of failure", axisLabel, "probability of failure pf (log scale)")
	for _, p := range []*plot.Plot{pb, pp} {
		if lt := newLambdaTicks(b, p.X.Tick.Marker); lt != nil {
			p.X.Tick.Marker = lt
		}
	}
	addGrid(pb, false)
	addGrid(pp, false)
	drawn, bands := 0, 0
	// The β panel's legend entries, added at the end: the curves are named
	// there only when the pf panel, in the same colours, is not drawn.
	type entry struct {
		name   string
		thumbs []plot.Thumbnailer
	}
	var curves, marks []entry
	pfMin, pfMax := math.Inf(1), math.Inf(-1)
	xmin, xmax := math.Inf(1), math.Inf(-1)
	models := make([]string, len(b.Series))
	for i, s := range b.Series {
		models[i] = s.Model
	}
	glyphs := seriesGlyphs(models)
	for i, s := range b.Series {
		style := modelStyle(s.Model)
		c := style.Color
		var beta, pf, lo, hi plotter.XYs
		for _, pt := range s.Points {
			if !finite(pt.Value) {
				continue
			}
			if finite(float64(pt.Beta)) {
				beta = append(beta, plotter.XY{X: pt.Value, Y: float64(pt.Beta)})
			}
			if pt.Pf > 0 && finite(pt.Pf) {
				pf = append(pf, plotter.XY{X: pt.Value, Y: math.Log10(pt.Pf)})
				pfMin, pfMax = math.Min(pfMin, pt.Pf), math.Max(pfMax, pt.Pf)
			}
			// beta interval from the pf interval (the upper pf gives the lower beta).
			bl, bh := sim.BetaFromPf(pt.PfCI[1]), sim.BetaFromPf(pt.PfCI[0])
			if finite(bl) && finite(bh) && bl <= bh {
				lo = append(lo, plotter.XY{X: pt.Value, Y: bl})
				hi = append(hi, plotter.XY{X: pt.Value, Y: bh})
			}
			xmin, xmax = math.Min(xmin, pt.Value), math.Max(xmax, pt.Value)
		}
		name := s.Name
		if name == "" {
			name = "study"
		}
		if len(lo) >= 2 {
			band := append(plotter.XYs(nil), lo...)
			for k := len(hi) - 1; k >= 0; k-- {
				band = append(band, hi[k])
			}
			if pg, err := plotter.NewPolygon(band); err == nil {
				pg.Color = faded(c, 0x30)
				pg.LineStyle.Width = 0
				pb.Add(pg)
				bands++
			}
		}
		if len(beta) > 0 {
			ln, sc, err := plotter.NewLinePoints(beta)
			if err == nil {
				ln.LineStyle = style.line(1.5)
				sc.GlyphStyle = draw.GlyphStyle{Color: c, Radius: vg.Points(2.6), Shape: glyphs[i]}
				pb.Add(ln, sc)
				curves = append(curves, entry{name, []plot.Thumbnailer{ln, sc}})
				drawn++
			}
		}
		if len(pf) > 1 && pf[len(pf)-1].Y > pf[0].Y {
			// pf rises to the right: the legend goes where it is small.
			pp.Legend.Left = true
		}
		if len(pf) > 0 {
			ln, sc, err := plotter.NewLinePoints(pf)
			if err == nil {
				ln.LineStyle = style.line(1.5)
				sc.GlyphStyle = draw.GlyphStyle{Color: c, Radius: vg.Points(2.6), Shape: glyphs[i]}
				pp.Add(ln, sc)
				pp.Legend.Add(name, ln, sc)
			}
		}
	}
	if drawn == 0 {
		return nil
	}
	d := doc(b)
	if d.TargetBeta != nil && finite(*d.TargetBeta) && xmax >= xmin {
		t := *d.TargetBeta
		if ln, err := plotter.NewLine(plotter.XYs{{X: xmin, Y: t}, {X: xmax, Y: t}}); err == nil {
			ln.LineStyle = lineStyle(colFailure, 1, true)
			pb.Add(ln)
			marks = append(marks, entry{"target β = " + fixed(t, 2), []plot.Thumbnailer{ln}})
		}
		if pt := sim.PfFromBeta(t); pt > 0 && finite(pfMin) {
			if ln, err := plotter.NewLine(plotter.XYs{{X: xmin, Y: math.Log10(pt)}, {X: xmax, Y: math.Log10(pt)}}); err == nil {
				ln.LineStyle = lineStyle(colFailure, 1, true)
				pp.Add(ln)
				pp.Legend.Add("target pf = "+prob(pt), ln)
				pfMin, pfMax = math.Min(pfMin, pt), math.Max(pfMax, pt)
			}
		}
	}
	if bands > 0 {
		// One entry for every band: a band of a precise estimate is
		// narrower than its line, and no wider than it is drawn.
		sw, err := plotter.NewPolygon(plotter.XYs{{X: 0, Y: 0}, {X: 1, Y: 0}, {X: 1, Y: 1}})
		if err == nil {
			sw.Color = faded(colSafe, 0x50)
			sw.LineStyle.Width = 0
			marks = append(marks, entry{bandLegend[0], []plot.Thumbnailer{sw}}, entry{bandLegend[1], nil})
		}
	}
	// Headroom above the curves for the legend: less when the curves are
	// named in the pf panel and the β legend is short.
	if lo, hi := pb.Y.Min, pb.Y.Max; finite(lo) && finite(hi) {
		span := math.Max(hi-lo, 0.5)
		room := 0.45
		if finite(pfMin) && pfMin > 0 && len(marks) <= 3 {
			room = 0.3
		}
		pb.Y.Max = hi + room*span
	}
	plots := []*plot.Plot{pb}
	if finite(pfMin) && pfMin > 0 {
		// The axis holds log10(pf); ticks are labelled as probabilities.
		pp.Y.Tick.Marker = exponentTicks{}
		pp.Y.Min = math.Floor(math.Log10(pfMin))
		pp.Y.Max = math.Min(0, math.Ceil(math.Log10(pfMax))+2) // headroom for the legend
		if pp.Y.Max <= pp.Y.Min {
			pp.Y.Max = pp.Y.Min + 1
		}
		plots = append(plots, pp)
	}
	if len(plots) == 1 {
		marks = append(curves, marks...)
	}
	for _, e := range marks {
		pb.Legend.Add(e.name, e.thumbs...)
	}
	w := 16 * vg.Centimeter
	if len(plots) == 2 {
		w = 24 * vg.Centimeter
	}
	caption := "Reliability index β (dimensionless) and probability of failure pf (dimensionless, log scale) against " + xlabel + ", one curve per variant (named in the legend of the pf panel when both are drawn); dashed: the target."
	if newLambdaTicks(b, niceTicks{}) != nil {
		caption += " Below each value of the axis: the study's nominal relative slenderness λ (dimensionless) about its " + b.SweepLambdaAxis + " axis there."
	}
	if bands > 0 {
		caption += " The shaded band round each β curve is its 95% interval, drawn to scale: where it is narrower than the line it is hidden behind it."
	}
	return &figure{Name: "sweep", Caption: caption, W: w, H: 9 * vg.Centimeter, Plots: plots}
}
