package column

import (
	"math"
	"math/cmplx"
	"testing"
)

// St Venant torsion constants against the thin-wall formulas, each value
// worked by hand beside it: open sections sum b t^3/3 over the midline
// lengths (Timoshenko & Goodier, Theory of Elasticity, 3rd ed., 109);
// closed tubes by Bredt's 4 Am^2 t / pm; a round bar or tube pi (d^4 -
// di^4)/32 exactly. The I section's warping constant Iz hf^2/4
// (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., 5.3) is
// checked against the IPE 300 table (ArcelorMittal sections catalogue,
// from memory: Iw = 125.9e3 cm^6).
func TestTorsionConstants(t *testing.T) {
	tests := []struct {
		name   string
		sec    Section
		it, iw float64 // mm^4, mm^6 (iw < 0: not checked)
		tol    float64
	}{
		// (2*150*10.7^3 + (300 - 10.7)*7.1^3)/3 = (367512.3 + 103539.6)/3
		{"IPE 300", Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10.7, Web: 7.1, Root: 15}, 157017.3, 125.9e9, 0.005},
		// flanges wider than the depth: the major axis is the web's, and Iw
		// still takes the flanges' I about the web, (2*10*300^3 + 80*8^3)/12 =
		// 45003413.3, times (100 - 10)^2/4; It = (2*300*10^3 + 90*8^3)/3
		{"wide I 100x300", Section{Shape: ShapeI, Depth: 100, Width: 300, Flange: 10, Web: 8}, 215360, 45003413.33 * 2025, 1e-6},
		// ((100 - 5) + (100 - 5)) * 10^3 / 3
		{"L 100x100x10", Section{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10, Root: 12}, 63333.33, -1, 1e-6},
		// (2*(75 - 4.25)*11.5^3 + (200 - 11.5)*8.5^3)/3 = (215184.9 + 115781.8)/3
		{"channel 200x75", Section{Shape: ShapeChannel, Depth: 200, Width: 75, Flange: 11.5, Web: 8.5}, 110322.2, -1, 1e-6},
		// (150*12^3 + (150 - 6)*8^3)/3 = (259200 + 73728)/3
		{"tee 150x150", Section{Shape: ShapeTee, Depth: 150, Width: 150, Flange: 12, Web: 8}, 110976, -1, 1e-6},
		// 4 * (190*90)^2 * 10 / (2*(190 + 90)) = 4 * 2.9241e8 * 10 / 560
		{"RHS 200x100x10", Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 10}, 20886429, 0, 1e-6},
		// pi/32 * (168.3^4 - 155.7^4)
		{"CHS 168.3x6.3", Section{Shape: ShapeCHS, Diameter: 168.3, Thickness: 6.3}, math.Pi / 32 * (8.02290e8 - 5.87684e8), 0, 1e-4},
	}
	for _, tt := range tests {
		p, err := tt.sec.Properties()
		if err != nil {
			t.Fatalf("%s: %v", tt.name, err)
		}
		if math.Abs(p.It-tt.it) > tt.tol*tt.it {
			t.Errorf("%s: It = %.7g mm^4, thin-wall formula %.7g", tt.name, p.It, tt.it)
		}
		if tt.iw >= 0 && math.Abs(p.Iw-tt.iw) > math.Max(tt.tol*tt.iw, 0) {
			t.Errorf("%s: Iw = %.7g mm^6, want %.7g", tt.name, p.Iw, tt.iw)
		}
	}
}

// monoFormula is the critical load of flexural-torsional buckling of a
// monosymmetric section as EN 1993-1-3:2006 eq. (6.35) writes it:
//
//	N = Ny / 2 beta [1 + NT/Ny - sqrt((1 - NT/Ny)^2 + 4 (y0/i0)^2 NT/Ny)]
//
// with beta = 1 - (y0/i0)^2 (also Timoshenko & Gere, eq. 5-27).
func monoFormula(ny, nt, y0, i0 float64) float64 {
	q := (y0 / i0) * (y0 / i0)
	beta := 1 - q
	r := nt / ny
	return ny / (2 * beta) * (1 + r - math.Sqrt((1-r)*(1-r)+4*q*r))
}

