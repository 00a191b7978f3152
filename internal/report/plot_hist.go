package report

import (
	"math"

	"gonum.org/v1/gonum/stat/distuv"
	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"

	"strutrisk/sim"
)

// densityBins turns a fixed-bin histogram of values in N into density bins
// in kN (per kN), scaled by the total count including the values outside
// the bins, so the bars are comparable with a probability density. It
// returns nil when the histogram is empty or not finite.
func densityBins(h sim.Histogram, scale float64) []plotter.HistogramBin {
	if len(h.Counts) == 0 || !finite(h.Lo) || !(h.Width > 0) || !finite(h.Width) || !finite(scale) {
		return nil
	}
	total := h.Under + h.Over
	for _, c := range h.Counts {
		if !finite(c) || c < 0 {
			return nil
		}
		total += c
	}
	if !(total > 0) || !finite(total) {
		return nil
	}
	w := h.Width * scale
	bins := make([]plotter.HistogramBin, len(h.Counts))
	for i, c := range h.Counts {
		lo := (h.Lo + float64(i)*h.Width) * scale
		bins[i] = plotter.HistogramBin{Min: lo, Max: lo + w, Weight: c / (total * w)}
	}
	return bins
}

// lognormalFit returns the lognormal density with the given mean and
// standard deviation (fitted by moments: sigma^2 = ln(1 + v^2),
// mu = ln(mean) - sigma^2/2, common practice), or nil when it does not
// exist.
func lognormalFit(mean, sd float64) func(float64) float64 {
	if !(mean > 0) || !(sd > 0) || !finite(mean) || !finite(sd) {
		return nil
	}
	v := sd / mean
	s := math.Sqrt(math.Log1p(v * v))
	d := distuv.LogNormal{Mu: math.Log(mean) - s*s/2, Sigma: s}
	return d.Prob
}

// curve samples f at n points on [lo, hi] into a line.
func curve(f func(float64) float64, lo, hi float64, n int) plotter.XYs {
	xy := make(plotter.XYs, 0, n)
	for i := 0; i < n; i++ {
		x := lo + (hi-lo)*float64(i)/float64(n-1)
		if y := f(x); finite(y) {
			xy = append(xy, plotter.XY{X: x, Y: y})
		}
	}
	return xy
}

// binsRange returns the x range covered by bins.
func binsRange(bins []plotter.HistogramBin) (lo, hi float64) {
	return bins[0].Min, bins[len(bins)-1].Max
}

// capacityDemandFigure draws the sampled capacity and demand as density
// histograms on one axis with their moment-fitted lognormal densities and
// the nominal capacity marked.
func capacityDemandFigure(b *Bundle) *figure {
	if b.Capacity == nil && b.Demand == nil {
		return nil
	}
	if b.Interaction != nil {
		return loadFactorFigure(b) // plot_interaction.go
	}
	p := newPlot("Capacity and demand", "axial force (kN)", "probability density (1/kN)")
	type part struct {
		s    *sim.OutputStats
		name string
		col  int
	}
	drawn := 0
	for _, pt := range []part{{b.Capacity, "capacity", 0}, {b.Demand, "demand", 1}} {
		if pt.s == nil {
			continue
		}
		bins := densityBins(pt.s.Hist, 1e-3)
		if bins == nil {
			continue
		}
		c := seriesColor(pt.col)
		h := &plotter.Histogram{Bins: bins, FillColor: faded(c, 0x55), LineStyle: lineStyle(faded(c, 0x99), 0.5, false)}
		p.Add(h)
		p.Legend.Add(pt.name+" (samples)", h)
		l, u := binsRange(bins)
		if f := lognormalFit(pt.s.Mean*1e-3, pt.s.SD*1e-3); f != nil {
			if xy := curve(f, l, u, 200); len(xy) > 1 {
				ln, err := plotter.NewLine(xy)
				if err == nil {
					ln.LineStyle = lineStyle(c, 1.6, false)
					p.Add(ln)
					p.Legend.Add(pt.name+", lognormal fit", ln)
				}
			}
		}
		drawn++
	}
	if drawn == 0 {
		return nil
	}
	p.Y.Max *= 1.05 // headroom: the tallest bar does not touch the title
	if nc := b.NominalCapacity * 1e-3; nc > 0 && finite(nc) {
		ln, err := plotter.NewLine(plotter.XYs{{X: nc, Y: 0}, {X: nc, Y: p.Y.Max}})
		if err == nil {
			ln.LineStyle = lineStyle(colInk, 1.2, true)
			p.Add(ln)
			p.Legend.Add("nominal capacity "+sig(nc, 4)+" kN", ln)
		}
	}
	p.Y.Min = 0
	return &figure{Name: "capacity-demand", Caption: "Sampled capacity and demand as axial force in kN (density histograms, probability density in 1/kN) with lognormal densities fitted by moments; the dashed line marks the nominal capacity.", W: 16 * vg.Centimeter, H: 9.5 * vg.Centimeter, Plots: []*plot.Plot{p}}
}

