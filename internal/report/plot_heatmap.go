package report

import (
	"fmt"
	"image/color"
	"math"
	"sort"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
)

// maxHeatPanels is the most panels the heat map draws (the study and the
// first variants); every case is in cases.csv.
const maxHeatPanels = 6

// heatGrid is a sweep of two keys laid out as a grid: the distinct values
// of each key, sorted, and the swept point at each cell.
type heatGrid struct {
	xs, ys []float64
	at     [][]int // at[ix][iy]: the index of the swept point
}

// newHeatGrid lays the points of c out as a grid, or returns nil when they
// are not every combination of two keys (a zipped sweep).
func newHeatGrid(c *CaseTable) *heatGrid {
	if c == nil || len(c.Keys) != 2 || len(c.Points) < 4 {
		return nil
	}
	g := &heatGrid{xs: distinctValues(c, 0), ys: distinctValues(c, 1)}
	if len(g.xs) < 2 || len(g.ys) < 2 || len(g.xs)*len(g.ys) != len(c.Points) {
		return nil
	}
	g.at = make([][]int, len(g.xs))
	for ix := range g.at {
		g.at[ix] = make([]int, len(g.ys))
		for iy := range g.at[ix] {
			g.at[ix][iy] = -1
		}
	}
	for i, p := range c.Points {
		ix, iy := sort.SearchFloat64s(g.xs, p[0]), sort.SearchFloat64s(g.ys, p[1])
		if g.at[ix][iy] >= 0 {
			return nil // a combination twice: not a grid
		}
		g.at[ix][iy] = i
	}
	return g
}

// distinctValues are the distinct values of axis a over the points of c,
// sorted.
func distinctValues(c *CaseTable, a int) []float64 {
	seen := map[float64]bool{}
	var out []float64
	for _, p := range c.Points {
		if !seen[p[a]] {
			seen[p[a]] = true
			out = append(out, p[a])
		}
	}
	sort.Float64s(out)
	return out
}

// betaClass is a class of the heat map's colour scale: beta from Low
// (inclusive) to High (exclusive).
type betaClass struct {
	Low, High float64
	Fill      color.Color
	Light     bool // the fill is light: dark text on it
}

// heatClasses are the colour classes of beta: about the target when there
// is one (reds below it, blues at or above it), else at whole numbers in
// one hue.
func heatClasses(target *float64) []betaClass {
	reds := []color.RGBA{{0x99, 0x1f, 0x17, 0xff}, {0xd6, 0x60, 0x4d, 0xff}, {0xf4, 0xb6, 0xa6, 0xff}}
	blues := []color.RGBA{{0xbd, 0xd7, 0xee, 0xff}, {0x6b, 0xa3, 0xd6, 0xff}, {0x1f, 0x5a, 0x99, 0xff}}
	var edges []float64
	var fills []color.RGBA
	if target != nil && finite(*target) {
		t := *target
		edges = []float64{t - 2, t - 1, t, t + 1, t + 2}
		fills = append(reds, blues...)
	} else {
		edges = []float64{1, 2, 3, 4, 5}
		fills = []color.RGBA{{0xf2, 0xf2, 0xf2, 0xff}, {0xd4, 0xdc, 0xe4, 0xff}, {0xaa, 0xba, 0xc9, 0xff}, {0x7a, 0x8a, 0x99, 0xff}, {0x4f, 0x60, 0x71, 0xff}, {0x2c, 0x3a, 0x48, 0xff}}
	}
	classes := make([]betaClass, len(fills))
	for k := range classes {
		lo, hi := math.Inf(-1), math.Inf(1)
		if k > 0 {
			lo = edges[k-1]
		}
		if k < len(edges) {
			hi = edges[k]
		}
		r, g, b := float64(fills[k].R), float64(fills[k].G), float64(fills[k].B)
		classes[k] = betaClass{Low: lo, High: hi, Fill: fills[k], Light: 0.299*r+0.587*g+0.114*b > 150}
	}
	return classes
}

