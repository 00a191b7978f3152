package column

import (
	"math"
	"strings"
	"testing"
)

// Rolled I sections against tabulated properties. The tables compute the
// root fillets exactly as quarter-circle spandrels, so agreement is close;
// the tolerance covers the tables' rounding to 4 significant figures.
func TestPropertiesRolledI(t *testing.T) {
	tests := []struct {
		name   string
		sec    Section
		a      float64 // cm^2
		i      [2]float64
		w      [2]float64 // cm^3
		r      [2]float64 // cm
		source string
	}{
		{
			name: "IPE 300", sec: Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10.7, Web: 7.1, Root: 15},
			a: 53.81, i: [2]float64{8356, 603.8}, w: [2]float64{557.1, 80.50}, r: [2]float64{12.46, 3.35},
			source: "ArcelorMittal sections catalogue, IPE table (from memory)",
		},
		{
			name: "HE 300 B", sec: Section{Shape: ShapeI, Depth: 300, Width: 300, Flange: 19, Web: 11, Root: 27},
			a: 149.1, i: [2]float64{25170, 8563}, w: [2]float64{1678, 570.9}, r: [2]float64{12.99, 7.58},
			source: "ArcelorMittal sections catalogue, HE table (from memory)",
		},
		{
			name: "UC 254x254x73", sec: Section{Shape: ShapeI, Depth: 254.1, Width: 254.6, Flange: 14.2, Web: 8.6, Root: 12.7},
			a: 93.1, i: [2]float64{11410, 3908}, w: [2]float64{898, 307}, r: [2]float64{11.1, 6.48},
			source: "SCI/BCSA Steel Building Design: Design Data (Blue Book), UC table (from memory)",
		},
	}
	for _, tt := range tests {
		p, err := tt.sec.Properties()
		if err != nil {
			t.Fatalf("%s: %v", tt.name, err)
		}
		near := func(what string, got, want float64) {
			tol := 0.002 * want // rounding of 4-figure entries plus fillet detail
			if what[0] == 'r' {
				tol = 0.005 * want // radii are printed to 3 figures
			}
			if math.Abs(got-want) > tol {
				t.Errorf("%s %s = %.5g, want %.5g (%s)", tt.name, what, got, want, tt.source)
			}
		}
		near("A", p.A/1e2, tt.a)
		for k, ax := range []string{"major", "minor"} {
			near("I "+ax, p.I[k]/1e4, tt.i[k])
			near("W "+ax, p.W[k]/1e3, tt.w[k])
			near("r "+ax, p.R[k]/1e1, tt.r[k])
		}
	}
}

// chords describes a section by the half-widths of its material at the
// height y from the centroid: the material occupies in < |x| < out.
type chords struct {
	half   float64   // half-depth
	breaks []float64 // heights 0 < y < half where the chord has a kink or jump
	chord  func(y float64) (in, out float64)
}

// integrate computes A, I about the horizontal axis (bending the depth) and
// I about the vertical axis by composite Simpson quadrature over
// horizontal strips, independently of the closed forms in Properties
// (first principles: A = ∫dA, I = ∫y^2 dA).
func (c chords) integrate() (a, ix, iy float64) {
	pts := append([]float64{0}, c.breaks...)
	pts = append(pts, c.half)
	const n = 4000 // even number of panels per piece
	for k := 0; k+1 < len(pts); k++ {
		y0, y1 := pts[k], pts[k+1]
		h := (y1 - y0) / n
		var sa, sx, sy float64
		for j := 0; j <= n; j++ {
			y := y0 + float64(j)*h
			if j == n {
				y = y1
			}
			wt := 2.0
			switch {
			case j == 0 || j == n:
				wt = 1
			case j%2 == 1:
				wt = 4
			}
			// Evaluate just inside the piece so a jump at a break belongs
			// to the correct side.
			yy := math.Min(math.Max(y, y0+1e-9*h), y1-1e-9*h)
			in, out := c.chord(yy)
			sa += wt * 2 * (out - in)
			sx += wt * 2 * (out - in) * y * y
			sy += wt * 2 * (out*out*out - in*in*in) / 3
		}
		a += sa * h / 3
		ix += sx * h / 3
		iy += sy * h / 3
	}
	return 2 * a, 2 * ix, 2 * iy // y < 0 mirrors y > 0
}

