package report

import (
	"math"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"strutrisk/sim"
)

// decadeTicks marks a logarithmic axis of counts: powers of ten labelled in
// digits grouped by thousands (1e7 and beyond as 1e7, 1e8...), unlabelled
// minor ticks at 2..9 times each power, and, when the axis spans less than
// two decades, labels at 2 and 5 times each power as well (at every
// multiple when it spans less than a factor of 5, so that a short run
// still has more than one label).
type decadeTicks struct{}

// Ticks implements plot.Ticker. min and max must be positive.
func (decadeTicks) Ticks(min, max float64) []plot.Tick {
	if !(min > 0) || !(max > min) || !finite(min) || !finite(max) {
		return nil
	}
	short, narrow := max/min < 100, max/min < 5
	var ticks []plot.Tick
	for e := int(math.Floor(math.Log10(min))); e <= int(math.Ceil(math.Log10(max))); e++ {
		p := math.Pow10(e)
		for k := 1; k <= 9; k++ {
			v := p * float64(k)
			if v < min*0.999 || v > max*1.001 {
				continue
			}
			t := plot.Tick{Value: v}
			if k == 1 || (short && (k == 2 || k == 5)) || narrow {
				t.Label = countLabel(v)
			}
			ticks = append(ticks, t)
		}
	}
	return ticks
}

// countLabel writes a count for an axis: grouped digits up to ten million,
// then 1e7, 2e7...
func countLabel(v float64) string {
	if v >= 1 && v < 1e7 {
		return thousands(int64(math.Round(v)))
	}
	return sci(v, 1)
}

// exponentTicks mark a linear axis that holds log10 of a probability:
// major ticks at whole exponents labelled 1e-3 etc., minor ticks at
// log10(k * 10^e) for k = 2..9. (A linear axis of log10 values is used
// rather than plot.LogScale, whose axis-label placement leaves a gap.)
type exponentTicks struct{}

// Ticks implements plot.Ticker.
func (exponentTicks) Ticks(min, max float64) []plot.Tick {
	if !finite(min) || !finite(max) || !(max > min) || max-min > 300 {
		return nil
	}
	var ticks []plot.Tick
	for e := math.Floor(min); e <= math.Ceil(max); e++ {
		if e >= min-1e-9 && e <= max+1e-9 {
			ticks = append(ticks, plot.Tick{Value: e, Label: sci(math.Pow(10, e), 1)})
		}
		for k := 2; k <= 9; k++ {
			if m := e + math.Log10(float64(k)); m >= min && m <= max {
				ticks = append(ticks, plot.Tick{Value: m})
			}
		}
	}
	return ticks
}

