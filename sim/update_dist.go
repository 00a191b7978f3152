package sim

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// logStudentsT is X = exp(mu + sigma T), T Student-t with nu degrees of
// freedom: the predictive distribution of a lognormal quantity updated with
// unknown variance. It has no finite moments.
type logStudentsT struct {
	mu, sigma float64
	t         distuv.StudentsT // standard: Mu 0, Sigma 1
}

func newLogStudentsT(mu, sigma, nu float64) logStudentsT {
	return logStudentsT{mu: mu, sigma: sigma, t: distuv.StudentsT{Mu: 0, Sigma: 1, Nu: nu}}
}

func (d logStudentsT) z(x float64) float64 { return (math.Log(x) - d.mu) / d.sigma }

func (d logStudentsT) CDF(x float64) float64 {
	if x <= 0 {
		return 0
	}
	return d.t.CDF(d.z(x))
}

func (d logStudentsT) Survival(x float64) float64 {
	if x <= 0 {
		return 1
	}
	return d.t.Survival(d.z(x))
}

func (d logStudentsT) Quantile(p float64) float64 {
	return math.Exp(d.mu + d.sigma*d.t.Quantile(p))
}

func (d logStudentsT) Prob(x float64) float64 {
	if x <= 0 {
		return 0
	}
	return d.t.Prob(d.z(x)) / (d.sigma * x)
}

// Mean is infinite: E[exp(sigma T)] diverges for every nu.
func (d logStudentsT) Mean() float64 { return math.Inf(1) }

// StdDev is infinite, as the mean.
func (d logStudentsT) StdDev() float64 { return math.Inf(1) }

// FromStdNormal works from the lower tail on both sides, so that both
// Phi(u) and the t quantile keep their accuracy for large |u|.
func (d logStudentsT) FromStdNormal(u float64) float64 {
	if u == 0 {
		return math.Exp(d.mu)
	}
	t := d.t.Quantile(distuv.UnitNormal.CDF(-math.Abs(u)))
	if u > 0 {
		t = -t
	}
	return math.Exp(d.mu + d.sigma*t)
}

func (d logStudentsT) ToStdNormal(x float64) float64 {
	if x <= 0 {
		return math.Inf(-1)
	}
	z := d.z(x)
	if z <= 0 {
		return distuv.UnitNormal.Quantile(d.t.CDF(z))
	}
	return -distuv.UnitNormal.Quantile(d.t.CDF(-z))
}

func (d logStudentsT) String() string {
	return fmt.Sprintf("log-Student-t(median %.4g, log-scale %.4g, nu %.3g)", math.Exp(d.mu), d.sigma, d.t.Nu)
}

// updLognormal is the lognormal with ln X ~ N(mu, sigma²), kept here so the
// update does not depend on the order in which distribution files land.
type updLognormal struct{ mu, sigma float64 }

func (d updLognormal) z(x float64) float64 { return (math.Log(x) - d.mu) / d.sigma }

func (d updLognormal) CDF(x float64) float64 {
	if x <= 0 {
		return 0
	}
	return distuv.UnitNormal.CDF(d.z(x))
}

func (d updLognormal) Survival(x float64) float64 {
	if x <= 0 {
		return 1
	}
	return distuv.UnitNormal.CDF(-d.z(x))
}

func (d updLognormal) Quantile(p float64) float64 {
	return math.Exp(d.mu + d.sigma*distuv.UnitNormal.Quantile(p))
}

func (d updLognormal) Prob(x float64) float64 {
	if x <= 0 {
		return 0
	}
	return distuv.UnitNormal.Prob(d.z(x)) / (d.sigma * x)
}

func (d updLognormal) Mean() float64 { return math.Exp(d.mu + d.sigma*d.sigma/2) }

func (d updLognormal) StdDev() float64 {
	s2 := d.sigma * d.sigma
	return d.Mean() * math.Sqrt(math.Expm1(s2))
}

func (d updLognormal) FromStdNormal(u float64) float64 { return math.Exp(d.mu + d.sigma*u) }

func (d updLognormal) ToStdNormal(x float64) float64 {
	if x <= 0 {
		return math.Inf(-1)
	}
	return d.z(x)
}

func (d updLognormal) String() string {
	return fmt.Sprintf("lognormal(mean %.4g, cov %.3g)", d.Mean(), math.Sqrt(math.Expm1(d.sigma*d.sigma)))
}