// classOf is the class of beta (+inf: no sample failed).
func classOf(classes []betaClass, beta float64) betaClass {
	for _, c := range classes {
		if beta < c.High {
			return c
		}
	}
	return classes[len(classes)-1]
}

// name is the class as the legend writes it.
func (c betaClass) name() string {
	switch {
	case math.IsInf(c.Low, -1):
		return "β < " + fixed(c.High, 1)
	case math.IsInf(c.High, 1):
		return "β ≥ " + fixed(c.Low, 1)
	}
	return fixed(c.Low, 1) + " ≤ β < " + fixed(c.High, 1)
}

// heatmapFigure draws beta over a sweep of every combination of two keys:
// a panel for the study and one for each variant (the first
// maxHeatPanels), a cell per swept point coloured by its class of beta and
// labelled with beta when the cells are large enough; with a target, a
// dark line bounds the cells below it. A side panel gives the classes.
func heatmapFigure(b *Bundle) *figure {
	c := b.Cases
	if c != nil && len(c.Keys) > 2 {
		return multiHeatmapFigure(b)
	}
	g := newHeatGrid(c)
	if g == nil {
		return nil
	}
	target := doc(b).TargetBeta
	classes := heatClasses(target)
	n := min(len(c.Grid), maxHeatPanels)
	labelled := len(g.xs) <= 10 && len(g.ys) <= 14
	var plots []*plot.Plot
	for s := 0; s < n; s++ {
		p := heatPanel(c, g, s, c.seriesName(s), classes, target, labelled)
		if p == nil {
			return nil
		}
		plots = append(plots, p)
	}
	cols := min(n, 3)
	rows := (n + cols - 1) / cols
	f := &figure{Name: "heatmap", Plots: plots, Cols: cols,
		W: vg.Length(cols)*8*vg.Centimeter + 4.5*vg.Centimeter, H: vg.Length(rows) * 8 * vg.Centimeter,
		Side: heatLegend(classes, target, anyDoubtful(c, n)), SideW: 4.5 * vg.Centimeter}
	var w strings.Builder
	fmt.Fprintf(&w, "Reliability index β (dimensionless) at every combination of %s and %s, one panel for the study", c.Keys[0], c.Keys[1])
	if len(c.Grid) > 1 {
		w.WriteString(" and one for each variant")
		if len(c.Grid) > n {
			fmt.Fprintf(&w, " (the first %d; every case is in cases.csv)", n-1)
		}
	}
	w.WriteString(heatCaptionTail(labelled, target, anyDoubtful(c, n)))
	f.Caption = w.String()
	return f
}

// heatCaptionTail is what a heat map's caption says of its cells: the
// colours, the numbers, the target's line and the grey of the estimates
// not trusted (when doubt).
func heatCaptionTail(labelled bool, target *float64, doubt bool) string {
	var w strings.Builder
	w.WriteString(". The colour of a cell is its class of β (legend)")
	if labelled {
		w.WriteString("; the number in it is β (inf: no sample failed, β only bounded below; -inf: every sample failed)")
	} else {
		w.WriteString("; the cells are too many to write β in them: cases.csv gives it")
	}
	if target != nil && finite(*target) {
		fmt.Fprintf(&w, ". Reds are below the target β = %s, blues at or above it; the dark line bounds the cells below the target", fixed(*target, 2))
	}
	w.WriteString(". A white cell did not run.")
	if doubt {
		w.WriteString(" A grey cell, its β marked ?, has an estimate the engine does not trust (the warnings say why): it is not judged against the target.")
	}
	return w.String()
}

