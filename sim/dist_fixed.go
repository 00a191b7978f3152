package sim

import (
	"math"
	"math/rand/v2"
)

// Fixed is a degenerate distribution: every draw is its value. Transform
// maps every u to the value; a Fixed variable cannot be correlated.
type Fixed struct {
	v float64
}

// NewFixed returns the degenerate distribution at value.
func NewFixed(value float64) (Dist, error) {
	if err := checkFinite("fixed", "value", value); err != nil {
		return nil, err
	}
	return Fixed{v: value}, nil
}

// CDF returns 0 below the value and 1 from it on.
func (d Fixed) CDF(x float64) float64 {
	if x < d.v {
		return 0
	}
	return 1
}

// Survival returns 1 - CDF(x).
func (d Fixed) Survival(x float64) float64 { return 1 - d.CDF(x) }

// Quantile returns the value.
func (d Fixed) Quantile(p float64) float64 {
	if !(p >= 0 && p <= 1) {
		panic(badProb)
	}
	return d.v
}

// Prob returns +Inf at the value and 0 elsewhere.
func (d Fixed) Prob(x float64) float64 {
	if x == d.v {
		return math.Inf(1)
	}
	return 0
}

// Mean returns the value.
func (d Fixed) Mean() float64 { return d.v }

// StdDev returns 0.
func (d Fixed) StdDev() float64 { return 0 }

// FromStdNormal returns the value for any u.
func (d Fixed) FromStdNormal(u float64) float64 { return d.v }

// ToStdNormal returns 0.
func (d Fixed) ToStdNormal(x float64) float64 { return 0 }

// String describes the distribution.
func (d Fixed) String() string { return "fixed(" + fmtNum(d.v) + ")" }

func (d Fixed) lowerQ(p float64) float64  { return d.v }
func (d Fixed) upperQ(q float64) float64  { return d.v }
func (d Fixed) draw(r *rand.Rand) float64 { return d.v }
