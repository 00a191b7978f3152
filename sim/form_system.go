package sim

import (
	"math"
	"math/rand/v2"

	"gonum.org/v1/gonum/stat/distuv"
)

// formSeriesPf returns the first-order probability of a series system of
// design points: P(Z_1 > beta_1 or ... or Z_m > beta_m) for standard
// normals Z with correlation R_ij = alpha_i·alpha_j, that is
// 1 - Phi_m(beta; R), computed as a union so that tiny probabilities keep
// their relative accuracy. One point is exact, two use a 1-D integral
// (formUnion2), three nested 1-D integrals (formUnion3), four one more
// level (formUnion4); more, and three or four of which two are (nearly)
// parallel or opposite, Genz's separation of variables (formUnionGenz).
func formSeriesPf(beta []float64, alpha [][]float64) float64 {
	switch len(beta) {
	case 0:
		return 0
	case 1:
		return formTail(beta[0])
	case 2:
		return formUnion2(beta[0], beta[1], formDot(alpha[0], alpha[1]))
	}
	m := len(beta)
	r := make([][]float64, m)
	for i := range r {
		r[i] = make([]float64, m)
		for j := range r[i] {
			r[i][j] = formDot(alpha[i], alpha[j])
		}
		r[i][i] = 1
	}
	switch m {
	case 3:
		if pf, ok := formUnion3(beta, r); ok {
			return pf
		}
	case 4:
		if pf, ok := formUnion4(beta, r); ok {
			return pf
		}
	}
	return formUnionGenz(beta, r)
}

// formTail is Phi(-b) = P(Z > b), accurate far into the upper tail.
func formTail(b float64) float64 { return distuv.UnitNormal.CDF(-b) }

// formUnion2 returns P(Z1 > b1 or Z2 > b2) for standard normals with
// correlation rho: Phi(-b1) + Phi(-b2) - P(Z1 > b1, Z2 > b2), the joint
// tail from the exact 1-D integral
//
//	P(Z1 > b1, Z2 > b2) = ∫_b1^∞ phi(z) Phi((rho z - b2)/sqrt(1 - rho^2)) dz
//
// (conditioning on Z1, Z2|Z1 = z ~ N(rho z, 1 - rho^2); e.g. Genz,
// "Numerical computation of rectangular bivariate and trivariate normal
// and t probabilities", Statistics and Computing 14, 2004, from memory).
func formUnion2(b1, b2, rho float64) float64 {
	p1, p2 := formTail(b1), formTail(b2)
	switch {
	case rho >= 1-1e-12:
		return math.Max(p1, p2)
	case rho <= -1+1e-12:
		// Z2 = -Z1: the two half-lines overlap only when b1 < -b2.
		both := 0.0
		if b1+b2 < 0 {
			both = formTail(b1) - formTail(-b2)
		}
		return p1 + p2 - both
	}
	return p1 + p2 - formJoint2(b1, b2, rho)
}

// formJoint2 is P(Z1 > b1, Z2 > b2) for correlation |rho| < 1 by adaptive
// Simpson quadrature of the conditional integral, split where the inner
// Phi steps (z = b2/rho), to 1e-12 of P(Z1 > b1).
func formJoint2(b1, b2, rho float64) float64 { return formJoint2Tol(b1, b2, rho, 1e-12) }

// formJoint2Tol is formJoint2 to the tolerance rel P(Z1 > b1).
func formJoint2Tol(b1, b2, rho, rel float64) float64 {
	s := math.Sqrt(1 - rho*rho)
	f := func(z float64) float64 {
		return distuv.UnitNormal.Prob(z) * distuv.UnitNormal.CDF((rho*z-b2)/s)
	}
	lo := b1
	hi := math.Max(b1, 0) + 12 // the rest of the tail is below e^-72 of it
	cuts := []float64{lo}
	if rho != 0 {
		if z0 := b2 / rho; z0 > lo && z0 < hi {
			cuts = append(cuts, z0)
		}
	}
	cuts = append(cuts, hi)
	tol := rel * formTail(b1)
	var sum float64
	for i := 0; i+1 < len(cuts); i++ {
		sum += formSimpson(f, cuts[i], cuts[i+1], tol)
	}
	return sum
}

// formSimpson integrates f over [a, b] by adaptive Simpson quadrature with
// Richardson correction to absolute tolerance tol.
func formSimpson(f func(float64) float64, a, b, tol float64) float64 {
	fa, fm, fb := f(a), f((a+b)/2), f(b)
	whole := (b - a) / 6 * (fa + 4*fm + fb)
	return formSimpsonRec(f, a, b, fa, fm, fb, whole, tol, 50)
}