// heatPanel is the panel of series s (the study, then each variant) over
// the cells of g, under the title.
func heatPanel(c *CaseTable, g *heatGrid, s int, title string, classes []betaClass, target *float64, labelled bool) *plot.Plot {
	p := newPlot(title, c.Keys[0], c.Keys[1])
	p.X.Tick.Marker = indexTicks(g.xs, c.Keys[0], 6)
	p.Y.Tick.Marker = indexTicks(g.ys, c.Keys[1], 12)
	edge := 1.0 // white lines between the cells, thinner when they are many
	if len(g.xs) > 12 || len(g.ys) > 12 {
		edge = 0.3
	}
	p.X.Min, p.X.Max = -0.5, float64(len(g.xs))-0.5
	p.Y.Min, p.Y.Max = -0.5, float64(len(g.ys))-0.5
	p.X.Tick.Length, p.Y.Tick.Length = 0, 0
	var labels plotter.XYLabels
	var styles []text.Style
	beta := func(ix, iy int) (float64, bool) {
		i := g.at[ix][iy]
		if s >= len(c.Grid) || i >= len(c.Grid[s]) || c.Grid[s][i] == nil {
			return 0, false
		}
		pt := c.Grid[s][i]
		if pt.Pf == 0 {
			return math.Inf(1), true
		}
		return float64(pt.Beta), !math.IsNaN(float64(pt.Beta))
	}
	doubtful := func(ix, iy int) bool {
		i := g.at[ix][iy]
		return s < len(c.Grid) && i < len(c.Grid[s]) && c.Grid[s][i] != nil && c.Grid[s][i].Doubtful
	}
	for ix := range g.xs {
		for iy := range g.ys {
			x, y := float64(ix), float64(iy)
			bt, ok := beta(ix, iy)
			fill := color.Color(color.White)
			var cl betaClass
			switch {
			case ok && doubtful(ix, iy):
				// Not judged against the target: grey, its beta marked.
				cl = betaClass{Fill: colGrid, Light: true}
				fill = cl.Fill
			case ok:
				cl = classOf(classes, bt)
				fill = cl.Fill
			}
			cell, err := plotter.NewPolygon(plotter.XYs{{X: x - 0.5, Y: y - 0.5}, {X: x + 0.5, Y: y - 0.5}, {X: x + 0.5, Y: y + 0.5}, {X: x - 0.5, Y: y + 0.5}})
			if err != nil {
				return nil
			}
			cell.Color = fill
			cell.LineStyle = lineStyle(color.White, edge, false)
			p.Add(cell)
			if !labelled || !ok {
				continue
			}
			ink := color.Color(color.White)
			if cl.Light {
				ink = colInk
			}
			labels.XYs = append(labels.XYs, plotter.XY{X: x, Y: y})
			label := BetaText(bt)
			if math.IsInf(bt, 0) {
				label = csvIndex(Index(bt)) // "inf" or "-inf": the caption says what they mean
			}
			if doubtful(ix, iy) {
				label += "?"
			}
			labels.Labels = append(labels.Labels, label)
			st := textStyle(9, ink)
			st.XAlign, st.YAlign = text.XCenter, text.YCenter
			styles = append(styles, st)
		}
	}
	if target != nil && finite(*target) {
		judged := func(ix, iy int) (float64, bool) {
			b, ok := beta(ix, iy)
			return b, ok && !doubtful(ix, iy)
		}
		addTargetBoundary(p, g, judged, *target)
	}
	if len(labels.Labels) > 0 {
		if l, err := plotter.NewLabels(labels); err == nil {
			l.TextStyle = styles
			p.Add(l)
		}
	}
	return p
}

// addTargetBoundary draws the edges between cells below the target and
// cells at or above it.
func addTargetBoundary(p *plot.Plot, g *heatGrid, beta func(ix, iy int) (float64, bool), t float64) {
	for _, e := range targetEdges(g, beta, t) {
		if ln, err := plotter.NewLine(plotter.XYs{{X: e[0], Y: e[1]}, {X: e[2], Y: e[3]}}); err == nil {
			ln.LineStyle = lineStyle(colInk, 2.2, false)
			p.Add(ln)
		}
	}
}

