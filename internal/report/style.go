package report

import (
	"image/color"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// The project's chart style: one sans-serif face (Liberation Sans, compiled
// into gonum/plot, so no font files are read), a few calm colours, thin
// axes, no frame or background grid unless a picture needs one, and one
// colour and line style per capacity model (modelStyles, below).
var (
	sans = font.Font{Typeface: "Liberation", Variant: "Sans"}

	colCapacity = color.RGBA{R: 0x2b, G: 0x6c, B: 0xb0, A: 0xff} // blue
	colDemand   = color.RGBA{R: 0xd9, G: 0x7a, B: 0x1e, A: 0xff} // orange
	colFailure  = color.RGBA{R: 0xc0, G: 0x39, B: 0x2b, A: 0xff} // red
	colSafe     = color.RGBA{R: 0x7a, G: 0x8a, B: 0x99, A: 0xff} // slate
	colInk      = color.RGBA{R: 0x22, G: 0x22, B: 0x22, A: 0xff}
	colMuted    = color.RGBA{R: 0x88, G: 0x88, B: 0x88, A: 0xff}
	colGrid     = color.RGBA{R: 0xe4, G: 0xe4, B: 0xe4, A: 0xff}

	// palette colours the series of a picture in order.
	palette = []color.Color{
		colCapacity, colDemand,
		color.RGBA{R: 0x3a, G: 0x8d, B: 0x5c, A: 0xff}, // green
		color.RGBA{R: 0x8e, G: 0x5a, B: 0xa8, A: 0xff}, // purple
		colFailure,
		color.RGBA{R: 0x4d, G: 0x4d, B: 0x4d, A: 0xff}, // dark grey
	}
)

// seriesColor returns the i-th colour of the palette, cycling.
func seriesColor(i int) color.Color { return palette[i%len(palette)] }

// faded returns c with alpha a (0..255), premultiplied as color.RGBA wants.
func faded(c color.Color, a uint8) color.Color {
	r, g, b, _ := c.RGBA()
	f := float64(a) / 255
	return color.RGBA{R: uint8(float64(r>>8) * f), G: uint8(float64(g>>8) * f), B: uint8(float64(b>>8) * f), A: a}
}

// textStyle returns a text style in the project's face at size pt.
func textStyle(pt vg.Length, c color.Color) text.Style {
	return text.Style{Color: c, Font: font.From(sans, pt), Handler: plot.DefaultTextHandler}
}

// newPlot returns a plot in the project's style with the given axis labels
// (which must carry units).
func newPlot(title, xlabel, ylabel string) *plot.Plot {
	p := plot.New()
	p.Title.Text = title
	p.Title.TextStyle.Font = font.From(sans, 11)
	p.Title.TextStyle.Color = colInk
	p.Title.Padding = vg.Points(6)
	for _, a := range []*plot.Axis{&p.X, &p.Y} {
		a.Label.TextStyle.Font = font.From(sans, 10)
		a.Label.TextStyle.Color = colInk
		a.Tick.Label.Font = font.From(sans, 9)
		a.Tick.Label.Color = colInk
		a.LineStyle.Color = colMuted
		a.Tick.LineStyle.Color = colMuted
		a.Tick.Length = vg.Points(4)
		a.Padding = vg.Points(3)
		a.Tick.Marker = niceTicks{}
	}
	p.X.Label.Text = xlabel
	p.Y.Label.Text = ylabel
	p.Legend.TextStyle.Font = font.From(sans, 9)
	p.Legend.TextStyle.Color = colInk
	p.Legend.Top = true
	p.Legend.ThumbnailWidth = vg.Points(14)
	p.Legend.Padding = vg.Points(2)
	return p
}

// addGrid adds light grid lines at the major ticks: horizontal ones, and
// vertical ones when vertical is set.
func addGrid(p *plot.Plot, vertical bool) {
	addGridLines(p, true, vertical)
}

// addGridLines adds light grid lines across either or both axes.
func addGridLines(p *plot.Plot, horizontal, vertical bool) {
	g := plotter.NewGrid()
	g.Horizontal = lineStyle(colGrid, 0.5, false)
	g.Vertical = lineStyle(colGrid, 0.5, false)
	if !horizontal {
		g.Horizontal.Color = nil
	}
	if !vertical {
		g.Vertical.Color = nil
	}
	p.Add(g)
}

// lineStyle returns a solid (or dashed) line style.
func lineStyle(c color.Color, width float64, dashed bool) draw.LineStyle {
	ls := draw.LineStyle{Color: c, Width: vg.Points(width)}
	if dashed {
		ls.Dashes = []vg.Length{vg.Points(4), vg.Points(3)}
	}
	return ls
}

// seriesStyle is the colour and dash pattern of a capacity model's lines.
type seriesStyle struct {
	Color  color.Color
	Dashes []vg.Length // nil: solid
}

// modelStyles is the one registry of the capacity models' styles: every
// line or point of a model has its colour and dash pattern in every
// picture (slenderness, sweep, variants), whatever else is drawn.
var modelStyles = map[string]seriesStyle{
	"perry-robertson": {colCapacity, nil},
	"curve":           {colDemand, nil},
	"secant":          {palette[2], []vg.Length{vg.Points(6), vg.Points(3)}},
	"beam-column":     {palette[3], []vg.Length{vg.Points(2), vg.Points(2)}},
	"euler":           {palette[5], []vg.Length{vg.Points(1), vg.Points(3)}},
}

// otherStyle is the style of a line whose model is not known.
var otherStyle = seriesStyle{colMuted, []vg.Length{vg.Points(8), vg.Points(2), vg.Points(2), vg.Points(2)}}

// modelStyle returns the style of the capacity model named model.
func modelStyle(model string) seriesStyle {
	if s, ok := modelStyles[model]; ok {
		return s
	}
	return otherStyle
}

// line returns the model's line style at width points.
func (s seriesStyle) line(width float64) draw.LineStyle {
	return draw.LineStyle{Color: s.Color, Width: vg.Points(width), Dashes: s.Dashes}
}

// occurrenceGlyphs tell apart the series that share a model (two variants
// with different bows, both Perry-Robertson): the k-th series of a model
// takes the k-th shape, in its model's colour.
var occurrenceGlyphs = []draw.GlyphDrawer{draw.CircleGlyph{}, draw.TriangleGlyph{}, draw.SquareGlyph{}, draw.RingGlyph{}, draw.CrossGlyph{}, draw.PlusGlyph{}, draw.BoxGlyph{}, draw.PyramidGlyph{}}

// seriesGlyphs returns the glyph of each series of models: the k-th
// occurrence of a model takes occurrenceGlyphs[k].
func seriesGlyphs(models []string) []draw.GlyphDrawer {
	seen := map[string]int{}
	out := make([]draw.GlyphDrawer, len(models))
	for i, m := range models {
		out[i] = occurrenceGlyphs[seen[m]%len(occurrenceGlyphs)]
		seen[m]++
	}
	return out
}
