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
