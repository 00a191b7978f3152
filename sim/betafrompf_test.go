package sim

import (
	"math"
	"testing"
)

// TestBetaFromPfEdges: an estimate at or beyond the ends of [0, 1] maps to
// an infinite index instead of failing, and the ordinary range keeps
// Phi(-3.8) = 7.2348e-5 (Abramowitz & Stegun, Handbook of Mathematical
// Functions, 1964, Table 26.1).
func TestBetaFromPfEdges(t *testing.T) {
	for _, c := range []struct{ pf, beta float64 }{
		{0, math.Inf(1)},
		{-1e-3, math.Inf(1)},
		{1, math.Inf(-1)},
		{1.2, math.Inf(-1)},
		{0.5, 0},
	} {
		if got := BetaFromPf(c.pf); got != c.beta {
			t.Errorf("BetaFromPf(%g) = %g, want %g", c.pf, got, c.beta)
		}
	}
	if got := BetaFromPf(math.NaN()); !math.IsNaN(got) {
		t.Errorf("BetaFromPf(NaN) = %g, want NaN", got)
	}
	if got := BetaFromPf(7.2348e-5); math.Abs(got-3.8) > 1e-4 {
		t.Errorf("BetaFromPf(7.2348e-5) = %.6f, want 3.8", got)
	}
}
