package report

import (
	"image/color"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

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
