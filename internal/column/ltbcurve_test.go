package column

import "testing"

// TestLTBCurveAlpha checks the lateral-torsional buckling curves against
// EN 1993-1-1:2005 Table 6.4 (general case: rolled I h/b <= 2 a, > 2 b;
// welded I h/b <= 2 c, > 2 d; other sections d) and Table 6.5 (rolled
// and equivalent welded sections: rolled I h/b <= 2 b, > 2 c; welded I
// h/b <= 2 c, > 2 d), with Table 6.3's factors a 0.21, b 0.34, c 0.49,
// d 0.76 (from memory of the standard).
func TestLTBCurveAlpha(t *testing.T) {
	for _, c := range []struct {
		shape  Shape
		fab    Fabrication
		hb     float64
		rolled bool
		want   float64
	}{
		{ShapeI, HotRolled, 1.0, false, 0.21},
		{ShapeI, HotRolled, 2.5, false, 0.34},
		{ShapeI, Welded, 1.5, false, 0.49},
		{ShapeI, Welded, 3.0, false, 0.76},
		{ShapeRHS, ColdFormed, 1.0, false, 0.76},
		{ShapeI, HotRolled, 2.0, true, 0.34},
		{ShapeI, HotRolled, 2.1, true, 0.49},
		{ShapeI, Welded, 1.0, true, 0.49},
		{ShapeI, Welded, 2.5, true, 0.76},
	} {
		if got := LTBCurveAlpha(c.shape, c.fab, c.hb, c.rolled); got != c.want {
			t.Errorf("%v %v h/b %g rolled %v: alpha_LT %g, want %g", c.shape, c.fab, c.hb, c.rolled, got, c.want)
		}
	}
}
