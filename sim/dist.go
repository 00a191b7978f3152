package sim

import (
	"fmt"
	"math"
	"math/rand/v2"
)

// drawer is implemented by the distributions of this package: draw returns
// one variate from r by the fastest exact method the distribution has.
type drawer interface {
	draw(r *rand.Rand) float64
}

// tails is implemented by the distributions of this package: lowerQ(p) is
// the x with CDF(x) = p and upperQ(q) the x with Survival(x) = q, each
// accurate when its argument is tiny.
type tails interface {
	lowerQ(p float64) float64
	upperQ(q float64) float64
}

const badProb = "sim: probability out of [0, 1]"

// quantile returns the p-quantile of d from its two tail inverses.
func quantile[T tails](d T, p float64) float64 {
	if !(p >= 0 && p <= 1) {
		panic(badProb)
	}
	if p <= 0.5 {
		return d.lowerQ(p)
	}
	return d.upperQ(1 - p)
}

// fromStd returns F^-1(Phi(u)) using the tail of Phi on the side of u, so
// that u = +8 maps to the upper tail of d without rounding Phi(8) to 1.
func fromStd[T tails](d T, u float64) float64 {
	if u <= 0 {
		return d.lowerQ(stdCDF(u))
	}
	return d.upperQ(stdCDF(-u))
}

// toStd returns Phi^-1(F(x)) from whichever of F and 1-F is smaller.
func toStd[T Dist](d T, x float64) float64 {
	return fromProbs(d.CDF(x), d.Survival(x))
}

// uniformOpen returns a uniform variate in the open interval (0, 1).
func uniformOpen(r *rand.Rand) float64 {
	return (float64(r.Uint64()>>11) + 0.5) * (1.0 / (1 << 53))
}

func checkFinite(dist, name string, v float64) error {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return fmt.Errorf("sim: %s %s must be a finite number, got %v", dist, name, v)
	}
	return nil
}

func checkPositive(dist, name string, v float64) error {
	if err := checkFinite(dist, name, v); err != nil {
		return err
	}
	if v <= 0 {
		return fmt.Errorf("sim: %s %s must be positive, got %v", dist, name, v)
	}
	return nil
}

func fmtNum(v float64) string { return fmt.Sprintf("%.6g", v) }

func errorf(format string, a ...any) error { return fmt.Errorf(format, a...) }
