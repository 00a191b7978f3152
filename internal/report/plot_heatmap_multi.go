package report

import (
	"fmt"
	"sort"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
)

// maxMultiPanels is the most heat maps the picture of a grid of three or
// more keys draws; maxMultiCols the most side by side.
const (
	maxMultiPanels = 12
	maxMultiCols   = 3
)

// heatSlice is the grid of the first two keys at one combination of the
// values of the others, and that combination written for a title.
type heatSlice struct {
	title string
	g     *heatGrid
}

// newHeatSlices cuts a grid of three or more keys into heat maps of the
// first two, one per combination of the values of the others (the last
// changing fastest). Nil unless the points are every combination of the
// keys, each once, with at least two values of each of the first two.
func newHeatSlices(c *CaseTable) []heatSlice {
	if c == nil || c.Zipped || len(c.Keys) < 3 || len(c.Points) < 4 {
		return nil
	}
	values := make([][]float64, len(c.Keys))
	total := 1
	for a := range c.Keys {
		values[a] = distinctValues(c, a)
		total *= len(values[a])
	}
	if total != len(c.Points) || len(values[0]) < 2 || len(values[1]) < 2 {
		return nil
	}
	nx, ny := len(values[0]), len(values[1])
	slices := make([]heatSlice, total/(nx*ny))
	for k := range slices {
		g := &heatGrid{xs: values[0], ys: values[1], at: make([][]int, nx)}
		for ix := range g.at {
			g.at[ix] = make([]int, ny)
			for iy := range g.at[ix] {
				g.at[ix][iy] = -1
			}
		}
		slices[k].g = g
	}
	for i, p := range c.Points {
		k := 0 // the slice: the extra keys' value indices, the last fastest
		for a := 2; a < len(p); a++ {
			k = k*len(values[a]) + sort.SearchFloat64s(values[a], p[a])
		}
		ix, iy := sort.SearchFloat64s(values[0], p[0]), sort.SearchFloat64s(values[1], p[1])
		if slices[k].g.at[ix][iy] >= 0 {
			return nil // a combination twice: not a grid
		}
		slices[k].g.at[ix][iy] = i
		if slices[k].title == "" {
			var parts []string
			for a := 2; a < len(p); a++ {
				parts = append(parts, c.Keys[a]+" = "+heatValue(p[a], c.Keys[a]))
			}
			slices[k].title = strings.Join(parts, "\n")
		}
	}
	return slices
}

// multiHeatmapFigure draws β over a grid of three or more keys as small
// multiples: a heat map of the first two keys for each combination of the
// values of the others, a row of them for the study and one for each
// variant, at most maxMultiPanels in all (the first combinations, the
// study and the first variants; the caption says what is left out).
func multiHeatmapFigure(b *Bundle) *figure {
	c := b.Cases
	slices := newHeatSlices(c)
	if slices == nil || len(c.Grid) == 0 {
		return nil
	}
	nsl := min(len(slices), maxMultiPanels)
	nser := max(1, min(len(c.Grid), maxMultiPanels/nsl))
	cols := min(nsl, maxMultiCols)
	rowsPer := (nsl + cols - 1) / cols
	target := doc(b).TargetBeta
	classes := heatClasses(target)
	g0 := slices[0].g
	labelled := len(g0.xs) <= 6 && len(g0.ys) <= 10
	var plots []*plot.Plot
	for s := 0; s < nser; s++ {
		for k := 0; k < rowsPer*cols; k++ {
			if k >= nsl {
				plots = append(plots, blankPanel()) // each series starts a row
				continue
			}
			title := c.seriesName(s) + "\n" + slices[k].title
			p := heatPanel(c, slices[k].g, s, title, classes, target, labelled)
			if p == nil {
				return nil
			}
			plots = append(plots, p)
		}
	}
	rows := nser * rowsPer
	doubt := anyDoubtful(c, nser)
	f := &figure{Name: "heatmap", Plots: plots, Cols: cols,
		W: vg.Length(cols)*7*vg.Centimeter + 4.5*vg.Centimeter, H: vg.Length(rows) * 7.5 * vg.Centimeter,
		Side: heatLegend(classes, target, doubt), SideW: 4.5 * vg.Centimeter}
	var w strings.Builder
	fmt.Fprintf(&w, "Reliability index β (dimensionless) at every combination of %s: small multiples, each a heat map of %s and %s at the values of %s written in its title", strings.Join(c.Keys, ", "), c.Keys[0], c.Keys[1], strings.Join(c.Keys[2:], " and "))
	if nser > 1 {
		w.WriteString("; the study's heat maps first, then each variant's, each starting a row")
	}
	if cut := multiCut(len(slices), nsl, len(c.Grid), nser); cut != "" {
		w.WriteString(" (" + cut + "; every case is in cases.csv)")
	}
	w.WriteString(heatCaptionTail(labelled, target, doubt))
	f.Caption = w.String()
	return f
}

// multiCut says what the small multiples leave out: nsl of the slices
// combinations of the extra keys are drawn, for nser of the series.
func multiCut(slices, nsl, series, nser int) string {
	var parts []string
	if nsl < slices {
		parts = append(parts, fmt.Sprintf("only the first %d of the %d combinations of the other keys are drawn", nsl, slices))
	}
	if nser < series {
		if nser == 1 {
			parts = append(parts, "only the study is drawn, not its variants")
		} else {
			parts = append(parts, fmt.Sprintf("only the study and its first %d variants of %d are drawn", nser-1, series-1))
		}
	}
	return strings.Join(parts, "; ")
}

// blankPanel fills a place in the rows of small multiples.
func blankPanel() *plot.Plot {
	p := newPlot("", "", "")
	p.HideAxes()
	return p
}
