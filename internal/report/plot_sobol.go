package report

import (
	"math"
	"sort"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"

	"strutrisk/sim"
)

// errXY is a set of points with horizontal error bars.
type errXY struct {
	plotter.XYs
	plotter.XErrors
}

// sobolFigure draws the Sobol indices of the bundle's sensitivity output.
func sobolFigure(b *Bundle) *figure {
	return sobolChart("sobol", doc(b).Sobol, b.SobolOutput, b.SobolNote)
}

// sobolCapacityFigure draws the Sobol indices of the capacity.
func sobolCapacityFigure(b *Bundle) *figure {
	return sobolChart("sobol-capacity", sobolRows(b.SobolCapacity), sobolCapacityOutput, b.SobolNote)
}

// sobolCapacityOutput names the output of Bundle.SobolCapacity.
const sobolCapacityOutput = "the capacity"

// sobolRows converts indices to document rows.
func sobolRows(idx []sim.SobolIndex) []Sobol {
	var rows []Sobol
	for _, s := range idx {
		rows = append(rows, Sobol{Variable: s.Variable, First: s.First, Total: s.Total, FirstCI: s.FirstCI, TotalCI: s.TotalCI})
	}
	return rows
}

// sobolChart draws the first-order and total Sobol indices of each input as
// paired horizontal bars with their bootstrap intervals as whiskers; what
// names the output the indices are of.
func sobolChart(name string, all []Sobol, what, note string) *figure {
	rows := make([]Sobol, 0, len(all))
	for _, s := range all {
		if finite(s.First) && finite(s.Total) {
			rows = append(rows, s)
		}
	}
	if len(rows) == 0 {
		return nil
	}
	// Largest total index at the top.
	sort.SliceStable(rows, func(i, j int) bool { return rows[i].Total > rows[j].Total })
	n := len(rows)
	if what == "" {
		what = "the output"
	}
	p := newPlot("Sobol indices of "+what, "index (share of variance, –)", "")
	addGridLines(p, false, true)
	names := make([]string, n)
	const h = 0.36
	var first, total *plotter.Polygon
	xmin, xmax := 0.0, 0.0
	var wf, wt errXY
	for k, s := range rows {
		y := float64(n - 1 - k)
		names[n-1-k] = s.Variable
		for _, part := range []struct {
			v      float64
			ci     [2]float64
			y0, y1 float64
			tot    bool
		}{{s.First, s.FirstCI, y, y + h, false}, {s.Total, s.TotalCI, y - h, y, true}} {
			pg, err := plotter.NewPolygon(plotter.XYs{{X: 0, Y: part.y0}, {X: part.v, Y: part.y0}, {X: part.v, Y: part.y1}, {X: 0, Y: part.y1}})
			if err != nil {
				return nil
			}
			pg.LineStyle.Width = 0
			if part.tot {
				pg.Color = faded(colCapacity, 0x70)
				total = pg
			} else {
				pg.Color = colCapacity
				first = pg
			}
			p.Add(pg)
			xmin, xmax = math.Min(xmin, part.v), math.Max(xmax, part.v)
			if lo, hi := part.ci[0], part.ci[1]; finite(lo) && finite(hi) && lo <= part.v && part.v <= hi {
				w := &wf
				if part.tot {
					w = &wt
				}
				w.XYs = append(w.XYs, plotter.XY{X: part.v, Y: (part.y0 + part.y1) / 2})
				w.XErrors = append(w.XErrors, struct{ Low, High float64 }{part.v - lo, hi - part.v})
				xmin, xmax = math.Min(xmin, lo), math.Max(xmax, hi)
			}
		}
	}
	for _, w := range []errXY{wf, wt} {
		if len(w.XYs) == 0 {
			continue
		}
		eb, err := plotter.NewXErrorBars(w)
		if err != nil {
			return nil
		}
		eb.LineStyle = lineStyle(colInk, 0.8, false)
		eb.CapWidth = vg.Points(4)
		p.Add(eb)
	}
	p.NominalY(names...)
	p.X.Min = math.Min(0, xmin)
	p.X.Max = math.Max(1, xmax)
	p.Y.Min, p.Y.Max = -1.5, float64(n)-0.4 // room for the legend below
	if first != nil {
		p.Legend.Add("first order", first)
	}
	if total != nil {
		p.Legend.Add("total", total)
	}
	p.Legend.Top = false
	caption := "First-order (own effect) and total (with interactions) Sobol indices of " + what + " (shares of its variance, dimensionless), with bootstrap 95% intervals as whiskers."
	if note != "" {
		caption += " " + note
	}
	return &figure{Name: name, Caption: caption, W: 16 * vg.Centimeter, H: 4*vg.Centimeter + vg.Length(n)*0.9*vg.Centimeter, Plots: []*plot.Plot{p}}
}
