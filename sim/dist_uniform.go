package sim

import (
	"math"
	"math/rand/v2"
)

// Uniform is the continuous uniform distribution on [min, max]. Build it
// with NewUniform.
type Uniform struct {
	a, b float64
}

// NewUniform returns the uniform distribution on [min, max], min < max.
func NewUniform(min, max float64) (Dist, error) {
	if err := checkFinite("uniform", "min", min); err != nil {
		return nil, err
	}
	if err := checkFinite("uniform", "max", max); err != nil {
		return nil, err
	}
	if !(min < max) {
		return nil, errorf("sim: uniform needs min < max, got min %v, max %v", min, max)
	}
	return Uniform{a: min, b: max}, nil
}

// CDF returns P(X <= x).
func (d Uniform) CDF(x float64) float64 { return math.Min(1, math.Max(0, (x-d.a)/(d.b-d.a))) }

// Survival returns P(X > x).
func (d Uniform) Survival(x float64) float64 { return math.Min(1, math.Max(0, (d.b-x)/(d.b-d.a))) }

// Quantile returns the p-quantile.
func (d Uniform) Quantile(p float64) float64 { return quantile(d, p) }

// Prob returns the density at x.
func (d Uniform) Prob(x float64) float64 {
	if x < d.a || x > d.b {
		return 0
	}
	return 1 / (d.b - d.a)
}

// Mean returns (min + max)/2.
func (d Uniform) Mean() float64 { return 0.5 * (d.a + d.b) }

// StdDev returns (max - min)/sqrt(12).
func (d Uniform) StdDev() float64 { return (d.b - d.a) / math.Sqrt(12) }

// FromStdNormal returns F^-1(Phi(u)).
func (d Uniform) FromStdNormal(u float64) float64 { return fromStd(d, u) }

// ToStdNormal returns Phi^-1(F(x)).
func (d Uniform) ToStdNormal(x float64) float64 { return toStd(d, x) }

// String describes the distribution.
func (d Uniform) String() string { return "uniform(min " + fmtNum(d.a) + ", max " + fmtNum(d.b) + ")" }

func (d Uniform) lowerQ(p float64) float64  { return d.a + p*(d.b-d.a) }
func (d Uniform) upperQ(q float64) float64  { return d.b - q*(d.b-d.a) }
func (d Uniform) draw(r *rand.Rand) float64 { return d.a + r.Float64()*(d.b-d.a) }

// Triangular is the triangular distribution on [min, max] with the given
// mode. Build it with NewTriangular.
type Triangular struct {
	a, c, b float64
}

// NewTriangular returns the triangular distribution with min < max and
// min <= mode <= max.
func NewTriangular(min, mode, max float64) (Dist, error) {
	for _, p := range []struct {
		n string
		v float64
	}{{"min", min}, {"mode", mode}, {"max", max}} {
		if err := checkFinite("triangular", p.n, p.v); err != nil {
			return nil, err
		}
	}
	if !(min < max) {
		return nil, errorf("sim: triangular needs min < max, got min %v, max %v", min, max)
	}
	if mode < min || mode > max {
		return nil, errorf("sim: triangular mode %v must lie in [min %v, max %v]", mode, min, max)
	}
	return Triangular{a: min, c: mode, b: max}, nil
}

// CDF returns P(X <= x).
func (d Triangular) CDF(x float64) float64 {
	switch {
	case x <= d.a:
		return 0
	case x >= d.b:
		return 1
	case x <= d.c:
		return (x - d.a) * (x - d.a) / ((d.b - d.a) * (d.c - d.a))
	}
	return 1 - d.Survival(x)
}

// Survival returns P(X > x).
func (d Triangular) Survival(x float64) float64 {
	switch {
	case x <= d.a:
		return 1
	case x >= d.b:
		return 0
	case x >= d.c:
		return (d.b - x) * (d.b - x) / ((d.b - d.a) * (d.b - d.c))
	}
	return 1 - d.CDF(x)
}

// Quantile returns the p-quantile.
func (d Triangular) Quantile(p float64) float64 { return quantile(d, p) }

// Prob returns the density at x.
func (d Triangular) Prob(x float64) float64 {
	switch {
	case x < d.a || x > d.b:
		return 0
	case x < d.c:
		return 2 * (x - d.a) / ((d.b - d.a) * (d.c - d.a))
	case x > d.c:
		return 2 * (d.b - x) / ((d.b - d.a) * (d.b - d.c))
	}
	return 2 / (d.b - d.a)
}

// Mean returns (min + mode + max)/3.
func (d Triangular) Mean() float64 { return (d.a + d.b + d.c) / 3 }

// StdDev returns sqrt((a^2 + b^2 + c^2 - ab - ac - bc)/18).
func (d Triangular) StdDev() float64 {
	a, b, c := d.a, d.b, d.c
	return math.Sqrt((a*a + b*b + c*c - a*b - a*c - b*c) / 18)
}

// FromStdNormal returns F^-1(Phi(u)).
func (d Triangular) FromStdNormal(u float64) float64 { return fromStd(d, u) }

// ToStdNormal returns Phi^-1(F(x)).
func (d Triangular) ToStdNormal(x float64) float64 { return toStd(d, x) }

// String describes the distribution.
func (d Triangular) String() string {
	return "triangular(min " + fmtNum(d.a) + ", mode " + fmtNum(d.c) + ", max " + fmtNum(d.b) + ")"
}

func (d Triangular) lowerQ(p float64) float64 {
	if p*(d.b-d.a) <= d.c-d.a {
		return d.a + math.Sqrt(p*(d.b-d.a)*(d.c-d.a))
	}
	return d.b - math.Sqrt((1-p)*(d.b-d.a)*(d.b-d.c))
}

func (d Triangular) upperQ(q float64) float64 {
	if q*(d.b-d.a) <= d.b-d.c {
		return d.b - math.Sqrt(q*(d.b-d.a)*(d.b-d.c))
	}
	return d.a + math.Sqrt((1-q)*(d.b-d.a)*(d.c-d.a))
}

func (d Triangular) draw(r *rand.Rand) float64 { return d.lowerQ(r.Float64()) }
