package report

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"

	"strutrisk/sim"
)

// bandLegend names the interval bands of the sweep picture.
// The second line has no swatch: gonum's legend writes one line an entry.
var bandLegend = [2]string{"95% interval band", "(narrower than the line where not visible)"}

// sweepFigure draws, for each series (variant), the reliability index
// against the swept parameter with its interval as a band, and next to it
// the failure probability on a logarithmic axis; for a sweep of several
// keys in step, zipFigure's picture.
func sweepFigure(b *Bundle) *figure {
	if len(b.Series) == 0 {
		return zipFigure(b)
	}
	xlabel := b.SweepLabel
	if xlabel == "" {
		xlabel = "swept parameter"
	}
	sp := sweepSpec{series: b.Series, axisLabel: xlabel, target: doc(b).TargetBeta}
	lam := newLambdaTicks(b, niceTicks{}) != nil
	if lam {
		sp.axisLabel = lambdaAxisLabel(b, xlabel)
		sp.ticker = func(base plot.Ticker) plot.Ticker { return newLambdaTicks(b, base) }
	}
	d := drawSweep(sp)
	if d == nil {
		return nil
	}
	caption := "Reliability index β (dimensionless) and probability of failure pf (dimensionless, log scale) against " + xlabel + ", one curve per variant (named in the legend of the pf panel when both are drawn); dashed: the target."
	if lam {
		caption += " Below each value of the axis: the study's nominal relative slenderness λ (dimensionless) about its " + b.SweepLambdaAxis + " axis there."
	}
	caption += d.captionTail()
	return &figure{Name: "sweep", Caption: caption, W: d.width(), H: 9 * vg.Centimeter, Plots: d.plots}
}

// sweepSpec is what the sweep picture draws: the curves, the x axis and
// the target.
type sweepSpec struct {
	series    []Series
	axisLabel string
	// ticker, when set, makes the x axis's ticker from the default one.
	ticker func(base plot.Ticker) plot.Ticker
	target *float64
}

// sweptDrawing is the drawn sweep picture: its panels (β, and pf when a
// case failed), and how many interval bands and untrusted cases it shows.
type sweptDrawing struct {
	plots         []*plot.Plot
	bands, doubts int
}

// width is the picture's width for its panels.
func (d *sweptDrawing) width() vg.Length {
	if len(d.plots) == 2 {
		return 24 * vg.Centimeter
	}
	return 16 * vg.Centimeter
}

// captionTail is what the caption says of the bands and the untrusted
// cases.
func (d *sweptDrawing) captionTail() string {
	s := ""
	if d.bands > 0 {
		s += " The shaded band round each β curve is its 95% interval, drawn to scale: where it is narrower than the line it is hidden behind it."
	}
	if d.doubts > 0 {
		s += " A hollow grey ring marked ? is a case whose estimate the engine does not trust (the warnings say why): it is no result, no line joins it and it is not judged against the target."
	}
	return s
}

// legendEntry is an entry of a legend added after the curves.
type legendEntry struct {
	name   string
	thumbs []plot.Thumbnailer
}

