package column

import (
	"errors"
	"math"
	"testing"
)

// enChi is the reduction factor of EN 1993-1-1:2005 eq. (6.49), written
// out here from the standard.
func enChi(lam, alpha float64) float64 {
	if lam <= 0.2 {
		return 1
	}
	phi := 0.5 * (1 + alpha*(lam-0.2) + lam*lam)
	return math.Min(1, 1/(phi+math.Sqrt(phi*phi-lam*lam)))
}

// A short equal angle L 100 x 100 x 10, pinned, 600 mm long, S355:
// flexural-torsional buckling (the symmetry axis, the major one, coupled
// with twist) sets N_cr well below the minor-axis Euler load, and the
// curve model must use it: lam_T = sqrt(A fy / N_cr,TF) with the minor
// axis's curve (EN 1993-1-1:2005 6.3.1.4; EN 1993-1-3 eq. 6.35 for
// N_cr,TF).
func TestShortEqualAngle(t *testing.T) {
	p, err := Section{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10, Root: 12}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	m := Member{Props: p, E: 210000, Fy: 355, Length: 600, K: [2]float64{1, 1}, Alpha: [2]float64{0.34, 0.34}}
	g := 210000 / 2.6
	i02 := PolarRadius2(&p)
	nt := (g*p.It + math.Pi*math.Pi*210000*p.Iw/(600*600)) / i02
	nft := monoFormula(Euler(&m, Major), nt, p.S[Major], math.Sqrt(i02))
	nv := Euler(&m, Minor)
	if ratio := nft / nv; !(ratio < 0.75) {
		t.Fatalf("N_cr,TF / N_cr,v = %.3f: not the short-angle case", ratio)
	}
	res, err := Curve(&m, Both)
	if err != nil {
		t.Fatal(err)
	}
	want := p.A * 355 * enChi(math.Sqrt(p.A*355/nft), 0.34)
	if res.Mode != ModeFlexuralTorsional || math.Abs(res.N-want) > 1e-9*want {
		t.Errorf("curve b: N = %.6g (%v), want %.6g flexural-torsional", res.N, res.Mode, want)
	}
	flex := p.A * 355 * enChi(math.Sqrt(p.A*355/nv), 0.34)
	if !(res.N < 0.97*flex) {
		t.Errorf("flexural-torsional resistance %.6g not below the flexural %.6g", res.N, flex)
	}
	// First yield with an L/1000 bow: the Perry-Robertson equation with
	// P/PE replaced by P/N_cr,TF and the minor axis's eta = e0 c / r^2
	// (the larger one), solved here as the smaller root of
	// (1 - x)(1 - x rho) = eta x.
	m.Bow = 0.6
	fy, err := FirstYield(&m, Both)
	if err != nil {
		t.Fatal(err)
	}
	rho := p.A * 355 / nft
	eta := 0.6 * p.C[Minor] / (p.R[Minor] * p.R[Minor])
	b := 1 + eta + rho
	x := (b - math.Sqrt(b*b-4*rho)) / (2 * rho)
	if fy.Mode != ModeFlexuralTorsional || math.Abs(fy.N-p.A*355*x) > 1e-9*fy.N {
		t.Errorf("first yield: N = %.6g (%v), want %.6g", fy.N, fy.Mode, p.A*355*x)
	}
	// One axis alone stays flexural.
	if r, _ := Curve(&m, Minor); r.Mode != ModeFlexuralMinor || math.Abs(r.N-flex) > 1e-9*flex {
		t.Errorf("minor axis alone: %v %v, want flexural %.6g", r.N, r.Mode, flex)
	}
	// The beam-column bends in one plane: refused.
	if _, err := BeamColumn(&m, Section{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10, Root: 12}, Both, nil); !errors.Is(err, ErrTwisting) {
		t.Errorf("beam-column on a flexural-torsional member: err %v, want ErrTwisting", err)
	}
	if n := testing.AllocsPerRun(100, func() { _, _ = FirstYield(&m, Both) }); n != 0 {
		t.Errorf("FirstYield with torsion allocates %v times", n)
	}
}

