package sim

import (
	"math"
	"math/rand/v2"
)

// eulerGamma is the Euler-Mascheroni constant, https://oeis.org/A001620.
const eulerGamma = 0.57721566490153286060651209008240243104215933593992

// Gumbel is the type I extreme-value distribution of largest values,
// F(x) = exp(-exp(-(x - location)/scale)). Build it with NewGumbel or
// NewGumbelLoc.
type Gumbel struct {
	loc, scale float64
}

// NewGumbel returns the Gumbel (largest values) distribution with the given
// mean and sd > 0: scale = sd*sqrt(6)/pi, location = mean - gamma*scale,
// gamma the Euler-Mascheroni constant (method of moments; e.g. Gumbel 1958,
// Statistics of Extremes).
func NewGumbel(mean, sd float64) (Dist, error) {
	if err := checkFinite("gumbel", "mean", mean); err != nil {
		return nil, err
	}
	if err := checkPositive("gumbel", "sd", sd); err != nil {
		return nil, err
	}
	scale := sd * math.Sqrt(6) / math.Pi
	return Gumbel{loc: mean - eulerGamma*scale, scale: scale}, nil
}

// NewGumbelLoc returns the Gumbel (largest values) distribution with the
// given location (mode) and scale > 0.
func NewGumbelLoc(location, scale float64) (Dist, error) {
	if err := checkFinite("gumbel", "location", location); err != nil {
		return nil, err
	}
	if err := checkPositive("gumbel", "scale", scale); err != nil {
		return nil, err
	}
	return Gumbel{loc: location, scale: scale}, nil
}

// CDF returns P(X <= x).
func (d Gumbel) CDF(x float64) float64 { return fastExp(-fastExp(-(x - d.loc) / d.scale)) }

// Survival returns P(X > x) = 1 - exp(-exp(-z)), computed with Expm1.
func (d Gumbel) Survival(x float64) float64 { return -math.Expm1(-fastExp(-(x - d.loc) / d.scale)) }

// Quantile returns the p-quantile.
func (d Gumbel) Quantile(p float64) float64 { return quantile(d, p) }

// Prob returns the density at x.
func (d Gumbel) Prob(x float64) float64 {
	z := (x - d.loc) / d.scale
	return math.Exp(-(z + math.Exp(-z))) / d.scale
}

// Mean returns location + gamma*scale.
func (d Gumbel) Mean() float64 { return d.loc + eulerGamma*d.scale }

// StdDev returns pi*scale/sqrt(6).
func (d Gumbel) StdDev() float64 { return math.Pi * d.scale / math.Sqrt(6) }

// FromStdNormal returns F^-1(Phi(u)).
func (d Gumbel) FromStdNormal(u float64) float64 { return fromStd(d, u) }

// ToStdNormal returns Phi^-1(F(x)).
func (d Gumbel) ToStdNormal(x float64) float64 {
	e := math.Exp(-(x - d.loc) / d.scale)
	return fromProbs(math.Exp(-e), -math.Expm1(-e))
}

// String describes the distribution.
func (d Gumbel) String() string {
	return "gumbel(mean " + fmtNum(d.Mean()) + ", sd " + fmtNum(d.StdDev()) + ")"
}

func (d Gumbel) lowerQ(p float64) float64 { return d.loc - d.scale*math.Log(-math.Log(p)) }
func (d Gumbel) upperQ(q float64) float64 { return d.loc - d.scale*math.Log(-math.Log1p(-q)) }

// draw uses -ln U ~ Exp(1).
func (d Gumbel) draw(r *rand.Rand) float64 { return d.loc - d.scale*math.Log(r.ExpFloat64()) }
