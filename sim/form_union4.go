package sim

import (
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// formUnion4 returns P(Z_i > b_i for some i of 4) for standard normals
// with correlation matrix r, conditioning on the variable k least
// correlated with the others:
//
//	P = P(Z_k > b_k) + ∫_{-∞}^{b_k} phi(z) P(Z_i > b_i for some i != k | Z_k = z) dz,
//
// the conditional union of the other three (normal with means r_ik z,
// variances 1 - r_ik^2 and the partial correlations given Z_k, as in
// formUnion3) by formUnion3, the integral by Gauss-Kronrod quadrature
// from where the normal tail below it is a thousandth of the tolerance.
// Both terms are positive: the union keeps its relative accuracy (about
// union3Rel). ok is false where formUnion3 refuses, for the three given
// Z_k or for a pair with Z_k: (nearly) parallel or opposite points.
func formUnion4(b []float64, r [][]float64) (pf float64, ok bool) {
	const m = 4
	for _, x := range b {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return 0, false
		}
	}
	k, worst := 0, math.Inf(1)
	for c := range m {
		var w float64
		for j := range m {
			if j != c {
				w = math.Max(w, math.Abs(r[c][j]))
			}
		}
		if w < worst {
			k, worst = c, w
		}
	}
	if worst > union3Near {
		return 0, false
	}
	var top float64
	for _, x := range b {
		top = math.Max(top, formTail(x))
	}
	if top == 0 {
		return 0, true
	}
	var idx [3]int
	n := 0
	for j := range m {
		if j != k {
			idx[n] = j
			n++
		}
	}
	var s [3]float64
	for a, j := range idx {
		s[a] = math.Sqrt(1 - r[j][k]*r[j][k])
	}
	pr := [][]float64{make([]float64, 3), make([]float64, 3), make([]float64, 3)}
	for a, i := range idx {
		for c, j := range idx {
			pr[a][c] = (r[i][j] - r[i][k]*r[j][k]) / (s[a] * s[c])
		}
		pr[a][a] = 1
	}
	refused := false
	x := make([]float64, 3)
	f := func(z float64) float64 {
		for a, j := range idx {
			x[a] = (b[j] - r[j][k]*z) / s[a]
		}
		u, ok := formUnion3(x, pr)
		refused = refused || !ok
		return distuv.UnitNormal.Prob(z) * u
	}
	tol := union3Rel * top
	lo := math.Min(b[k]-1, distuv.UnitNormal.Quantile(1e-3*tol))
	rest := kronrodAdaptive(f, lo, b[k], tol/2)
	if refused {
		return 0, false
	}
	return formTail(b[k]) + rest, true
}
