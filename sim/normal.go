package sim

import (
	"math"

	"gonum.org/v1/gonum/mathext"
	"gonum.org/v1/gonum/stat/distuv"
)

// PfFromBeta returns Phi(-beta), accurate far into the tail.
func PfFromBeta(beta float64) float64 { return distuv.UnitNormal.CDF(-beta) }

// BetaFromPf returns the reliability index -Phi^-1(pf): +Inf for pf = 0 and
// -Inf for pf = 1. An estimate outside [0, 1] (a weighted estimator can
// overshoot) is taken at the nearer end; NaN stays NaN.
func BetaFromPf(pf float64) float64 {
	switch {
	case math.IsNaN(pf):
		return math.NaN()
	case pf <= 0:
		return math.Inf(1)
	case pf >= 1:
		return math.Inf(-1)
	}
	return -distuv.UnitNormal.Quantile(pf)
}

// phi is the standard normal density.
func phi(u float64) float64 { return math.Exp(-0.5*u*u) / math.Sqrt(2*math.Pi) }

// stdCDF is the standard normal CDF Phi(u) computed through Erfc, which keeps
// full relative accuracy in the lower tail; use stdCDF(-u) for the upper tail.
func stdCDF(u float64) float64 { return 0.5 * math.Erfc(-u/math.Sqrt2) }

// stdQuantile is Phi^-1(p) (Wichura's AS 241 in gonum's mathext).
func stdQuantile(p float64) float64 { return mathext.NormalQuantile(p) }

// fromProbs returns Phi^-1 of a probability given both as p = F and as its
// complement q = 1 - F, choosing the smaller one so that tails keep their
// accuracy.
func fromProbs(p, q float64) float64 {
	if p <= q {
		return stdQuantile(p)
	}
	return -stdQuantile(q)
}
