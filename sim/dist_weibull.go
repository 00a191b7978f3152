package sim

import (
	"math"
	"math/rand/v2"
)

// Weibull is the two-parameter Weibull distribution,
// F(x) = 1 - exp(-(x/scale)^shape), x >= 0. Build it with NewWeibull or
// NewWeibullMean.
type Weibull struct {
	k, lambda float64
}

// NewWeibull returns the Weibull distribution with the given shape > 0 and
// scale > 0.
func NewWeibull(shape, scale float64) (Dist, error) {
	if err := checkPositive("weibull", "shape", shape); err != nil {
		return nil, err
	}
	if err := checkPositive("weibull", "scale", scale); err != nil {
		return nil, err
	}
	return Weibull{k: shape, lambda: scale}, nil
}

// weibullCoV returns the coefficient of variation of a Weibull variable of
// shape k: sqrt(Gamma(1+2/k)/Gamma(1+1/k)^2 - 1) (moments of the Weibull
// distribution, e.g. Johnson, Kotz and Balakrishnan vol. 1, ch. 21).
func weibullCoV(k float64) float64 {
	l1, _ := math.Lgamma(1 + 1/k)
	l2, _ := math.Lgamma(1 + 2/k)
	return math.Sqrt(math.Expm1(l2 - 2*l1))
}

// NewWeibullMean returns the Weibull distribution with the given mean > 0
// and coefficient of variation cov > 0: the shape is found by bisection on
// weibullCoV (which decreases with the shape), then
// scale = mean/Gamma(1 + 1/shape).
func NewWeibullMean(mean, cov float64) (Dist, error) {
	if err := checkPositive("weibull", "mean", mean); err != nil {
		return nil, err
	}
	if err := checkPositive("weibull", "cov", cov); err != nil {
		return nil, err
	}
	lo, hi := math.Log(0.05), math.Log(1e4) // bracket of log(shape)
	if cov > weibullCoV(math.Exp(lo)) || cov < weibullCoV(math.Exp(hi)) {
		return nil, errorf("sim: weibull cov %v is out of the supported range [%.3g, %.3g]", cov, weibullCoV(math.Exp(hi)), weibullCoV(math.Exp(lo)))
	}
	for i := 0; i < 200 && hi-lo > 1e-15; i++ {
		mid := 0.5 * (lo + hi)
		if weibullCoV(math.Exp(mid)) > cov {
			lo = mid
		} else {
			hi = mid
		}
	}
	k := math.Exp(0.5 * (lo + hi))
	return Weibull{k: k, lambda: mean / math.Gamma(1+1/k)}, nil
}

// CDF returns P(X <= x).
func (d Weibull) CDF(x float64) float64 {
	if x <= 0 {
		return 0
	}
	return -math.Expm1(-math.Pow(x/d.lambda, d.k))
}

// Survival returns P(X > x).
func (d Weibull) Survival(x float64) float64 {
	if x <= 0 {
		return 1
	}
	return math.Exp(-math.Pow(x/d.lambda, d.k))
}

// Quantile returns the p-quantile.
func (d Weibull) Quantile(p float64) float64 { return quantile(d, p) }

// Prob returns the density at x.
func (d Weibull) Prob(x float64) float64 {
	if x < 0 {
		return 0
	}
	z := x / d.lambda
	return d.k / d.lambda * math.Pow(z, d.k-1) * math.Exp(-math.Pow(z, d.k))
}

// Mean returns scale*Gamma(1 + 1/shape).
func (d Weibull) Mean() float64 { return d.lambda * math.Gamma(1+1/d.k) }

// StdDev returns the standard deviation.
func (d Weibull) StdDev() float64 { return d.Mean() * weibullCoV(d.k) }

// FromStdNormal returns F^-1(Phi(u)).
func (d Weibull) FromStdNormal(u float64) float64 { return fromStd(d, u) }

// ToStdNormal returns Phi^-1(F(x)).
func (d Weibull) ToStdNormal(x float64) float64 {
	if x <= 0 {
		return math.Inf(-1)
	}
	t := math.Pow(x/d.lambda, d.k)
	return fromProbs(-math.Expm1(-t), math.Exp(-t))
}

// String describes the distribution.
func (d Weibull) String() string {
	return "weibull(shape " + fmtNum(d.k) + ", scale " + fmtNum(d.lambda) + ")"
}

func (d Weibull) lowerQ(p float64) float64  { return d.lambda * math.Pow(-math.Log1p(-p), 1/d.k) }
func (d Weibull) upperQ(q float64) float64  { return d.lambda * math.Pow(-math.Log(q), 1/d.k) }
func (d Weibull) draw(r *rand.Rand) float64 { return d.lambda * math.Pow(r.ExpFloat64(), 1/d.k) }
