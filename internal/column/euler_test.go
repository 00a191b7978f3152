package column

import (
	"math"
	"testing"
)

// Beer & Johnston, Mechanics of Materials, Sample Problem 10.2: a
// fixed-free member, Le = 2 L = 192 in, I = 8.00 in^4, E = 29e6 psi;
// published Pcr = 62.1 kips.
func TestEulerLoadBeerJohnston(t *testing.T) {
	pcr := EulerLoad(29000*ksi, 8*inch*inch*inch*inch, 192*inch)
	if got := pcr / kip; math.Abs(got-62.1) > 0.05 {
		t.Errorf("Pcr = %.3f kips, want 62.1 (Beer & Johnston, Sample Problem 10.2)", got)
	}
}

// EN 1993-1-1:2005 6.3.1.3: lambda1 = pi sqrt(E/fy) = 93.9 eps,
// eps = sqrt(235/fy), E = 210000: the Euler stress at lambda1 is fy.
func TestEulerStressLambda1(t *testing.T) {
	for _, fy := range []float64{235, 275, 355, 460} {
		eps := math.Sqrt(235 / fy)
		if got := EulerStress(210000, 93.9*eps); math.Abs(got-fy) > 1e-3*fy {
			t.Errorf("fy %g: Euler stress at 93.9 eps = %g, want %g", fy, got, fy)
		}
		m := strut(1000, 20, 30, 210000, fy, 93.9*eps*20)
		if got := RelativeSlenderness(&m, Both); math.Abs(got-1) > 1e-3 {
			t.Errorf("fy %g: relative slenderness at L/i = 93.9 eps = %g, want 1", fy, got)
		}
	}
}

func TestMemberHelpers(t *testing.T) {
	m := Member{
		Props: Props{A: 5000, R: [2]float64{100, 40}, C: [2]float64{150, 75}},
		E:     200000, Fy: 300, Length: 4000, K: [2]float64{1, 0.7},
	}
	if got, want := Slenderness(&m, Major), 40.0; got != want {
		t.Errorf("Slenderness major = %g, want %g", got, want)
	}
	if got, want := Slenderness(&m, Minor), 70.0; math.Abs(got-want) > 1e-12 {
		t.Errorf("Slenderness minor = %g, want %g", got, want)
	}
	if Slenderness(&m, Both) != Slenderness(&m, Minor) {
		t.Errorf("Slenderness both should be the larger (minor)")
	}
	// Euler about the minor axis: pi^2 E I / (K L)^2 with I = A r^2.
	want := math.Pi * math.Pi * 200000 * 5000 * 40 * 40 / (0.7 * 4000 * 0.7 * 4000)
	if got := Euler(&m, Minor); math.Abs(got-want) > 1e-12*want || Euler(&m, Both) != got {
		t.Errorf("Euler minor = %g, both = %g; want %g", got, Euler(&m, Both), want)
	}
	// lam = sqrt(A fy / Ncr) (EN 1993-1-1:2005 eq. 6.50).
	if got, want := RelativeSlenderness(&m, Minor), math.Sqrt(5000*300/Euler(&m, Minor)); math.Abs(got-want) > 1e-12 {
		t.Errorf("RelativeSlenderness = %g, want %g", got, want)
	}
	if Axis(0).String() != "major" || Minor.String() != "minor" || Both.String() != "both" {
		t.Errorf("Axis.String")
	}
}
