package study

import (
	"math"
	"testing"
)

// TestCharacteristicValues: the characteristic value of each kind of input
// (EN 1990 4.1.2 and 4.2, from memory), each against a closed form.
func TestCharacteristicValues(t *testing.T) {
	text := `[member]
length = 3000
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 168.3
thickness = { dist = "normal", mean = 8, sd = 0.2 }
[material]
modulus = { dist = "lognormal", mean = 205000, cov = 0.03 }
yield = { dist = "lognormal", mean = 380, cov = 0.07 }
[imperfection]
bow = { dist = "normal", mean = 0, sd = 3 }
[loads]
dead = { dist = "normal", mean = 300000, cov = 0.1 }
imposed = { dist = "gumbel", location = 100000, scale = 20000 }
[target]
beta = 3.8
reference_period = "50 years"
`
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	zeta := math.Sqrt(math.Log1p(0.07 * 0.07))
	want := map[string]struct {
		value float64
		basis string
	}{
		// 5 % fractile of a lognormal: exp(lambda - 1.6449 zeta).
		"material.yield": {math.Exp(math.Log(380) - zeta*zeta/2 - 1.6448536269514722*zeta), "5 % fractile"},
		// Stiffness and geometry: the mean.
		"material.modulus":         {205000, "mean"},
		"member.section.thickness": {8, "mean"},
		// E|X| of N(0, s) is s sqrt(2/pi) (the half-normal mean).
		"imperfection.bow": {3 * math.Sqrt(2/math.Pi), "mean of the magnitude"},
		"loads.dead":       {300000, "mean"},
		// Gumbel maxima over 50 years, location u and scale b: the annual
		// maxima are Gumbel with location u - b ln 50 (max-stability), and
		// their 98 % fractile is that location - b ln(-ln 0.98).
		"loads.imposed": {100000 - 20000*math.Log(50) - 20000*math.Log(-math.Log(0.98)), "98 % fractile of annual maxima (50 years maxima: fractile 0.98^50)"},
	}
	for i, v := range md.Sim.Vars {
		c := md.Characteristic(i)
		w, ok := want[v.Name]
		if !ok {
			t.Errorf("%s: no expectation", v.Name)
			continue
		}
		if math.Abs(c.Value-w.value) > 1e-6*math.Abs(w.value) || c.Basis != w.basis {
			t.Errorf("%s: %.9g (%s), want %.9g (%s)", v.Name, c.Value, c.Basis, w.value, w.basis)
		}
	}
}