// circ returns the half-chord of a circle of radius r at height y.
func circ(r, y float64) float64 {
	if math.Abs(y) >= r {
		return 0
	}
	return math.Sqrt(r*r - y*y)
}

// TestPropertiesIntegrated checks the closed forms, thickness loss and
// axis labelling against strip integration of each shape.
func TestPropertiesIntegrated(t *testing.T) {
	iShape := func(h, b, tf, tw, r float64) chords {
		web := h/2 - tf
		return chords{half: h / 2, breaks: []float64{web - r, web}, chord: func(y float64) (float64, float64) {
			switch {
			case y > web:
				return 0, b / 2
			case y > web-r: // fillet: centre at (tw/2 + r, web - r)
				return 0, tw/2 + r - circ(r, y-(web-r))
			}
			return 0, tw / 2
		}}
	}
	rhs := func(h, b, t float64) chords {
		return chords{half: h / 2, breaks: []float64{h/2 - t}, chord: func(y float64) (float64, float64) {
			if y > h/2-t {
				return 0, b / 2
			}
			return b/2 - t, b / 2
		}}
	}
	chs := func(d, t float64) chords {
		return chords{half: d / 2, breaks: []float64{d/2 - t}, chord: func(y float64) (float64, float64) {
			return circ(d/2-t, y), circ(d/2, y)
		}}
	}
	rect := func(h, b float64) chords {
		return chords{half: h / 2, chord: func(float64) (float64, float64) { return 0, b / 2 }}
	}
	tests := []struct {
		name  string
		sec   Section
		shape chords // of the reduced section
		swap  bool   // the axis bending the width is the major one
		tol   float64
	}{
		{"I sharp", Section{Shape: ShapeI, Depth: 400, Width: 180, Flange: 13.5, Web: 8.6}, iShape(400, 180, 13.5, 8.6, 0), false, 1e-9},
		{"I root", Section{Shape: ShapeI, Depth: 400, Width: 180, Flange: 13.5, Web: 8.6, Root: 21}, iShape(400, 180, 13.5, 8.6, 21), false, 1e-6},
		{"I root, loss 1.5", Section{Shape: ShapeI, Depth: 400, Width: 180, Flange: 13.5, Web: 8.6, Root: 21, ThicknessLoss: 1.5},
			iShape(397, 177, 10.5, 5.6, 22.5), false, 1e-6},
		{"I wide and shallow", Section{Shape: ShapeI, Depth: 100, Width: 300, Flange: 20, Web: 10}, iShape(100, 300, 20, 10, 0), true, 1e-9},
		{"RHS", Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8}, rhs(200, 100, 8), false, 1e-9},
		{"RHS, loss 2", Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8, ThicknessLoss: 2}, rhs(196, 96, 6), false, 1e-9},
		{"RHS on its side", Section{Shape: ShapeRHS, Depth: 100, Width: 200, Thickness: 8}, rhs(100, 200, 8), true, 1e-9},
		{"CHS", Section{Shape: ShapeCHS, Diameter: 168.3, Thickness: 7.1}, chs(168.3, 7.1), false, 1e-5},
		{"CHS, loss 1", Section{Shape: ShapeCHS, Diameter: 168.3, Thickness: 7.1, ThicknessLoss: 1}, chs(166.3, 6.1), false, 1e-5},
		{"rect", Section{Shape: ShapeRect, Depth: 120, Width: 40}, rect(120, 40), false, 1e-9},
		{"rect flat, loss 3", Section{Shape: ShapeRect, Depth: 40, Width: 120, ThicknessLoss: 3}, rect(34, 114), true, 1e-9},
		{"round", Section{Shape: ShapeRound, Diameter: 60}, chs(60, 30), false, 1e-5},
		{"round, loss 2", Section{Shape: ShapeRound, Diameter: 60, ThicknessLoss: 2}, chs(56, 28), false, 1e-5},
	}
	for _, tt := range tests {
		p, err := tt.sec.Properties()
		if err != nil {
			t.Errorf("%s: %v", tt.name, err)
			continue
		}
		a, ix, iy := tt.shape.integrate()
		cx, cy := tt.shape.half, 0.0
		_, cy = tt.shape.chord(0)
		if tt.sec.Shape == ShapeI || tt.sec.Shape == ShapeRHS {
			_, cy = tt.shape.chord(tt.shape.half)
		}
		if tt.swap {
			ix, iy, cx, cy = iy, ix, cy, cx
		}
		rel := func(got, want float64) bool { return math.Abs(got-want) <= tt.tol*want }
		if !rel(p.A, a) || !rel(p.I[Major], ix) || !rel(p.I[Minor], iy) {
			t.Errorf("%s: A, I = %.8g, %.8g, %.8g; integrated %.8g, %.8g, %.8g", tt.name, p.A, p.I[Major], p.I[Minor], a, ix, iy)
		}
		if p.C != [2]float64{cx, cy} {
			t.Errorf("%s: C = %v, want [%g %g]", tt.name, p.C, cx, cy)
		}
		for k := range 2 {
			if !rel(p.R[k], math.Sqrt(p.I[k]/p.A)) || !rel(p.W[k], p.I[k]/p.C[k]) {
				t.Errorf("%s: axis %d: R = %g, W = %g inconsistent with I = %g, A = %g, C = %g", tt.name, k, p.R[k], p.W[k], p.I[k], p.A, p.C[k])
			}
		}
		if p.I[Major] < p.I[Minor] {
			t.Errorf("%s: major I %g < minor I %g", tt.name, p.I[Major], p.I[Minor])
		}
	}
}