// convergenceFigure draws the failure probability estimate and its
// interval against the number of evaluations on a logarithmic axis. The pf
// axis spans the estimate and its band with a little room round them, not
// from zero, and is logarithmic when they span more than a decade. When
// the trace carries no interval at its last point (subset simulation gives
// none along the way), the interval of the final estimate is drawn there
// as a bar. The legend gives the final estimate and interval in figures.
func convergenceFigure(b *Bundle) *figure {
	if useReplicates(b) {
		return replicatesFigure(b)
	}
	levels := b.TraceKind == sim.TraceLevels
	var pts, lower, upper plotter.XYs
	for _, c := range b.Convergence {
		x := float64(c.Evaluations)
		if !(x > 0) || !finite(c.Pf) || c.Pf < 0 {
			continue
		}
		pts = append(pts, plotter.XY{X: x, Y: c.Pf})
		// A band point must hold the estimate: a zero interval is "none".
		if lo, hi := c.PfCI[0], c.PfCI[1]; finite(lo) && finite(hi) && lo <= c.Pf && c.Pf <= hi && lo < hi {
			lower = append(lower, plotter.XY{X: x, Y: lo})
			upper = append(upper, plotter.XY{X: x, Y: hi})
		}
	}
	if len(pts) < 2 || pts[0].X == pts[len(pts)-1].X {
		return nil
	}
	last := pts[len(pts)-1]
	if len(lower) < 2 {
		lower, upper = nil, nil
	}
	last, final, finalBar := finalInterval(b, last, lower)
	appended := last != pts[len(pts)-1]
	if appended {
		pts = append(pts, last) // the final estimate after the last level
	}
	if !finalBar && len(lower) > 0 && lower[len(lower)-1].X == last.X {
		final = [2]float64{lower[len(lower)-1].Y, upper[len(upper)-1].Y}
	}

	// The range of everything drawn, and of its positive part.
	vmin, vmax, pmin := math.Inf(1), math.Inf(-1), math.Inf(1)
	see := func(y float64) {
		vmin, vmax = math.Min(vmin, y), math.Max(vmax, y)
		if y > 0 {
			pmin = math.Min(pmin, y)
		}
	}
	for _, set := range []plotter.XYs{pts, lower, upper} {
		for _, q := range set {
			see(q.Y)
		}
	}
	if finalBar {
		see(final[0])
		see(final[1])
	}
	logAxis := pmin > 0 && finite(pmin) && vmax/pmin > 10

	ylabel := "probability of failure pf (–)"
	if logAxis {
		ylabel = "probability of failure pf (log scale)"
	}
	title := "Convergence of the estimate"
	if levels {
		title = "Levels of subset simulation"
		ylabel = strings.Replace(ylabel, "probability of failure pf", "probability P(g ≤ b) of the level", 1)
	}
	p := newPlot(title, "limit-state evaluations (log scale)", ylabel)
	addGrid(p, false)
	// On a log axis the plotted values are log10(pf); a zero estimate (no
	// failure yet) is left out and a zero lower bound drawn at the bottom.
	var bottom float64
	if logAxis {
		span := math.Log10(vmax / pmin)
		p.Y.Min = math.Log10(pmin) - 0.08*span
		if fl := math.Floor(math.Log10(pmin) - 0.05); span >= 2 || math.Log10(pmin)-fl < 0.5 {
			p.Y.Min = fl // a labelled power of ten at the bottom, if near
		}
		// Room for the legend, but no probability above 1.
		p.Y.Max = math.Max(math.Min(math.Log10(vmax)+0.35*span, 0), math.Log10(vmax)+0.1*span)
		bottom = p.Y.Min
		p.Y.Tick.Marker = exponentTicks{}
	} else {
		span := vmax - vmin
		if !(span > 0) {
			span = math.Max(0.2*math.Abs(vmax), 1e-12)
		}
		p.Y.Min = math.Max(0, vmin-0.12*span)
		p.Y.Max = vmax + 0.45*span // room for the legend
		p.Y.Tick.Marker = niceTicks{Format: axisProb(p.Y.Min, p.Y.Max)}
	}
	ty := func(y float64) (float64, bool) {
		if !logAxis {
			return y, true
		}
		if y <= 0 {
			return bottom, false
		}
		return math.Log10(y), true
	}
	tr := func(set plotter.XYs, keepZero bool) plotter.XYs {
		var out plotter.XYs
		for _, q := range set {
			if y, ok := ty(q.Y); ok || keepZero {
				out = append(out, plotter.XY{X: q.X, Y: y})
			}
		}
		return out
	}
	finalText := func(lo, hi float64) string { return prob(lo) + " to " + prob(hi) }
	if len(lower) >= 2 {
		band := tr(lower, true)
		up := tr(upper, true)
		for i := len(up) - 1; i >= 0; i-- {
			band = append(band, up[i])
		}
		if pg, err := plotter.NewPolygon(band); err == nil {
			pg.Color = faded(colCapacity, 0x40)
			pg.LineStyle.Width = 0
			p.Add(pg)
			label := "95% interval"
			if finite(final[0]) && !finalBar {
				label += " (final " + finalText(final[0], final[1]) + ")"
			}
			p.Legend.Add(label, pg)
		}
	}
	line := tr(pts, false)
	if len(line) == 0 {
		return nil
	}
	ln, err := plotter.NewLine(line)
	if err != nil {
		return nil
	}
	ln.LineStyle = lineStyle(colCapacity, 1.5, false)
	p.Add(ln)
	// The final estimate as a dot, named with its value.
	var dot *plotter.Scatter
	if y, ok := ty(last.Y); ok {
		if sc, err := plotter.NewScatter(plotter.XYs{{X: last.X, Y: y}}); err == nil {
			sc.GlyphStyle = draw.GlyphStyle{Color: colCapacity, Radius: vg.Points(2.5), Shape: draw.CircleGlyph{}}
			p.Add(sc)
			dot = sc
		}
	}
	switch {
	case levels && dot != nil:
		p.Legend.Add("intermediate levels P(g ≤ b_k)", ln)
		p.Legend.Add("estimate of pf (the last level, "+prob(last.Y)+")", dot)
	case levels:
		p.Legend.Add("intermediate levels P(g ≤ b_k)", ln)
	case dot != nil:
		p.Legend.Add("estimate of pf (final "+prob(last.Y)+")", ln, dot)
	default:
		p.Legend.Add("estimate of pf", ln)
	}
	if finalBar {
		ylo, _ := ty(final[0])
		yhi, _ := ty(final[1])
		ymid, _ := ty(last.Y)
		eb, err := plotter.NewYErrorBars(finalBar1{x: last.X, y: ymid, lo: ymid - ylo, hi: yhi - ymid})
		if err == nil {
			eb.LineStyle = lineStyle(colInk, 1, false)
			eb.CapWidth = vg.Points(6)
			p.Add(eb)
			p.Legend.Add("95% interval of the final estimate ("+finalText(final[0], final[1])+")", barThumb{eb.LineStyle})
		}
	}
	p.Legend.Top = true
	p.X.Scale = plot.LogScale{}
	if finalBar {
		p.X.Max = last.X * 1.06 // room for the bar's caps
	}
	p.X.Tick.Marker = decadeTicks{}
	caption := "Estimate of the failure probability pf (dimensionless) and its 95% interval as the number of limit-state evaluations (log axis) grows. "
	if levels {
		caption = "Subset simulation does not refine one estimate as it goes: each point is the probability P(g ≤ b_k) of an intermediate level, the product of the conditional probabilities so far, as the threshold b_k falls towards 0 with each level of samples (log axis of evaluations). Only the last point, at b = 0, is the estimate of the failure probability pf (dimensionless). "
	}
	if logAxis {
		caption += "The pf axis is logarithmic because the values span more than a decade"
		if vmin <= 0 {
			caption += "; an estimate of zero (no failure yet) is not drawn, and a lower bound of zero is drawn at the bottom edge"
		}
		caption += "."
	} else {
		caption += "The pf axis spans the estimate and its interval, not from zero."
	}
	switch {
	case finalBar && appended:
		caption += " The trace gives no interval along the way and ends before the final estimate (a method working in steps, such as subset simulation, traces its intermediate levels): the dot and bar at the right are the final estimate and its 95% interval."
	case finalBar:
		caption += " The trace gives no interval along the way: the dot and bar at the right are the final estimate and its 95% interval."
	}
	return &figure{Name: "convergence", Caption: caption, W: 16 * vg.Centimeter, H: 9 * vg.Centimeter, Plots: []*plot.Plot{p}}
}

