package column

import (
	"math"
	"testing"
)

// TestMomentFactorCm checks C_m against EN 1993-1-1:2005 Annex B Table
// B.3 (uniform-load column), each value worked by hand from the table's
// formula.
func TestMomentFactorCm(t *testing.T) {
	const l = 4000.0
	for _, c := range []struct {
		name      string
		ma, mb, q float64
		want      float64
	}{
		{"uniform moment, psi = 1: 0.6 + 0.4", 50e6, 50e6, 0, 1.0},
		{"psi = 0: 0.6", 0, 50e6, 0, 0.6},
		{"psi = -0.5: 0.6 - 0.2", -25e6, 50e6, 0, 0.4},
		{"psi = -1: 0.2, not below 0.4", -50e6, 50e6, 0, 0.4},
		{"psi = 0.5, either end", 50e6, 25e6, 0, 0.8},
		{"uniform load alone: a_h = 0, 0.95", 0, 0, 10, 0.95},
		// M_h = 40e6, psi = 1, M_s = 40e6 + 10 * 4000^2/8 = 60e6: a_h = 2/3,
		// 0.95 + 0.05 * 2/3.
		{"end moments under the span moment", 40e6, 40e6, 10, 0.95 + 0.05*40e6/60e6},
		// M_h = 60e6, psi = 0, M_s = 30e6 - 20e6 = 10e6: a_s = 1/6,
		// 0.2 + 0.8/6 = 0.3333 -> 0.4.
		{"a_s = 1/6, clamped", 0, 60e6, -10, 0.4},
		// M_h = 60e6, psi = 0, M_s = 30e6 + 20e6 = 50e6: a_s = 5/6, 0.2 + 0.8 * 5/6.
		{"a_s = 5/6", 0, 60e6, 10, 0.2 + 0.8*5.0/6},
		// M_h = 100e6, psi = 1, M_s = 100e6 - 160e6 = -60e6: a_s = -0.6,
		// psi >= 0: 0.1 + 0.48 = 0.58.
		{"a_s = -0.6, psi = 1", 100e6, 100e6, -80, 0.58},
		// M_h = 100e6, psi = -0.5, M_s = 25e6 - 80e6 = -55e6: a_s = -0.55,
		// psi < 0: 0.1 * 1.5 + 0.44 = 0.59.
		{"a_s = -0.55, psi = -0.5", -50e6, 100e6, -40, 0.59},
		// M_h = 20e6, psi = -0.5, M_s = 5e6 - 40e6 = -35e6: a_h = -4/7,
		// psi < 0: 0.95 + 0.05 (-4/7)(1 - 1) = 0.95.
		{"a_h = -4/7, psi = -0.5", -10e6, 20e6, -20, 0.95},
		// M_h = 20e6, psi = -0.25, M_s = 7.5e6 - 40e6 = -32.5e6: a_h = -0.6154,
		// 0.95 + 0.05 a_h (1 - 0.5).
		{"a_h < 0, psi = -0.25", -5e6, 20e6, -20, 0.95 + 0.05*(20e6/-32.5e6)*0.5},
	} {
		if got := MomentFactorCm(c.ma, c.mb, c.q, l); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("%s: C_m = %.12g, want %.12g", c.name, got, c.want)
		}
	}
}