// Closed forms quoted in handbooks, as a check that does not rely on the
// integration above (Roark's Formulas for Stress and Strain, Appendix A;
// from memory).
func TestPropertiesClosedForms(t *testing.T) {
	p, err := Section{Shape: ShapeRound, Diameter: 40}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	if want := math.Pi * 40 * 40 * 40 * 40 / 64; math.Abs(p.I[Major]-want) > 1e-9*want || p.R[Major] != 10 {
		t.Errorf("round d=40: I = %g, r = %g; want %g, 10 (r = d/4)", p.I[Major], p.R[Major], want)
	}
	p, err = Section{Shape: ShapeRect, Depth: 120, Width: 40}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	if want := 120 / math.Sqrt(12); math.Abs(p.R[Major]-want) > 1e-12*want || p.W[Major] != 40*120*120/6.0 {
		t.Errorf("rect 120x40: r = %g, W = %g; want h/sqrt(12) = %g, b h^2/6 = %g", p.R[Major], p.W[Major], want, 40*120*120/6.0)
	}
	// Thin-walled tube: r -> d_mean / (2 sqrt 2) as t/d -> 0.
	p, err = Section{Shape: ShapeCHS, Diameter: 1000.1, Thickness: 0.1}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	if want := 1000 / (2 * math.Sqrt2); math.Abs(p.R[Major]-want) > 1e-6*want {
		t.Errorf("thin CHS: r = %g, want %g", p.R[Major], want)
	}
	// Custom section: given properties pass through.
	p, err = Section{Shape: ShapeCustom, Area: 5000, IMajor: 8e7, IMinor: 2e7, CMajor: 150, CMinor: 100}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	if p.A != 5000 || p.I != [2]float64{8e7, 2e7} || p.C != [2]float64{150, 100} || p.R[Minor] != math.Sqrt(2e7/5000) {
		t.Errorf("custom: %+v", p)
	}
}

