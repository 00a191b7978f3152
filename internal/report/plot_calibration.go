package report

import (
	"math"
	"unicode/utf8"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"strutrisk/internal/assess"
)

// calibrationFigure draws each case's reliability index at the calibrated
// factor, one row per case in the order of the calibration, with its beta
// at the factor's initial value (a ring, joined to it by a thin line)
// when the calibration has it; the target is a dashed line.
func calibrationFigure(b *Bundle) *figure {
	d := doc(b)
	c := d.Calibration
	if c == nil || len(c.Cases) == 0 {
		return nil
	}
	p := newPlot("Reliability index of the calibration cases", "reliability index β (–)", "")
	addGridLines(p, false, true)
	n := len(c.Cases)
	names := make([]string, n)
	lo, hi := math.Inf(1), math.Inf(-1)
	var now, before plotter.XYs
	for i, k := range c.Cases {
		y := float64(n - 1 - i) // the first case on top
		names[n-1-i] = calibrationCaseLabel(k)
		if !finite(k.Beta) {
			continue
		}
		now = append(now, plotter.XY{X: k.Beta, Y: y})
		lo, hi = math.Min(lo, k.Beta), math.Max(hi, k.Beta)
		if k.BetaInitial == nil || !finite(*k.BetaInitial) {
			continue
		}
		bi := *k.BetaInitial
		before = append(before, plotter.XY{X: bi, Y: y})
		lo, hi = math.Min(lo, bi), math.Max(hi, bi)
		if ln, err := plotter.NewLine(plotter.XYs{{X: bi, Y: y}, {X: k.Beta, Y: y}}); err == nil {
			ln.LineStyle = lineStyle(colMuted, 0.8, false)
			p.Add(ln)
		}
	}
	if len(now) == 0 {
		return nil
	}
	if !addCalibrationPoints(p, c, now, before) {
		return nil
	}
	entries := 1 + min(len(before), 1)
	if t := c.TargetBeta; finite(t) {
		entries++
		if ln, err := plotter.NewLine(plotter.XYs{{X: t, Y: -0.5}, {X: t, Y: float64(n) - 0.5}}); err == nil {
			ln.LineStyle = lineStyle(colFailure, 1, true)
			p.Add(ln)
			p.Legend.Add("target β = "+fixed(t, 2), ln)
			lo, hi = math.Min(lo, t), math.Max(hi, t)
		}
	}
	span := math.Max(hi-lo, 0.2)
	p.X.Min, p.X.Max = lo-0.1*span, hi+0.1*span
	// A free band above the rows holds the legend, clear of the points.
	p.Y.Min, p.Y.Max = -0.6, float64(n)-0.3+0.45*float64(entries)
	p.NominalY(names...)
	p.Y.Tick.Label.Font.Size = 9
	h := vg.Length(4+0.6*float64(n)) * vg.Centimeter
	caption := "Reliability index β (dimensionless, FORM) of every case of the calibration of " + c.Factor + " at the value found, " + fixed(c.Value, 3) + " (filled)"
	if len(before) > 0 {
		caption += ", and at the study's own value " + fixed(c.Initial, 3) + " (ring)"
	}
	caption += "; dashed: the target. A case's weight in the fit follows its name when it is not 1."
	if c.AtBound {
		caption += " The value lies at an end of the range searched: it is no calibration."
	}
	// Long case names (swept values) widen the picture, not squeeze the rows.
	long := 0
	for _, s := range names {
		long = max(long, utf8.RuneCountInString(s))
	}
	// (A little only: the HTML scales a wide picture down, labels too.)
	w := vg.Length(16+0.1*math.Max(0, float64(long-30))) * vg.Centimeter
	if long > 36 {
		p.Y.Tick.Label.Font.Size = 8
	}
	return &figure{Name: "calibration", Caption: caption, W: min(w, 18*vg.Centimeter), H: min(h, 60*vg.Centimeter), Plots: []*plot.Plot{p}}
}

// addCalibrationPoints draws the betas at the calibrated value (filled)
// and at the initial value (rings), with their legend entries; false when
// the points cannot be drawn.
func addCalibrationPoints(p *plot.Plot, c *assess.Calibration, now, before plotter.XYs) bool {
	if len(before) > 0 {
		sc, err := plotter.NewScatter(before)
		if err != nil {
			return false
		}
		sc.GlyphStyle = draw.GlyphStyle{Color: colMuted, Radius: vg.Points(3.5), Shape: draw.RingGlyph{}}
		p.Add(sc)
		p.Legend.Add(c.Factor+" = "+fixed(c.Initial, 3)+" (the study's)", sc)
	}
	sc, err := plotter.NewScatter(now)
	if err != nil {
		return false
	}
	sc.GlyphStyle = draw.GlyphStyle{Color: colCapacity, Radius: vg.Points(3.5), Shape: draw.CircleGlyph{}}
	p.Add(sc)
	label := c.Factor + " = " + fixed(c.Value, 3) + " (calibrated)"
	if c.AtBound {
		label = c.Factor + " = " + fixed(c.Value, 3) + " (at an end of the range: no calibration)"
	}
	p.Legend.Add(label, sc)
	return true
}

// calibrationCaseLabel is a case's name, with its weight when not 1.
func calibrationCaseLabel(k assess.CalibratedCase) string {
	if k.Weight == 1 {
		return k.Case
	}
	return k.Case + " (weight " + sig(k.Weight, 3) + ")"
}
