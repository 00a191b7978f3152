package report

import (
	"math"
	"testing"
)

func TestFormat(t *testing.T) {
	t.Parallel()
	for _, c := range []struct{ got, want string }{
		{sig(1234.567, 4), "1235"},
		{sig(0.0123456, 3), "0.0123"},
		{sig(160000, 4), "160000"},
		{sig(160, 4), "160"},
		{sig(0.9, 4), "0.9"},
		{sig(-2.5, 2), "-2.5"},
		{sig(123456, 2), "120000"},
		{sig(math.NaN(), 3), notAvailable},
		{sig(math.Inf(1), 3), notAvailable},
		{sci(0.00277, 3), "2.77e-3"},
		{sci(0.001, 3), "1e-3"},
		{sci(12345, 3), "1.23e4"},
		{prob(0.00184), "1.84e-3"},
		{prob(0.25), "0.25"},
		{prob(0), "0"},
		// The Clopper-Pearson lower bound of pf when all of 10000
		// samples fail, 0.025^(1/10000) = 0.999631 (Clopper and Pearson
		// 1934, closed form for k = n), printed "1" with 3 digits.
		{prob(math.Pow(0.025, 1.0/10000)), "0.999631"},
		{prob(1), "1"},
		{prob(0.9985), "0.999"},
		{percent(0.0233), "2.3%"},
		{fixed(math.Inf(-1), 2), notAvailable},
		{thousands(1000000), "1 000 000"},
		{thousands(-12345), "-12 345"},
		{thousands(999), "999"},
		{withUnit(160e3, "N"), "160 kN"},
		{withUnit(205000, "MPa"), "205 GPa"},
		{withUnit(282, "MPa"), "282 MPa"},
		{withUnit(0.9, ""), "0.9"},
		{withUnit(3e9, "N*mm"), "3000 kN·m"},
	} {
		if c.got != c.want {
			t.Errorf("got %q, want %q", c.got, c.want)
		}
	}
}