func formSimpsonRec(f func(float64) float64, a, b, fa, fm, fb, whole, tol float64, depth int) float64 {
	m := (a + b) / 2
	lm, rm := (a+m)/2, (m+b)/2
	flm, frm := f(lm), f(rm)
	left := (m - a) / 6 * (fa + 4*flm + fm)
	right := (b - m) / 6 * (fm + 4*frm + fb)
	delta := left + right - whole
	if depth <= 0 || math.Abs(delta) <= 15*tol {
		return left + right + delta/15
	}
	return formSimpsonRec(f, a, m, fa, flm, fm, left, tol/2, depth-1) +
		formSimpsonRec(f, m, b, fm, frm, fb, right, tol/2, depth-1)
}

// formUnionGenz returns P(Z_i > b_i for some i) for standard normals with
// correlation matrix r by Genz's separation of variables (A. Genz,
// "Numerical computation of multivariate normal probabilities", Journal of
// Computational and Graphical Statistics 1, 1992, 141-149): with r = L L^T
// and Z = L w, the event Z_i <= b_i is w_i <= c_i(w_1..w_{i-1}), so
//
//	1 - Phi_m = E[ sum_k (prod_{i<k} e_i) (1 - e_k) ],  e_i = Phi(c_i),
//
// where w_i is drawn from the normal truncated to w_i <= c_i. The
// expectation is taken with a randomly shifted Richtmyer lattice (fixed
// seed, so the value is reproducible). A singular r (e.g. two opposite
// design points) is regularised by 1e-10 on the diagonal: a constraint
// fixed by the others then acts as an indicator.
func formUnionGenz(b []float64, r [][]float64) float64 {
	m := len(b)
	// Cholesky of (1 - eps) r + eps I.
	const eps = 1e-10
	l := make([][]float64, m)
	for i := range l {
		l[i] = make([]float64, m)
	}
	for i := 0; i < m; i++ {
		for j := 0; j <= i; j++ {
			s := (1 - eps) * r[i][j]
			if i == j {
				s += eps
			}
			for k := 0; k < j; k++ {
				s -= l[i][k] * l[j][k]
			}
			if i == j {
				l[i][i] = math.Sqrt(math.Max(s, eps*eps))
			} else {
				l[i][j] = s / l[j][j]
			}
		}
	}
	const (
		points = 8191 // prime lattice size
		shifts = 8
	)
	primes := []float64{2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37, 41, 43, 47, 53}
	gen := make([]float64, m)
	for i := range gen {
		gen[i] = math.Sqrt(primes[i%len(primes)]) * float64(1+i/len(primes))
	}
	rng := rand.New(rand.NewPCG(0x5eed, 0x6e7a))
	shift := make([]float64, m)
	w := make([]float64, m)
	// The first limit c_1 = b_1 / l_11 is the same at every point.
	first := b[0] / l[0][0]
	e1, ec1 := normalPair(first)
	var total float64
	for sh := 0; sh < shifts; sh++ {
		for i := range shift {
			shift[i] = rng.Float64()
		}
		var sum float64
		for p := 1; p <= points; p++ {
			prod := 1.0
			var union float64
			for i := 0; i < m; i++ {
				c, e, ec := first, e1, ec1
				if i > 0 {
					s := b[i]
					for k := 0; k < i; k++ {
						s -= l[i][k] * w[k]
					}
					c = s / l[i][i]
					e, ec = normalPair(c)
				}
				union += prod * ec
				prod *= e
				if i == m-1 || prod == 0 {
					break
				}
				// Baker's tent transform of the shifted lattice point;
				// x - floor(x) is math.Mod(x, 1) for x >= 0, exactly.
				q := float64(p)*gen[i] + shift[i]
				q -= math.Floor(q)
				q = 1 - math.Abs(2*q-1)
				q = math.Min(math.Max(q, 1e-16), 1-1e-16)
				// w = Phi^-1(q e), through the upper tail when e is near 1.
				if c > 0 {
					w[i] = -distuv.UnitNormal.Quantile((1 - q) + q*ec)
				} else {
					w[i] = distuv.UnitNormal.Quantile(q * e)
				}
			}
			sum += union
		}
		total += sum / points
	}
	return total / shifts
}
