package analysis

import (
	"testing"

	"strutrisk/internal/study"
)

// TestCaseName: a case names the swept value with its unit.
func TestCaseName(t *testing.T) {
	text := stocky + "[sweep]\nparameter = \"member.length\"\nvalues = [\"11.07 m\", 300]\n[[variant]]\nname = \"b\"\nset = { \"capacity.curve\" = \"c\" }\n"
	st, err := study.Load(writeStudy(t, text))
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		v, i int
		want string
	}{
		{-1, 0, "member.length = 11.07 m"},
		{0, 1, `variant "b" at member.length = 300 mm`},
	} {
		if got := caseName(st, c.v, c.i); got != c.want {
			t.Errorf("caseName(%d, %d) = %q, want %q", c.v, c.i, got, c.want)
		}
	}
	if got, want := caseLabel(st, 0, 0), `member.length = 11.07 m, variant "b"`; got != want {
		t.Errorf("caseLabel = %q, want %q", got, want)
	}
	for _, c := range []struct {
		v    float64
		unit string
		want string
	}{
		{1.5e6, "N", "1500 kN"},
		{0.002, "fraction of L", "L/500"},
		{355, "MPa", "355 MPa"},
		{2.5e8, "N*mm/rad", "250 kN*m/rad"},
		{0.1, "", "0.1"},
	} {
		if got := valueText(c.v, c.unit); got != c.want {
			t.Errorf("valueText(%g, %q) = %q, want %q", c.v, c.unit, got, c.want)
		}
	}
}
