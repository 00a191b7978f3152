package report

import (
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"strutrisk/sim"
)

// doubtLegend names the mark of a case whose estimate the engine does not
// trust in the sweep picture.
const doubtLegend = "estimate not trusted (?): no result"

// sweepCurve is one series of a sweep picture made ready to draw. The
// trusted points are cut into runs of neighbours: a line joins the points
// of a run only, never across a case the engine does not trust, and the
// interval band follows each run. The untrusted cases are apart, drawn
// as hollow grey marks with "?", not as points of the curve.
type sweepCurve struct {
	beta, pf []plotter.XYs // runs of trusted points: β, and log10 pf
	lo, hi   []plotter.XYs // the β interval along each run, where it is finite
	// doubtBeta and doubtPf are the untrusted cases: β, and log10 pf.
	doubtBeta, doubtPf plotter.XYs
}

// newSweepCurve splits the points of a series, in the order of the sweep;
// points without a finite x are left out.
func newSweepCurve(pts []Point) sweepCurve {
	var c sweepCurve
	var beta, pf, lo, hi plotter.XYs
	flush := func() {
		if len(beta) > 0 {
			c.beta = append(c.beta, beta)
		}
		if len(pf) > 0 {
			c.pf = append(c.pf, pf)
		}
		if len(lo) > 0 {
			c.lo, c.hi = append(c.lo, lo), append(c.hi, hi)
		}
		beta, pf, lo, hi = nil, nil, nil, nil
	}
	for _, pt := range pts {
		if !finite(pt.Value) {
			continue
		}
		b, okB := float64(pt.Beta), finite(float64(pt.Beta))
		p, okP := math.Log10(pt.Pf), pt.Pf > 0 && finite(pt.Pf)
		if pt.Doubtful {
			flush()
			if okB {
				c.doubtBeta = append(c.doubtBeta, plotter.XY{X: pt.Value, Y: b})
			}
			if okP {
				c.doubtPf = append(c.doubtPf, plotter.XY{X: pt.Value, Y: p})
			}
			continue
		}
		if okB {
			beta = append(beta, plotter.XY{X: pt.Value, Y: b})
		}
		if okP {
			pf = append(pf, plotter.XY{X: pt.Value, Y: p})
		}
		// The β interval from the pf interval (the upper pf gives the lower β).
		bl, bh := sim.BetaFromPf(pt.PfCI[1]), sim.BetaFromPf(pt.PfCI[0])
		if finite(bl) && finite(bh) && bl <= bh {
			lo = append(lo, plotter.XY{X: pt.Value, Y: bl})
			hi = append(hi, plotter.XY{X: pt.Value, Y: bh})
		}
	}
	flush()
	return c
}

// pfRange widens [lo, hi] to the pf (not its log) of every point of c.
func (c *sweepCurve) pfRange(lo, hi float64) (float64, float64) {
	for _, run := range append(append([]plotter.XYs(nil), c.pf...), c.doubtPf) {
		for _, xy := range run {
			p := math.Pow(10, xy.Y)
			lo, hi = math.Min(lo, p), math.Max(hi, p)
		}
	}
	return lo, hi
}

// bands are the β interval's polygons of c, one per run of at least two
// points.
func (c *sweepCurve) bands() []plotter.XYs {
	var out []plotter.XYs
	for k, lo := range c.lo {
		if len(lo) < 2 {
			continue
		}
		band := append(plotter.XYs(nil), lo...)
		hi := c.hi[k]
		for j := len(hi) - 1; j >= 0; j-- {
			band = append(band, hi[j])
		}
		out = append(out, band)
	}
	return out
}

// addRuns draws each run of a curve as a line with its glyphs and
// returns the first run's line and glyphs for the legend (nil when none).
func addRuns(p *plot.Plot, runs []plotter.XYs, style seriesStyle, glyph draw.GlyphDrawer) []plot.Thumbnailer {
	var thumbs []plot.Thumbnailer
	for _, run := range runs {
		ln, sc, err := plotter.NewLinePoints(run)
		if err != nil {
			continue
		}
		ln.LineStyle = style.line(1.5)
		sc.GlyphStyle = draw.GlyphStyle{Color: style.Color, Radius: vg.Points(2.6), Shape: glyph}
		p.Add(ln, sc)
		if thumbs == nil {
			thumbs = []plot.Thumbnailer{ln, sc}
		}
	}
	return thumbs
}

// addDoubts draws the untrusted cases as hollow grey rings marked "?" and
// returns the ring for the legend (nil when there are none).
func addDoubts(p *plot.Plot, xys plotter.XYs) plot.Thumbnailer {
	if len(xys) == 0 {
		return nil
	}
	sc, err := plotter.NewScatter(xys)
	if err != nil {
		return nil
	}
	sc.GlyphStyle = doubtGlyph()
	p.Add(sc)
	labels := plotter.XYLabels{XYs: xys, Labels: make([]string, len(xys))}
	for i := range labels.Labels {
		labels.Labels[i] = "?"
	}
	if l, err := plotter.NewLabels(labels); err == nil {
		st := textStyle(10, colMuted)
		st.XAlign, st.YAlign = text.XLeft, text.YCenter
		for i := range l.TextStyle {
			l.TextStyle[i] = st
		}
		l.Offset = vg.Point{X: vg.Points(5)}
		p.Add(l)
	}
	return sc
}

// doubtGlyph is the hollow grey ring of an untrusted case.
func doubtGlyph() draw.GlyphStyle {
	return draw.GlyphStyle{Color: colMuted, Radius: vg.Points(3.4), Shape: draw.RingGlyph{}}
}
