package sim

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// Test-only marginals for the sensitivity tests, so that they do not depend
// on the package's own distributions (tested elsewhere). Both delegate to
// gonum's distuv.

// sensUniform is the uniform distribution on [Min, Max].
type sensUniform struct{ Min, Max float64 }

func (d sensUniform) u() distuv.Uniform               { return distuv.Uniform{Min: d.Min, Max: d.Max} }
func (d sensUniform) CDF(x float64) float64           { return d.u().CDF(x) }
func (d sensUniform) Survival(x float64) float64      { return d.u().Survival(x) }
func (d sensUniform) Quantile(p float64) float64      { return d.u().Quantile(p) }
func (d sensUniform) Prob(x float64) float64          { return d.u().Prob(x) }
func (d sensUniform) Mean() float64                   { return d.u().Mean() }
func (d sensUniform) StdDev() float64                 { return d.u().StdDev() }
func (d sensUniform) FromStdNormal(u float64) float64 { return d.Quantile(distuv.UnitNormal.CDF(u)) }
func (d sensUniform) ToStdNormal(x float64) float64   { return distuv.UnitNormal.Quantile(d.CDF(x)) }
func (d sensUniform) String() string                  { return fmt.Sprintf("uniform(%g, %g)", d.Min, d.Max) }

// sensNormal is the normal distribution with mean Mu and deviation Sigma.
type sensNormal struct{ Mu, Sigma float64 }

func (d sensNormal) n() distuv.Normal                { return distuv.Normal{Mu: d.Mu, Sigma: d.Sigma} }
func (d sensNormal) CDF(x float64) float64           { return d.n().CDF(x) }
func (d sensNormal) Survival(x float64) float64      { return d.n().CDF(2*d.Mu - x) }
func (d sensNormal) Quantile(p float64) float64      { return d.n().Quantile(p) }
func (d sensNormal) Prob(x float64) float64          { return d.n().Prob(x) }
func (d sensNormal) Mean() float64                   { return d.Mu }
func (d sensNormal) StdDev() float64                 { return d.Sigma }
func (d sensNormal) FromStdNormal(u float64) float64 { return d.Mu + d.Sigma*u }
func (d sensNormal) ToStdNormal(x float64) float64   { return (x - d.Mu) / d.Sigma }
func (d sensNormal) String() string                  { return fmt.Sprintf("normal(%g, %g)", d.Mu, d.Sigma) }

var (
	_ Dist = sensUniform{}
	_ Dist = sensNormal{}
)

// ishigami is the Ishigami & Homma (1990) function with a = 7, b = 0.1 on
// three U(-pi, pi) inputs, as a Model whose single output is f.
func ishigami() *Model {
	u := sensUniform{-math.Pi, math.Pi}
	return &Model{
		Vars:    []Variable{{Name: "x1", Dist: u}, {Name: "x2", Dist: u}, {Name: "x3", Dist: u}},
		Outputs: []string{"f"},
		G: func(x, out []float64) float64 {
			const a, b = 7, 0.1
			s2 := math.Sin(x[1])
			f := math.Sin(x[0]) + a*s2*s2 + b*x[2]*x[2]*x[2]*x[2]*math.Sin(x[0])
			if out != nil {
				out[0] = f
			}
			return f
		},
	}
}
