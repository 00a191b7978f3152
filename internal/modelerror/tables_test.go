package modelerror

import (
	"math"
	"testing"
)

// The tables of EN 1990:2002 Annex D (Tables D.1 and D.2, values from
// memory, rows as printed in the standard) are prediction fractiles of a
// normal population: the formulas of FractileFactor must give them to the
// two decimals the standard prints. Table D.1 is the 5 % fractile
// (u = 1.645). The finite-n columns of Table D.2 match the 0.1 % fractile
// u = 3.09 (the column for infinity prints alpha_R beta = 3.04): checked
// here as the standard's numbers stand.
func TestTablesAgainstPredictionFractiles(t *testing.T) {
	for _, tc := range []struct {
		name  string
		row   []float64
		u     float64
		known bool
	}{
		{"D.1 Vx known", tableD1Known[:], 1.645, true},
		{"D.1 Vx unknown", tableD1Unknown[:], 1.645, false},
		{"D.2 Vx known", tableD2Known[:], 3.09, true},
		{"D.2 Vx unknown", tableD2Unknown[:], 3.09, false},
	} {
		for i, n := range tableN[:len(tableN)-1] {
			want := tc.row[i]
			if math.IsNaN(want) {
				continue
			}
			got := FractileFactor(n, tc.u, tc.known)
			if math.Abs(got-want) > 0.015*want {
				t.Errorf("%s, n = %d: formula %.3f, table %.2f", tc.name, n, got, want)
			}
		}
	}
}

func TestKnLookup(t *testing.T) {
	for _, tc := range []struct {
		n     int
		known bool
		d1    float64
		d2    float64
	}{
		{3, false, 3.37, nan},    // D.2 has no value for 3 tests, V_X unknown
		{4, false, 2.63, 11.40},  // tabulated
		{7, false, 2.18, 6.36},   // between 6 and 8: the 6 column, the safe side
		{25, false, 1.76, 3.64},  // between 20 and 30
		{500, false, 1.73, 3.44}, // beyond 30: the 30 column, not infinity
		{1, true, 2.31, 4.36},
		{0, true, nan, nan},
	} {
		if got := Kn(tc.n, tc.known); !same(got, tc.d1) {
			t.Errorf("Kn(%d, %v) = %v, want %v", tc.n, tc.known, got, tc.d1)
		}
		if got := Kdn(tc.n, tc.known); !same(got, tc.d2) {
			t.Errorf("Kdn(%d, %v) = %v, want %v", tc.n, tc.known, got, tc.d2)
		}
	}
}

func same(a, b float64) bool { return a == b || math.IsNaN(a) && math.IsNaN(b) }
