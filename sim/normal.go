package sim

import "gonum.org/v1/gonum/stat/distuv"

// PfFromBeta returns Phi(-beta), accurate far into the tail.
func PfFromBeta(beta float64) float64 { return distuv.UnitNormal.CDF(-beta) }

// BetaFromPf returns the reliability index -Phi^-1(pf): +Inf for pf = 0 and
// -Inf for pf = 1.
func BetaFromPf(pf float64) float64 { return -distuv.UnitNormal.Quantile(pf) }
