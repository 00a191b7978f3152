package report

import (
	"fmt"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// minTracePoints is the number of points below which a trace against
// evaluations says nothing (two points draw a straight line): the
// replicate estimates are drawn instead, when the method has them.
const minTracePoints = 4

// useReplicates reports whether the convergence picture draws the
// replicate estimates of b instead of a trace against evaluations.
func useReplicates(b *Bundle) bool {
	if len(b.Replicates) < 2 {
		return false
	}
	n := 0
	for _, c := range b.Convergence {
		if c.Evaluations > 0 && finite(c.Pf) {
			n++
		}
	}
	return n < minTracePoints
}

// replicatesFigure draws the independent estimates of pf the method made
// (the randomisations of conditional quasi-Monte Carlo, the runs of subset
// simulation) as dots, with their mean, the estimate, as a line and the
// 95 % interval of the result document as a band.
func replicatesFigure(b *Bundle) *figure {
	d := doc(b)
	if d.Pf == nil || len(d.PfCI) != 2 || !finite(*d.Pf) {
		return nil
	}
	pf, lo, hi := *d.Pf, d.PfCI[0], d.PfCI[1]
	var dots plotter.XYs
	vmin, vmax := math.Min(pf, lo), math.Max(pf, hi)
	for i, v := range b.Replicates {
		if finite(v) {
			dots = append(dots, plotter.XY{X: float64(i + 1), Y: v})
			vmin, vmax = math.Min(vmin, v), math.Max(vmax, v)
		}
	}
	if len(dots) < 2 || !finite(lo) || !finite(hi) {
		return nil
	}
	name := b.ReplicateName
	if name == "" {
		name = "replicate"
	}
	p := newPlot("Independent estimates of pf", name+" (–)", "probability of failure pf (–)")
	addGrid(p, false)
	x0, x1 := 0.5, float64(len(b.Replicates))+0.5
	span := vmax - vmin
	if !(span > 0) {
		span = math.Max(0.2*math.Abs(vmax), 1e-12)
	}
	p.X.Min, p.X.Max = x0, x1
	p.Y.Min = math.Max(0, vmin-0.12*span)
	p.Y.Max = vmax + 0.5*span // room for the legend
	p.Y.Tick.Marker = niceTicks{Format: axisProb(p.Y.Min, p.Y.Max)}
	p.X.Tick.Marker = niceTicks{Format: func(v float64) string {
		if v != math.Round(v) {
			return ""
		}
		return fmt.Sprint(int(v))
	}}
	if lo < hi {
		band, err := plotter.NewPolygon(plotter.XYs{{X: x0, Y: lo}, {X: x1, Y: lo}, {X: x1, Y: hi}, {X: x0, Y: hi}})
		if err == nil {
			band.Color = faded(colCapacity, 0x40)
			band.LineStyle.Width = 0
			p.Add(band)
			p.Legend.Add("95% interval of the estimate ("+prob(lo)+" to "+prob(hi)+")", band)
		}
	}
	if ln, err := plotter.NewLine(plotter.XYs{{X: x0, Y: pf}, {X: x1, Y: pf}}); err == nil {
		ln.LineStyle = lineStyle(colCapacity, 1.5, false)
		p.Add(ln)
		p.Legend.Add("estimate of pf, their mean ("+prob(pf)+")", ln)
	}
	sc, err := plotter.NewScatter(dots)
	if err != nil {
		return nil
	}
	sc.GlyphStyle = draw.GlyphStyle{Color: colInk, Radius: vg.Points(2.5), Shape: draw.CircleGlyph{}}
	p.Add(sc)
	p.Legend.Add(fmt.Sprintf("estimate of each %s (%d)", name, len(dots)), sc)
	p.Legend.Top = true
	from := "which comes from the scatter of the dots (Student's t)"
	if name == "run" {
		from = "which comes from each run's own estimate of its coefficient of variation"
	}
	caption := fmt.Sprintf("Each dot is an independent estimate of the failure probability pf (dimensionless) by one %s; the line is their mean, the estimate reported, and the band its 95%% interval, %s. ", name, from)
	caption += fmt.Sprintf("A trace against the number of evaluations is not drawn: the run has fewer than %d steps, and a line through so few points would show no convergence.", minTracePoints)
	return &figure{Name: "convergence", Caption: caption, W: 16 * vg.Centimeter, H: 9 * vg.Centimeter, Plots: []*plot.Plot{p}}
}
