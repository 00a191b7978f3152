package sim

import (
	"fmt"
	"math"
	"strconv"
)

// BetaStatement says in words what an infinite reliability index means,
// and returns "" for a finite one. Beta is -Inf when every evaluation
// failed and +Inf when none did: either way the estimate only bounds pf
// (by PfCI) and beta (by BetaCI), and a printed "-inf" or "inf" without
// this statement reads as a result. It returns "" too when a warning of
// the method already says so, so that a caller can add it to the warnings
// as it stands.
func (r *Result) BetaStatement() string {
	switch {
	case r.boundStated:
		return ""
	case math.IsInf(r.Beta, -1):
		return fmt.Sprintf("beta is -inf: every one of the %d evaluations failed, so pf is only known to be above %s (beta below %.3g); a member that fails at practically any values of its inputs is far more often a mistake in the inputs (a unit, a load) than a real case: check them before reading anything else",
			r.Evaluations, pfNearOne(r.PfCI[0]), r.BetaCI[1])
	case math.IsInf(r.Beta, 1):
		return fmt.Sprintf("beta is +inf: none of the %d evaluations failed, so pf is only known to be below %.3g (beta above %.3g); beta itself is unbounded: give more samples, or use importance or subset simulation",
			r.Evaluations, r.PfCI[1], r.BetaCI[0])
	}
	return ""
}

// pfNearOne formats a probability close to 1 with enough digits to tell
// it from 1 (0.99955, not the "1" of %.3g that reads as certainty).
func pfNearOne(p float64) string {
	d := 3
	if q := 1 - p; q > 0 && q < 1e-3 {
		d = int(math.Ceil(-math.Log10(q))) + 2
	}
	return strconv.FormatFloat(p, 'g', d, 64)
}
