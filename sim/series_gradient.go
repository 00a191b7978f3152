package sim

import (
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// SeriesPfGradient returns d pf / d beta_j of SeriesPf(beta, alpha) for
// each index j, exactly, for systems of up to three points: the density
// of Z_j at beta_j times the probability that no other point fails given
// Z_j = beta_j (the other Z_k are then normal with mean rho_kj beta_j and
// variance 1 - rho_kj^2; two of them have the partial correlation of the
// pair given Z_j; e.g. Ditlevsen and Madsen, Structural Reliability
// Methods, 1996, ch. 14, from memory), with the sign of a growing index.
// ok is false for more points, or two points (nearly) parallel, where
// the caller differentiates SeriesPf itself.
func SeriesPfGradient(beta []float64, alpha [][]float64) (grad []float64, ok bool) {
	m := len(beta)
	if m == 0 || m > 3 {
		return nil, false
	}
	const near = 1 - 1e-9
	rho := func(i, j int) float64 { return formDot(alpha[i], alpha[j]) }
	grad = make([]float64, m)
	for j := range m {
		var others []int
		for k := range m {
			if k != j {
				others = append(others, k)
			}
		}
		x := make([]float64, len(others))
		for n, k := range others {
			r := rho(k, j)
			if math.Abs(r) > near {
				return nil, false
			}
			x[n] = (beta[k] - r*beta[j]) / math.Sqrt(1-r*r)
		}
		var safe float64
		switch len(others) {
		case 0:
			safe = 1
		case 1:
			safe = distuv.UnitNormal.CDF(x[0])
		case 2:
			k, l := others[0], others[1]
			rkj, rlj := rho(k, j), rho(l, j)
			pr := (rho(k, l) - rkj*rlj) / math.Sqrt((1-rkj*rkj)*(1-rlj*rlj))
			if math.Abs(pr) > near {
				return nil, false
			}
			// P(Y_k <= x_k, Y_l <= x_l) = P(-Y_k > -x_k, -Y_l > -x_l).
			safe = formJoint2(-x[0], -x[1], pr)
		}
		grad[j] = -distuv.UnitNormal.Prob(beta[j]) * safe
	}
	return grad, true
}
