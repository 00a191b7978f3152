package sim

import (
	"math"
	"math/rand/v2"
)

// Normal is the normal (Gaussian) distribution. Build it with NewNormal.
type Normal struct {
	mu, sigma float64
}

// NewNormal returns the normal distribution with the given mean and
// standard deviation sd > 0.
func NewNormal(mean, sd float64) (Dist, error) {
	if err := checkFinite("normal", "mean", mean); err != nil {
		return nil, err
	}
	if err := checkPositive("normal", "sd", sd); err != nil {
		return nil, err
	}
	return Normal{mu: mean, sigma: sd}, nil
}

// CDF returns P(X <= x).
func (d Normal) CDF(x float64) float64 { return stdCDF((x - d.mu) / d.sigma) }

// Survival returns P(X > x).
func (d Normal) Survival(x float64) float64 { return stdCDF((d.mu - x) / d.sigma) }

// Quantile returns the p-quantile.
func (d Normal) Quantile(p float64) float64 { return quantile(d, p) }

// Prob returns the density at x.
func (d Normal) Prob(x float64) float64 { return phi((x-d.mu)/d.sigma) / d.sigma }

// Mean returns the mean.
func (d Normal) Mean() float64 { return d.mu }

// StdDev returns the standard deviation.
func (d Normal) StdDev() float64 { return d.sigma }

// FromStdNormal returns mean + sd*u.
func (d Normal) FromStdNormal(u float64) float64 { return d.mu + d.sigma*u }

// ToStdNormal returns (x - mean)/sd.
func (d Normal) ToStdNormal(x float64) float64 { return (x - d.mu) / d.sigma }

// String describes the distribution.
func (d Normal) String() string {
	return "normal(mean " + fmtNum(d.mu) + ", sd " + fmtNum(d.sigma) + ")"
}

func (d Normal) lowerQ(p float64) float64  { return d.mu + d.sigma*stdQuantile(p) }
func (d Normal) upperQ(q float64) float64  { return d.mu - d.sigma*stdQuantile(q) }
func (d Normal) draw(r *rand.Rand) float64 { return d.mu + d.sigma*r.NormFloat64() }

// TruncNormal is a normal distribution cut to [lower, upper]. Build it with
// NewTruncNormal.
type TruncNormal struct {
	mu, sigma    float64
	lo, hi       float64 // bounds in x
	al, be       float64 // standardised bounds
	pAl, qAl     float64 // Phi(al), Phi(-al)
	pBe, qBe     float64 // Phi(be), Phi(-be)
	mass         float64 // Phi(be) - Phi(al)
	mean, sd     float64
	rejectSample bool
}

// NewTruncNormal returns the normal distribution of the parent mean and sd
// truncated to [lower, upper]; use math.Inf(-1) or math.Inf(1) for a side
// without a bound.
func NewTruncNormal(mean, sd, lower, upper float64) (Dist, error) {
	if err := checkFinite("truncated normal", "mean", mean); err != nil {
		return nil, err
	}
	if err := checkPositive("truncated normal", "sd", sd); err != nil {
		return nil, err
	}
	if math.IsNaN(lower) || math.IsNaN(upper) || !(lower < upper) {
		return nil, errorf("sim: truncated normal needs lower < upper, got lower %v, upper %v", lower, upper)
	}
	d := TruncNormal{mu: mean, sigma: sd, lo: lower, hi: upper}
	d.al, d.be = (lower-mean)/sd, (upper-mean)/sd
	d.pAl, d.qAl = stdCDF(d.al), stdCDF(-d.al)
	d.pBe, d.qBe = stdCDF(d.be), stdCDF(-d.be)
	switch {
	case d.al >= 0:
		d.mass = d.qAl - d.qBe
	case d.be <= 0:
		d.mass = d.pBe - d.pAl
	default:
		d.mass = 1 - d.pAl - d.qBe
	}
	if !(d.mass > 1e-300) {
		return nil, errorf("sim: truncated normal keeps no probability between lower %v and upper %v (mean %v, sd %v)", lower, upper, mean, sd)
	}
	// Moments of the truncated normal (e.g. Johnson, Kotz and Balakrishnan,
	// Continuous Univariate Distributions vol. 1, ch. 13).
	pa, pb := phi(d.al), phi(d.be)
	apa, bpb := 0.0, 0.0
	if !math.IsInf(d.al, 0) {
		apa = d.al * pa
	}
	if !math.IsInf(d.be, 0) {
		bpb = d.be * pb
	}
	k := (pa - pb) / d.mass
	d.mean = mean + sd*k
	d.sd = sd * math.Sqrt(math.Max(0, 1+(apa-bpb)/d.mass-k*k))
	d.rejectSample = d.mass > 0.25
	return d, nil
}

