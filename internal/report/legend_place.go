package report

import (
	"math"
	"unicode/utf8"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
)

// legendCorner is a corner of a plot's data area.
type legendCorner struct{ top, left bool }

// legendCorners are the corners tried, in order of preference on a tie.
var legendCorners = []legendCorner{{true, false}, {false, true}, {false, false}, {true, true}}

// bestLegendCorner returns the corner of the data area [0, xmax] x
// [0, ymax] whose legend box (a fraction wf of the width and hf of the
// height) covers the fewest of the drawn points pts.
func bestLegendCorner(pts plotter.XYs, xmax, ymax, wf, hf float64) legendCorner {
	best, fewest := legendCorners[0], math.MaxInt
	for _, c := range legendCorners {
		x0, x1 := xmax*(1-wf), xmax
		if c.left {
			x0, x1 = 0, xmax*wf
		}
		y0, y1 := 0.0, ymax*hf
		if c.top {
			y0, y1 = ymax*(1-hf), ymax
		}
		n := 0
		for _, p := range pts {
			if p.X >= x0 && p.X <= x1 && p.Y >= y0 && p.Y <= y1 {
				n++
			}
		}
		if n < fewest {
			best, fewest = c, n
		}
	}
	return best
}

// placeLegend puts the legend of p (entries lines, the longest of
// longest characters) in the corner of its data area, [0, xmax] x
// [0, ymax], that hides the fewest of the drawn points pts. w and h are the
// picture's size; the data area is taken as the picture less about 2 cm
// each way for the title, axes and labels.
func placeLegend(p *plot.Plot, pts plotter.XYs, entries, longest int, xmax, ymax float64, w, h vg.Length) {
	if !(xmax > 0 && ymax > 0) {
		return
	}
	areaW, areaH := w-2*vg.Centimeter, h-2*vg.Centimeter
	// 9 pt text: about 0.5 em a character, a line of 11 pt; the thumbnail
	// and the padding besides.
	boxW := vg.Length(longest)*4.6 + 2*p.Legend.ThumbnailWidth + 8
	boxH := vg.Length(entries)*11 + 8
	c := bestLegendCorner(pts, xmax, ymax, math.Min(1, float64(boxW/areaW)), math.Min(1, float64(boxH/areaH)))
	p.Legend.Top, p.Legend.Left = c.top, c.left
	p.Legend.XOffs, p.Legend.YOffs = 0, 0
	if c.left {
		p.Legend.XOffs = vg.Points(8)
	}
	if !c.top {
		p.Legend.YOffs = vg.Points(6)
	}
}

// legendLayout gathers what a plot draws and names in its legend, so
// that the legend can then go where it hides the fewest points.
type legendLayout struct {
	pts   plotter.XYs
	names []string
}

// add names thumbs in the legend of p and records the points drawn.
func (l *legendLayout) add(p *plot.Plot, name string, pts plotter.XYs, thumbs ...plot.Thumbnailer) {
	p.Legend.Add(name, thumbs...)
	l.pts = append(l.pts, pts...)
	l.names = append(l.names, name)
}

// place puts the legend of p, a picture of size w by h whose data area
// starts at 0 on both axes (see placeLegend).
func (l *legendLayout) place(p *plot.Plot, w, h vg.Length) {
	xmax, ymax, longest := 0.0, 0.0, 0
	for _, q := range l.pts {
		xmax, ymax = math.Max(xmax, q.X), math.Max(ymax, q.Y)
	}
	for _, n := range l.names {
		longest = max(longest, utf8.RuneCountInString(n))
	}
	placeLegend(p, l.pts, len(l.names), longest, xmax, ymax, w, h)
}
