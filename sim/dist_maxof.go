package sim

import (
	"fmt"
	"math"
)

// MaxOf is the distribution of the largest of n independent values of a
// base distribution F: CDF F(x)^n (n > 0 need not be whole: a
// distribution of 1-year maxima is that of 50-year maxima with n = 1/50
// under independent years). Its quantile is F^-1(p^(1/n)). Every method
// works with ln F so that both tails keep their accuracy. Build it with
// MaximumOf, which returns an exact Gumbel where one exists.
type MaxOf struct {
	base     Dist
	n        float64
	mean, sd float64
}

// MaximumOf returns the distribution of the largest of n independent
// values of d. A Gumbel stays a Gumbel, exactly (max-stability: the same
// scale, the location moved by scale ln n; Gumbel 1958, Statistics of
// Extremes), for any n > 0. Any other distribution becomes a MaxOf, for
// n >= 1 only: the inverse (n < 1, the maxima over a shorter period) is
// refused, since F^n with n < 1 is not the maxima distribution of
// anything the study described.
func MaximumOf(d Dist, n float64) (Dist, error) {
	if !(n > 0) || math.IsInf(n, 0) {
		return nil, fmt.Errorf("sim: the number of maxima n = %g must be a positive finite number", n)
	}
	if g, ok := d.(Gumbel); ok {
		return Gumbel{loc: g.loc + g.scale*math.Log(n), scale: g.scale}, nil
	}
	if n == 1 {
		return d, nil
	}
	if n < 1 {
		return nil, fmt.Errorf("sim: %v is not a gumbel distribution, so its maxima over a shorter period (n = %g < 1) are not defined", d, n)
	}
	m := MaxOf{base: d, n: n}
	m.mean, m.sd = m.moments()
	return m, nil
}

// N returns the number of maxima n.
func (d MaxOf) N() float64 { return d.n }

// Base returns the distribution whose maximum d is.
func (d MaxOf) Base() Dist { return d.base }

// logCDF returns ln F(x) of the base distribution, from 1 - Survival in
// the upper tail.
func (d MaxOf) logCDF(x float64) float64 {
	if s := d.base.Survival(x); s < 0.5 {
		return math.Log1p(-s)
	}
	return math.Log(d.base.CDF(x))
}

// CDF returns F(x)^n.
func (d MaxOf) CDF(x float64) float64 { return math.Exp(d.n * d.logCDF(x)) }

// Survival returns 1 - F(x)^n, computed with Expm1.
func (d MaxOf) Survival(x float64) float64 { return -math.Expm1(d.n * d.logCDF(x)) }

// Prob returns the density n F(x)^(n-1) f(x).
func (d MaxOf) Prob(x float64) float64 {
	f := d.base.Prob(x)
	if f == 0 {
		return 0
	}
	return d.n * math.Exp((d.n-1)*d.logCDF(x)) * f
}

// Quantile returns F^-1(p^(1/n)).
func (d MaxOf) Quantile(p float64) float64 {
	if !(p >= 0 && p <= 1) {
		panic(badProb)
	}
	if p > 0.5 {
		return d.baseAt(math.Log1p(-(1 - p)) / d.n)
	}
	return d.baseAt(math.Log(p) / d.n)
}

// FromStdNormal returns F^-n(Phi(u)) = F^-1(Phi(u)^(1/n)), with ln Phi(u)
// from the tail on the side of u.
func (d MaxOf) FromStdNormal(u float64) float64 {
	var lp float64
	if u <= 0 {
		lp = math.Log(stdCDF(u))
	} else {
		lp = math.Log1p(-stdCDF(-u))
	}
	return d.baseAt(lp / d.n)
}

// baseAt returns the base value whose log-CDF is lp (lp <= 0), going
// through the standard normal so that the base keeps its tail accuracy:
// the upper tail uses 1 - exp(lp) = -expm1(lp).
func (d MaxOf) baseAt(lp float64) float64 {
	if lp < -math.Ln2 {
		return d.base.FromStdNormal(stdQuantile(math.Exp(lp)))
	}
	return d.base.FromStdNormal(-stdQuantile(-math.Expm1(lp)))
}

// ToStdNormal returns Phi^-1(F(x)^n).
func (d MaxOf) ToStdNormal(x float64) float64 {
	l := d.n * d.logCDF(x)
	return fromProbs(math.Exp(l), -math.Expm1(l))
}

// Mean returns the mean, integrated numerically at construction.
func (d MaxOf) Mean() float64 { return d.mean }

// StdDev returns the standard deviation, integrated numerically at
// construction.
func (d MaxOf) StdDev() float64 { return d.sd }

// String describes the distribution.
func (d MaxOf) String() string {
	return "maximum of " + fmtNum(d.n) + " of " + d.base.String()
}

// moments integrates the mean and standard deviation over the standard
// normal, E[h(U)] with h = FromStdNormal, by the trapezoidal rule on
// [-10, 10] (the mass beyond is below 1e-22; the rule converges fast for
// a smooth integrand decaying like the normal density).
func (d MaxOf) moments() (mean, sd float64) {
	const lim, steps = 10.0, 4000
	h := 2 * lim / steps
	var s0, s1 float64
	xs := make([]float64, steps+1)
	for i := range xs {
		u := -lim + float64(i)*h
		xs[i] = d.FromStdNormal(u)
		s0 += phi(u) * xs[i] * h
	}
	for i, x := range xs {
		u := -lim + float64(i)*h
		s1 += phi(u) * (x - s0) * (x - s0) * h
	}
	return s0, math.Sqrt(s1)
}
