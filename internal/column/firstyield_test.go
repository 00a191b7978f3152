package column

import (
	"errors"
	"math"
	"testing"
)

// Unit conversions (exact definitions of the inch and the pound-force).
const (
	inch = 25.4              // mm
	kip  = 4448.2216152605   // N
	ksi  = kip / inch / inch // MPa
)

// strut returns a member with the same properties about both axes.
func strut(a, r, c, e, fy, l float64) Member {
	return Member{
		Props: Props{A: a, I: [2]float64{a * r * r, a * r * r}, R: [2]float64{r, r}, C: [2]float64{c, c},
			W: [2]float64{a * r * r / c, a * r * r / c}},
		E: e, Fy: fy, Length: l, K: [2]float64{1, 1},
	}
}

// BS 5950-1:2000 Annex C (Perry strut formula with the Robertson constant
// a): pc = pE py / (phi + sqrt(phi^2 - pE py)), eta = a (lambda -
// lambda0)/1000 >= 0, lambda0 = 0.2 sqrt(pi^2 E/py), E = 205000 N/mm^2.
// The values below are computed from the Annex formula (py = 275); the
// Robertson constants 2.0, 3.5, 5.5, 8.0 are those of Annex C.2. FirstYield
// gets the same eta through the bow e0 = eta r^2 / c.
func TestFirstYieldBS5950AnnexC(t *testing.T) {
	const e, py, r, c = 205000.0, 275.0, 40.0, 55.0
	lambda0 := 0.2 * math.Sqrt(math.Pi*math.Pi*e/py)
	robertson := [4]float64{2.0, 3.5, 5.5, 8.0}
	tests := []struct {
		lambda float64
		pc     [4]float64 // N/mm^2 for a = 2.0, 3.5, 5.5, 8.0
	}{
		{15, [4]float64{275.000, 275.000, 275.000, 275.000}},
		{20, [4]float64{273.356, 272.136, 270.528, 268.545}},
		{30, [4]float64{267.209, 261.685, 254.706, 246.544}},
		{50, [4]float64{251.087, 236.571, 220.314, 203.545}},
		{70, [4]float64{223.504, 201.916, 181.174, 162.137}},
		{100, [4]float64{157.435, 140.787, 125.236, 111.239}},
		{120, [4]float64{118.592, 107.865, 97.115, 87.004}},
		{150, [4]float64{80.103, 74.413, 68.239, 62.067}},
		{200, [4]float64{46.789, 44.356, 41.533, 38.527}},
		{250, [4]float64{30.492, 29.234, 27.724, 26.060}},
		{350, [4]float64{15.844, 15.377, 14.797, 14.134}},
	}
	for _, tt := range tests {
		for k, a := range robertson {
			eta := math.Max(0, a*(tt.lambda-lambda0)/1000)
			m := strut(1000, r, c, e, py, tt.lambda*r)
			m.Bow = eta * r * r / c
			res, err := PerryRobertson(&m, Minor)
			if err != nil {
				t.Fatal(err)
			}
			if pc := res.N / m.Props.A; math.Abs(pc-tt.pc[k]) > 6e-4 {
				t.Errorf("lambda %g, a = %g: pc = %.4f, want %.3f", tt.lambda, a, pc, tt.pc[k])
			}
		}
	}
}

// Gere, Mechanics of Materials, solution to Problem 11.6-11: a pinned
// W 12x87 column, L = 216 in, e = 1.471 in, A = 25.6 in^2, I = 740 in^4,
// c = 6.265 in, E = 29000 ksi, sigma_Y = 36 ksi; published load at first
// yield P_Y = 664.7 k.
func TestSecantGere(t *testing.T) {
	a, i := 25.6*inch*inch, 740*inch*inch*inch*inch
	m := strut(a, math.Sqrt(i/a), 6.265*inch, 29000*ksi, 36*ksi, 216*inch)
	m.Ecc = 1.471 * inch
	res, err := Secant(&m, Major)
	if err != nil {
		t.Fatal(err)
	}
	if got := res.N / kip; math.Abs(got-664.7) > 0.05 {
		t.Errorf("P_Y = %.2f k, want 664.7 k (Gere, Problem 11.6-11)", got)
	}
	if res.Governs != GovernsFirstYield || res.Axis != Major {
		t.Errorf("Result = %+v", res)
	}
}