// marginFigure draws the sampled margin g as a density histogram with the
// failure side (g < 0) shaded and its bars in the failure colour.
func marginFigure(b *Bundle) *figure {
	if b.Margin == nil {
		return nil
	}
	scale, unit := 1e-3, "kN"
	if b.Interaction != nil { // a load factor minus one
		scale, unit = 1, "–"
	}
	bins := densityBins(b.Margin.Hist, scale)
	if bins == nil {
		return nil
	}
	var fail, safe []plotter.HistogramBin
	for _, bin := range bins {
		switch {
		case bin.Max <= 0:
			fail = append(fail, bin)
		case bin.Min >= 0:
			safe = append(safe, bin)
		default: // straddles 0: split at 0 with the same density
			fail = append(fail, plotter.HistogramBin{Min: bin.Min, Max: 0, Weight: bin.Weight})
			safe = append(safe, plotter.HistogramBin{Min: 0, Max: bin.Max, Weight: bin.Weight})
		}
	}
	p := newPlot("Safety margin g = capacity − demand", "margin g (kN)", "probability density (1/kN)")
	if b.Interaction != nil {
		p = newPlot("Safety margin g = load factor − 1", "margin g (–)", "probability density (–)")
	}
	lo, hi := binsRange(bins)
	top := 0.0
	for _, bin := range bins {
		top = math.Max(top, bin.Weight)
	}
	if lo < 0 {
		right := math.Min(0, hi)
		shade, err := plotter.NewPolygon(plotter.XYs{{X: lo, Y: 0}, {X: right, Y: 0}, {X: right, Y: top * 1.05}, {X: lo, Y: top * 1.05}})
		if err == nil {
			shade.Color = faded(colFailure, 0x22)
			shade.LineStyle.Width = 0
			p.Add(shade)
			name := "failure side, g < 0"
			if d := doc(b); d.Pf != nil && finite(*d.Pf) {
				name += " (pf = " + prob(*d.Pf) + ")"
			}
			p.Legend.Add(name, shade)
		}
	}
	if len(safe) > 0 {
		h := &plotter.Histogram{Bins: safe, FillColor: faded(colSafe, 0x99), LineStyle: lineStyle(colSafe, 0.5, false)}
		p.Add(h)
		p.Legend.Add("samples, g ≥ 0", h)
	}
	if len(fail) > 0 {
		h := &plotter.Histogram{Bins: fail, FillColor: colFailure, LineStyle: lineStyle(colFailure, 0.5, false)}
		p.Add(h)
		p.Legend.Add("samples, g < 0 (failure)", h)
	}
	if lo < 0 && hi > 0 {
		ln, err := plotter.NewLine(plotter.XYs{{X: 0, Y: 0}, {X: 0, Y: top * 1.05}})
		if err == nil {
			ln.LineStyle = lineStyle(colInk, 1, true)
			p.Add(ln)
		}
	}
	p.Y.Min = 0
	caption := "Sampled safety margin g = capacity − demand in kN (probability density in 1/kN); failure is g < 0 (shaded). Values outside the histogram range are counted but not drawn."
	if unit != "kN" {
		caption = "Sampled safety margin g = load factor − 1, the factor on every action at which the member reaches its limit, less one (dimensionless); failure is g < 0 (shaded). Values outside the histogram range are counted but not drawn."
	}
	return &figure{Name: "margin", Caption: caption, W: 16 * vg.Centimeter, H: 9 * vg.Centimeter, Plots: []*plot.Plot{p}}
}
