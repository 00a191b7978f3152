package report

import (
	"math"
	"slices"
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
	f, same := tornadoChart(b, d.Tornado, b.TornadoBase, scale, xlabel, "One-at-a-time sensitivity (tornado)", "all inputs at their medians: ")
	if f != nil {
		f.Name = "tornado"
		f.Caption = "Each input in turn at its low and high fractile with the others at their medians; bars are the change of " + xlabel + " from the result with every input at its median, labelled with the input value in its unit." + sameWayNote(b, same, "the result")
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
	f, same := tornadoChart(b, rows, d.FORM.Beta, 1, "reliability index β by FORM (–)", "Reliability index with one input fixed", "all inputs random: β = ")
	if f != nil {
		f.Name = "tornado-beta"
		f.Caption = "FORM reliability index β (dimensionless) with each input in turn fixed at its low and high fractile (the others random), about the index of the whole study; labelled with the fixed value in its unit. " +
			"A fractile can move β the “wrong” way for two reasons: fixing an input removes its scatter, so when the input's value at the design point lies beyond both fractiles, both fixed values raise β; and an input that acts by its magnitude (a bow or an eccentricity, either side of the member) is worse at a large magnitude of either sign." +
			sameWayNote(b, same, "β")
	}
	return f
}

// sameWayNote names the rows whose two fractiles move the output the same
// way (drawn as two half-height bars, marked †) and says why for each
// that the bundle can explain: an input acting by its magnitude, or one
// whose FORM design-point value lies beyond both fractiles.
func sameWayNote(b *Bundle, same []string, output string) string {
	if len(same) == 0 {
		return ""
	}
	d := doc(b)
	var parts []string
	for _, name := range same {
		why := ""
		switch {
		case slices.Contains(b.ByMagnitude, name):
			why = " (acts by its magnitude)"
		case d.FORM != nil:
			if x, ok := d.FORM.DesignPoint[name]; ok && finite(x) {
				if lo, hi, found := fractilesOf(b, name); found && (x < min(lo, hi) || x > max(lo, hi)) {
					why = " (design-point value " + withUnitSig(x, inputUnit(b, name), 3) + ", beyond both fractiles)"
				}
			}
		}
		parts = append(parts, name+why)
	}
	return " † Both fractiles move " + output + " the same way for " + strings.Join(parts, ", ") + ": the two settings are drawn as two half-height bars, the low fractile above."
}

// fractilesOf returns the low and high fractile values of the named input
// from the tornado rows of b.
func fractilesOf(b *Bundle, name string) (lo, hi float64, ok bool) {
	for _, r := range b.TornadoBeta {
		if r.Variable == name {
			return r.LowValue, r.HighValue, true
		}
	}
	for _, r := range doc(b).Tornado {
		if r.Variable == name {
			return r.LowValue, r.HighValue, true
		}
	}
	return 0, 0, false
}

// tornadoChart draws two-sided horizontal bars of rows about base; values
// are multiplied by scale, xlabel names the axis and baseLegend introduces
// the base value in the legend. Rows that are not finite are left out; the
// figure is nil when nothing is left. same lists the rows whose two
// fractiles move the output the same way (see tornadoLayout); their names
// are marked †.
func tornadoChart(b *Bundle, all []Tornado, base, scale float64, xlabel, title, baseLegend string) (f *figure, same []string) {
	if len(all) == 0 || !finite(base) {
		return nil, nil
	}
	base *= scale
	label := func(r Tornado, x float64) string { return withUnitSig(x, inputUnit(b, r.Variable), 3) }
	rows, bars, same := tornadoLayout(all, base, scale, label)
	if len(rows) == 0 {
		return nil, nil
	}
	p := newPlot(title, xlabel, "")
	thumbs, xmin, xmax, err := addTornadoBars(p, bars, base)
	if err != nil {
		return nil, nil
	}
	bl, err := plotter.NewLine(plotter.XYs{{X: base, Y: -0.5}, {X: base, Y: float64(len(rows)) - 0.5}})
	if err != nil {
		return nil, nil
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
	names := make([]string, len(rows))
	for i, r := range rows {
		names[i] = r.Variable
		if slices.Contains(same, r.Variable) {
			names[i] += " †"
		}
	}
	p.NominalY(names...)
	p.Y.Tick.Label.Font.Size = 9
	if thumbs[0] != nil {
		p.Legend.Add("input at its low fractile", thumbs[0])
	}
	if thumbs[1] != nil {
		p.Legend.Add("input at its high fractile", thumbs[1])
	}
	p.Legend.Add(baseLegend+baseText(base, xlabel), bl)
	p.Legend.Top = false
	h := 4.5*vg.Centimeter + vg.Length(len(rows))*0.85*vg.Centimeter
	return &figure{W: 16 * vg.Centimeter, H: h, Plots: []*plot.Plot{p}}, same
}

// baseText writes the base value with the unit of xlabel: three
// significant digits, but whole units kept (1047 kN, not 1050).
func baseText(base float64, xlabel string) string {
	unit := ""
	if i := strings.LastIndex(xlabel, "("); i >= 0 && strings.HasSuffix(xlabel, ")") {
		if u := xlabel[i+1 : len(xlabel)-1]; u != "–" && u != "-" {
			unit = " " + u
		}
	}
	digits := 3
	if a := math.Abs(base); a >= 1000 && a < 1e7 {
		digits = int(math.Floor(math.Log10(a))) + 1
	}
	return sig(base, digits) + unit
}

// addTornadoBars adds the bars and their labels to p. It returns a bar of
// each fractile for the legend and the horizontal extent of the bars.
func addTornadoBars(p *plot.Plot, bars []tornadoBar, base float64) (thumbs [2]*plotter.Polygon, xmin, xmax float64, err error) {
	xmin, xmax = base, base
	var left, right plotter.XYLabels
	var leftStyle, rightStyle []text.Style
	for _, br := range bars {
		pg, err := plotter.NewPolygon(plotter.XYs{{X: base, Y: br.Y0}, {X: br.X, Y: br.Y0}, {X: br.X, Y: br.Y1}, {X: base, Y: br.Y1}})
		if err != nil {
			return thumbs, 0, 0, err
		}
		pg.LineStyle.Width = 0
		if br.Low {
			pg.Color, thumbs[0] = colCapacity, pg
		} else {
			pg.Color, thumbs[1] = colDemand, pg
		}
		p.Add(pg)
		xmin, xmax = math.Min(xmin, br.X), math.Max(xmax, br.X)
		st := textStyle(8, colInk)
		st.YAlign = draw.YCenter
		xy := plotter.XY{X: br.X, Y: br.LabelY}
		if br.Split {
			st = textStyle(7.5, colInk)
			st.YAlign = draw.YCenter
		}
		if br.Left {
			st.XAlign = draw.XRight
			left.XYs, left.Labels, leftStyle = append(left.XYs, xy), append(left.Labels, br.Label), append(leftStyle, st)
		} else {
			st.XAlign = draw.XLeft
			right.XYs, right.Labels, rightStyle = append(right.XYs, xy), append(right.Labels, br.Label), append(rightStyle, st)
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
			return thumbs, 0, 0, err
		}
		lb.TextStyle = l.st
		lb.Offset = vg.Point{X: l.off}
		p.Add(lb)
	}
	return thumbs, xmin, xmax, nil
}
