package sim

import (
	"math"

	"gonum.org/v1/gonum/mathext"
)

// tConsts are the constants of the standard Student-t with nu degrees of
// freedom that its quantile uses.
type tConsts struct {
	// lnC is the log of the density's constant,
	// Gamma((nu+1)/2) / (Gamma(nu/2) sqrt(nu pi)).
	lnC float64
	// lnB is ln B(nu/2, 1/2).
	lnB float64
}

func newTConsts(nu float64) tConsts {
	a, _ := math.Lgamma((nu + 1) / 2)
	b, _ := math.Lgamma(nu / 2)
	h, _ := math.Lgamma(0.5)
	return tConsts{lnC: a - b - 0.5*math.Log(nu*math.Pi), lnB: b + h - a}
}

// tMaxNu is the largest nu for which tLowerQuantile iterates on the CDF.
// Above it the tail CDF, I_x(nu/2, 1/2) with x near 1, is computed by the
// incomplete beta function as a difference from 1 and loses its relative
// accuracy below about 1e-12 (seen from nu = 50 on).
const tMaxNu = 40

// tLowerCDF returns F(t) of the standard Student-t for t <= 0 and its
// density there: F(t) = I_x(nu/2, 1/2)/2 with x = nu/(nu + t^2), or
// 1/2 - I_y(1/2, nu/2)/2 with y = t^2/(nu + t^2) = 1 - x when x is near 1
// (the Student-t distribution function in terms of the regularised
// incomplete beta function; Abramowitz and Stegun, Handbook of
// Mathematical Functions, 26.7.1 and 26.5.2; from memory).
func tLowerCDF(t, nu float64, c tConsts) (cdf, pdf float64) {
	t2 := t * t
	x := nu / (nu + t2)
	if x < 0.5 {
		cdf = 0.5 * mathext.RegIncBeta(nu/2, 0.5, x)
	} else {
		cdf = 0.5 - 0.5*mathext.RegIncBeta(0.5, nu/2, t2/(nu+t2))
	}
	pdf = math.Exp(c.lnC - (nu+1)/2*math.Log1p(t2/nu))
	return cdf, pdf
}

// tLowerQuantile returns the p-quantile t <= 0 of the standard Student-t
// with nu degrees of freedom, for 0 < p < 1/2, given z = Phi^-1(p).
//
// The first guess is the Cornish-Fisher expansion of t in powers of 1/nu
// about z (Abramowitz and Stegun 26.7.5; G. W. Hill, "Algorithm 396:
// Student's t-quantiles", Comm. ACM 13 (1970) 617-619; from memory) or, in
// the far tail, the leading term of the incomplete beta there,
// I_x(a, 1/2) ~ x^a / (a B(a, 1/2)) for small x, solved for x. Halley's
// method on F(t) = p then converges cubically; it stops when the step falls
// below 1e-6 |t|, after which the error is of order 1e-18 |t|. Should it
// fail to settle, or for nu above tMaxNu, the inverse incomplete beta
// function is used.
func tLowerQuantile(p, z, nu float64, c tConsts) float64 {
	a := nu / 2
	if nu > tMaxNu {
		x := mathext.InvRegIncBeta(a, 0.5, 2*p)
		return -math.Sqrt(nu * (1 - x) / x)
	}
	var t float64
	if x0 := math.Exp((math.Log(2*p*a) + c.lnB) / a); x0 < 0.1 {
		t = -math.Sqrt(nu * (1 - x0) / x0)
	} else {
		z2 := z * z
		g1 := (z2 + 1) * z / 4
		g2 := ((5*z2+16)*z2 + 3) * z / 96
		g3 := (((3*z2+19)*z2+17)*z2 - 15) * z / 384
		g4 := ((((79*z2+776)*z2+1482)*z2-1920)*z2 - 945) * z / 92160
		t = z + (g1+(g2+(g3+g4/nu)/nu)/nu)/nu
		if !(t < 0) {
			t = z
		}
	}
	for range 12 {
		cdf, pdf := tLowerCDF(t, nu, c)
		if pdf == 0 {
			break
		}
		r := (cdf - p) / pdf
		// f'/f = -(nu+1) t / (nu + t^2) for the Student-t density.
		step := r / (1 + 0.5*r*(nu+1)*t/(nu+t*t))
		next := t - step
		if !(next < 0) {
			next = t / 2 // stay in the lower half
		}
		if math.Abs(step) <= 1e-6*math.Abs(t) {
			return next
		}
		t = next
	}
	x := mathext.InvRegIncBeta(a, 0.5, 2*p)
	return -math.Sqrt(nu * (1 - x) / x)
}
