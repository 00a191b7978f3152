package column

import (
	"math"
	"testing"
)

// bcIPE300 is an IPE 300 (h 300, b 150, tw 7.1, tf 10.7, r 15 mm; the
// Euronorm 19-57 dimensions, from memory).
var bcIPE300 = Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10.7, Web: 7.1, Root: 15}

// bcChi is the EN 1993-1-1:2005 reduction factor, eqs. (6.49)-(6.50),
// written out here independently of the package's curve code.
func bcChi(lam, alpha float64) float64 {
	phi := 0.5 * (1 + alpha*(lam-0.2) + lam*lam)
	return math.Min(1, 1/(phi+math.Sqrt(phi*phi-lam*lam)))
}

// bcMemberAt returns a pinned member of sec (S235, E = 210000) whose
// relative slenderness about axis is lam, with a bow of L/1000.
func bcMemberAt(t *testing.T, sec Section, axis Axis, lam float64) *Member {
	p, err := sec.Properties()
	if err != nil {
		t.Fatal(err)
	}
	m := &Member{Props: p, E: 210000, Fy: 235, K: [2]float64{1, 1}}
	m.Length = lam * math.Pi * math.Sqrt(m.E/m.Fy) * p.R[axis]
	m.Bow = m.Length / 1000
	return m
}

// Pinned hot-rolled I columns in S235 with a bow of L/1000 and the ECCS
// residual stresses, against the buckling curves EN 1993-1-1:2005 Table
// 6.2 assigns to them (alpha from Table 6.1): rolled I with h/b > 1.2 and
// tf <= 40 mm, curve a (0.21) about y-y and b (0.34) about z-z; h/b <= 1.2
// and tf <= 100 mm, curve b about y-y and c (0.49) about z-z. The curves
// were fitted to tests and to simulations of this kind, which scatter
// about the assigned curve by roughly +-5 % at these slenderness values,
// and lie above it (curve b is conservative) for stocky H sections about
// y-y (from memory, e.g. the background studies of the ECCS curves by
// Beer & Schulz, 1970, and later GMNIA recalculations). The band tested is
// -5 % to +5 % of chi, widened to +10 % for h/b <= 1.2 about y-y.
func TestBeamColumnUltimateBucklingCurves(t *testing.T) {
	ipe500 := Section{Shape: ShapeI, Depth: 500, Width: 200, Flange: 16, Web: 10.2, Root: 21} // from memory
	heb300 := Section{Shape: ShapeI, Depth: 300, Width: 300, Flange: 19, Web: 11, Root: 27}   // from memory
	for _, c := range []struct {
		name   string
		sec    Section
		axis   Axis
		alpha  float64
		lo, hi float64
	}{
		{"IPE 300", bcIPE300, Major, 0.21, -0.05, 0.05},
		{"IPE 300", bcIPE300, Minor, 0.34, -0.05, 0.05},
		{"IPE 500", ipe500, Major, 0.21, -0.05, 0.05},
		{"IPE 500", ipe500, Minor, 0.34, -0.05, 0.05},
		{"HEB 300", heb300, Major, 0.34, -0.05, 0.10},
		{"HEB 300", heb300, Minor, 0.49, -0.05, 0.05},
	} {
		for _, lam := range []float64{0.5, 1.0, 1.5} {
			m := bcMemberAt(t, c.sec, c.axis, lam)
			r, err := BeamColumn(m, c.sec, c.axis, &BeamOptions{Limit: UltimateLimit, Residual: ResidualHotRolled})
			if err != nil {
				t.Fatal(err)
			}
			chi := r.N / (m.Props.A * m.Fy)
			want := bcChi(lam, c.alpha)
			if d := chi/want - 1; d < c.lo || d > c.hi || r.Governs != GovernsUltimate {
				t.Errorf("%s %v lam %.1f: chi %.4f (%s), curve %.4f, off by %+.1f %%", c.name, c.axis, lam, chi, r.Governs, want, 100*d)
			} else {
				t.Logf("%s %v lam %.1f: chi %.4f, curve %.4f (%+.1f %%)", c.name, c.axis, lam, chi, want, 100*d)
			}
		}
	}
}

// Up to first yield the member is elastic, so without residual stresses
// the peak of the path cannot lie below the first-yield load (a property
// of the model, e.g. Trahair et al., The Behaviour and Design of Steel
// Structures to EC3, §3.3.3); the fibres reproduce the elastic section
// exactly, so the comparison is like for like.
func TestBeamColumnUltimateAboveFirstYield(t *testing.T) {
	sec := Section{Shape: ShapeI, Depth: 300, Width: 150, Flange: 10.7, Web: 7.1}
	for _, axis := range []Axis{Major, Minor} {
		for _, lam := range []float64{0.3, 0.8, 1.4, 2.2} {
			m := bcMemberAt(t, sec, axis, lam)
			m.Ecc = m.Length / 2000
			for _, springs := range [][2]float64{{0, 0}, {2e10, 5e9}} {
				o := &BeamOptions{}
				o.Springs[axis] = springs
				fy, err := BeamColumn(m, sec, axis, o)
				if err != nil {
					t.Fatal(err)
				}
				o.Limit = UltimateLimit
				u, err := BeamColumn(m, sec, axis, o)
				if err != nil {
					t.Fatal(err)
				}
				if u.N < fy.N*(1-1e-6) || u.N > m.Props.A*m.Fy {
					t.Errorf("%v lam %.1f springs %v: ultimate %.6g below first yield %.6g or above A fy", axis, lam, springs, u.N, fy.N)
				}
			}
		}
	}
}

