package report

import (
	"math"
	"strings"
	"testing"
)

// heatBundle is a bundle of a sweep of two keys: every combination of nx
// lengths and ny bows (zip: the values in step), for the study and
// variants more series, beta falling with both keys.
func heatBundle(nx, ny, variants int, zip bool) *Bundle {
	c := &CaseTable{StudyName: "perry-robertson", Keys: []string{"member.length (mm)", "imperfection.bow (fraction of L)"},
		Params: []string{"member.length", "imperfection.bow"}}
	for ix := 0; ix < nx; ix++ {
		for iy := 0; iy < ny; iy++ {
			if zip && ix != iy {
				continue
			}
			c.Points = append(c.Points, []float64{3000 + 1000*float64(ix), 0.001 * float64(iy+1)})
		}
	}
	for s := 0; s <= variants; s++ {
		line := make([]*Point, len(c.Points))
		for i, p := range c.Points {
			beta := 6 - (p[0]-3000)/1000 - 400*p[1] - 0.5*float64(s)
			line[i] = &Point{Pf: 0.5 * math.Erfc(beta/math.Sqrt2), Beta: Index(beta)}
		}
		c.Grid = append(c.Grid, line)
	}
	target := 3.8
	return &Bundle{Cases: c, Doc: &Document{TargetBeta: &target}}
}

// TestHeatmapFigure: the heat map is drawn for every combination of two
// keys, one panel a series up to maxHeatPanels, and not for a zipped
// sweep; it renders as PNG.
func TestHeatmapFigure(t *testing.T) {
	for _, c := range []struct {
		name             string
		nx, ny, variants int
		zip              bool
		panels           int // 0: no picture
		caption          string
	}{
		{"study alone", 4, 3, 0, false, 1, "target β = 3.80"},
		{"two variants", 3, 3, 2, false, 3, "one for each variant"},
		{"many variants", 3, 2, 8, false, maxHeatPanels, "the first 5; every case is in cases.csv"},
		{"too many to label", 20, 20, 0, false, 1, "too many to write β"},
		{"a case not trusted", 3, 3, 0, false, 1, "A grey cell, its β marked ?"},
		{"zipped", 4, 4, 0, true, 0, ""},
		{"one value of a key", 4, 1, 0, false, 0, ""},
	} {
		t.Run(c.name, func(t *testing.T) {
			b := heatBundle(c.nx, c.ny, c.variants, c.zip)
			if strings.Contains(c.name, "not trusted") {
				b.Cases.Grid[0][4].Doubtful = true
			}
			f := heatmapFigure(b)
			if c.panels == 0 {
				if f != nil {
					t.Fatalf("a picture of %d panels, want none", len(f.Plots))
				}
				return
			}
			if f == nil || len(f.Plots) != c.panels {
				t.Fatalf("picture %v, want %d panels", f, c.panels)
			}
			if !strings.Contains(f.Caption, c.caption) {
				t.Errorf("caption %q\nwant %q in it", f.Caption, c.caption)
			}
			if _, err := f.render("png"); err != nil {
				t.Fatal(err)
			}
		})
	}
}

// TestHeatClasses: with a target the classes meet at it, beta equal to
// the target in the first class at or above it; every beta has a class.
func TestHeatClasses(t *testing.T) {
	target := 3.8
	cl := heatClasses(&target)
	for _, c := range []struct {
		beta float64
		name string
	}{
		{3.8, "3.8 ≤ β < 4.8"},
		{3.79, "2.8 ≤ β < 3.8"},
		{math.Inf(1), "β ≥ 5.8"},
		{math.Inf(-1), "β < 1.8"},
		{-0.4, "β < 1.8"},
	} {
		if got := classOf(cl, c.beta).name(); got != c.name {
			t.Errorf("class of %g = %q, want %q", c.beta, got, c.name)
		}
	}
}

// TestTargetEdges: the boundary runs between the cells below the target
// and those at or above it, and round no cell that did not run.
func TestTargetEdges(t *testing.T) {
	g := &heatGrid{xs: []float64{1, 2}, ys: []float64{1, 2}}
	// beta at (ix, iy): the left column meets the target, the right one
	// does not, but for the top right cell, which did not run.
	betas := map[[2]int]float64{{0, 0}: 4, {0, 1}: 3.8, {1, 0}: 3}
	beta := func(ix, iy int) (float64, bool) {
		b, ok := betas[[2]int{ix, iy}]
		return b, ok
	}
	got := targetEdges(g, beta, 3.8)
	want := [][4]float64{{0.5, -0.5, 0.5, 0.5}}
	if len(got) != len(want) || got[0] != want[0] {
		t.Errorf("edges %v, want %v", got, want)
	}
}
