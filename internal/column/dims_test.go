package column

import "testing"

// TestSectionField checks that every Dim names its own field of a Section
// and that a value outside the constants names none.
func TestSectionField(t *testing.T) {
	var s Section
	seen := map[*float64]Dim{}
	for d := DimDepth; d <= DimThicknessLoss; d++ {
		f := s.Field(d)
		if f == nil {
			t.Fatalf("Dim %d names no field", d)
		}
		if e, ok := seen[f]; ok {
			t.Errorf("Dims %d and %d name the same field", e, d)
		}
		seen[f] = d
		*f = float64(d) + 1
	}
	if s.Depth != 1 || s.Radius != float64(DimRadius)+1 || s.ShearCentre[Minor] != float64(DimShearMinor)+1 || s.ThicknessLoss != float64(DimThicknessLoss)+1 {
		t.Errorf("fields set by Dim: %+v", s)
	}
	if s.Field(DimThicknessLoss+1) != nil || s.Field(-1) != nil {
		t.Error("a Dim outside the constants names a field")
	}
}