// cardanoSmallest returns the smallest real root of the cubic of
// Timoshenko & Gere eq. (5-21) expanded into a N^3 + b N^2 + c N + d by
// Cardano's formula over the complex numbers: an independent route to the
// root TwistingLoad finds by Newton steps.
func cardanoSmallest(n0, n1, nt, s0, s1, i02 float64) float64 {
	// i02 (n0 - N)(n1 - N)(nt - N) - N^2 s0^2 (n1 - N) - N^2 s1^2 (n0 - N)
	a := -i02 + s0*s0 + s1*s1
	b := i02*(n0+n1+nt) - s0*s0*n1 - s1*s1*n0
	c := -i02 * (n0*n1 + n0*nt + n1*nt)
	d := i02 * n0 * n1 * nt
	p := (3*a*c - b*b) / (3 * a * a)
	q := (2*b*b*b - 9*a*b*c + 27*a*a*d) / (27 * a * a * a)
	best := math.Inf(1)
	disc := cmplx.Sqrt(complex(q*q/4+p*p*p/27, 0))
	u := cmplx.Pow(complex(-q/2, 0)+disc, 1.0/3)
	for k := 0; k < 3; k++ {
		uk := u * cmplx.Rect(1, 2*math.Pi*float64(k)/3)
		if uk == 0 {
			continue
		}
		z := uk - complex(p/3, 0)/uk
		if math.Abs(imag(z)) < 1e-6*math.Abs(real(z)) {
			n := real(z) - b/(3*a)
			if n > 0 && n < best {
				best = n
			}
		}
	}
	return best
}

// Critical loads of angles, channels and tees against the closed forms
// with the same section properties, to 1e-9 (the brief asks 0.5 %).
func TestTwistingLoad(t *testing.T) {
	secs := []Section{
		{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10, Root: 12},
		{Shape: ShapeAngle, Depth: 150, Width: 90, Thickness: 10, Root: 12},
		{Shape: ShapeAngle, Depth: 60, Width: 30, Thickness: 5},
		{Shape: ShapeChannel, Depth: 200, Width: 75, Flange: 11.5, Web: 8.5},
		{Shape: ShapeChannel, Depth: 80, Width: 120, Flange: 6, Web: 5},
		{Shape: ShapeTee, Depth: 150, Width: 150, Flange: 12, Web: 8},
		{Shape: ShapeTee, Depth: 200, Width: 100, Flange: 10, Web: 8},
	}
	for _, s := range secs {
		p, err := s.Properties()
		if err != nil {
			t.Fatal(err)
		}
		for _, l := range []float64{300, 1000, 3000, 8000} {
			m := Member{Props: p, E: 210000, G: 81000, Fy: 355, Length: l, K: [2]float64{1, 0.7}}
			n0, n1 := Euler(&m, Major), Euler(&m, Minor)
			i02 := PolarRadius2(&p)
			// EN 1993-1-3 eq. (6.33a): (G It + pi^2 E Iw / lT^2) / i0^2, lT = K_T L
			nt := (81000*p.It + math.Pi*math.Pi*210000*p.Iw/(l*l)) / i02
			if got := TorsionalLoad(&m); math.Abs(got-nt) > 1e-12*nt {
				t.Errorf("%v L %g: N_T = %.10g, formula %.10g", s.Shape, l, got, nt)
			}
			got, mode := TwistingLoad(&m)
			var want, bound float64
			switch {
			case p.S[Minor] == 0:
				want, bound = monoFormula(n0, nt, p.S[Major], math.Sqrt(i02)), math.Min(n0, nt)
			case p.S[Major] == 0:
				want, bound = monoFormula(n1, nt, p.S[Minor], math.Sqrt(i02)), math.Min(n1, nt)
			default:
				want = cardanoSmallest(n0, n1, nt, p.S[Major], p.S[Minor], i02)
				bound = math.Min(n0, math.Min(n1, nt))
			}
			if mode != ModeFlexuralTorsional || math.Abs(got-want) > 1e-9*want {
				t.Errorf("%v %gx%g L %g: N_cr = %.10g (%v), closed form %.10g", s.Shape, s.Depth, s.Width, l, got, mode, want)
			}
			if !(got <= bound) {
				t.Errorf("%v L %g: coupled root %.6g above the loads it couples, %.6g", s.Shape, l, got, bound)
			}
		}
	}
}

