package report

import (
	"math"
	"sort"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// tornadoScale reads the unit in parentheses at the end of the tornado
// output's name. The values are held in N, mm, MPa; an output named in kN
// or N is a force and is shown in kN.
func tornadoScale(name string) (scale float64, label string) {
	label = name
	i := strings.LastIndex(name, "(")
	if i < 0 || !strings.HasSuffix(name, ")") {
		return 1, label
	}
	switch u := strings.TrimSpace(name[i+1 : len(name)-1]); u {
	case "kN", "N":
		return 1e-3, strings.TrimSpace(name[:i]) + " (kN)"
	}
	return 1, label
}

// inputUnit returns the unit of the input named n, or "".
func inputUnit(b *Bundle, n string) string {
	for _, in := range b.Inputs {
		if in.Name == n {
			return in.Unit
		}
	}
	return ""
}

// tornadoFigure draws the one-at-a-time sensitivity as two-sided horizontal
// bars about the result with every input at its median; each bar end is
// labelled with the input value that produced it.
func tornadoFigure(b *Bundle) *figure {
	d := doc(b)
	scale, xlabel := tornadoScale(b.TornadoOutput)
	if xlabel == "" {
		xlabel = "output"
	}
	f := tornadoChart(b, d.Tornado, b.TornadoBase, scale, xlabel, "One-at-a-time sensitivity (tornado)", "all inputs at their medians: ")
	if f != nil {
		f.Name = "tornado"
		f.Caption = "Each input in turn at its low and high fractile with the others at their medians; bars are the change of " + xlabel + " from the result with every input at its median, labelled with the input value in its unit."
	}
	return f
}

// tornadoBetaFigure draws the tornado of the reliability index: FORM with
// each input in turn fixed at its low and high value, about the FORM index
// of the whole study.
func tornadoBetaFigure(b *Bundle) *figure {
	d := doc(b)
	if len(b.TornadoBeta) == 0 || d.FORM == nil {
		return nil
	}
	rows := make([]Tornado, len(b.TornadoBeta))
	for i, r := range b.TornadoBeta {
		rows[i] = Tornado{Variable: r.Variable, LowValue: r.LowValue, HighValue: r.HighValue, Low: r.LowBeta, High: r.HighBeta}
	}
	f := tornadoChart(b, rows, d.FORM.Beta, 1, "reliability index β by FORM (–)", "Reliability index with one input fixed", "all inputs random: β = ")
	if f != nil {
		f.Name = "tornado-beta"
		f.Caption = "FORM reliability index β (dimensionless) with each input in turn fixed at its low and high fractile (the others random), about the index of the whole study; labelled with the fixed value in its unit."
	}
	return f
}

// tornadoChart draws two-sided horizontal bars of rows about base; values
// are multiplied by scale, xlabel names the axis and baseLegend introduces
// the base value in the legend. Rows that are not
// finite are left out; nil when nothing is left.
func tornadoChart(b *Bundle, all []Tornado, base, scale float64, xlabel, title, baseLegend string) *figure {
	if len(all) == 0 || !finite(base) {
		return nil
	}
	rows := make([]Tornado, 0, len(all))
	for _, r := range all {
		if finite(r.Low) && finite(r.High) {
			rows = append(rows, r)
		}
	}
	if len(rows) == 0 {
		return nil
	}
	// Smallest swing at the bottom, largest at the top.
	sort.SliceStable(rows, func(i, j int) bool { return math.Abs(rows[i].High-rows[i].Low) < math.Abs(rows[j].High-rows[j].Low) })
	base *= scale
	p := newPlot(title, xlabel, "")
	const half = 0.32
	lowCol, highCol := colCapacity, colDemand
	var lowThumb, highThumb *plotter.Polygon
	var left, right plotter.XYLabels
	var leftStyle, rightStyle []text.Style
	names := make([]string, len(rows))
	xmin, xmax := base, base
	for i, r := range rows {
		names[i] = r.Variable
		y := float64(i)
		unit := inputUnit(b, r.Variable)
		// Draw the longer half first so a shorter one on the same side stays visible.
		halves := []struct {
			v, in float64
			c     any
			low   bool
		}{{r.Low * scale, r.LowValue, lowCol, true}, {r.High * scale, r.HighValue, highCol, false}}
		if math.Abs(halves[1].v-base) > math.Abs(halves[0].v-base) {
			halves[0], halves[1] = halves[1], halves[0]
		}
		sameSide := (halves[0].v-base)*(halves[1].v-base) > 0
		for k, h := range halves {
			pg, err := plotter.NewPolygon(plotter.XYs{{X: base, Y: y - half}, {X: h.v, Y: y - half}, {X: h.v, Y: y + half}, {X: base, Y: y + half}})
			if err != nil {
				return nil
			}
			pg.LineStyle.Width = 0
			if h.low {
				pg.Color = lowCol
				lowThumb = pg
			} else {
				pg.Color = highCol
				highThumb = pg
			}
			p.Add(pg)
			xmin, xmax = math.Min(xmin, h.v), math.Max(xmax, h.v)
			if sameSide && k == 1 {
				continue // labelled together with the longer half
			}
			label := withUnitSig(h.in, unit, 3)
			if sameSide {
				// Both settings move the result the same way: one label at the
				// far end, the nearer setting's value first.
				label = withUnitSig(halves[1].in, unit, 3) + ", " + label
			}
			st := textStyle(8, colInk)
			st.YAlign = draw.YCenter
			if h.v < base || (h.v == base && h.low) {
				st.XAlign = draw.XRight
				left.XYs = append(left.XYs, plotter.XY{X: h.v, Y: y})
				left.Labels = append(left.Labels, label)
				leftStyle = append(leftStyle, st)
			} else {
				st.XAlign = draw.XLeft
				right.XYs = append(right.XYs, plotter.XY{X: h.v, Y: y})
				right.Labels = append(right.Labels, label)
				rightStyle = append(rightStyle, st)
			}
		}
	}
	for _, l := range []struct {
		xy  plotter.XYLabels
		st  []text.Style
		off vg.Length
	}{{left, leftStyle, -vg.Points(3)}, {right, rightStyle, vg.Points(3)}} {
		if len(l.xy.XYs) == 0 {
			continue
		}
		lb, err := plotter.NewLabels(l.xy)
		if err != nil {
			return nil
		}
		lb.TextStyle = l.st
		lb.Offset = vg.Point{X: l.off}
		p.Add(lb)
	}
	bl, err := plotter.NewLine(plotter.XYs{{X: base, Y: -0.5}, {X: base, Y: float64(len(rows)) - 0.5}})
	if err != nil {
		return nil
	}
	bl.LineStyle = lineStyle(colInk, 1, true)
	p.Add(bl)
	// Room for the value labels beyond the bar ends.
	span := xmax - xmin
	if span == 0 {
		span = math.Max(math.Abs(base), 1)
	}
	p.X.Min, p.X.Max = xmin-0.3*span, xmax+0.3*span
	// An empty band under the bars holds the legend.
	p.Y.Min, p.Y.Max = -2.3, float64(len(rows))-0.4
	p.NominalY(names...)
	p.Y.Tick.Label.Font.Size = 9
	if lowThumb != nil {
		p.Legend.Add("input at its low fractile", lowThumb)
	}
	if highThumb != nil {
		p.Legend.Add("input at its high fractile", highThumb)
	}
	unit := ""
	if i := strings.LastIndex(xlabel, "("); i >= 0 && strings.HasSuffix(xlabel, ")") {
		if u := xlabel[i+1 : len(xlabel)-1]; u != "–" && u != "-" {
			unit = " " + u
		}
	}
	// Three significant digits, but whole units kept: 1047 kN, not 1050.
	digits := 3
	if a := math.Abs(base); a >= 1000 && a < 1e7 {
		digits = int(math.Floor(math.Log10(a))) + 1
	}
	p.Legend.Add(baseLegend+sig(base, digits)+unit, bl)
	p.Legend.Top = false
	h := 4.5*vg.Centimeter + vg.Length(len(rows))*0.85*vg.Centimeter
	return &figure{W: 16 * vg.Centimeter, H: h, Plots: []*plot.Plot{p}}
}