// A tee's extreme fibres differ on the two sides of its major axis: the
// flange tip and the stem tip. Centroid from the flange top
// (b tf tf/2 + tw hw (tf + hw/2)) / A (Gere, Mechanics of Materials, 12.3);
// the first-yield distance is the larger side.
func TestTeeFibreSides(t *testing.T) {
	h, b, tf, tw := 200.0, 100.0, 10.0, 8.0
	p, err := Section{Shape: ShapeTee, Depth: h, Width: b, Flange: tf, Web: tw}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	hw := h - tf
	a := b*tf + tw*hw
	top := (b*tf*tf/2 + tw*hw*(tf+hw/2)) / a
	sides := p.CSide[Major]
	if math.Abs(sides[0]-top) > 1e-9*h || math.Abs(sides[1]-(h-top)) > 1e-9*h {
		t.Errorf("major-axis fibre sides %v, want %.6g and %.6g", sides, top, h-top)
	}
	if math.Abs(p.C[Major]-math.Max(top, h-top)) > 1e-9*h || p.CSide[Minor] != [2]float64{b / 2, b / 2} {
		t.Errorf("C = %v, CSide minor %v", p.C, p.CSide[Minor])
	}
}

// Degenerate and impossible sections give errors that say what is wrong,
// never a panic or NaN properties.
func TestOpenSectionErrors(t *testing.T) {
	nan := math.NaN()
	for _, s := range []Section{
		{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 0},
		{Shape: ShapeAngle, Depth: 100, Width: 0, Thickness: 10},
		{Shape: ShapeAngle, Depth: 100, Width: 10, Thickness: 10},
		{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10, Root: 95},
		{Shape: ShapeAngle, Depth: nan, Width: 100, Thickness: 10},
		{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10, Root: -1},
		{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10, ThicknessLoss: 5},
		{Shape: ShapeTee, Depth: 12, Width: 150, Flange: 12, Web: 8}, // no web
		{Shape: ShapeTee, Depth: 150, Width: 150, Flange: 12, Web: 0},
		{Shape: ShapeTee, Depth: 150, Width: 150, Flange: 12, Web: 160},
		{Shape: ShapeChannel, Depth: 20, Width: 75, Flange: 10, Web: 8},
		{Shape: ShapeChannel, Depth: 200, Width: 8, Flange: 10, Web: 8},
		{Shape: ShapeChannel, Depth: 200, Width: 75, Flange: math.Inf(1), Web: 8},
		{Shape: ShapeCustom, Area: 100, IMajor: 2e4, IMinor: 1e4, CMajor: 10, CMinor: 5, It: -1},
		{Shape: ShapeCustom, Area: 100, IMajor: 2e4, IMinor: 1e4, CMajor: 10, CMinor: 5, Iw: 5},
		{Shape: ShapeCustom, Area: 100, IMajor: 2e4, IMinor: 1e4, CMajor: 10, CMinor: 5, It: 10, ShearCentre: [2]float64{nan, 0}},
	} {
		if p, err := s.Properties(); err == nil {
			t.Errorf("%+v: no error, properties %+v", s, p)
		}
	}
	p, _ := Section{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10}.Properties()
	m := Member{Props: p, E: 210000, G: -1, Fy: 355, Length: 600, K: [2]float64{1, 1}}
	if _, err := FirstYield(&m, Both); !errors.Is(err, ErrShear) {
		t.Errorf("negative G: err %v, want ErrShear", err)
	}
}

// A thickness loss t recedes every face of an open section: an angle's
// legs lose 2t in thickness and in length (heel and toe).
func TestOpenThicknessLoss(t *testing.T) {
	r, err := Section{Shape: ShapeAngle, Depth: 100, Width: 80, Thickness: 10, Root: 12, ThicknessLoss: 1}.Reduced()
	if err != nil {
		t.Fatal(err)
	}
	want := Section{Shape: ShapeAngle, Depth: 98, Width: 78, Thickness: 8, Root: 13}
	if r != want {
		t.Errorf("reduced %+v, want %+v", r, want)
	}
	c, err := Section{Shape: ShapeChannel, Depth: 200, Width: 75, Flange: 11.5, Web: 8.5, ThicknessLoss: 0.5}.Reduced()
	if err != nil || c.Depth != 199 || c.Width != 74 || c.Flange != 10.5 || c.Web != 7.5 {
		t.Errorf("reduced channel %+v, %v", c, err)
	}
}