// A near-perfect stocky member reaches the squash load A fy whatever its
// (self-equilibrated) residual stresses (very stocky here, relative
// slenderness 0.02, so that even the tangent-modulus load of the partly
// yielded section exceeds A fy); a near-perfect slender elastic one
// approaches the Euler load pi^2 E I / L^2 (Euler 1744; e.g. Timoshenko &
// Gere, Theory of Elastic Stability, §2.1).
func TestBeamColumnUltimateLimits(t *testing.T) {
	for _, c := range []struct {
		name string
		sec  Section
		res  Residual
	}{
		{"I hot-rolled", bcIPE300, ResidualHotRolled},
		{"I welded", bcIPE300, ResidualWelded},
		{"RHS cold-formed", Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8}, ResidualColdFormed},
		{"RHS welded", Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8}, ResidualWelded},
		// Rounded corners (EN 10219-2: ro 2.5t, ri 1.5t for an 8 mm wall):
		// the fibres must hold the same area as Properties.
		{"RHS cold-formed, corners", Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8, Radius: 20, InnerRadius: 12}, ResidualColdFormed},
		{"RHS hot-finished, corners", Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8, Radius: 12, InnerRadius: 8}, ResidualNone},
		{"CHS", Section{Shape: ShapeCHS, Diameter: 168.3, Thickness: 6.3}, ResidualColdFormed},
		{"rect", Section{Shape: ShapeRect, Depth: 60, Width: 40}, ResidualNone},
		{"round", Section{Shape: ShapeRound, Diameter: 50}, ResidualNone},
	} {
		for _, axis := range []Axis{Major, Minor} {
			p, err := c.sec.Properties()
			if err != nil {
				t.Fatal(err)
			}
			m := &Member{Props: p, E: 210000, Fy: 355, K: [2]float64{1, 1}}
			m.Length = 0.02 * math.Pi * math.Sqrt(m.E/m.Fy) * p.R[axis]
			m.Bow = m.Length * 1e-6
			o := &BeamOptions{Limit: UltimateLimit, Residual: c.res}
			r, err := BeamColumn(m, c.sec, axis, o)
			if err != nil {
				t.Fatal(err)
			}
			if d := r.N/(p.A*m.Fy) - 1; math.Abs(d) > 1e-3 {
				t.Errorf("%s %v stocky: N = %.6g, A fy = %.6g (%+.2g)", c.name, axis, r.N, p.A*m.Fy, d)
			}
			m.Length = 3 * math.Pi * math.Sqrt(m.E/m.Fy) * p.R[axis]
			m.Bow = m.Length * 1e-6
			o.Residual = ResidualNone
			r, err = BeamColumn(m, c.sec, axis, o)
			if err != nil {
				t.Fatal(err)
			}
			ncr := math.Pi * math.Pi * m.E * p.I[axis] / (m.Length * m.Length)
			if d := r.N/ncr - 1; d > 1e-4 || d < -2e-3 {
				t.Errorf("%s %v slender: N = %.6g, Euler %.6g (%+.2g)", c.name, axis, r.N, ncr, d)
			}
		}
	}
}

// A very short rectangular bar loaded at an eccentricity e fails when its
// sections become fully plastic: M/Mp + (N/Np)^2 = 1 for a rectangle
// (e.g. Neal, The Plastic Methods of Structural Analysis, ch. 6), with
// M = N e as the bar hardly deflects (length 0.3 times the depth). The
// fibres approach full plasticity only as the curvature grows, so the
// model lies a little below.
func TestBeamColumnUltimateInteraction(t *testing.T) {
	sec := Section{Shape: ShapeRect, Depth: 100, Width: 50}
	p, err := sec.Properties()
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range []float64{5, 20, 50, 150} {
		m := &Member{Props: p, E: 210000, Fy: 275, K: [2]float64{1, 1}, Length: 30, Ecc: e}
		r, err := BeamColumn(m, sec, Major, &BeamOptions{Limit: UltimateLimit, Fibres: 200})
		if err != nil {
			t.Fatal(err)
		}
		// n^2 + n (4 e / h) = 1 with n = N/Np, Mp = Np h / 4.
		b := 4 * e / sec.Depth
		n := (-b + math.Sqrt(b*b+4)) / 2
		got := r.N / (p.A * m.Fy)
		if d := got/n - 1; d > 1e-4 || d < -5e-3 {
			t.Errorf("e = %g: N/Np = %.5f, plastic interaction %.5f (%+.2g)", e, got, n, d)
		}
	}
}

// The default mesh (40 elements, about 50 fibres) is converged: a four
// times finer mesh in both directions moves the ultimate load by less than
// 0.5 % (a convergence check, common practice), here with an end spring
// and an eccentricity as well as the bow.
func TestBeamColumnUltimateMesh(t *testing.T) {
	for _, c := range []struct {
		axis Axis
		lam  float64
	}{{Major, 1.0}, {Minor, 0.5}, {Minor, 1.5}} {
		m := bcMemberAt(t, bcIPE300, c.axis, c.lam)
		m.Ecc = 3
		o := &BeamOptions{Limit: UltimateLimit, Residual: ResidualHotRolled}
		o.Springs[c.axis] = [2]float64{1e11, 0}
		coarse, err := BeamColumn(m, bcIPE300, c.axis, o)
		if err != nil {
			t.Fatal(err)
		}
		o.Elements, o.Fibres = 160, 200
		fine, err := BeamColumn(m, bcIPE300, c.axis, o)
		if err != nil {
			t.Fatal(err)
		}
		if d := coarse.N/fine.N - 1; math.Abs(d) > 5e-3 {
			t.Errorf("%v lam %.1f: default mesh %.6g, fine mesh %.6g (%+.2g)", c.axis, c.lam, coarse.N, fine.N, d)
		}
	}
}