// TestChiLT checks chi_LT of EN 1993-1-1:2005 6.3.2 at values worked by
// hand from eqs. (6.56) and (6.57).
func TestChiLT(t *testing.T) {
	for _, c := range []struct {
		name   string
		lam, a float64
		rolled bool
		want   float64
	}{
		// 6.3.2.3, curve b: Phi = 0.5 (1 + 0.34 * 0.6 + 0.75) = 0.977;
		// chi = 1/(0.977 + sqrt(0.977^2 - 0.75)) = 1/(0.977 + 0.452249) = 0.699668.
		{"rolled, lam 1.0, curve b", 1.0, 0.34, true, 1 / (0.977 + math.Sqrt(0.977*0.977-0.75))},
		// Phi = 0.5 (1 + 0.49 * 1.1 + 0.75 * 2.25) = 1.61325; chi = 1/(1.61325 +
		// sqrt(1.61325^2 - 1.6875)) = 0.3892; 1/lam^2 = 0.4444 does not bind.
		{"rolled, lam 1.5, curve c", 1.5, 0.49, true, 1 / (1.61325 + math.Sqrt(1.61325*1.61325-1.6875))},
		{"rolled, lam 0.4: the plateau", 0.4, 0.34, true, 1},
		// 6.3.2.2, curve a: Phi = 0.5 (1 + 0.21 * 0.8 + 1) = 1.084;
		// chi = 1/(1.084 + sqrt(1.084^2 - 1)) = 0.665603.
		{"general, lam 1.0, curve a", 1.0, 0.21, false, 1 / (1.084 + math.Sqrt(1.084*1.084-1))},
		{"general, lam 0.2", 0.2, 0.76, false, 1},
	} {
		if got := ChiLT(c.lam, c.a, c.rolled); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("%s: chi_LT = %.12g, want %.12g", c.name, got, c.want)
		}
	}
	// The values shown above, to the digits written.
	if got := ChiLT(1.0, 0.34, true); math.Abs(got-0.699668) > 1e-6 {
		t.Errorf("rolled, lam 1.0, curve b: %g, want 0.699668", got)
	}
	if got := ChiLT(1.0, 0.21, false); math.Abs(got-0.665603) > 1e-6 {
		t.Errorf("general, lam 1.0, curve a: %g, want 0.665603", got)
	}
}

// TestCriticalMomentIPE300 checks Mcr of an IPE 300, 6 m between fork
// supports under a uniform moment, with the section tables' It = 20.12
// cm4, Iw = 125.9e3 cm6, Iz = 603.8 cm4 (from memory), E = 210,000 MPa
// and G = 81,000 MPa, worked by hand:
//
//	pi^2 E Iz / L^2 = 9.8696 * 210000 * 6.038e6 / 3.6e7 = 347,625 N
//	Iw/Iz = 1.259e11 / 6.038e6 = 20,851 mm2
//	L^2 G It / (pi^2 E Iz) = 3.6e7 * 81000 * 2.012e5 / 1.25145e13 = 46,882 mm2
//	Mcr = 347,625 * sqrt(67,733) = 90.47 kN m
func TestCriticalMomentIPE300(t *testing.T) {
	m := bendingMember()
	m.Props.It, m.Props.Iw = 2.012e5, 1.259e11
	m.G = 81000
	got := CriticalMoment(&m, 1)
	if math.Abs(got-90.47e6) > 0.01e6 {
		t.Errorf("Mcr = %.5g N mm, want 90.47 kN m", got)
	}
	if c2 := CriticalMoment(&m, MomentFactorC1(0, 50e6, 0)); math.Abs(c2/got-1.88) > 1e-12 {
		t.Errorf("psi = 0: Mcr ratio %g, want C1 = 1.88", c2/got)
	}
	if c := MomentFactorC1(-50e6, 50e6, 0); c != 2.70 {
		t.Errorf("psi = -1: C1 = %g, want 1.88 + 1.40 + 0.52 = 3.80 capped at 2.70", c)
	}
}

