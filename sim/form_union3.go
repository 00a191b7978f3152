package sim

import (
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// union3Near is how close to ±1 a correlation between two of three
// design points may come before formUnion3 leaves the union to Genz's
// integration (the conditional integral degenerates there).
const union3Near = 1 - 1e-9

// union3Rel is the tolerance of formUnion3 relative to the union: far
// below the first-order approximation's own error, and below what any
// reserve search (1e-4 on the index) can see. The Gauss-Kronrod error
// estimates are pessimistic: the error measured against the closed forms
// of the tests is below 1e-12.
const union3Rel = 1e-8

// formUnion3 returns P(Z_1 > b_1 or Z_2 > b_2 or Z_3 > b_3) for standard
// normals with correlation matrix r, by inclusion and exclusion,
//
//	sum_i p_i - sum_{i<j} p_ij + p_123,
//
// each pair's joint tail p_ij from the exact one-dimensional integral of
// formJoint2 (by formJointTail), and the triple's from one more level of
// conditioning on the variable k least correlated with the other two,
//
//	p_123 = ∫_{b_k}^∞ phi(z) P(Z_i > b_i, Z_j > b_j | Z_k = z) dz,
//
// where, given Z_k = z, Z_i and Z_j are normal with means r_ik z and r_jk
// z, variances 1 - r_ik^2 and 1 - r_jk^2 and the partial correlation
// (r_ij - r_ik r_jk) / sqrt((1 - r_ik^2)(1 - r_jk^2)) (e.g. Genz,
// "Numerical computation of rectangular bivariate and trivariate normal
// and t probabilities", Statistics and Computing 14, 2004, from memory).
// Every term keeps its relative accuracy far into the tail. ok is false
// when two of the points are (nearly) parallel or opposite (a correlation
// beyond union3Near), where the conditional densities degenerate, or an
// index is not finite.
func formUnion3(b []float64, r [][]float64) (pf float64, ok bool) {
	for _, x := range b {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return 0, false
		}
	}
	for i := range 3 {
		for j := i + 1; j < 3; j++ {
			if math.Abs(r[i][j]) > union3Near {
				return 0, false
			}
		}
	}
	k := 0 // the conditioning variable: least correlated with the others
	worst := math.Inf(1)
	for c := range 3 {
		i, j := (c+1)%3, (c+2)%3
		if w := math.Max(math.Abs(r[c][i]), math.Abs(r[c][j])); w < worst {
			k, worst = c, w
		}
	}
	i, j := (k+1)%3, (k+2)%3
	p := [3]float64{formTail(b[0]), formTail(b[1]), formTail(b[2])}
	top := math.Max(p[0], math.Max(p[1], p[2])) // the union is at least this
	if top == 0 {
		return 0, true // every index beyond 38
	}
	tol := union3Rel * top
	// A quarter of tol to each pair and to the triple.
	pairs := formJointTail(b[0], b[1], r[0][1], tol/4) +
		formJointTail(b[0], b[2], r[0][2], tol/4) +
		formJointTail(b[1], b[2], r[1][2], tol/4)
	si, sj := math.Sqrt(1-r[i][k]*r[i][k]), math.Sqrt(1-r[j][k]*r[j][k])
	rho := (r[i][j] - r[i][k]*r[j][k]) / (si * sj)
	// An error d in the inner probability moves the triple by at most d
	// P(Z_k > b_k), so the inner probability needs d <= tol / (8 P(Z_k >
	// b_k)), at least union3Rel/8 as P(Z_k > b_k) <= top: bvnUpper's
	// absolute error (about 1e-15; checked to 1e-11) is far below.
	f := func(z float64) float64 {
		x, y := (b[i]-r[i][k]*z)/si, (b[j]-r[j][k]*z)/sj
		return distuv.UnitNormal.Prob(z) * math.Max(0, bvnUpper(x, y, rho))
	}
	triple := kronrodAdaptive(f, b[k], math.Max(b[k], 0)+9, tol/8)
	return p[0] + p[1] + p[2] - pairs + triple, true
}

// formJointTail is P(Z1 > b1, Z2 > b2) for standard normals with
// correlation rho, to the absolute tolerance tol, by Gauss-Kronrod
// quadrature of the conditional integral of formJoint2, split where its
// inner Phi steps; including the limits rho = ±1 (within 1e-12).
func formJointTail(b1, b2, rho, tol float64) float64 {
	switch {
	case rho >= 1-1e-12:
		return formTail(math.Max(b1, b2))
	case rho <= -1+1e-12:
		// Z2 = -Z1: b1 < Z1 < -b2.
		if b1+b2 < 0 {
			return formTail(b1) - formTail(-b2)
		}
		return 0
	}
	s := math.Sqrt(1 - rho*rho)
	f := func(z float64) float64 {
		return distuv.UnitNormal.Prob(z) * distuv.UnitNormal.CDF((rho*z-b2)/s)
	}
	lo, hi := b1, math.Max(b1, 0)+9 // the rest of the tail is below e^-40 of it
	if rho != 0 {
		if z0 := b2 / rho; z0 > lo && z0 < hi {
			return kronrodAdaptive(f, lo, z0, tol/2) + kronrodAdaptive(f, z0, hi, tol/2)
		}
	}
	return kronrodAdaptive(f, lo, hi, tol)
}