// CDF returns P(X <= x).
func (d TruncNormal) CDF(x float64) float64 {
	switch {
	case x <= d.lo:
		return 0
	case x >= d.hi:
		return 1
	}
	z := (x - d.mu) / d.sigma
	if z < 0 {
		return math.Min(1, (stdCDF(z)-d.pAl)/d.mass)
	}
	return math.Max(0, 1-(stdCDF(-z)-d.qBe)/d.mass)
}

// Survival returns P(X > x).
func (d TruncNormal) Survival(x float64) float64 {
	switch {
	case x <= d.lo:
		return 1
	case x >= d.hi:
		return 0
	}
	z := (x - d.mu) / d.sigma
	if z > 0 {
		return math.Min(1, (stdCDF(-z)-d.qBe)/d.mass)
	}
	return math.Max(0, 1-(stdCDF(z)-d.pAl)/d.mass)
}

// Quantile returns the p-quantile.
func (d TruncNormal) Quantile(p float64) float64 { return quantile(d, p) }

// Prob returns the density at x.
func (d TruncNormal) Prob(x float64) float64 {
	if x < d.lo || x > d.hi {
		return 0
	}
	return phi((x-d.mu)/d.sigma) / (d.sigma * d.mass)
}

// Mean returns the mean of the truncated distribution.
func (d TruncNormal) Mean() float64 { return d.mean }

// StdDev returns the standard deviation of the truncated distribution.
func (d TruncNormal) StdDev() float64 { return d.sd }

// FromStdNormal returns F^-1(Phi(u)).
func (d TruncNormal) FromStdNormal(u float64) float64 { return fromStd(d, u) }

// ToStdNormal returns Phi^-1(F(x)).
func (d TruncNormal) ToStdNormal(x float64) float64 { return toStd(d, x) }

// String describes the distribution.
func (d TruncNormal) String() string {
	return "truncated normal(mean " + fmtNum(d.mu) + ", sd " + fmtNum(d.sigma) +
		", lower " + fmtNum(d.lo) + ", upper " + fmtNum(d.hi) + ")"
}

// lowerQ solves Phi(z) = Phi(al) + p*mass, or equivalently
// Phi(-z) = Phi(-al) - p*mass, using the smaller side.
func (d TruncNormal) lowerQ(p float64) float64 {
	return d.clamp(d.mu + d.sigma*fromProbs(d.pAl+p*d.mass, d.qAl-p*d.mass))
}

// upperQ solves Phi(-z) = Phi(-be) + q*mass.
func (d TruncNormal) upperQ(q float64) float64 {
	return d.clamp(d.mu + d.sigma*fromProbs(d.pBe-q*d.mass, d.qBe+q*d.mass))
}

func (d TruncNormal) clamp(x float64) float64 { return math.Min(d.hi, math.Max(d.lo, x)) }

func (d TruncNormal) draw(r *rand.Rand) float64 {
	if d.rejectSample {
		for {
			x := d.mu + d.sigma*r.NormFloat64()
			if x >= d.lo && x <= d.hi {
				return x
			}
		}
	}
	return d.Quantile(uniformOpen(r))
}
