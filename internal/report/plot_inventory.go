package report

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// invPoint is one member as the inventory pictures draw it; concern is
// set when it does not meet the target or is undecided.
type invPoint struct {
	name         string
	beta, lo, hi float64
	concern      bool
}

// inventoryPoints are the members with a finite beta, in the order of the
// document (lowest beta first).
func inventoryPoints(inv *Inventory) (pts []invPoint, members []Member) {
	for _, m := range inv.Members {
		b := float64(m.Beta)
		if m.Error != "" || !finite(b) || math.Abs(b) > 1e300 {
			continue
		}
		v := shownVerdict(m)
		pts = append(pts, invPoint{m.Name, b, float64(m.BetaCI[0]), float64(m.BetaCI[1]), v == "not met" || v == "undecided"})
		members = append(members, m)
	}
	return pts, members
}

// addBetaBar draws one member's beta at position at, with its interval
// as an error bar with end caps along the beta axis (horizontal when
// horizontal is set), the estimate a ring of radius r so that a short bar
// shows; bar and ring are red for a member of concern (the ring drawn
// thicker, so that it reads at a glance beside the target's red line),
// blue otherwise.
func addBetaBar(p *plot.Plot, pt invPoint, at float64, horizontal bool, capHalf float64, r vg.Length) {
	xy := func(beta, off float64) plotter.XY {
		if horizontal {
			return plotter.XY{X: beta, Y: at + off}
		}
		return plotter.XY{X: at + off, Y: beta}
	}
	c, ring := colCapacity, vg.Points(0.9)
	if pt.concern {
		c, ring = colFailure, vg.Points(1.8)
	}
	if finite(pt.lo) && finite(pt.hi) && pt.lo <= pt.hi {
		for _, seg := range []plotter.XYs{{xy(pt.lo, 0), xy(pt.hi, 0)}, {xy(pt.lo, -capHalf), xy(pt.lo, capHalf)}, {xy(pt.hi, -capHalf), xy(pt.hi, capHalf)}} {
			if ln, err := plotter.NewLine(seg); err == nil {
				ln.LineStyle = lineStyle(c, 0.9, false)
				p.Add(ln)
			}
		}
	}
	if sc, err := plotter.NewScatter(plotter.XYs{xy(pt.beta, 0)}); err == nil {
		sc.GlyphStyle = draw.GlyphStyle{Color: c, Radius: r, Shape: thickRing{ring}}
		p.Add(sc)
	}
}

// thickRing is a ring glyph whose line is Width wide (draw.RingGlyph
// takes a fixed hairline).
type thickRing struct{ Width vg.Length }