// TestPlasticModulus checks Wpl against the section tables (IPE 300:
// Wpl,y 628.4 cm3, Wpl,z 125.2 cm3, from memory) and the closed forms of
// solid and tubular sections.
func TestPlasticModulus(t *testing.T) {
	for _, c := range []struct {
		name string
		sec  Section
		want [2]float64
		tol  float64
	}{
		{"IPE 300", Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10.7, Web: 7.1, Root: 15},
			[2]float64{628.4e3, 125.2e3}, 0.1e3},
		{"rect 200 x 100: b h^2/4", Section{Shape: ShapeRect, Depth: 200, Width: 100},
			[2]float64{100 * 200 * 200 / 4.0, 200 * 100 * 100 / 4.0}, 1e-6},
		{"rect laid flat: the labels follow the stiffness", Section{Shape: ShapeRect, Depth: 100, Width: 200},
			[2]float64{100 * 200 * 200 / 4.0, 200 * 100 * 100 / 4.0}, 1e-6},
		{"round 50: d^3/6", Section{Shape: ShapeRound, Diameter: 50},
			[2]float64{50 * 50 * 50 / 6.0, 50 * 50 * 50 / 6.0}, 1e-6},
		{"CHS 168.3 x 10: (d^3 - di^3)/6", Section{Shape: ShapeCHS, Diameter: 168.3, Thickness: 10},
			[2]float64{(168.3*168.3*168.3 - 148.3*148.3*148.3) / 6, (168.3*168.3*168.3 - 148.3*148.3*148.3) / 6}, 1e-6},
		// Square corners: b h^2/4 - (b - 2t)(h - 2t)^2/4 = 100 * 200^2/4 -
		// 80 * 180^2/4 = 1,000,000 - 648,000.
		{"RHS 200 x 100 x 10, square corners", Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 10},
			[2]float64{352e3, 200*100*100/4.0 - 180*80*80/4.0}, 1e-6},
	} {
		got, err := c.sec.PlasticModulus()
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		for a := range got {
			if math.Abs(got[a]-c.want[a]) > c.tol {
				t.Errorf("%s: Wpl[%d] = %.6g mm3, want %.6g", c.name, a, got[a], c.want[a])
			}
		}
	}
	if _, err := (Section{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10}).PlasticModulus(); err == nil {
		t.Error("an angle has no plastic modulus here: want an error")
	}
}

// handInteraction is EN 1993-1-1:2005 6.3.3 with Annex B written out
// again in the test for a class 1 I section bent about its major axis and
// susceptible to torsional deformations (eqs. 6.61, 6.62, Table B.2 k_yy
// and k_zy of class 1 and 2, 6.2.1(7)), at an axial load n and a largest
// moment m.
func handInteraction(n, m, nrk, mrk, chiY, chiZ, chiLT, lamY, lamZ, cm float64) float64 {
	ny, nz := n/(chiY*nrk), n/(chiZ*nrk)
	kyy := cm * math.Min(1+(lamY-0.2)*ny, 1+0.8*ny)
	kzy := math.Max(1-0.1*lamZ*nz/(cm-0.25), 1-0.1*nz/(cm-0.25))
	if lamZ < 0.4 {
		kzy = math.Min(0.6+lamZ, 1-0.1*lamZ*nz/(cm-0.25))
	}
	u61 := ny + kyy*m/(chiLT*mrk)
	u62 := nz + kzy*m/(chiLT*mrk)
	return math.Max(math.Max(u61, u62), n/nrk+m/mrk)
}

