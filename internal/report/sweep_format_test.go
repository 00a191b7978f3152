package report

import "testing"

// TestSweepDecimals: swept values keep five significant digits and share
// one number of decimals, so the summary's column lines up.
func TestSweepDecimals(t *testing.T) {
	for _, c := range []struct {
		values []float64
		want   int
	}{
		{[]float64{1229.8, 6149, 12298}, 1},
		{[]float64{20000, 40000}, 0},
		{[]float64{0.25, 0.5, 1}, 5},
		{[]float64{0, 1e-9}, 6},
	} {
		if got := sweepDecimals(c.values); got != c.want {
			t.Errorf("sweepDecimals(%v) = %d, want %d", c.values, got, c.want)
		}
	}
}