// targetEdges are the cell edges (x0, y0, x1, y1 in cell units) between a
// cell whose beta is below t and a neighbour whose beta is not; cells
// that did not run have no edges.
func targetEdges(g *heatGrid, beta func(ix, iy int) (float64, bool), t float64) [][4]float64 {
	below := func(ix, iy int) (bool, bool) {
		b, ok := beta(ix, iy)
		return b < t, ok
	}
	var out [][4]float64
	for ix := range g.xs {
		for iy := range g.ys {
			a, ok := below(ix, iy)
			if !ok {
				continue
			}
			x, y := float64(ix), float64(iy)
			if ix+1 < len(g.xs) {
				if b, ok := below(ix+1, iy); ok && a != b {
					out = append(out, [4]float64{x + 0.5, y - 0.5, x + 0.5, y + 0.5})
				}
			}
			if iy+1 < len(g.ys) {
				if b, ok := below(ix, iy+1); ok && a != b {
					out = append(out, [4]float64{x - 0.5, y + 0.5, x + 0.5, y + 0.5})
				}
			}
		}
	}
	return out
}

// indexTicks labels the cells 0, 1, ... of an axis with the swept values
// they stand for (L/n values as L/n), at most about most of them.
func indexTicks(values []float64, key string, most int) plot.ConstantTicks {
	ticks := make(plot.ConstantTicks, len(values))
	step := max(1, (len(values)+most-1)/most)
	for i, v := range values {
		ticks[i].Value = float64(i)
		if i%step == 0 {
			ticks[i].Label = heatValue(v, key)
		}
	}
	return ticks
}

// heatValue writes a swept value of the axis key: L/n for a fraction of
// the length, else four significant digits.
func heatValue(v float64, key string) string {
	if strings.HasSuffix(key, "(fraction of L)") && v > 0 {
		return "L/" + sig(1/v, 4)
	}
	if strings.HasSuffix(key, "(fraction of Lcr)") && v > 0 {
		return "Lcr/" + sig(1/v, 4)
	}
	return sig(v, 4)
}

// heatLegend is the side panel naming the classes of beta, the highest on
// top, the grey of the estimates not trusted (when doubt), and the
// target's boundary.
func heatLegend(classes []betaClass, target *float64, doubt bool) *plot.Plot {
	p := newPlot("", "", "")
	p.HideAxes()
	p.X.Min, p.X.Max, p.Y.Min, p.Y.Max = 0, 1, 0, 1
	p.Legend.Top, p.Legend.Left = true, true
	p.Legend.ThumbnailWidth = vg.Points(16)
	p.Legend.Add("β classes")
	for k := len(classes) - 1; k >= 0; k-- {
		sw, err := plotter.NewPolygon(plotter.XYs{{X: 0, Y: 0}, {X: 1, Y: 0}, {X: 1, Y: 1}})
		if err != nil {
			continue
		}
		sw.Color = classes[k].Fill
		sw.LineStyle.Width = 0
		p.Legend.Add(classes[k].name(), sw)
	}
	if sw, err := plotter.NewPolygon(plotter.XYs{{X: 0, Y: 0}, {X: 1, Y: 0}, {X: 1, Y: 1}}); err == nil && doubt {
		sw.Color = colGrid
		sw.LineStyle.Width = 0
		p.Legend.Add("not trusted (β?)", sw)
	}
	if target != nil && finite(*target) {
		if ln, err := plotter.NewLine(plotter.XYs{{X: 0, Y: 0}, {X: 1, Y: 0}}); err == nil {
			ln.LineStyle = lineStyle(colInk, 2.2, false)
			p.Legend.Add("edge of target β = "+fixed(*target, 2), ln)
		}
	}
	return p
}

// anyDoubtful tells whether a case of the first n rows of c.Grid has an
// estimate the engine does not trust.
func anyDoubtful(c *CaseTable, n int) bool {
	for _, line := range c.Grid[:min(n, len(c.Grid))] {
		for _, pt := range line {
			if pt != nil && pt.Doubtful {
				return true
			}
		}
	}
	return false
}