// TestInteractionFactorHand checks the load factor of the 6.3.3
// interaction for a rolled IPE 300 of S355, 4 m, under 400 kN and end
// moments of 80 and 40 kN m (single curvature). Values worked by hand
// (E 210,000 MPa, G 81,000 MPa, table properties from memory: A 5381 mm2,
// Iy 8356 cm4, Iz 603.8 cm4, Wpl,y 628.4 cm3, It 20.12 cm4, Iw 125.9e3
// cm6; curves: y-y a (0.21), z-z b (0.34), LT 6.3.2.3 curve b (0.34)):
//
//	lam_y = 4000/124.6/(pi sqrt(210000/355)) = 0.4201, chi_y = 0.9474
//	lam_z = 4000/33.50/76.41 = 1.5628, chi_z = 0.3201
//	psi = 0.5: C_m = 0.8, C1 = 1.88 - 0.70 + 0.13 = 1.31
//	Mcr = 1.31 * 782,157 N * sqrt(20,851 + 20,836) mm = 209.2 kN m
//	lam_LT = sqrt(628.4e3 * 355 / 209.2e6) = 1.0326, chi_LT = 0.6797
//
// At the factor returned, the largest utilisation written out again in
// the test (handInteraction) is 1.
func TestInteractionFactorHand(t *testing.T) {
	m := bendingMember()
	m.Length = 4000
	m.Props.It, m.Props.Iw = 2.012e5, 1.259e11
	m.G = 81000
	m.Alpha = [2]float64{0.21, 0.34}
	in := Interaction{Class: 1, Plastic: [2]float64{628.4e3, 125.2e3}, Open: true, IShape: true, AlphaLT: 0.34, Rolled: true}
	b := Bending{Axis: Major, Top: 80e6, Bottom: 40e6}
	const n = 400e3
	f, err := InteractionFactor(&m, n, &b, &in)
	if err != nil {
		t.Fatal(err)
	}
	nrk, mrk := m.Props.A*m.Fy, 628.4e3*m.Fy
	lamY := m.Length / m.Props.R[Major] / (math.Pi * math.Sqrt(m.E/m.Fy))
	lamZ := m.Length / m.Props.R[Minor] / (math.Pi * math.Sqrt(m.E/m.Fy))
	chi := func(lam, a float64) float64 {
		phi := 0.5 * (1 + a*(lam-0.2) + lam*lam)
		return 1 / (phi + math.Sqrt(phi*phi-lam*lam))
	}
	chiY, chiZ := chi(lamY, 0.21), chi(lamZ, 0.34)
	mcr := 1.31 * math.Pi * math.Pi * m.E * 6.038e6 / (4000 * 4000) *
		math.Sqrt(1.259e11/6.038e6+4000*4000*81000*2.012e5/(math.Pi*math.Pi*m.E*6.038e6))
	lamLT := math.Sqrt(mrk / mcr)
	phi := 0.5 * (1 + 0.34*(lamLT-0.4) + 0.75*lamLT*lamLT)
	chiLT := 1 / (phi + math.Sqrt(phi*phi-0.75*lamLT*lamLT))
	for _, v := range []struct {
		name      string
		got, want float64
	}{
		{"lam_y", lamY, 0.4201}, {"chi_y", chiY, 0.9474}, {"lam_z", lamZ, 1.5628},
		{"chi_z", chiZ, 0.3201}, {"Mcr (kN m)", mcr / 1e6, 209.2}, {"lam_LT", lamLT, 1.0326}, {"chi_LT", chiLT, 0.6797},
	} {
		if math.Abs(v.got-v.want) > 1e-4*v.want {
			t.Errorf("hand value %s = %.5g, the comment says %g", v.name, v.got, v.want)
		}
	}
	u := handInteraction(f.Factor*n, f.Factor*80e6, nrk, mrk, chiY, chiZ, chiLT, lamY, lamZ, 0.8)
	if math.Abs(u-1) > 1e-9 {
		t.Errorf("factor %g: the hand interaction gives %.12g, want 1", f.Factor, u)
	}
	if u := handInteraction(n, 80e6, nrk, mrk, chiY, chiZ, chiLT, lamY, lamZ, 0.8); !(u < 1) == (f.Factor > 1) {
		t.Errorf("utilisation at the loads %g and factor %g disagree", u, f.Factor)
	}
}