// drawSweep draws the β and pf panels of sp; nil when no curve has a
// point to draw.
func drawSweep(sp sweepSpec) *sweptDrawing {
	pb := newPlot("Reliability index", sp.axisLabel, "reliability index β (–)")
	pp := newPlot("Probability of failure", sp.axisLabel, "probability of failure pf (log scale)")
	for _, p := range []*plot.Plot{pb, pp} {
		if sp.ticker != nil {
			p.X.Tick.Marker = sp.ticker(p.X.Tick.Marker)
		}
		addGrid(p, false)
	}
	d := &sweptDrawing{}
	// The β panel's legend entries, added at the end: the curves are named
	// there only when the pf panel, in the same colours, is not drawn.
	var curves, marks []legendEntry
	pfMin, pfMax := math.Inf(1), math.Inf(-1)
	xmin, xmax := math.Inf(1), math.Inf(-1)
	models := make([]string, len(sp.series))
	for i, s := range sp.series {
		models[i] = s.Model
	}
	glyphs := seriesGlyphs(models)
	var doubtThumb plot.Thumbnailer
	for i, s := range sp.series {
		style := modelStyle(s.Model)
		c := newSweepCurve(s.Points)
		for _, pt := range s.Points {
			if finite(pt.Value) {
				xmin, xmax = math.Min(xmin, pt.Value), math.Max(xmax, pt.Value)
			}
		}
		pfMin, pfMax = c.pfRange(pfMin, pfMax)
		name := s.Name
		if name == "" {
			name = "study"
		}
		d.bands += addBands(pb, c.bands(), style.Color)
		if thumbs := addRuns(pb, c.beta, style, glyphs[i]); thumbs != nil {
			curves = append(curves, legendEntry{name, thumbs})
		}
		if t := addDoubts(pb, c.doubtBeta); t != nil {
			doubtThumb = t
			d.doubts += len(c.doubtBeta)
		}
		if len(c.pf) > 0 && pfRises(c.pf) {
			// pf rises to the right: the legend goes where it is small.
			pp.Legend.Left = true
		}
		if thumbs := addRuns(pp, c.pf, style, glyphs[i]); thumbs != nil {
			pp.Legend.Add(name, thumbs...)
		}
		addDoubts(pp, c.doubtPf)
	}
	if len(curves) == 0 && d.doubts == 0 {
		return nil
	}
	if sp.target != nil && finite(*sp.target) && xmax >= xmin {
		marks = append(marks, addTargets(pb, pp, *sp.target, xmin, xmax, &pfMin, &pfMax)...)
	}
	if d.bands > 0 {
		// One entry for every band: a band of a precise estimate is
		// narrower than its line, and no wider than it is drawn.
		sw, err := plotter.NewPolygon(plotter.XYs{{X: 0, Y: 0}, {X: 1, Y: 0}, {X: 1, Y: 1}})
		if err == nil {
			sw.Color = faded(colSafe, 0x50)
			sw.LineStyle.Width = 0
			marks = append(marks, legendEntry{bandLegend[0], []plot.Thumbnailer{sw}}, legendEntry{bandLegend[1], nil})
		}
	}
	if doubtThumb != nil {
		marks = append(marks, legendEntry{doubtLegend, []plot.Thumbnailer{doubtThumb}})
		pp.Legend.Add(doubtLegend, doubtThumb)
	}
	d.plots = finishSweepPanels(pb, pp, curves, marks, pfMin, pfMax)
	return d
}

// addBands draws the interval bands in c, faded, and returns how many.
func addBands(p *plot.Plot, bands []plotter.XYs, c color.Color) int {
	n := 0
	for _, band := range bands {
		if pg, err := plotter.NewPolygon(band); err == nil {
			pg.Color = faded(c, 0x30)
			pg.LineStyle.Width = 0
			p.Add(pg)
			n++
		}
	}
	return n
}

// pfRises tells whether the first run of pf ends higher than it starts.
func pfRises(runs []plotter.XYs) bool {
	first, last := runs[0][0], runs[len(runs)-1][len(runs[len(runs)-1])-1]
	return last.Y > first.Y
}

// addTargets draws the target as dashed lines in both panels, widens the
// pf range to hold it, and returns the β panel's legend entry.
func addTargets(pb, pp *plot.Plot, t, xmin, xmax float64, pfMin, pfMax *float64) []legendEntry {
	var out []legendEntry
	if ln, err := plotter.NewLine(plotter.XYs{{X: xmin, Y: t}, {X: xmax, Y: t}}); err == nil {
		ln.LineStyle = lineStyle(colFailure, 1, true)
		pb.Add(ln)
		out = append(out, legendEntry{"target β = " + fixed(t, 2), []plot.Thumbnailer{ln}})
	}
	if pt := sim.PfFromBeta(t); pt > 0 && finite(*pfMin) {
		if ln, err := plotter.NewLine(plotter.XYs{{X: xmin, Y: math.Log10(pt)}, {X: xmax, Y: math.Log10(pt)}}); err == nil {
			ln.LineStyle = lineStyle(colFailure, 1, true)
			pp.Add(ln)
			pp.Legend.Add("target pf = "+prob(pt), ln)
			*pfMin, *pfMax = math.Min(*pfMin, pt), math.Max(*pfMax, pt)
		}
	}
	return out
}

// finishSweepPanels sets the axes' ranges with room for the legends,
// writes the β panel's legend and returns the panels to draw: β, and pf
// when a case failed.
func finishSweepPanels(pb, pp *plot.Plot, curves, marks []legendEntry, pfMin, pfMax float64) []*plot.Plot {
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
	return plots
}