// A doubly symmetric section buckles in pure torsion about its centroid:
// a short cruciform-like I with a tiny warping constant and low It. The
// default shear modulus is E / 2.6 (EN 1993-1-1:2005 3.2.6, nu = 0.3).
func TestTorsionalModeDoublySymmetric(t *testing.T) {
	p, err := Section{Shape: ShapeI, Depth: 300, Width: 300, Flange: 6, Web: 5}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	m := Member{Props: p, E: 210000, Fy: 355, Length: 500, K: [2]float64{1, 1}}
	n, mode := CriticalLoad(&m, Both)
	g := 210000 / 2.6
	want := (g*p.It + math.Pi*math.Pi*210000*p.Iw/(500*500)) / (p.R[0]*p.R[0] + p.R[1]*p.R[1])
	if mode != ModeTorsional || math.Abs(n-want) > 1e-12*want {
		t.Errorf("N_cr = %.8g (%v), want torsional %.8g", n, mode, want)
	}
	// Long: flexure about the minor axis governs.
	m.Length = 6000
	if _, mode := CriticalLoad(&m, Both); mode != ModeFlexuralMinor {
		t.Errorf("long member mode %v, want flexural-minor", mode)
	}
}

// TestTieReportsLowestCriticalLoad: on the plateau of the buckling curves
// (relative slenderness at most 0.2, EN 1993-1-1 6.3.1.2(4)) every mode
// resists the squash load A fy, so the resistances tie; the mode reported
// is the one of the lowest elastic critical load. A solid square bar
// 100 x 100 mm, 200 mm long: flexural N_cr = pi^2 E I / L^2 = 4.2e8 N
// (I = b^4/12, Timoshenko & Gere ch. 2) against a torsional
// G It / i0^2 = 6.7e8 N (It = 0.1406 b^4, Timoshenko & Goodier, Theory of
// Elasticity, torsion of a square bar), so flexure governs, not torsion.
// Strictly lower resistances still decide: the short cruciform-like I of
// TestTorsionalModeDoublySymmetric twists.
func TestTieReportsLowestCriticalLoad(t *testing.T) {
	bar, err := Section{Shape: ShapeRect, Depth: 100, Width: 100}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	thin, err := Section{Shape: ShapeI, Depth: 300, Width: 300, Flange: 6, Web: 5}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name string
		m    Member
		want Mode
	}{
		{"stocky bar", Member{Props: bar, E: 210000, Fy: 355, Length: 200, K: [2]float64{1, 1}, Alpha: [2]float64{0.49, 0.49}}, ModeFlexuralMinor},
		{"stocky bar, major axis longer", Member{Props: bar, E: 210000, Fy: 355, Length: 200, K: [2]float64{1.5, 1}, Alpha: [2]float64{0.49, 0.49}}, ModeFlexuralMajor},
		{"short thin I", Member{Props: thin, E: 210000, Fy: 355, Length: 500, K: [2]float64{1, 1}, Alpha: [2]float64{0.34, 0.49}}, ModeTorsional},
	} {
		cv, err := Curve(&c.m, Both)
		if err != nil {
			t.Fatal(err)
		}
		fy, err := FirstYield(&c.m, Both)
		if err != nil {
			t.Fatal(err)
		}
		if cv.Mode != c.want || fy.Mode != c.want {
			t.Errorf("%s: curve mode %v, first-yield mode %v, want %v", c.name, cv.Mode, fy.Mode, c.want)
		}
	}
}