// beamColumnFirstYield solves the beam-column equation
// v” + k^2 v = -k^2 (e + e0 sin(pi x/L)), v(0) = v(L) = 0, k^2 = P/(E I),
// by RK4 shooting, and returns the largest extreme-fibre stress
// P/A + P max|e + e0 sin + v| c / I at the grid points (Timoshenko & Gere,
// Theory of Elastic Stability, ch. 1, set up numerically).
func beamColumnStress(m *Member, p float64) float64 {
	const n = 2000 // even: the midpoint is a grid point
	l := m.Length
	a, r, c := m.Props.A, m.Props.R[Major], m.Props.C[Major]
	i := a * r * r
	k2 := p / (m.E * i)
	e, e0 := m.Ecc, m.Bow
	h := l / n
	deriv := func(x, v, dv float64) (float64, float64) {
		return dv, -k2 * (v + e + e0*math.Sin(math.Pi*x/l))
	}
	// shoot integrates from v(0) = 0, v'(0) = s and returns v(L) and the
	// largest total offset from the chord.
	shoot := func(s float64) (end, peak float64) {
		x, v, dv := 0.0, 0.0, s
		peak = math.Abs(e)
		for j := 0; j < n; j++ {
			k1v, k1d := deriv(x, v, dv)
			k2v, k2d := deriv(x+h/2, v+h/2*k1v, dv+h/2*k1d)
			k3v, k3d := deriv(x+h/2, v+h/2*k2v, dv+h/2*k2d)
			k4v, k4d := deriv(x+h, v+h*k3v, dv+h*k3d)
			v += h / 6 * (k1v + 2*k2v + 2*k3v + k4v)
			dv += h / 6 * (k1d + 2*k2d + 2*k3d + k4d)
			x = float64(j+1) * h
			peak = math.Max(peak, math.Abs(e+e0*math.Sin(math.Pi*x/l)+v))
		}
		return v, peak
	}
	// v(L) is affine in the initial slope s.
	v0, _ := shoot(0)
	v1, _ := shoot(1)
	_, peak := shoot(-v0 / (v1 - v0))
	return p/a + p*peak*c/i
}

// The first-yield load of FirstYield against a numerical solution of the
// beam-column equation, solved in the test for the load at which the
// extreme fibre reaches fy.
func TestFirstYieldBeamColumnODE(t *testing.T) {
	tests := []struct {
		name          string
		length, e, e0 float64
	}{
		{"secant, stocky", 2000, 10, 0},
		{"secant, intermediate", 5000, 20, 0},
		{"secant, slender", 12000, 5, 0},
		{"secant, large e", 6000, 300, 0},
		{"bow only", 5000, 0, 5},
		{"bow and eccentricity", 5000, 12, 5},
		{"bow and eccentricity, slender", 14000, 3, 14},
	}
	for _, tt := range tests {
		m := strut(9310, 64.8, 127.3, 210000, 275, tt.length) // UC 254x254x73 minor axis
		m.Ecc, m.Bow = tt.e, tt.e0
		res, err := FirstYield(&m, Major)
		if err != nil {
			t.Fatal(err)
		}
		lo, hi := 0.0, math.Min(m.Props.A*m.Fy, Euler(&m, Major))
		for range 200 {
			mid := 0.5 * (lo + hi)
			if beamColumnStress(&m, mid) < m.Fy {
				lo = mid
			} else {
				hi = mid
			}
			if hi-lo < 1e-12*hi {
				break
			}
		}
		if ode := 0.5 * (lo + hi); math.Abs(res.N-ode) > 1e-6*ode {
			t.Errorf("%s: FirstYield N = %.9g, beam-column equation %.9g", tt.name, res.N, ode)
		}
	}
}

// With no eccentricity the equation is the Perry-Robertson quadratic
// (1 - chi)(1 - chi rho) = eta chi; check the cancellation-free root by
// its residual where the textbook form b - sqrt(b^2 - 4ac) loses digits.
func TestPerryRootResidual(t *testing.T) {
	for _, rho := range []float64{1e-8, 0.04, 0.5, 1, 2, 1e4, 1e12} {
		for _, eta := range []float64{1e-14, 1e-9, 1e-3, 0.3, 5, 1e6} {
			chi := perryChi(rho, eta)
			res := (1-chi)*(1-chi*rho) - eta*chi
			if !(chi > 0 && chi <= math.Min(1, 1/rho)) || math.Abs(res) > 1e-12*math.Max(eta*chi, 1e-300)+4e-16 {
				t.Errorf("rho %g, eta %g: chi = %.17g, residual %g", rho, eta, chi, res)
			}
		}
	}
}