// DrawGlyph implements draw.GlyphDrawer.
func (g thickRing) DrawGlyph(c *draw.Canvas, sty draw.GlyphStyle, pt vg.Point) {
	c.SetLineStyle(draw.LineStyle{Color: sty.Color, Width: g.Width})
	var p vg.Path
	p.Move(vg.Point{X: pt.X + sty.Radius, Y: pt.Y})
	p.Arc(pt, sty.Radius, 0, 2*math.Pi)
	p.Close()
	c.Stroke(p)
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

// rankedMaxRows is the most members the ranked picture draws: the
// lowest ones, each named; the caption gives the range of the others.
const rankedMaxRows = 50

// inventoryRankedFigure draws the members of the inventory ranked by
// beta, the lowest on top (at most rankedMaxRows of them), each with its
// 95% interval, those that do not meet the target or are undecided in
// red; the target, if any, is a dashed line.
func inventoryRankedFigure(b *Bundle) *figure {
	d := doc(b)
	if d.Inventory == nil {
		return nil
	}
	all, _ := inventoryPoints(d.Inventory)
	if len(all) == 0 {
		return nil
	}
	pts := all[:min(len(all), rankedMaxRows)]
	n := len(pts)
	p := newPlot("Members ranked by reliability index", "reliability index β (–)", "")
	addGridLines(p, false, true)
	names := make([]string, n)
	for i, pt := range pts {
		y := float64(n - 1 - i) // the weakest on top
		names[n-1-i] = pt.name
		addBetaBar(p, pt, y, true, 0.18, vg.Points(3))
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
	caption := "Reliability index β (dimensionless) of every member of the inventory, the lowest on top (bar: its 95% interval; red: not meeting the target or undecided); dashed: the target. Members share inputs, so their results are not independent."
	if rest := all[n:]; len(rest) > 0 {
		caption = fmt.Sprintf("Reliability index β (dimensionless) of the %d members of the inventory with the lowest β, the lowest on top (bar: its 95%% interval; red: not meeting the target or undecided); dashed: the target. The other %d members have β from %s to %s; every member is in inventory.csv and in the picture of β against a column. Members share inputs, so their results are not independent.",
			n, len(rest), fixed(rest[0].beta, 2), fixed(rest[len(rest)-1].beta, 2))
	}
	if left := len(d.Inventory.Members) - len(all); left > 0 {
		caption += fmt.Sprintf(" %d %s no finite β (no sample failed, every sample failed, or not run) and %s not drawn: see inventory.csv.", left, plural(left, "member has", "members have"), plural(left, "is", "are"))
	}
	h := vg.Length(3.5+0.6*float64(n)) * vg.Centimeter
	return &figure{Name: "inventory-ranked", Caption: caption, W: 16 * vg.Centimeter, H: h, Plots: []*plot.Plot{p}}
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

// Sizes of the against picture (cm): the figure, and roughly its
// plotting area inside the title, the axes and their labels.
const (
	againstW, againstH         = 16.0, 9.0
	againstAreaW, againstAreaH = 13.6, 6.4
)

// inventoryAgainstFigure draws each member's beta, with its 95%
// interval, against one numeric column of the inventory (againstColumn),
// in the unit of its cells or of the inventory's header; members that do
// not meet the target or are undecided in red and named where there is
// room (every member when there are few); the target, if any, is a
// dashed line.
func inventoryAgainstFigure(b *Bundle) *figure {
	f, _ := againstFigure(b)
	return f
}

// againstFigure is inventoryAgainstFigure with the members' names it
// writes (nil when none).
func againstFigure(b *Bundle) (*figure, *plotter.Labels) {
	d := doc(b)
	if d.Inventory == nil {
		return nil, nil
	}
	pts, members := inventoryPoints(d.Inventory)
	col, unit := againstColumn(b.InventoryColumns, b.InventoryShared, b.InventoryAgainst, members)
	if len(pts) == 0 || col == "" {
		return nil, nil
	}
	if unit == "" {
		unit = b.InventoryUnits[col]
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
	if span == 0 {
		span = math.Max(math.Abs(xmax), 1) // one value: a band around it
	}
	r, capHalf := vg.Points(3), 0.012*span
	if len(pts) > 30 {
		r, capHalf = vg.Points(1.8), 0.005*span
	}
	for i, pt := range pts {
		addBetaBar(p, pt, xs[i], false, capHalf, r)
	}
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
	labels := addMemberLabels(p, pts, xs, t)
	named := 0
	if labels != nil {
		named = len(labels.Labels)
	}
	why := "The column is the first numeric one of the inventory that no shared input uses ([inventory] plot_against names another)."
	if b.InventoryAgainst != "" {
		why = "The column is the one [inventory] plot_against names."
	}
	names := "Every member is named."
	if named < len(pts) {
		names = fmt.Sprintf("%d of the %d members are named: those of concern, the lowest β first, where there is room; every member is in inventory.csv.", named, len(pts))
	}
	return &figure{Name: "inventory-against", Caption: "Reliability index β (dimensionless) of every member of the inventory against its " + xlabel + " (bar: the 95% interval of β; red: not meeting the target or undecided); dashed: the target. " + why + " " + names, W: againstW * vg.Centimeter, H: againstH * vg.Centimeter, Plots: []*plot.Plot{p}}, labels
}

// maxAgainstLabels is the most members named on the against picture of
// an inventory of more than 30 members.
const maxAgainstLabels = 12

// box is a label's extent in data units.
type box struct{ x0, x1, y0, y1 float64 }

func (a box) overlaps(b box) bool { return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1 }

// addMemberLabels names members beside their points, after the axes'
// ranges are set: every member of an inventory of at most 30, else the
// members of concern up to maxAgainstLabels; concern first, lowest beta
// first, each to the right of its point or else to the left, moved off
// the target line t (NaN: none) to the point's side of it, left out
// where it would cover another name (or, of a few members, a point) or
// leave the plot. It returns the names, nil when none.
func addMemberLabels(p *plot.Plot, pts []invPoint, xs []float64, t float64) *plotter.Labels {
	xcm := (p.X.Max - p.X.Min) / againstAreaW // data units a centimetre
	ycm := (p.Y.Max - p.Y.Min) / againstAreaH
	few := len(pts) <= 30
	var taken []box // names, and the points of a few members
	if few {
		for i, pt := range pts {
			taken = append(taken, box{xs[i] - 0.11*xcm, xs[i] + 0.11*xcm, pt.beta - 0.11*ycm, pt.beta + 0.11*ycm})
		}
	}
	var xys plotter.XYs
	var names []string
	var styles []text.Style
	for _, concern := range []bool{true, false} {
		for i, pt := range pts {
			if pt.concern != concern || (!concern && !few) || (!few && len(names) == maxAgainstLabels) {
				continue
			}
			w, h, dx := 0.155*float64(len(pt.name))*xcm, 0.34*ycm, 0.2*xcm // 8-point text
			y := pt.beta
			if finite(t) && math.Abs(y-t) < h/2 {
				// Off the target line, on the point's side of it.
				y = t + math.Copysign(h/2+0.03*ycm, pt.beta-t)
			}
			right := box{xs[i] + dx, xs[i] + dx + w, y - h/2, y + h/2}
			left := box{xs[i] - dx - w, xs[i] - dx, y - h/2, y + h/2}
			for k, bx := range []box{right, left} {
				if bx.x0 < p.X.Min || bx.x1 > p.X.Max || bx.y0 < p.Y.Min || bx.y1 > p.Y.Max || overlapsAny(bx, taken, i, few) {
					continue
				}
				st := textStyle(8, colInk)
				st.YAlign = draw.YCenter
				x := bx.x0
				if k == 1 {
					st.XAlign, x = draw.XRight, bx.x1
				}
				taken = append(taken, bx)
				xys = append(xys, plotter.XY{X: x, Y: y})
				names = append(names, pt.name)
				styles = append(styles, st)
				break
			}
		}
	}
	if len(names) == 0 {
		return nil
	}
	l, err := plotter.NewLabels(plotter.XYLabels{XYs: xys, Labels: names})
	if err != nil {
		return nil
	}
	copy(l.TextStyle, styles)
	p.Add(l)
	return l
}

// overlapsAny reports whether b overlaps any of bs but the point of
// member self (bs begin with the points of the members when few).
func overlapsAny(b box, bs []box, self int, few bool) bool {
	for j, o := range bs {
		if few && j == self {
			continue
		}
		if b.overlaps(o) {
			return true
		}
	}
	return false
}
