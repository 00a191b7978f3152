package sim

import (
	"math"
	"math/rand/v2"
)

// Lognormal is the distribution of exp(Y) with Y normal(mu, sigma). Build it
// with NewLognormal, NewLognormalLog or NewLognormalChar.
type Lognormal struct {
	mu, sigma float64
}

// NewLognormal returns the lognormal distribution with the given mean > 0
// and standard deviation sd > 0, using the exact relations
// sigma^2 = ln(1 + cov^2), mu = ln(mean) - sigma^2/2 (cov = sd/mean).
func NewLognormal(mean, sd float64) (Dist, error) {
	if err := checkPositive("lognormal", "mean", mean); err != nil {
		return nil, err
	}
	if err := checkPositive("lognormal", "sd", sd); err != nil {
		return nil, err
	}
	cov := sd / mean
	s2 := math.Log1p(cov * cov)
	return Lognormal{mu: math.Log(mean) - 0.5*s2, sigma: math.Sqrt(s2)}, nil
}

// NewLognormalLog returns the lognormal distribution whose logarithm has
// mean mu and standard deviation sigma > 0.
func NewLognormalLog(mu, sigma float64) (Dist, error) {
	if err := checkFinite("lognormal", "mu", mu); err != nil {
		return nil, err
	}
	if err := checkPositive("lognormal", "sigma", sigma); err != nil {
		return nil, err
	}
	return Lognormal{mu: mu, sigma: sigma}, nil
}

// NewLognormalChar returns the lognormal distribution with coefficient of
// variation cov > 0 whose fractile-quantile is the characteristic value
// xk > 0 (e.g. fractile 0.05): sigma^2 = ln(1 + cov^2),
// mu = ln(xk) - sigma*Phi^-1(fractile).
func NewLognormalChar(xk, fractile, cov float64) (Dist, error) {
	if err := checkPositive("lognormal", "characteristic value", xk); err != nil {
		return nil, err
	}
	if !(fractile > 0 && fractile < 1) {
		return nil, errorf("sim: lognormal fractile must be in (0, 1), got %v", fractile)
	}
	if err := checkPositive("lognormal", "cov", cov); err != nil {
		return nil, err
	}
	sigma := math.Sqrt(math.Log1p(cov * cov))
	return Lognormal{mu: math.Log(xk) - sigma*stdQuantile(fractile), sigma: sigma}, nil
}

// CDF returns P(X <= x).
func (d Lognormal) CDF(x float64) float64 {
	if x <= 0 {
		return 0
	}
	return stdCDF((math.Log(x) - d.mu) / d.sigma)
}

// Survival returns P(X > x).
func (d Lognormal) Survival(x float64) float64 {
	if x <= 0 {
		return 1
	}
	return stdCDF((d.mu - math.Log(x)) / d.sigma)
}

// Quantile returns the p-quantile.
func (d Lognormal) Quantile(p float64) float64 { return quantile(d, p) }

// Prob returns the density at x.
func (d Lognormal) Prob(x float64) float64 {
	if x <= 0 {
		return 0
	}
	return phi((math.Log(x)-d.mu)/d.sigma) / (d.sigma * x)
}

// Mean returns exp(mu + sigma^2/2).
func (d Lognormal) Mean() float64 { return math.Exp(d.mu + 0.5*d.sigma*d.sigma) }

// StdDev returns mean*sqrt(exp(sigma^2) - 1).
func (d Lognormal) StdDev() float64 { return d.Mean() * math.Sqrt(math.Expm1(d.sigma*d.sigma)) }

// FromStdNormal returns exp(mu + sigma*u).
func (d Lognormal) FromStdNormal(u float64) float64 { return fastExp(d.mu + d.sigma*u) }

// ToStdNormal returns (ln x - mu)/sigma.
func (d Lognormal) ToStdNormal(x float64) float64 {
	if x <= 0 {
		return math.Inf(-1)
	}
	return (math.Log(x) - d.mu) / d.sigma
}

// String describes the distribution.
func (d Lognormal) String() string {
	return "lognormal(mean " + fmtNum(d.Mean()) + ", cov " + fmtNum(d.StdDev()/d.Mean()) + ")"
}

func (d Lognormal) lowerQ(p float64) float64  { return fastExp(d.mu + d.sigma*stdQuantile(p)) }
func (d Lognormal) upperQ(q float64) float64  { return fastExp(d.mu - d.sigma*stdQuantile(q)) }
func (d Lognormal) draw(r *rand.Rand) float64 { return fastExp(d.mu + d.sigma*r.NormFloat64()) }
