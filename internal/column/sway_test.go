package column

import (
	"math"
	"testing"
)

// leaningCantileverMoment integrates the elastic cantilever fixed at x = 0
// whose axis leans by phi and which carries the vertical load p at its top
// x = l: EI v” = p (phi l + v(l) - phi x - v(x)), v(0) = v'(0) = 0 (the
// bending moment of the deflected, leaning member; Timoshenko & Gere,
// Theory of Elastic Stability, ch. 1, set up from equilibrium). The
// equation is linear in the unknown top deflection v(l), so two RK4 shots
// (classical fourth-order Runge-Kutta, 4000 steps) give it; the base
// moment p (phi l + v(l)) is returned. It is independent of SwayMoment's
// closed form.
func leaningCantileverMoment(p, phi, l, ei float64) float64 {
	k2 := p / ei
	shoot := func(c0, c1 float64) float64 { // v'' = k2 (c0 - c1 x - v)
		const n = 4000
		h := l / n
		v, dv := 0.0, 0.0
		f := func(x, v float64) float64 { return k2 * (c0 - c1*x - v) }
		for i := 0; i < n; i++ {
			x := float64(i) * h
			a1, b1 := dv, f(x, v)
			a2, b2 := dv+h/2*b1, f(x+h/2, v+h/2*a1)
			a3, b3 := dv+h/2*b2, f(x+h/2, v+h/2*a2)
			a4, b4 := dv+h*b3, f(x+h, v+h*a3)
			v += h / 6 * (a1 + 2*a2 + 2*a3 + a4)
			dv += h / 6 * (b1 + 2*b2 + 2*b3 + b4)
		}
		return v
	}
	va := shoot(phi*l, phi) // with v(l) = 0 on the right-hand side
	vb := shoot(1, 0)       // per unit v(l)
	vl := va / (1 - vb)
	return p * (phi*l + vl)
}

func TestSwayMomentLeaningCantilever(t *testing.T) {
	const ei, l, phi = 205000 * 3870e4, 4000.0, 1.0 / 200
	ncr := math.Pi * math.Pi * ei / (4 * l * l) // Euler load of a cantilever, K = 2
	for _, r := range []float64{1e-6, 0.1, 0.3, 0.6, 0.9, 0.98} {
		p := r * ncr
		got := SwayMoment(p, phi, l, ei)
		want := leaningCantileverMoment(p, phi, l, ei)
		if math.Abs(got-want) > 1e-7*want {
			t.Errorf("N/Ncr %g: SwayMoment %.10g, integrated %.10g", r, got, want)
		}
		if first := p * phi * l; got < first {
			t.Errorf("N/Ncr %g: second-order moment %g below the first-order %g", r, got, first)
		}
	}
	if m := SwayMoment(1.01*ncr, phi, l, ei); !math.IsInf(m, 1) {
		t.Errorf("past Ncr: got %g, want +Inf", m)
	}
	if m := SwayMoment(0.5*ncr, -phi, l, ei); m != SwayMoment(0.5*ncr, phi, l, ei) {
		t.Errorf("a sway acts by its magnitude: %g", m)
	}
}

// FirstYield of a fixed-free member with a sway imperfection is the load
// at which N/A + M/W = fy with M the base moment of the leaning
// cantilever, found here by the independent integration.
func TestFirstYieldSwayCantilever(t *testing.T) {
	for _, l := range []float64{1500, 3000, 6000, 10000} {
		for _, phi := range []float64{1.0 / 400, 1.0 / 200, 1.0 / 50} {
			m := bcTestMember(l, 0, 0)
			m.K = [2]float64{2, 2}
			m.Sway = phi
			res, err := FirstYield(m, Minor)
			if err != nil {
				t.Fatal(err)
			}
			ei := m.E * m.Props.I[Minor]
			stress := res.N/m.Props.A + leaningCantileverMoment(res.N, phi, l, ei)/m.Props.W[Minor]
			if math.Abs(stress-m.Fy) > 1e-6*m.Fy {
				t.Errorf("L %g, phi %g: N = %g gives a peak stress %.9g, want fy %g", l, phi, res.N, stress, m.Fy)
			}
			m.Sway = 0
			straight, _ := FirstYield(m, Minor)
			if !(res.N < straight.N) {
				t.Errorf("L %g, phi %g: the sway does not reduce the capacity (%g, straight %g)", l, phi, res.N, straight.N)
			}
		}
	}
}

// In the beam-column the sway is the half-sine bow SwayBow: exact at first
// order, conservative by at most pi^2/8 on the second-order moment, so its
// capacity lies between the exact first yield and a little below it.
func TestBeamColumnSwayConservative(t *testing.T) {
	for _, l := range []float64{2000, 4000, 8000} {
		m := bcTestMember(l, 0, 0)
		m.K = [2]float64{2, 2}
		m.Sway = 1.0 / 200
		exact, err := FirstYield(m, Minor)
		if err != nil {
			t.Fatal(err)
		}
		bc, err := BeamColumn(m, Section{}, Minor, nil)
		if err != nil {
			t.Fatal(err)
		}
		if !(bc.N <= exact.N*(1+1e-4) && bc.N >= 0.9*exact.N) {
			t.Errorf("L %g: beam-column %g, exact first yield %g", l, bc.N, exact.N)
		}
		// The same half-sine written as a bow gives the same capacity.
		m2 := bcTestMember(l, SwayBow(m, Minor), 0)
		m2.K = m.K
		bow, _ := BeamColumn(m2, Section{}, Minor, nil)
		if math.Abs(bow.N-bc.N) > 1e-9*bc.N {
			t.Errorf("L %g: sway %g, bow %g", l, bc.N, bow.N)
		}
	}
	m := bcTestMember(3000, 0, 0)
	m.Sway = 0.005
	opt := BeamOptions{Springs: [2][2]float64{{1e12, 0}, {1e12, 0}}}
	if _, err := BeamColumn(m, Section{}, Minor, &opt); err == nil {
		t.Error("a sway on a braced member with end springs was accepted")
	}
}
