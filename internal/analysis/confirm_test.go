package analysis

import (
	"math"
	"testing"

	"strutrisk/sim"
)

// TestConfirmation: a sampling run confirms the reserve factor only when
// it is trusted, rests on enough failures, has a finite beta and its
// interval holds the target (3.8 here). The intervals are invented.
func TestConfirmation(t *testing.T) {
	inf := math.Inf(1)
	cases := []struct {
		name       string
		res        sim.Result
		ok, usable bool
	}{
		{"interval holds the target", sim.Result{Beta: 3.79, BetaCI: [2]float64{3.7, 3.9}, Failures: 200}, true, true},
		{"interval misses the target", sim.Result{Beta: 3.5, BetaCI: [2]float64{3.4, 3.6}, Failures: 200}, false, true},
		{"one failure", sim.Result{Beta: 3.4, BetaCI: [2]float64{2.9, 3.85}, Failures: 1, Status: sim.FewFailures}, false, false},
		{"every sample failed", sim.Result{Pf: 1, Beta: -inf, BetaCI: [2]float64{-inf, -inf}, Failures: 9000}, false, false},
		{"degenerate weights", sim.Result{Beta: 3.8, BetaCI: [2]float64{3.7, 3.9}, Status: sim.WeightsDegenerate, StatusReason: "weights degenerate"}, false, false},
	}
	for _, c := range cases {
		ok, usable, why := confirmation(&c.res, 3.8)
		if ok != c.ok || usable != c.usable || (!ok && why == "") {
			t.Errorf("%s: confirmed %v usable %v (%q), want %v %v", c.name, ok, usable, why, c.ok, c.usable)
		}
	}
}
