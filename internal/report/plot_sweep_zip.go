package report

import (
	"fmt"
	"math"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
)

// maxZipLabels is the most swept points whose values the zipped sweep's
// axis writes; the others have a tick without label.
const maxZipLabels = 8

// zipFigure draws a sweep of several keys taken in step (combine = "zip")
// as the sweep picture of one key: β and pf of the study and of each
// variant at each swept point. The points lie at the first key's values
// when these run one way at spacings within a factor of 3 of each other,
// else evenly, one step a point; under each point its value of every key,
// one row per key (and the study's relative slenderness when the sweep
// changes it).
func zipFigure(b *Bundle) *figure {
	c := b.Cases
	if c == nil || !c.Zipped || len(c.Keys) < 2 || len(c.Points) < 2 {
		return nil
	}
	xs, onFirst := zipPositions(c)
	series := make([]Series, len(c.Grid))
	for s, line := range c.Grid {
		series[s].Name = c.seriesName(s)
		if s < len(c.Models) {
			series[s].Model = c.Models[s]
		}
		for i, pt := range line {
			// A case without failures has no finite β to draw.
			if pt != nil && pt.Pf > 0 && i < len(xs) {
				p := *pt
				p.Value = xs[i]
				series[s].Points = append(series[s].Points, p)
			}
		}
	}
	rows := zipRows(b)
	ticks := zipTicks(c, xs, rows)
	// The axis's label names the rows of values under it, in their order
	// (one line each: a wide label would narrow the panel).
	axis := "rows from the top: " + strings.Join(rows, "\n")
	sp := sweepSpec{series: series, axisLabel: axis, target: doc(b).TargetBeta,
		ticker: func(plot.Ticker) plot.Ticker { return ticks }}
	d := drawSweep(sp)
	if d == nil {
		return nil
	}
	var w strings.Builder
	fmt.Fprintf(&w, "Reliability index β (dimensionless) and probability of failure pf (dimensionless, log scale) over the %d swept points of %s, taken in step (combine = \"zip\"), one curve per variant (named in the legend of the pf panel when both are drawn); dashed: the target.", len(c.Points), strings.Join(c.Keys, ", "))
	if onFirst {
		fmt.Fprintf(&w, " The points lie at their values of %s;", c.Keys[0])
	} else {
		fmt.Fprintf(&w, " The points are evenly spaced in the order of the sweep (the values of %s are not evenly spaced or do not run one way);", c.Keys[0])
	}
	w.WriteString(" under each, one row per key in the order the axis's label names them, its value of " + strings.Join(rows, ", then "))
	if len(c.Points) > maxZipLabels {
		w.WriteString(" (at every few points; every point is in cases.csv)")
	}
	w.WriteString(".")
	w.WriteString(d.captionTail())
	h := 9*vg.Centimeter + vg.Length(len(rows)-1)*0.9*vg.Centimeter
	return &figure{Name: "sweep", Caption: w.String(), W: d.width(), H: h, Plots: d.plots}
}

// zipRows names the rows of values under the zipped sweep's axis: each
// key, then the relative slenderness when the sweep changes it.
func zipRows(b *Bundle) []string {
	rows := append([]string(nil), b.Cases.Keys...)
	if b.Cases.Lambda != nil {
		rows = append(rows, "λ: relative slenderness (nominal, "+b.SweepLambdaAxis+" axis, –)")
	}
	return rows
}

// zipPositions places the swept points of c along the x axis: at the
// first key's values when they are strictly monotonic with spacings
// within a factor of 3 of each other (onFirst), else at 0, 1, 2...
func zipPositions(c *CaseTable) (xs []float64, onFirst bool) {
	n := len(c.Points)
	xs = make([]float64, n)
	onFirst = n >= 2
	gapMin, gapMax := math.Inf(1), 0.0
	for i, p := range c.Points {
		xs[i] = p[0]
		if !finite(p[0]) {
			onFirst = false
		}
		if i > 0 {
			g := p[0] - c.Points[i-1][0]
			if g == 0 || (i > 1 && (g > 0) != (xs[1] > xs[0])) {
				onFirst = false
			}
			gapMin, gapMax = math.Min(gapMin, math.Abs(g)), math.Max(gapMax, math.Abs(g))
		}
	}
	if onFirst && gapMax <= 3*gapMin {
		return xs, true
	}
	for i := range xs {
		xs[i] = float64(i)
	}
	return xs, false
}

// zipTicks marks every swept point at xs and labels at most about
// maxZipLabels of them (the first always) with their values of every
// key, one line each, and λ when known.
func zipTicks(c *CaseTable, xs []float64, rows []string) plot.ConstantTicks {
	step := max(1, (len(xs)+maxZipLabels-1)/maxZipLabels)
	ticks := make(plot.ConstantTicks, len(xs))
	for i, x := range xs {
		ticks[i].Value = x
		if i%step != 0 {
			continue
		}
		lines := make([]string, 0, len(rows))
		for a, v := range c.Points[i] {
			lines = append(lines, heatValue(v, c.Keys[a]))
		}
		if c.Lambda != nil && i < len(c.Lambda) && finite(c.Lambda[i]) {
			lines = append(lines, "λ "+fixed(c.Lambda[i], 2))
		}
		ticks[i].Label = strings.Join(lines, "\n")
	}
	return ticks
}