// Robustness: for any positive input the secant solution (with or
// without a sway term) is finite, lies in (0, min(1, 1/rho)] and satisfies
// the equation.
func TestFirstYieldNoNaN(t *testing.T) {
	for _, rho := range []float64{1e-10, 1e-4, 0.04, 0.3, 1, 1.0000001, 3, 1e3, 1e8} {
		for _, eta := range []float64{0, 1e-13, 1e-4, 0.2, 3, 1e5} {
			for _, ecc := range []float64{0, 1e-15, 1e-9, 1e-3, 0.1, 1, 30, 1e6, 1e12} {
				for _, sw := range []float64{0, 1e-12, 1e-3, 0.4, 20, 1e9} {
					checkFirstYieldRoot(t, rho, eta, ecc, sw)
				}
			}
		}
	}
}

func checkFirstYieldRoot(t *testing.T, rho, eta, ecc, sw float64) {
	t.Helper()
	chi := firstYieldChi(rho, eta, ecc, sw)
	if !(chi > 0 && chi <= math.Min(1, 1/rho)) {
		t.Errorf("rho %g, eta %g, ecc %g, sw %g: chi = %g", rho, eta, ecc, sw, chi)
		return
	}
	// The root is bracketed by a relative perturbation of 1e-12 (the
	// equation is ill-conditioned near P = PE, so its residual is not a
	// fair measure).
	if g := fyLHS(chi*(1-1e-12), rho, eta, ecc, sw); g > 1 {
		t.Errorf("rho %g, eta %g, ecc %g, sw %g: chi = %.17g: equation just below gives %.17g > 1", rho, eta, ecc, sw, chi, g)
	}
	if g := fyLHS(chi*(1+1e-12), rho, eta, ecc, sw); g < 1 {
		t.Errorf("rho %g, eta %g, ecc %g, sw %g: chi = %.17g: equation just above gives %.17g < 1", rho, eta, ecc, sw, chi, g)
	}
}

// fyLHS is the left-hand side of the first-yield equation over fy, written
// out from the equation (+Inf past the Euler load): secant term, Perry
// amplification and the leaning cantilever's tan(u)/u (Timoshenko & Gere,
// art. 1.3, from memory).
func fyLHS(chi, rho, eta, ecc, sw float64) float64 {
	q := chi * rho
	if q >= 1 {
		return math.Inf(1)
	}
	u := math.Pi / 2 * math.Sqrt(q)
	tu := 1.0
	if u > 0 {
		tu = math.Tan(u) / u
	}
	return chi * (1 + ecc/math.Cos(u) + eta/(1-q) + sw*tu)
}

// Limits: vanishing imperfections give the squash load A fy (stocky) or the
// Euler load (slender); growing slenderness with L/1000 imperfections tends
// to the Euler load.
func TestFirstYieldLimits(t *testing.T) {
	for _, tiny := range []struct{ bow, ecc float64 }{{1e-9, 0}, {0, 1e-9}, {1e-9, 1e-9}} {
		m := strut(9310, 64.8, 127.3, 210000, 275, 1500) // relative slenderness 0.27
		m.Bow, m.Ecc = tiny.bow, tiny.ecc
		res, _ := FirstYield(&m, Minor)
		if ny := m.Props.A * m.Fy; math.Abs(res.N-ny) > 1e-7*ny {
			t.Errorf("bow %g, ecc %g: N = %.12g, want the squash load %.12g", tiny.bow, tiny.ecc, res.N, ny)
		}
		m.Length = 20000 // relative slenderness 3.6
		res, _ = FirstYield(&m, Minor)
		if pe := Euler(&m, Minor); math.Abs(res.N-pe) > 1e-7*pe {
			t.Errorf("bow %g, ecc %g: N = %.12g, want the Euler load %.12g", tiny.bow, tiny.ecc, res.N, pe)
		}
	}
	prev := 0.0
	for _, l := range []float64{1e4, 1e5, 1e6, 1e7} {
		m := strut(9310, 64.8, 127.3, 210000, 275, l)
		m.Bow, m.Ecc = l/1000, l/1000
		res, _ := FirstYield(&m, Minor)
		ratio := res.N / Euler(&m, Minor)
		if !(ratio > prev && ratio < 1) {
			t.Errorf("L = %g: N/PE = %g, want it rising towards 1 (previous %g)", l, ratio, prev)
		}
		prev = ratio
	}
	if prev < 0.999 {
		t.Errorf("L = 1e7: N/PE = %g, want > 0.999", prev)
	}
}

