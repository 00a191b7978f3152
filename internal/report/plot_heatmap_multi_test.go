package report

import (
	"math"
	"strings"
	"testing"
)

// multiBundle is a grid of three keys: nx lengths, ny bows and nz yield
// strengths, every combination (the last changing fastest, as the study
// lists them), for the study and variants more series.
func multiBundle(nx, ny, nz, variants int) *Bundle {
	c := &CaseTable{StudyName: "perry-robertson",
		Keys:   []string{"member.length (mm)", "imperfection.bow (fraction of L)", "material.yield.mean (MPa)"},
		Params: []string{"member.length", "imperfection.bow", "material.yield.mean"}}
	for ix := 0; ix < nx; ix++ {
		for iy := 0; iy < ny; iy++ {
			for iz := 0; iz < nz; iz++ {
				c.Points = append(c.Points, []float64{3000 + 1000*float64(ix), 0.001 * float64(iy+1), 360 + 20*float64(iz)})
			}
		}
	}
	for s := 0; s <= variants; s++ {
		line := make([]*Point, len(c.Points))
		for i, p := range c.Points {
			beta := 6 - (p[0]-3000)/1000 - 400*p[1] + (p[2]-400)/40 - 0.5*float64(s)
			line[i] = &Point{Pf: 0.5 * math.Erfc(beta/math.Sqrt2), Beta: Index(beta)}
		}
		c.Grid = append(c.Grid, line)
	}
	target := 3.8
	return &Bundle{Cases: c, Doc: &Document{TargetBeta: &target}}
}

// TestHeatSlices: each slice holds, at cell (ix, iy), the point of the
// grid with the first two keys' values there and the slice's own values
// of the others, which its title names.
func TestHeatSlices(t *testing.T) {
	c := multiBundle(3, 2, 4, 0).Cases
	slices := newHeatSlices(c)
	if len(slices) != 4 {
		t.Fatalf("%d slices, want 4 (one per yield strength)", len(slices))
	}
	for k, sl := range slices {
		z := 360 + 20*float64(k)
		if want := "material.yield.mean (MPa) = " + sig(z, 4); sl.title != want {
			t.Errorf("slice %d titled %q, want %q", k, sl.title, want)
		}
		for ix, x := range sl.g.xs {
			for iy, y := range sl.g.ys {
				i := sl.g.at[ix][iy]
				if i < 0 {
					t.Fatalf("slice %d: cell (%d, %d) empty", k, ix, iy)
				}
				if p := c.Points[i]; p[0] != x || p[1] != y || p[2] != z {
					t.Errorf("slice %d, cell (%g, %g): point %v", k, x, y, p)
				}
			}
		}
	}
	// Not every combination, or in step: no slices.
	c.Points = c.Points[:len(c.Points)-1]
	c.Grid[0] = c.Grid[0][:len(c.Points)]
	if newHeatSlices(c) != nil {
		t.Error("a grid with a point missing cut into slices")
	}
	z := multiBundle(2, 2, 2, 0).Cases
	z.Zipped = true
	if newHeatSlices(z) != nil {
		t.Error("a zipped sweep cut into slices")
	}
}

// TestMultiHeatmapFigure: a heat map per slice and series, each series
// starting a row, at most maxMultiPanels heat maps, and the caption says
// what is cut.
func TestMultiHeatmapFigure(t *testing.T) {
	for _, tt := range []struct {
		name                string
		nz, variants        int
		maps, blanks, cols  int
		caption, notCaption string
	}{
		{"three slices, a variant", 3, 1, 6, 0, 3, "the study's heat maps first, then each variant's", "are drawn"},
		{"five slices wrap", 5, 1, 10, 2, maxMultiCols, "each starting a row", "are drawn"},
		{"too many slices", 15, 1, maxMultiPanels, 0, maxMultiCols, "only the first 12 of the 15 combinations of the other keys are drawn; only the study is drawn, not its variants", ""},
		{"too many variants", 3, 6, maxMultiPanels, 0, 3, "only the study and its first 3 variants of 6 are drawn", ""},
	} {
		b := multiBundle(3, 2, tt.nz, tt.variants)
		f := heatmapFigure(b)
		if f == nil {
			t.Fatalf("%s: no picture", tt.name)
		}
		maps, blanks := 0, 0
		for _, p := range f.Plots {
			if p.Title.Text == "" {
				blanks++
			} else {
				maps++
			}
		}
		if maps != tt.maps || blanks != tt.blanks || f.Cols != tt.cols {
			t.Errorf("%s: %d heat maps, %d blanks in %d columns, want %d, %d in %d", tt.name, maps, blanks, f.Cols, tt.maps, tt.blanks, tt.cols)
		}
		if !strings.Contains(f.Caption, tt.caption) || (tt.notCaption != "" && strings.Contains(f.Caption, tt.notCaption)) {
			t.Errorf("%s: caption %q\nwant %q in it, not %q", tt.name, f.Caption, tt.caption, tt.notCaption)
		}
	}
	// An untrusted case is grey and marked, as in the heat map of two keys.
	b := multiBundle(3, 2, 3, 0)
	b.Cases.Grid[0][5].Doubtful = true
	f := heatmapFigure(b)
	svg, err := f.render("svg")
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(f.Caption, "A grey cell, its β marked ?") || !strings.Contains(string(svg), "?<") {
		t.Error("an untrusted case of a grid of three keys is not marked")
	}
}
