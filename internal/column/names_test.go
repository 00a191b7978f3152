package column

import "testing"

// The names of the study-file contract (section shapes and axes) round-trip.
func TestNames(t *testing.T) {
	for _, name := range []string{"I", "RHS", "CHS", "rect", "round", "custom"} {
		s, err := ParseShape(name)
		if err != nil || s.String() != name {
			t.Errorf("ParseShape(%q) = %v, %v", name, s, err)
		}
	}
	for _, name := range []string{"major", "minor", "both"} {
		a, err := ParseAxis(name)
		if err != nil || a.String() != name {
			t.Errorf("ParseAxis(%q) = %v, %v", name, a, err)
		}
	}
	for _, bad := range []string{"", "i", "W", "Rect"} {
		if _, err := ParseShape(bad); err == nil {
			t.Errorf("ParseShape(%q): no error", bad)
		}
	}
	if _, err := ParseAxis("Major"); err == nil {
		t.Errorf("ParseAxis(\"Major\"): no error")
	}
	if Shape(9).String() != "Shape(9)" || Axis(7).String() != "Axis(7)" {
		t.Errorf("out-of-range names: %v, %v", Shape(9), Axis(7))
	}
}

// TestNameLists checks that the name lists the key table reads parse back
// to their constants, in order.
func TestNameLists(t *testing.T) {
	for i, n := range FabricationNames() {
		if f, err := ParseFabrication(n); err != nil || f != HotRolled+Fabrication(i) {
			t.Errorf("fabrication %q parses to %v, %v", n, f, err)
		}
	}
	for i, n := range BeamLimitNames() {
		if l, err := ParseBeamLimit(n); err != nil || l != BeamLimit(i) {
			t.Errorf("limit %q parses to %v, %v", n, l, err)
		}
	}
	for i, n := range ResidualNames() {
		if r, err := ParseResidual(n); err != nil || r != Residual(i) {
			t.Errorf("residual stress %q parses to %v, %v", n, r, err)
		}
	}
}
