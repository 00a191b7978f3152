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

// InteractionChart is the picture of a study with bending: the limit of
// the member at nominal values in the plane of the axial load N (N) and
// the largest first-order moment M (N mm), and the nominal actions. The
// sampled points come from the bundle's kept samples (their "axial",
// "moment" and "g" columns).
type InteractionChart struct {
	N, M               []float64
	NominalN, NominalM float64
	// Axis is the bending axis, "major" or "minor"; Model names the
	// capacity model of the limit.
	Axis, Model string
}

// sampleColumn returns the index of the kept sample column named name
// (with or without its unit), or -1.
func sampleColumn(s *sim.Samples, name string) int {
	for j, n := range s.Names {
		if n == name || strings.HasPrefix(n, name+" (") {
			return j
		}
	}
	return -1
}

// interactionFigure draws N against M: the sampled actions (failures in
// the failure colour), the limit curve at nominal values and the nominal
// actions.
func interactionFigure(b *Bundle) *figure {
	c := b.Interaction
	if c == nil || len(c.N) < 2 {
		return nil
	}
	p := newPlot("Axial force and bending moment", "largest first-order moment M (kN m)", "axial force N (kN)")
	addGrid(p, true)
	var lg legendLayout
	if s := b.Samples; s != nil {
		jn, jm, jg := sampleColumn(s, "axial"), sampleColumn(s, "moment"), sampleColumn(s, "g")
		if jn >= 0 && jm >= 0 {
			var safe, fail plotter.XYs
			for _, row := range s.Rows {
				pt := plotter.XY{X: row[jm] * 1e-6, Y: row[jn] * 1e-3}
				if !finite(pt.X) || !finite(pt.Y) {
					continue
				}
				if jg >= 0 && row[jg] < 0 {
					fail = append(fail, pt)
				} else {
					safe = append(safe, pt)
				}
			}
			for _, set := range []struct {
				xy   plotter.XYs
				name string
				col  int
			}{{safe, "sampled actions", 0}, {fail, "sampled actions, failed (g < 0)", 1}} {
				if len(set.xy) == 0 {
					continue
				}
				if sc, err := plotter.NewScatter(set.xy); err == nil {
					colour, r := faded(colSafe, 0x66), vg.Points(1.3)
					if set.col == 1 {
						colour, r = colFailure, vg.Points(2)
					}
					sc.GlyphStyle = draw.GlyphStyle{Color: colour, Radius: r, Shape: draw.CircleGlyph{}}
					p.Add(sc)
					lg.add(p, set.name, set.xy, sc)
				}
			}
		}
	}
	curve := make([]float64, len(c.M))
	for i, m := range c.M {
		curve[i] = m * 1e-6
	}
	n := make([]float64, len(c.N))
	for i, v := range c.N {
		n[i] = v * 1e-3
	}
	if xy := finiteXYs(curve, n); len(xy) > 1 {
		if ln, err := plotter.NewLine(xy); err == nil {
			ln.LineStyle = lineStyle(colInk, 1.6, false)
			p.Add(ln)
			lg.add(p, "limit at nominal values ("+c.Model+")", xy, ln)
		}
	}
	if finite(c.NominalM) && finite(c.NominalN) {
		pt := plotter.XYs{{X: c.NominalM * 1e-6, Y: c.NominalN * 1e-3}}
		if sc, err := plotter.NewScatter(pt); err == nil {
			sc.GlyphStyle = draw.GlyphStyle{Color: colFailure, Radius: vg.Points(4.5), Shape: draw.CrossGlyph{}}
			p.Add(sc)
			lg.add(p, "nominal actions", pt, sc)
		}
	}
	p.X.Min, p.Y.Min = math.Min(p.X.Min, 0), math.Min(p.Y.Min, 0)
	w, h := 16*vg.Centimeter, 10*vg.Centimeter
	lg.place(p, w, h)
	return &figure{Name: "interaction", Caption: "Axial force N (kN) against the largest first-order bending moment M (kN m) about the " + c.Axis +
		" axis: the sampled actions (effect factor included; failures in red), the limit of the member at nominal values (each point the load factor times actions in one proportion, with the moment diagram of the nominal bending; the model factor included) and the nominal actions (cross). A sampled point outside the curve need not have failed, nor one inside it have held: each sample has its own member.",
		W: w, H: h, Plots: []*plot.Plot{p}}
}

// loadFactorFigure draws the sampled load factor of a study with bending
// (its capacity output) as a density histogram with a moment-fitted
// lognormal density, the limit at 1 and the nominal load factor.
func loadFactorFigure(b *Bundle) *figure {
	s := b.Capacity
	if s == nil {
		return nil
	}
	bins := densityBins(s.Hist, 1)
	if bins == nil {
		return nil
	}
	p := newPlot("Load factor", "load factor on every action (–)", "probability density (–)")
	c := seriesColor(0)
	h := &plotter.Histogram{Bins: bins, FillColor: faded(c, 0x55), LineStyle: lineStyle(faded(c, 0x99), 0.5, false)}
	p.Add(h)
	p.Legend.Add("load factor (samples)", h)
	l, u := binsRange(bins)
	if f := lognormalFit(s.Mean, s.SD); f != nil {
		if xy := curve(f, l, u, 200); len(xy) > 1 {
			if ln, err := plotter.NewLine(xy); err == nil {
				ln.LineStyle = lineStyle(c, 1.6, false)
				p.Add(ln)
				p.Legend.Add("lognormal fit", ln)
			}
		}
	}
	p.Y.Max *= 1.05
	marks := []struct {
		x      float64
		name   string
		dashed bool
	}{{1, "limit: factor 1", false}}
	if d := doc(b); d.Nominal != nil && d.Nominal.LoadFactor > 0 {
		marks = append(marks, struct {
			x      float64
			name   string
			dashed bool
		}{d.Nominal.LoadFactor, "nominal load factor " + sig(d.Nominal.LoadFactor, 4), true})
	}
	for _, mk := range marks {
		if ln, err := plotter.NewLine(plotter.XYs{{X: mk.x, Y: 0}, {X: mk.x, Y: p.Y.Max}}); err == nil {
			col := colInk
			if !mk.dashed {
				col = colFailure
			}
			ln.LineStyle = lineStyle(col, 1.2, mk.dashed)
			p.Add(ln)
			p.Legend.Add(mk.name, ln)
		}
	}
	p.X.Min = math.Min(p.X.Min, 0.9)
	p.Y.Min = 0
	return &figure{Name: "capacity-demand", Caption: "Sampled load factor, the factor on every action (axial loads, end moments, lateral load) at which each sampled member reaches its limit, model factor included (density histogram, dimensionless), with a lognormal density fitted by moments; failure is a factor below 1 (solid line); the dashed line marks the nominal load factor.", W: 16 * vg.Centimeter, H: 9.5 * vg.Centimeter, Plots: []*plot.Plot{p}}
}
