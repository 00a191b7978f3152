package report

import (
	"math"
	"strconv"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// invPoint is one member as the inventory pictures draw it.
type invPoint struct {
	name         string
	beta, lo, hi float64
}

// inventoryPoints are the members with a finite beta, in the order of the
// document (lowest beta first).
func inventoryPoints(inv *Inventory) (pts []invPoint, members []Member) {
	for _, m := range inv.Members {
		b := float64(m.Beta)
		if m.Error != "" || !finite(b) || math.Abs(b) > 1e300 {
			continue
		}
		pts = append(pts, invPoint{m.Name, b, float64(m.BetaCI[0]), float64(m.BetaCI[1])})
		members = append(members, m)
	}
	return pts, members
}

// addBetaBar draws one member's beta at position at, with its interval
// as an error bar with end caps along the beta axis (horizontal when
// horizontal is set), the estimate a ring so that a short bar shows.
func addBetaBar(p *plot.Plot, pt invPoint, at float64, horizontal bool, capHalf float64) {
	xy := func(beta, off float64) plotter.XY {
		if horizontal {
			return plotter.XY{X: beta, Y: at + off}
		}
		return plotter.XY{X: at + off, Y: beta}
	}
	if finite(pt.lo) && finite(pt.hi) && pt.lo <= pt.hi {
		for _, seg := range []plotter.XYs{{xy(pt.lo, 0), xy(pt.hi, 0)}, {xy(pt.lo, -capHalf), xy(pt.lo, capHalf)}, {xy(pt.hi, -capHalf), xy(pt.hi, capHalf)}} {
			if ln, err := plotter.NewLine(seg); err == nil {
				ln.LineStyle = lineStyle(colInk, 0.9, false)
				p.Add(ln)
			}
		}
	}
	if sc, err := plotter.NewScatter(plotter.XYs{xy(pt.beta, 0)}); err == nil {
		sc.GlyphStyle = draw.GlyphStyle{Color: colCapacity, Radius: vg.Points(3), Shape: draw.RingGlyph{}}
		p.Add(sc)
	}
}

// betaRange is the smallest and largest beta and interval end of pts and
// the target t (ignored when not finite).
func betaRange(pts []invPoint, t float64) (lo, hi float64) {
	lo, hi = math.Inf(1), math.Inf(-1)
	for _, pt := range pts {
		for _, v := range []float64{pt.beta, pt.lo, pt.hi} {
			if finite(v) && math.Abs(v) < 1e300 {
				lo, hi = math.Min(lo, v), math.Max(hi, v)
			}
		}
	}
	if finite(t) {
		lo, hi = math.Min(lo, t), math.Max(hi, t)
	}
	return lo, hi
}

// targetBeta is the study's target beta, NaN when it has none.
func targetBeta(d Document) float64 {
	if d.TargetBeta != nil && finite(*d.TargetBeta) {
		return *d.TargetBeta
	}
	return math.NaN()
}

// inventoryRankedFigure draws the members of the inventory ranked by
// beta, the lowest on top, each with its 95% interval; the target, if
// any, is a dashed line.
func inventoryRankedFigure(b *Bundle) *figure {
	d := doc(b)
	if d.Inventory == nil {
		return nil
	}
	pts, _ := inventoryPoints(d.Inventory)
	if len(pts) == 0 {
		return nil
	}
	n := len(pts)
	p := newPlot("Members ranked by reliability index", "reliability index β (–)", "")
	addGridLines(p, false, true)
	names := make([]string, n)
	for i, pt := range pts {
		y := float64(n - 1 - i) // the weakest on top
		names[n-1-i] = pt.name
		addBetaBar(p, pt, y, true, 0.18)
	}
	t := targetBeta(d)
	if finite(t) {
		if ln, err := plotter.NewLine(plotter.XYs{{X: t, Y: -0.5}, {X: t, Y: float64(n) - 0.5}}); err == nil {
			ln.LineStyle = lineStyle(colFailure, 1, true)
			p.Add(ln)
			p.Legend.Add("target β = "+fixed(t, 2), ln)
		}
	}
	lo, hi := betaRange(pts, t)
	span := math.Max(hi-lo, 0.2)
	p.X.Min, p.X.Max = lo-0.1*span, hi+0.1*span
	// A free band above the rows holds the legend, clear of the bars.
	p.Y.Min, p.Y.Max = -0.6, float64(n)+0.3
	p.NominalY(names...)
	p.Y.Tick.Label.Font.Size = 9
	h := vg.Length(3.5+0.6*float64(n)) * vg.Centimeter
	return &figure{Name: "inventory-ranked", Caption: "Reliability index β (dimensionless) of every member of the inventory, the lowest on top (bar: its 95% interval); dashed: the target. Members share inputs, so their results are not independent.", W: 16 * vg.Centimeter, H: min(h, 60*vg.Centimeter), Plots: []*plot.Plot{p}}
}

// cellNumber reads a cell as a number and its unit, if written in the
// cell ("3.6 m").
func cellNumber(cell string) (x float64, unit string, ok bool) {
	f := strings.Fields(cell)
	if len(f) == 0 || len(f) > 2 {
		return 0, "", false
	}
	x, err := strconv.ParseFloat(f[0], 64)
	if err != nil || !finite(x) {
		return 0, "", false
	}
	if len(f) == 2 {
		unit = f[1]
	}
	return x, unit, true
}

// isShared reports whether column c is a shared input's key path, lies
// under one, or groups members sharing an input.
func isShared(c string, shared []string) bool {
	for _, s := range shared {
		if c == s || strings.HasPrefix(c, s+".") {
			return true
		}
	}
	return false
}

// againstColumn is the column the members are drawn against: named, when
// not "", else the first column, not shared, whose every cell is a number
// of one unit and which is not the same for all members. It returns ""
// when none is (or the named column's cells are not numbers of one unit).
func againstColumn(columns, shared []string, named string, members []Member) (col, unit string) {
	if named != "" {
		columns, shared = []string{named}, nil
	}
	for _, c := range columns {
		if isShared(c, shared) {
			continue
		}
		ok, varies := true, false
		var first float64
		var u string
		for i, m := range members {
			x, mu, good := cellNumber(m.Cells[c])
			if !good || (i > 0 && mu != u) {
				ok = false
				break
			}
			if i == 0 {
				first, u = x, mu
			} else if x != first {
				varies = true
			}
		}
		if ok && (varies || named != "") {
			return c, u
		}
	}
	return "", ""
}

// inventoryAgainstFigure draws each member's beta, with its 95%
// interval, against one numeric column of the inventory (againstColumn);
// the target, if any, is a dashed line.
func inventoryAgainstFigure(b *Bundle) *figure {
	d := doc(b)
	if d.Inventory == nil {
		return nil
	}
	pts, members := inventoryPoints(d.Inventory)
	col, unit := againstColumn(b.InventoryColumns, b.InventoryShared, b.InventoryAgainst, members)
	if len(pts) == 0 || col == "" {
		return nil
	}
	xlabel := col
	if unit != "" {
		xlabel += " (" + unit + ")"
	}
	p := newPlot("Reliability index against "+col, xlabel, "reliability index β (–)")
	addGrid(p, true)
	xmin, xmax := math.Inf(1), math.Inf(-1)
	xs := make([]float64, len(pts))
	for i := range pts {
		x, _, _ := cellNumber(members[i].Cells[col])
		xs[i] = x
		xmin, xmax = math.Min(xmin, x), math.Max(xmax, x)
	}
	span := xmax - xmin
	for i, pt := range pts {
		addBetaBar(p, pt, xs[i], false, 0.012*span)
	}
	addMemberLabels(p, pts, xs, 0.022*span)
	p.X.Min, p.X.Max = xmin-0.08*span, xmax+0.08*span
	t := targetBeta(d)
	if finite(t) {
		if ln, err := plotter.NewLine(plotter.XYs{{X: p.X.Min, Y: t}, {X: p.X.Max, Y: t}}); err == nil {
			ln.LineStyle = lineStyle(colFailure, 1, true)
			p.Add(ln)
			p.Legend.Add("target β = "+fixed(t, 2), ln)
		}
	}
	lo, hi := betaRange(pts, t)
	yspan := math.Max(hi-lo, 0.2)
	// A free band above the points holds the legend.
	p.Y.Min, p.Y.Max = lo-0.08*yspan, hi+0.25*yspan
	why := "The column is the first numeric one of the inventory that no shared input uses ([inventory] plot_against names another)."
	if b.InventoryAgainst != "" {
		why = "The column is the one [inventory] plot_against names."
	}
	return &figure{Name: "inventory-against", Caption: "Reliability index β (dimensionless) of every member of the inventory against its " + col + " (bar: the 95% interval of β); dashed: the target. " + why, W: 16 * vg.Centimeter, H: 9 * vg.Centimeter, Plots: []*plot.Plot{p}}
}

// addMemberLabels names each member beside its point, when there are few
// enough members for the names to be read.
func addMemberLabels(p *plot.Plot, pts []invPoint, xs []float64, dx float64) {
	if len(pts) > 30 {
		return
	}
	xys := make(plotter.XYs, len(pts))
	names := make([]string, len(pts))
	for i, pt := range pts {
		xys[i] = plotter.XY{X: xs[i] + dx, Y: pt.beta}
		names[i] = pt.name
	}
	l, err := plotter.NewLabels(plotter.XYLabels{XYs: xys, Labels: names})
	if err != nil {
		return
	}
	for i := range l.TextStyle {
		l.TextStyle[i] = textStyle(8, colInk)
		l.TextStyle[i].YAlign = draw.YCenter
	}
	p.Add(l)
}
