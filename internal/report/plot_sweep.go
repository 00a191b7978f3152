package report

import (
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"strutrisk/sim"
)

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
	pb := newPlot("Reliability index", xlabel, "reliability index β (–)")
	pp := newPlot("Probability of failure", xlabel, "probability of failure pf (log scale)")
	addGrid(pb, false)
	addGrid(pp, false)
	drawn := 0
	pfMin, pfMax := math.Inf(1), math.Inf(-1)
	xmin, xmax := math.Inf(1), math.Inf(-1)
	for i, s := range b.Series {
		c := seriesColor(i)
		var beta, pf, lo, hi plotter.XYs
		for _, pt := range s.Points {
			if !finite(pt.Value) {
				continue
			}
			if finite(pt.Beta) {
				beta = append(beta, plotter.XY{X: pt.Value, Y: pt.Beta})
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
			}
		}
		if len(beta) > 0 {
			ln, sc, err := plotter.NewLinePoints(beta)
			if err == nil {
				ln.LineStyle = lineStyle(c, 1.5, false)
				sc.GlyphStyle = draw.GlyphStyle{Color: c, Radius: vg.Points(2.2), Shape: draw.CircleGlyph{}}
				pb.Add(ln, sc)
				pb.Legend.Add(name, ln, sc)
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
				ln.LineStyle = lineStyle(c, 1.5, false)
				sc.GlyphStyle = draw.GlyphStyle{Color: c, Radius: vg.Points(2.2), Shape: draw.CircleGlyph{}}
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
			pb.Legend.Add("target β = "+fixed(t, 2), ln)
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
	// Headroom above the curves for the legend.
	if lo, hi := pb.Y.Min, pb.Y.Max; finite(lo) && finite(hi) {
		span := math.Max(hi-lo, 0.5)
		pb.Y.Max = hi + 0.45*span
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
	w := 16 * vg.Centimeter
	if len(plots) == 2 {
		w = 24 * vg.Centimeter
	}
	return &figure{Name: "sweep", Caption: "Reliability index (band: its 95% interval) and probability of failure against " + xlabel + ", one curve per variant; dashed: the target.", W: w, H: 9 * vg.Centimeter, Plots: plots}
}