// Imperfections act by their magnitude, and the weaker axis governs.
func TestFirstYieldAxes(t *testing.T) {
	p, err := Section{Shape: ShapeI, Depth: 254.1, Width: 254.6, Flange: 14.2, Web: 8.6, Root: 12.7}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	m := Member{Props: p, E: 210000, Fy: 275, Length: 5000, K: [2]float64{1, 1}, Bow: 5, Ecc: 3}
	both, _ := FirstYield(&m, Both)
	maj, _ := FirstYield(&m, Major)
	mnr, _ := FirstYield(&m, Minor)
	if both != mnr || !(mnr.N < maj.N) || maj.Axis != Major {
		t.Errorf("Both %+v, Major %+v, Minor %+v: want Both = Minor (weaker)", both, maj, mnr)
	}
	m.K = [2]float64{1, 0.2} // restrain the minor axis: the major governs
	m.Length, m.Bow, m.Ecc = 12000, 1, 0
	maj, _ = FirstYield(&m, Major)
	both, _ = FirstYield(&m, Both)
	if both.Axis != Major || both.N != maj.N {
		t.Errorf("with K minor 0.3: Both %+v, want Major %+v", both, maj)
	}
	m.Bow, m.Ecc = 5, 3
	neg := m
	neg.Bow, neg.Ecc = -5, -3
	if a, b := mustN(FirstYield(&m, Both)), mustN(FirstYield(&neg, Both)); a != b {
		t.Errorf("negative imperfections: N = %g, want %g", b, a)
	}
	sym := strut(9310, 64.8, 127.3, 210000, 275, 5000)
	sym.Bow = 5
	if res, _ := FirstYield(&sym, Both); res.Axis != Minor {
		t.Errorf("tie reports %v, want minor", res.Axis)
	}
}

func mustN(r Result, err error) float64 {
	if err != nil {
		return math.NaN()
	}
	return r.N
}

func TestCapacityErrors(t *testing.T) {
	good := strut(9310, 64.8, 127.3, 210000, 275, 5000)
	good.Alpha = [2]float64{0.34, 0.49}
	nan := math.NaN()
	tests := []struct {
		name   string
		change func(m *Member)
		axis   Axis
		want   error
	}{
		{"zero length", func(m *Member) { m.Length = 0 }, Both, ErrLength},
		{"negative length", func(m *Member) { m.Length = -5 }, Minor, ErrLength},
		{"infinite length", func(m *Member) { m.Length = math.Inf(1) }, Minor, ErrLength},
		{"NaN modulus", func(m *Member) { m.E = nan }, Major, ErrModulus},
		{"zero modulus", func(m *Member) { m.E = 0 }, Major, ErrModulus},
		{"negative yield", func(m *Member) { m.Fy = -275 }, Both, ErrYield},
		{"zero area", func(m *Member) { m.Props.A = 0 }, Both, ErrArea},
		{"overflowing squash load", func(m *Member) { m.Props.A, m.Fy = 1e200, 1e200 }, Both, ErrRange},
		{"zero K", func(m *Member) { m.K[Minor] = 0 }, Both, ErrK},
		{"NaN K", func(m *Member) { m.K[Major] = nan }, Major, ErrK},
		{"zero r", func(m *Member) { m.Props.R[Major] = 0 }, Both, ErrRadius},
		{"zero c", func(m *Member) { m.Props.C[Minor] = 0 }, Minor, ErrFibre},
		{"NaN bow", func(m *Member) { m.Bow = nan }, Both, ErrImperfection},
		{"infinite eccentricity", func(m *Member) { m.Ecc = math.Inf(-1) }, Both, ErrImperfection},
		{"bad axis", func(m *Member) {}, Axis(5), ErrAxis},
	}
	models := []struct {
		name string
		f    func(*Member, Axis) (Result, error)
	}{{"FirstYield", FirstYield}, {"PerryRobertson", PerryRobertson}, {"Secant", Secant}, {"Curve", Curve}}
	for _, tt := range tests {
		for _, mod := range models {
			m := good
			tt.change(&m)
			res, err := mod.f(&m, tt.axis)
			if !errors.Is(err, tt.want) || res != (Result{}) {
				t.Errorf("%s, %s: (%+v, %v), want error %v", mod.name, tt.name, res, err, tt.want)
			}
		}
	}
	// An axis that is not evaluated is not checked.
	m := good
	m.K[Major] = 0
	if _, err := FirstYield(&m, Minor); err != nil {
		t.Errorf("K major = 0, minor axis: %v", err)
	}
	m = good
	m.Alpha[Minor] = -0.1
	if _, err := Curve(&m, Both); !errors.Is(err, ErrAlpha) {
		t.Errorf("negative alpha: %v, want ErrAlpha", err)
	}
	m.Alpha[Minor] = nan
	if _, err := Curve(&m, Minor); !errors.Is(err, ErrAlpha) {
		t.Errorf("NaN alpha: %v, want ErrAlpha", err)
	}
}
