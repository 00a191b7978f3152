package column

import (
	"math"
	"testing"
)

// TestWeldedKappa checks kappa of EN 1999-1-1:2007 Table 6.5 (from
// memory), eqs. (6.68) and (6.69), worked by hand at a few slendernesses.
func TestWeldedKappa(t *testing.T) {
	cases := []struct {
		lam, a1 float64
		classA  bool
		want    float64
	}{
		// class A, eq. (6.68): lam = 0 leaves A1/A.
		{0, 0.8, true, 0.8},
		// 1 - 0.2*10^-1 - (0.05 + 0.08)*1^0 = 1 - 0.02 - 0.13
		{1, 0.8, true, 0.85},
		// 1 - 0.2*10^-0.5 - 0.13*0.5^0.65
		{0.5, 0.8, true, 1 - 0.2*0.31622776601683794 - 0.13*0.6372803137},
		// class B, eq. (6.69): 1 at lam 0.2 and below
		{0.2, 1, false, 1},
		// 1 + 0.04*4^-0.5 - 0.22*1 = 1 + 0.02 - 0.22
		{1, 1, false, 0.8},
		// 1 + 0.04*8^-1.5 - 0.22*2^-1.4
		{2, 1, false, 1 + 0.04*0.04419417382 - 0.22*0.3789291416},
	}
	for _, c := range cases {
		if got := WeldedKappa(c.lam, c.a1, c.classA); math.Abs(got-c.want) > 1e-9 {
			t.Errorf("WeldedKappa(%g, %g, %v) = %.10g, want %.10g", c.lam, c.a1, c.classA, got, c.want)
		}
	}
	// eq. (6.69) joins kappa = 1 at lam = 0.2 (to 0.2 %).
	if k := WeldedKappa(0.2000001, 1, false); math.Abs(k-1) > 2e-3 {
		t.Errorf("class B kappa just past 0.2: %g, want about 1", k)
	}
}

// TestHAZArea checks the heat-affected area of a welded I (the zone of
// width b beside each web-to-flange weld, EN 1999-1-1 6.1.6.3) and of a
// welded box, worked by hand.
func TestHAZArea(t *testing.T) {
	i := Section{Shape: ShapeI, Depth: 300, Width: 200, Flange: 12, Web: 8}
	// flanges 2 * (8 + 2*30) * 12 = 1632; web 2*30*8 = 480
	if got, err := HAZArea(i, 30); err != nil || math.Abs(got-2112) > 1e-9 {
		t.Errorf("I: %g, %v; want 2112", got, err)
	}
	box := Section{Shape: ShapeRHS, Depth: 150, Width: 100, Thickness: 6}
	// 2*min(150, 40)*6 + 2*min(100, 40)*6 = 960
	if got, err := HAZArea(box, 20); err != nil || math.Abs(got-960) > 1e-9 {
		t.Errorf("box: %g, %v; want 960", got, err)
	}
	if _, err := HAZArea(Section{Shape: ShapeCHS, Diameter: 100, Thickness: 5}, 20); err == nil {
		t.Error("a CHS took a longitudinal HAZ")
	}
	// EN 1999-1-1 6.1.6.3 (from memory): MIG, 20 / 30 / 35 / 40 mm.
	for t0, want := range map[float64]float64{5: 20, 10: 30, 20: 35, 30: 40} {
		if got := HAZWidth(t0); got != want {
			t.Errorf("HAZWidth(%g) = %g, want %g", t0, got, want)
		}
	}
	if got := AluminiumWelded(900, 1000, 0, 0.8, true); got != 720 {
		t.Errorf("AluminiumWelded at lam 0 = %g, want the HAZ-reduced 0.8 * 900 = 720", got)
	}
}