// TestInteractionFactorHollow checks a class 3 RHS (Table B.1, elastic,
// chi_LT = 1) bent about its minor axis: the factor makes the larger of
// eq. (6.61) with k_yz = k_zz, eq. (6.62) and the cross-section check 1.
func TestInteractionFactorHollow(t *testing.T) {
	sec := Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 6}
	p, err := sec.Properties()
	if err != nil {
		t.Fatal(err)
	}
	m := Member{Props: p, E: 2.1e5, Fy: 355, Length: 3000, K: [2]float64{1, 1}, Alpha: [2]float64{0.49, 0.49}}
	in := Interaction{Class: 3}
	b := Bending{Axis: Minor, Top: 10e6, Bottom: -5e6, Lateral: 2}
	const n = 300e3
	f, err := InteractionFactor(&m, n, &b, &in)
	if err != nil {
		t.Fatal(err)
	}
	lam := func(a Axis) float64 { return 3000 / p.R[a] / (math.Pi * math.Sqrt(2.1e5/355)) }
	chi := func(l float64) float64 {
		phi := 0.5 * (1 + 0.49*(l-0.2) + l*l)
		return 1 / (phi + math.Sqrt(phi*phi-l*l))
	}
	nrk, mrk := p.A*355, p.W[Minor]*355
	// First-order moments: M(x) = -5e6 (1 - x/L) + 10e6 x/L + x (L - x); the
	// largest is the end's 10e6 or the stationary point x = 1500 + 15e6/6000 = 4000 > L: the end.
	// Table B.3: M_h = 10e6, psi = -0.5, M_s = 2.5e6 + 2 * 3000^2/8 = 4.75e6
	// <= M_h: a_s = 0.475 >= 0, C_m = 0.2 + 0.8 * 0.475 = 0.58.
	cm := 0.58
	g := f.Factor
	ny, nz := g*n/(chi(lam(Major))*nrk), g*n/(chi(lam(Minor))*nrk)
	kzz := cm * math.Min(1+0.6*lam(Minor)*nz, 1+0.6*nz)
	u := math.Max(math.Max(ny+kzz*g*10e6/mrk, nz+kzz*g*10e6/mrk), g*n/nrk+g*10e6/mrk)
	if math.Abs(u-1) > 1e-9 {
		t.Errorf("factor %g: the hand interaction gives %.12g, want 1", g, u)
	}
}

// TestInteractionFactorAllocs checks that an interaction evaluation does
// not allocate (one per sample).
func TestInteractionFactorAllocs(t *testing.T) {
	m := bendingMember()
	m.Props.It, m.Props.Iw = 2.012e5, 1.259e11
	m.Alpha = [2]float64{0.21, 0.34}
	in := Interaction{Class: 1, Plastic: [2]float64{628.4e3, 125.2e3}, Open: true, IShape: true, AlphaLT: 0.34, Rolled: true}
	b := Bending{Axis: Major, Top: 80e6, Bottom: -40e6, Lateral: 3}
	if a := testing.AllocsPerRun(20, func() { _, _ = InteractionFactor(&m, 400e3, &b, &in) }); a != 0 {
		t.Errorf("InteractionFactor allocates %v times", a)
	}
}

// TestInteractionFactorModulusFromIC checks that a member whose Props
// leave the elastic modulus W out resists bending with W = I/C (the
// elastic modulus of elementary beam theory, EN 1993-1-1:2005 6.2.5(2),
// M_c,Rd = W_el fy with W_el = I/z_max), as the first-yield and
// beam-column models take it: the factor is that of the same member with
// W = I/C given, not 0 (or NaN without bending).
func TestInteractionFactorModulusFromIC(t *testing.T) {
	in := Interaction{Class: 3}
	for _, b := range []Bending{
		{Axis: Major, Top: 50e6, Bottom: 50e6},
		{Axis: Minor, Top: 10e6, Bottom: -5e6, Lateral: 1},
		{Axis: Major},
	} {
		m := bendingMember()
		m.Length = 4000
		for a := range 2 {
			m.Props.W[a] = m.Props.I[a] / m.Props.C[a]
		}
		want, err := InteractionFactor(&m, 300e3, &b, &in)
		if err != nil {
			t.Fatal(err)
		}
		m.Props.W = [2]float64{}
		got, err := InteractionFactor(&m, 300e3, &b, &in)
		if err != nil {
			t.Fatal(err)
		}
		if !(math.Abs(got.Factor-want.Factor) <= 1e-9*want.Factor) {
			t.Errorf("%+v: factor %g without W, %g with W = I/C", b, got.Factor, want.Factor)
		}
	}
}
