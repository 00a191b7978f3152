package sim

import (
	"fmt"
	"math"
	"math/rand/v2"

	"gonum.org/v1/gonum/stat/distuv"
)

// logStudentsT is X = exp(mu + sigma T), T Student-t with nu degrees of
// freedom: the predictive distribution of a lognormal quantity updated with
// unknown variance. It has no finite moments.
type logStudentsT struct {
	mu, sigma float64
	t         distuv.StudentsT // standard: Mu 0, Sigma 1
	chi       Gamma            // chi-square(nu)/nu, for draw
	tc        tConsts          // constants of the quantile
}

func newLogStudentsT(mu, sigma, nu float64) logStudentsT {
	g, err := NewGammaShape(nu/2, 2/nu)
	if err != nil {
		panic("sim: log-Student-t with nu = " + fmtNum(nu))
	}
	return logStudentsT{mu: mu, sigma: sigma, t: distuv.StudentsT{Mu: 0, Sigma: 1, Nu: nu}, chi: g.(Gamma), tc: newTConsts(nu)}
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

// Quantile and FromStdNormal are written out rather than calling quantile
// and fromStd, whose interface argument would move d to the heap.
func (d logStudentsT) Quantile(p float64) float64 {
	if !(p >= 0 && p <= 1) {
		panic(badProb)
	}
	if p <= 0.5 {
		return d.lowerQ(p)
	}
	return d.upperQ(1 - p)
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

func (d logStudentsT) FromStdNormal(u float64) float64 {
	if u <= 0 {
		return math.Exp(d.mu + d.sigma*d.lowerTz(stdCDF(u), u))
	}
	return math.Exp(d.mu - d.sigma*d.lowerTz(stdCDF(-u), -u))
}

func (d logStudentsT) ToStdNormal(x float64) float64 {
	if x <= 0 {
		return math.Inf(-1)
	}
	z := d.z(x)
	if z <= 0 {
		return stdQuantile(d.t.CDF(z))
	}
	return -stdQuantile(d.t.CDF(-z))
}

func (d logStudentsT) String() string {
	return "log-Student-t(median " + fmtNum(math.Exp(d.mu)) + ", log-scale " + fmtNum(d.sigma) +
		", nu " + fmt.Sprint(d.t.Nu) + ")"
}

// lowerT returns the p-quantile of the standard Student-t for p <= 1/2,
// accurate for tiny p.
func (d logStudentsT) lowerT(p float64) float64 {
	if !(p > 0 && p < 0.5) {
		return d.lowerTz(p, 0)
	}
	return d.lowerTz(p, stdQuantile(p))
}

// lowerTz is lowerT given z = Phi^-1(p) as well (FromStdNormal has it).
func (d logStudentsT) lowerTz(p, z float64) float64 {
	switch {
	case math.IsNaN(p):
		return p
	case p <= 0:
		return math.Inf(-1)
	case p >= 0.5:
		return 0
	}
	return tLowerQuantile(p, z, d.t.Nu, d.tc)
}

func (d logStudentsT) lowerQ(p float64) float64 { return math.Exp(d.mu + d.sigma*d.lowerT(p)) }
func (d logStudentsT) upperQ(q float64) float64 { return math.Exp(d.mu - d.sigma*d.lowerT(q)) }

// draw uses T = Z / sqrt(W), W = chi-square(nu)/nu independent of Z.
func (d logStudentsT) draw(r *rand.Rand) float64 {
	z := r.NormFloat64()
	return math.Exp(d.mu + d.sigma*z/math.Sqrt(d.chi.draw(r)))
}
