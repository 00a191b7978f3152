package report

import (
	"bytes"
	"fmt"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgimg"
	"gonum.org/v1/plot/vg/vgsvg"
)

// pngDPI is the resolution of PNG pictures: a 16 cm wide picture is 945
// pixels wide, sharp in a document and on a screen.
const pngDPI = 150

// figure is one picture of a report: one plot, or several side by side.
type figure struct {
	// Name is the file stem, e.g. "tornado".
	Name string
	// Caption says what the picture shows, for the HTML and Markdown.
	Caption string
	// W and H are the size of the whole picture.
	W, H vg.Length
	// Plots are the panels, in one row, or in rows of Cols when Cols is
	// set.
	Plots []*plot.Plot
	Cols  int
	// Side, when set, is a panel of width SideW right of the others (a
	// legend they share).
	Side  *plot.Plot
	SideW vg.Length
}

// render draws f in the format "svg" or "png" and returns the bytes. It
// never panics: a plotting panic (gonum/plot panics on some degenerate
// data) is returned as an error so that the picture is skipped.
func (f *figure) render(format string) (out []byte, err error) {
	defer func() {
		if r := recover(); r != nil {
			out, err = nil, fmt.Errorf("report: picture %s could not be drawn: %v", f.Name, r)
		}
	}()
	var buf bytes.Buffer
	switch format {
	case "svg":
		c := vgsvg.New(f.W, f.H)
		f.draw(draw.New(c))
		if _, err := c.WriteTo(&buf); err != nil {
			return nil, err
		}
		// Name generic fallbacks for readers without Liberation Sans.
		return bytes.ReplaceAll(buf.Bytes(), []byte("font-family:Liberation Sans"), []byte("font-family:'Liberation Sans',Arial,Helvetica,sans-serif")), nil
	case "png":
		c := vgimg.NewWith(vgimg.UseWH(f.W, f.H), vgimg.UseDPI(pngDPI))
		f.draw(draw.New(c))
		if _, err := (vgimg.PngCanvas{Canvas: c}).WriteTo(&buf); err != nil {
			return nil, err
		}
	default:
		return nil, fmt.Errorf("report: unknown picture format %q (want svg or png)", format)
	}
	return buf.Bytes(), nil
}

// figureMargin is the white border kept round every picture, so that no
// label or legend touches the edge of the image.
const figureMargin = 4 * vg.Millimeter / 2

// draw lays the panels out in one row on dc, each in its own tile, inside
// a small white margin.
func (f *figure) draw(dc draw.Canvas) {
	dc = draw.Crop(dc, figureMargin, -figureMargin, figureMargin, -figureMargin)
	if f.Side != nil {
		f.Side.Draw(draw.Crop(dc, dc.Max.X-dc.Min.X-f.SideW, 0, 0, 0))
		dc = draw.Crop(dc, 0, -f.SideW, 0, 0)
	}
	if len(f.Plots) == 1 {
		f.Plots[0].Draw(dc)
		return
	}
	cols := len(f.Plots)
	if f.Cols > 0 && f.Cols < cols {
		cols = f.Cols
	}
	rows := (len(f.Plots) + cols - 1) / cols
	tiles := draw.Tiles{Rows: rows, Cols: cols, PadX: vg.Points(18), PadY: vg.Points(12)}
	for j, p := range f.Plots {
		p.Draw(tiles.At(dc, j%cols, j/cols))
	}
}

// inlineSVG returns the SVG of a picture ready to be placed inside HTML:
// the XML declaration and the generator's comment removed.
func inlineSVG(svg []byte) string {
	s := string(svg)
	if i := strings.Index(s, "<svg"); i > 0 {
		s = s[i:]
	}
	return s
}
