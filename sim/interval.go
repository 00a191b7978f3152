package sim

import (
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// WilsonInterval returns the Wilson score interval for a binomial
// proportion with k successes in n trials at confidence conf (e.g. 0.95):
// Wilson (1927), "Probable inference, the law of succession, and
// statistical inference", JASA 22(158). For k = 0 it gives lo = 0.
func WilsonInterval(k, n int64, conf float64) (lo, hi float64) {
	if n <= 0 {
		return 0, 1
	}
	z := stdQuantile(0.5 + conf/2)
	fn, fk := float64(n), float64(k)
	z2 := z * z
	center := (fk + z2/2) / (fn + z2)
	half := z / (fn + z2) * math.Sqrt(fk*(fn-fk)/fn+z2/4)
	return math.Max(0, center-half), math.Min(1, center+half)
}

// ClopperPearson returns the exact (conservative) binomial interval for k
// successes in n trials at confidence conf: Clopper and Pearson (1934),
// "The use of confidence or fiducial limits illustrated in the case of the
// binomial", Biometrika 26(4). The bounds are quantiles of beta
// distributions; for k = 0 the upper bound is 1 - (alpha/2)^(1/n) in
// closed form (and symmetrically for k = n).
func ClopperPearson(k, n int64, conf float64) (lo, hi float64) {
	if n <= 0 {
		return 0, 1
	}
	a := (1 - conf) / 2
	fn, fk := float64(n), float64(k)
	switch {
	case k <= 0:
		lo = 0
		hi = -math.Expm1(math.Log(a) / fn)
	case k >= n:
		lo = math.Exp(math.Log(a) / fn)
		hi = 1
	default:
		lo = distuv.Beta{Alpha: fk, Beta: fn - fk + 1}.Quantile(a)
		hi = distuv.Beta{Alpha: fk + 1, Beta: fn - fk}.Quantile(1 - a)
	}
	return lo, hi
}

// binomialInterval is the interval Run reports for crude sampling: Wilson's,
// except with no failures (or no survivors), where the exact
// Clopper-Pearson bound is used.
func binomialInterval(k, n int64, conf float64) [2]float64 {
	if k <= 0 || k >= n {
		lo, hi := ClopperPearson(k, n, conf)
		return [2]float64{lo, hi}
	}
	lo, hi := WilsonInterval(k, n, conf)
	return [2]float64{lo, hi}
}

// TInterval returns mean -/+ t*se, with t the two-sided Student's t
// quantile at confidence conf with df degrees of freedom; the lower bound is
// not allowed below zero (a probability).
func TInterval(mean, se float64, df int, conf float64) [2]float64 {
	t := distuv.StudentsT{Mu: 0, Sigma: 1, Nu: float64(df)}.Quantile(0.5 + conf/2)
	return [2]float64{math.Max(0, mean-t*se), math.Min(1, mean+t*se)}
}

// BetaInterval maps an interval of pf to the interval of
// beta = -Phi^-1(pf): the low beta comes from the high pf.
func BetaInterval(pfCI [2]float64) [2]float64 {
	return [2]float64{BetaFromPf(pfCI[1]), BetaFromPf(pfCI[0])}
}

// binomialCoV returns the coefficient of variation of a crude estimate of
// pf from n samples, sqrt((1-pf)/(n pf)); +Inf when pf = 0.
func binomialCoV(pf float64, n int64) float64 {
	if pf <= 0 || n <= 0 {
		return math.Inf(1)
	}
	return math.Sqrt((1 - pf) / (float64(n) * pf))
}