// finalInterval returns the final estimate of the result document and its
// 95% interval, and whether they are to be drawn as a dot with a bar at the
// right of the trace: only when the trace has no band at its last point,
// the estimate is sampled, and the document's estimate is the trace's last
// point or comes after it (subset simulation traces its intermediate
// levels, and the final estimate follows the last of them).
func finalInterval(b *Bundle, last plotter.XY, lower plotter.XYs) (plotter.XY, [2]float64, bool) {
	none := [2]float64{math.NaN(), math.NaN()}
	if len(lower) > 0 && lower[len(lower)-1].X == last.X {
		return last, none, false
	}
	d := doc(b)
	if d.Pf == nil || len(d.PfCI) != 2 || !sampled(&d) {
		return last, none, false
	}
	pf, lo, hi := *d.Pf, d.PfCI[0], d.PfCI[1]
	if !finite(pf) || !finite(lo) || !finite(hi) || !(lo <= pf && pf <= hi && lo < hi) || pf < 0 {
		return last, none, false
	}
	switch {
	case math.Abs(pf-last.Y) <= 1e-9*math.Abs(last.Y):
		return last, [2]float64{lo, hi}, true
	case d.Evaluations != nil && float64(*d.Evaluations) > last.X:
		return plotter.XY{X: float64(*d.Evaluations), Y: pf}, [2]float64{lo, hi}, true
	}
	return last, none, false
}

// finalBar1 is one point with a vertical error bar, for plotter.YErrorBars.
type finalBar1 struct{ x, y, lo, hi float64 }

func (f finalBar1) Len() int                      { return 1 }
func (f finalBar1) XY(int) (float64, float64)     { return f.x, f.y }
func (f finalBar1) YError(int) (float64, float64) { return f.lo, f.hi }

// axisProb returns a label writer for probability ticks on [lo, hi] with
// enough significant digits that neighbouring ticks differ (at least 3).
func axisProb(lo, hi float64) func(float64) string {
	n := 3
	if step := (hi - lo) / 5; step > 0 && finite(step) {
		if k := int(math.Ceil(math.Log10(math.Max(math.Abs(lo), math.Abs(hi))/step))) + 1; k > n {
			n = min(k, 8)
		}
	}
	return func(v float64) string {
		if v != 0 && math.Abs(v) < 0.01 {
			return sci(v, n)
		}
		return sig(v, n)
	}
}

// barThumb draws a short vertical bar as a legend entry, for an error bar.
type barThumb struct{ draw.LineStyle }

// Thumbnail implements plot.Thumbnailer.
func (t barThumb) Thumbnail(c *draw.Canvas) {
	x := (c.Min.X + c.Max.X) / 2
	c.StrokeLine2(t.LineStyle, x, c.Min.Y, x, c.Max.Y)
}