func TestReduced(t *testing.T) {
	s := Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10.7, Web: 7.1, Root: 15, ThicknessLoss: 1}
	r, err := s.Reduced()
	if err != nil {
		t.Fatal(err)
	}
	want := Section{Shape: ShapeI, Depth: 298, Width: 148, Flange: 8.7, Web: 5.1, Root: 16}
	for _, d := range [][2]float64{{r.Depth, want.Depth}, {r.Width, want.Width}, {r.Flange, want.Flange}, {r.Web, want.Web}, {r.Root, want.Root}} {
		if math.Abs(d[0]-d[1]) > 1e-12 {
			t.Errorf("Reduced = %+v, want %+v", r, want)
			break
		}
	}
	if r.ThicknessLoss != 0 {
		t.Errorf("Reduced keeps ThicknessLoss %g", r.ThicknessLoss)
	}
	// Properties of the reduced section equal those with the loss.
	p1, _ := s.Properties()
	p2, _ := r.Properties()
	if p1 != p2 {
		t.Errorf("Properties with loss %+v differ from those of Reduced %+v", p1, p2)
	}
}

func TestSectionErrors(t *testing.T) {
	tests := []struct {
		sec  Section
		want string // part of the message
	}{
		{Section{Shape: ShapeI, Depth: 50, Width: 50, Flange: 30, Web: 8.6}, "section: flange thickness 30 mm leaves no web: depth 50 mm"},
		{Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10, Web: 0}, "web thickness 0 mm must be positive"},
		{Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10, Web: 160}, "web thickness 160 mm is wider"},
		{Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10, Web: 7, Root: 80}, "root radius 80 mm"},
		{Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10, Web: 7, Root: -1}, "root radius -1 mm"},
		{Section{Shape: ShapeI, Depth: math.NaN(), Width: 150, Flange: 10, Web: 7}, "depth NaN mm"},
		{Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10, Web: 7, ThicknessLoss: 3.5}, "consumes the web"},
		{Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10, Web: 7, ThicknessLoss: -1}, "thickness loss -1 mm"},
		{Section{Shape: ShapeRHS, Depth: 100, Width: 50, Thickness: 25}, "wall thickness 25 mm leaves no hollow"},
		{Section{Shape: ShapeRHS, Depth: 100, Width: 50, Thickness: 5, ThicknessLoss: 5}, "consumes the wall"},
		{Section{Shape: ShapeCHS, Diameter: 100, Thickness: 60}, "leaves no hollow"},
		{Section{Shape: ShapeCHS, Diameter: 0, Thickness: 6}, "diameter 0 mm"},
		{Section{Shape: ShapeRect, Depth: 10, Width: 20, ThicknessLoss: 5}, "consumes the bar"},
		{Section{Shape: ShapeRound, Diameter: math.Inf(1)}, "diameter +Inf mm"},
		{Section{Shape: ShapeCustom, Area: 5000, IMajor: 1e7, IMinor: 2e7, CMajor: 100, CMinor: 100}, "exceeds the major"},
		{Section{Shape: ShapeCustom, Area: 5000, IMajor: 2e7, IMinor: 1e7, CMajor: 100, CMinor: 100, ThicknessLoss: 1}, "custom section"},
		{Section{Shape: ShapeCustom, Area: 0, IMajor: 2e7, IMinor: 1e7, CMajor: 100, CMinor: 100}, "area 0"},
		{Section{Shape: Shape(42)}, "unknown shape"},
	}
	for _, tt := range tests {
		_, err := tt.sec.Properties()
		if err == nil || !strings.Contains(err.Error(), tt.want) {
			t.Errorf("%+v: error %v, want one containing %q", tt.sec, err, tt.want)
		}
	}
}
