package column

import "testing"

// TestBucklingCurveTable62 checks the choice of EN 1993-1-1:2005 Table 6.2
// (flexural buckling; rows transcribed from memory) for each kind of
// section, both axes, and the S460 column.
func TestBucklingCurveTable62(t *testing.T) {
	ipe300 := Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10.7, Web: 7.1, Root: 15} // h/b 2
	heb300 := Section{Shape: ShapeI, Depth: 300, Width: 300, Flange: 19, Web: 11, Root: 27}    // h/b 1
	deepThick := Section{Shape: ShapeI, Depth: 500, Width: 300, Flange: 60, Web: 40}           // h/b 1.67, tf 60
	stubThick := Section{Shape: ShapeI, Depth: 400, Width: 400, Flange: 110, Web: 60}          // h/b 1, tf 110
	welded := Section{Shape: ShapeI, Depth: 600, Width: 300, Flange: 30, Web: 12}
	weldedThick := Section{Shape: ShapeI, Depth: 600, Width: 300, Flange: 50, Web: 20}
	rhs := Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8}
	box := Section{Shape: ShapeRHS, Depth: 600, Width: 400, Thickness: 10}
	stockyBox := Section{Shape: ShapeRHS, Depth: 250, Width: 250, Thickness: 10}
	chs := Section{Shape: ShapeCHS, Diameter: 168.3, Thickness: 7.1}
	bar := Section{Shape: ShapeRect, Depth: 60, Width: 40}
	tests := []struct {
		name       string
		sec        Section
		fab        Fabrication
		fyk        float64
		major, min string
	}{
		{"rolled I h/b > 1.2, tf <= 40", ipe300, HotRolled, 355, "a", "b"},
		{"rolled I h/b > 1.2, tf <= 40, S460", ipe300, HotRolled, 460, "a0", "a0"},
		{"rolled I h/b > 1.2, 40 < tf <= 100", deepThick, HotRolled, 355, "b", "c"},
		{"rolled I h/b > 1.2, 40 < tf <= 100, S460", deepThick, HotRolled, 440, "a", "a"},
		{"rolled I h/b <= 1.2, tf <= 100", heb300, HotRolled, 275, "b", "c"},
		{"rolled I h/b <= 1.2, tf <= 100, S460", heb300, HotRolled, 460, "a", "a"},
		{"rolled I h/b <= 1.2, tf > 100", stubThick, HotRolled, 355, "d", "d"},
		{"rolled I h/b <= 1.2, tf > 100, S460", stubThick, HotRolled, 460, "c", "c"},
		{"welded I tf <= 40", welded, Welded, 355, "b", "c"},
		{"welded I tf <= 40, S460", welded, Welded, 460, "b", "c"},
		{"welded I tf > 40", weldedThick, Welded, 355, "c", "d"},
		{"RHS hot-finished", rhs, HotFinished, 355, "a", "a"},
		{"RHS hot-finished, S460", rhs, HotFinished, 460, "a0", "a0"},
		{"RHS cold-formed", rhs, ColdFormed, 355, "c", "c"},
		{"RHS cold-formed, S460", rhs, ColdFormed, 460, "c", "c"},
		{"welded box, b/t 40", box, Welded, 355, "b", "b"},
		{"welded box, b/t 25 (thick welds possible)", stockyBox, Welded, 355, "c", "c"},
		{"CHS hot-finished", chs, HotFinished, 355, "a", "a"},
		{"CHS cold-formed", chs, ColdFormed, 355, "c", "c"},
		{"solid", bar, HotRolled, 235, "c", "c"},
		// L-sections b; U-, T- and solid sections c, any grade (same table).
		{"angle", Section{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10}, HotRolled, 355, "b", "b"},
		{"angle, S460", Section{Shape: ShapeAngle, Depth: 150, Width: 90, Thickness: 10}, HotRolled, 460, "b", "b"},
		{"channel", Section{Shape: ShapeChannel, Depth: 200, Width: 75, Flange: 11.5, Web: 8.5}, HotRolled, 355, "c", "c"},
		{"tee", Section{Shape: ShapeTee, Depth: 150, Width: 150, Flange: 12, Web: 8}, HotRolled, 460, "c", "c"},
	}
	for _, tt := range tests {
		for a, want := range []string{tt.major, tt.min} {
			got, row, err := BucklingCurve(tt.sec, tt.fab, tt.fyk, Axis(a))
			if err != nil || got != want {
				t.Errorf("%s, %s: curve %q (%s, %v); want %q", tt.name, Axis(a), got, row, err, want)
			}
		}
	}
	// S420 stays in the first column; S460's 440 MPa (t > 40 mm) is in the
	// S460 one (EN 1993-1-1 Table 3.1).
	if c, _, _ := BucklingCurve(ipe300, HotRolled, 420, Major); c != "a" {
		t.Errorf("S420 rolled IPE: curve %q, want a", c)
	}
	for _, bad := range []struct {
		sec Section
		fab Fabrication
	}{
		{ipe300, ColdFormed}, {rhs, HotRolled}, {chs, Welded},
		{Section{Shape: ShapeCustom, Area: 1, IMajor: 1, IMinor: 1, CMajor: 1, CMinor: 1}, HotRolled},
	} {
		if c, _, err := BucklingCurve(bad.sec, bad.fab, 355, Major); err == nil {
			t.Errorf("%s %s: curve %q, want an error", bad.sec.Shape, bad.fab, c)
		}
	}
}

// TestCurveAlphaOnce checks the imperfection factors of EN 1993-1-1:2005
// Table 6.1 and their order of severity.
func TestCurveAlphaOnce(t *testing.T) {
	want := map[string]float64{"a0": 0.13, "a": 0.21, "b": 0.34, "c": 0.49, "d": 0.76}
	for name, alpha := range want {
		got, err := CurveAlpha(name)
		if err != nil || got != alpha {
			t.Errorf("CurveAlpha(%q) = %g, %v; want %g", name, got, err, alpha)
		}
	}
	if CurveSeverity("a0") != 0 || CurveSeverity("d") != 4 || CurveSeverity("b") <= CurveSeverity("a") || CurveSeverity("e") != -1 {
		t.Error("CurveSeverity does not rank a0 < a < b < c < d")
	}
}
