package report

import (
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
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
// interval against the number of evaluations on a logarithmic axis.
func convergenceFigure(b *Bundle) *figure {
	var pts []plotter.XY
	var band plotter.XYs
	var upper plotter.XYs
	for _, c := range b.Convergence {
		x := float64(c.Evaluations)
		if !(x > 0) || !finite(c.Pf) {
			continue
		}
		pts = append(pts, plotter.XY{X: x, Y: c.Pf})
		if finite(c.PfCI[0]) && finite(c.PfCI[1]) && c.PfCI[0] <= c.PfCI[1] {
			band = append(band, plotter.XY{X: x, Y: c.PfCI[0]})
			upper = append(upper, plotter.XY{X: x, Y: c.PfCI[1]})
		}
	}
	if len(pts) < 2 || pts[0].X == pts[len(pts)-1].X {
		return nil
	}
	p := newPlot("Convergence of the estimate", "limit-state evaluations (log scale)", "probability of failure pf (–)")
	addGrid(p, false)
	if len(band) >= 2 {
		for i := len(upper) - 1; i >= 0; i-- {
			band = append(band, upper[i])
		}
		pg, err := plotter.NewPolygon(band)
		if err == nil {
			pg.Color = faded(colCapacity, 0x40)
			pg.LineStyle.Width = 0
			p.Add(pg)
			p.Legend.Add("95% interval", pg)
		}
	}
	ln, err := plotter.NewLine(plotter.XYs(pts))
	if err != nil {
		return nil
	}
	ln.LineStyle = lineStyle(colCapacity, 1.5, false)
	p.Add(ln)
	p.Legend.Add("estimate of pf", ln)
	p.Legend.Top = false // the estimate settles well above zero at the right
	p.X.Scale = plot.LogScale{}
	p.X.Tick.Marker = decadeTicks{}
	p.Y.Min = math.Min(p.Y.Min, 0)
	p.Y.Tick.Marker = niceTicks{Format: prob}
	return &figure{Name: "convergence", Caption: "Estimate of the failure probability and its 95% interval as the number of limit-state evaluations grows.", W: 16 * vg.Centimeter, H: 9 * vg.Centimeter, Plots: []*plot.Plot{p}}
}
