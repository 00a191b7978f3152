package column

import (
	"math"
	"testing"
)

// TestRHSCornersPublished checks RHS properties with rounded corners
// against published section tables (values from memory): EN 10219-2
// cold-formed square hollow sections and EN 10210-2 hot-finished ones,
// with the corner radii those standards take (RHSCornerRadii).
func TestRHSCornersPublished(t *testing.T) {
	tests := []struct {
		name    string
		h, b, t float64
		fab     Fabrication
		a, i    float64 // cm2, cm4 (major axis)
		tol     float64 // relative
	}{
		// EN 10219-2 SHS 100x100x4: A 14.9 cm2, I 226 cm4 (from memory).
		{"CF 100x100x4", 100, 100, 4, ColdFormed, 14.9, 226, 0.005},
		// EN 10210-2 SHS 200x200x10: A 74.9 cm2, I 4471 cm4 (from memory).
		{"HF 200x200x10", 200, 200, 10, HotFinished, 74.9, 4471, 0.003},
		// EN 10210-2 SHS 100x100x5: A 18.7 cm2, I 279 cm4 (from memory).
		{"HF 100x100x5", 100, 100, 5, HotFinished, 18.7, 279, 0.004},
	}
	for _, tt := range tests {
		ro, ri := RHSCornerRadii(tt.t, tt.fab)
		p, err := Section{Shape: ShapeRHS, Depth: tt.h, Width: tt.b, Thickness: tt.t, Radius: ro, InnerRadius: ri}.Properties()
		if err != nil {
			t.Fatalf("%s: %v", tt.name, err)
		}
		if d := math.Abs(p.A/100-tt.a) / tt.a; d > tt.tol {
			t.Errorf("%s: A = %.3f cm2, want %.3g (published)", tt.name, p.A/100, tt.a)
		}
		if d := math.Abs(p.I[Major]/1e4-tt.i) / tt.i; d > tt.tol {
			t.Errorf("%s: I = %.1f cm4, want %.4g (published)", tt.name, p.I[Major]/1e4, tt.i)
		}
	}
}

// TestRHSCornersThinWall checks the exact corner terms against the
// thin-wall closed form of a rounded rectangle with its mid-line as the
// wall: flats of length h - 2 rm and b - 2 rm, and four quarter arcs of
// radius rm whose centres are at (h/2 - rm, b/2 - rm), each giving
// int (yc + rm sin th)^2 t rm dth = t rm (yc^2 pi/2 + 2 yc rm + rm^2 pi/4)
// about the x axis (derived here; the arc length t rm pi/2 gives the area).
// The two differ by O(t^2) relative terms, so a thin wall agrees closely.
func TestRHSCornersThinWall(t *testing.T) {
	h, b, tw, rm := 1000.0, 600.0, 0.5, 40.0
	s := Section{Shape: ShapeRHS, Depth: h, Width: b, Thickness: tw, Radius: rm + tw/2, InnerRadius: rm - tw/2}
	p, err := s.Properties()
	if err != nil {
		t.Fatal(err)
	}
	hm, bm := h-tw, b-tw // mid-line dimensions
	fh, fb := hm-2*rm, bm-2*rm
	arcA := tw * rm * math.Pi / 2
	a := 2*(fh+fb)*tw + 4*arcA
	arc := func(yc float64) float64 { return tw * rm * (yc*yc*math.Pi/2 + 2*yc*rm + rm*rm*math.Pi/4) }
	ix := 2*tw*fh*fh*fh/12 + 2*fb*tw*(hm/2)*(hm/2) + 4*arc(hm/2-rm)
	if d := math.Abs(p.A-a) / a; d > 1e-6 {
		t.Errorf("A = %.6g, thin-wall %.6g (rel %.2g)", p.A, a, d)
	}
	if d := math.Abs(p.I[Major]-ix) / ix; d > 1e-5 {
		t.Errorf("I = %.6g, thin-wall %.6g (rel %.2g)", p.I[Major], ix, d)
	}
}

// TestRHSCornerRadii checks the product standards' defaults (EN 10219-2
// and EN 10210-2, from memory) and that a loss thins the outer corner.
func TestRHSCornerRadii(t *testing.T) {
	tests := []struct {
		t      float64
		fab    Fabrication
		ro, ri float64
	}{
		{4, ColdFormed, 8, 4}, {6, ColdFormed, 12, 6}, {8, ColdFormed, 20, 12},
		{10, ColdFormed, 25, 15}, {12, ColdFormed, 36, 24},
		{10, HotFinished, 15, 10}, {10, Welded, 0, 0},
	}
	for _, tt := range tests {
		ro, ri := RHSCornerRadii(tt.t, tt.fab)
		if ro != tt.ro || ri != tt.ri {
			t.Errorf("RHSCornerRadii(%g, %s) = %g, %g; want %g, %g", tt.t, tt.fab, ro, ri, tt.ro, tt.ri)
		}
	}
	r, err := Section{Shape: ShapeRHS, Depth: 100, Width: 100, Thickness: 4, Radius: 8, InnerRadius: 4, ThicknessLoss: 1}.Reduced()
	if err != nil || r.Radius != 7 || r.InnerRadius != 4 || r.Thickness != 3 || r.Depth != 98 {
		t.Errorf("Reduced: %+v, %v; want the outer radius 7, inner 4, wall 3, depth 98", r, err)
	}
	_, err = Section{Shape: ShapeRHS, Depth: 100, Width: 60, Thickness: 4, Radius: 31}.Properties()
	if err == nil {
		t.Error("a corner radius beyond half the width is accepted")
	}
}
