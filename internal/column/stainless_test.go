package column

import (
	"math"
	"testing"
)

// TestRambergOsgoodDefinition checks the compound law against its defining
// equations, EN 1993-1-4:2006+A1:2015 Annex C eqs. (C.1) to (C.3)
// (Rasmussen 2003), for an austenitic grade with E = 200000 MPa, fy = 280,
// fu = 580 and n = 7 (values worked by hand, shown).
func TestRambergOsgoodDefinition(t *testing.T) {
	r := RambergOsgood{E: 200000, Fy: 280, Fu: 580, N: 7}
	if err := r.Validate(); err != nil {
		t.Fatal(err)
	}
	ey := 200000 / (1 + 0.002*7*200000/280.0) // eq. (C.3): 200000/11 = 18181.8
	m := 1 + 3.5*280/580.0                    // 2.689655
	eu := 1 - 280/580.0                       // 0.517241
	cases := []struct {
		s, eps float64
	}{
		{140, 140/200000.0 + 0.002*math.Pow(0.5, 7)}, // 0.0007 + 0.000015625
		{280, 0.002 + 280/200000.0},                  // 0.0034: 0.2 % proof stress
		{-280, -(0.002 + 280/200000.0)},              // odd law
		{430, 0.0034 + 150/ey + eu*math.Pow(0.5, m)}, // half way to fu
		{580, 0.0034 + 300/ey + eu},                  // ultimate
	}
	for _, c := range cases {
		if got := r.Strain(c.s); math.Abs(got-c.eps) > 1e-12 {
			t.Errorf("Strain(%g) = %.10g, want %.10g", c.s, got, c.eps)
		}
		s, et := r.Stress(c.eps)
		if math.Abs(s-c.s) > 1e-7*math.Abs(c.s) {
			t.Errorf("Stress(%g) = %.10g, want %g", c.eps, s, c.s)
		}
		if math.Abs(c.s) < 580 && math.Abs(et*r.Compliance(c.s)-1) > 1e-6 {
			t.Errorf("tangent at %g: %g, want 1/compliance %g", c.s, et, 1/r.Compliance(c.s))
		}
	}
	// The two stages meet with the same slope at fy: 1/E + 0.002 n / fy =
	// 1/Ey (eq. C.3).
	below := 1/r.E + 0.002*r.N/r.Fy
	if math.Abs(below*ey-1) > 1e-12 || math.Abs(r.Compliance(280)*ey-1) > 1e-12 {
		t.Errorf("slope at fy: %g and %g, want 1/Ey = %g", below, r.Compliance(280), 1/ey)
	}
	if d := r.Compliance(math.Nextafter(280, 1000)); math.Abs(d*ey-1) > 1e-9 {
		t.Errorf("slope just above fy: %g, want 1/Ey = %g", d, 1/ey)
	}
	if s, et := r.Stress(0.6); s != 580 || et != 0 {
		t.Errorf("beyond the ultimate strain: %g, %g; want 580, 0", s, et)
	}
	for _, bad := range []RambergOsgood{{E: 200000, Fy: 300, Fu: 280, N: 7}, {E: 0, Fy: 280, Fu: 580, N: 7}, {E: 200000, Fy: 280, Fu: 580, N: 0.5}} {
		if bad.Validate() == nil {
			t.Errorf("%+v accepted", bad)
		}
	}
}

// TestRambergOsgoodRoundTrip checks that Stress inverts Strain over the
// whole curve, in tension and compression.
func TestRambergOsgoodRoundTrip(t *testing.T) {
	r := RambergOsgood{E: 195000, Fy: 450, Fu: 650, N: 8}
	for i := -64; i <= 64; i++ {
		s := 649.9 * float64(i) / 64
		if got, _ := r.Stress(r.Strain(s)); math.Abs(got-s) > 1e-8*math.Max(1, math.Abs(s)) {
			t.Errorf("Stress(Strain(%g)) = %g", s, got)
		}
	}
	if n := testing.AllocsPerRun(100, func() { r.Stress(0.004) }); n != 0 {
		t.Errorf("Stress allocates %v times", n)
	}
}

// TestRambergOsgoodTable checks the tabulated law of the beam-column
// against the law itself: within Fu/roN in stress everywhere, exact at
// the nodes, and without allocation.
func TestRambergOsgoodTable(t *testing.T) {
	r := RambergOsgood{E: 200000, Fy: 280, Fu: 580, N: 7}
	var tab roTable
	tab.build(r)
	for i := -200; i <= 200; i++ {
		eps := 0.04 * float64(i) / 200 * math.Abs(float64(i)) / 200 // dense near zero
		want, _ := r.Stress(eps)
		got, et := tab.stress(eps)
		if math.Abs(got-want) > r.Fu/roN || !(et > 0) {
			t.Errorf("strain %g: table %g (tangent %g), law %g", eps, got, et, want)
		}
	}
	s := 100 * r.Fu / roN
	if got, _ := tab.stress(r.Strain(s)); math.Abs(got-s) > 1e-9 {
		t.Errorf("at a node: %g, want %g", got, s)
	}
	if n := testing.AllocsPerRun(100, func() { tab.stress(0.003) }); n != 0 {
		t.Errorf("stress allocates %v times", n)
	}
}
