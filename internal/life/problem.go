package life

import (
	"errors"
	"fmt"
	"math"

	"strutrisk/sim"
)

// Problem is a member followed over its remaining life.
type Problem struct {
	// Vars are the inputs drawn once for each path and kept in every
	// year, with their correlations Corr (Nataf).
	Vars []sim.Variable
	Corr []sim.Correlation
	// Annual are the variable loads whose annual maxima are independent
	// from year to year (and of Vars), in the units of the limit state.
	Annual []sim.Variable
	// Ends are the years at which the member is evaluated, whole years,
	// increasing, the first at least 1. The resistance of every year in
	// (Ends[k-1], Ends[k]] is that at Ends[k] (with a resistance that only
	// falls, on the safe side); with a step of one year it is exact.
	Ends []int
	// Split returns the limit state of the path x at time t (years from
	// now): g = h - c * (sum of the annual maxima). It is called
	// concurrently and must not keep x.
	Split func(x []float64, t float64) (h, c float64)
	// Paths is the number of paths drawn; Seed seeds them; Workers is the
	// number of goroutines (the numbers do not depend on it).
	Paths   int
	Seed    uint64
	Workers int
}

// Point is the reliability of the member at one year.
type Point struct {
	// Year is the year, counted from now.
	Year int
	// Pf is the probability of failure within the year (under its annual
	// maxima, at the resistance of that year), Beta its index, CoV the
	// coefficient of variation of the estimate.
	Pf, Beta, CoV float64
	// PfCumulative is the probability of failure at any time from now to
	// the end of Year, BetaCumulative its index, CoVCumulative the
	// coefficient of variation of the estimate.
	PfCumulative, BetaCumulative, CoVCumulative float64
}

// Result is the reliability of the member over its remaining life.
type Result struct {
	Points []Point
	// Paths is the number of member paths drawn.
	Paths int
	// Exact names the variable load whose annual maxima were integrated
	// through their CDF ("" when no variable load is random); Sampled
	// the ones drawn year by year.
	Exact   string
	Sampled []string
}

// Method says in one sentence how the result was computed.
func (r Result) Method() string {
	s := fmt.Sprintf("conditional sampling over the years: %d member paths, each drawn once and kept in every year (failures in different years are not taken as independent)", r.Paths)
	switch {
	case r.Exact == "":
		s += "; no variable load is random, so a path fails in the first year its resistance falls below the loads"
	default:
		s += fmt.Sprintf("; the annual maxima of %s integrated exactly through their CDF, independent from year to year", r.Exact)
	}
	for _, n := range r.Sampled {
		s += fmt.Sprintf("; the annual maxima of %s sampled each year and added", n)
	}
	return s
}

// check reports a problem that makes p unusable.
func (p *Problem) check() error {
	switch {
	case len(p.Ends) == 0:
		return errors.New("life: no years to evaluate")
	case p.Ends[0] < 1:
		return fmt.Errorf("life: the first year is %d: years start at 1", p.Ends[0])
	case p.Split == nil:
		return errors.New("life: no limit state")
	case p.Paths < 2:
		return fmt.Errorf("life: %d paths: at least 2 are needed", p.Paths)
	}
	for k := 1; k < len(p.Ends); k++ {
		if p.Ends[k] <= p.Ends[k-1] {
			return fmt.Errorf("life: years %d and %d are not increasing", p.Ends[k-1], p.Ends[k])
		}
	}
	for _, c := range p.Corr {
		for _, a := range p.Annual {
			if c.A == a.Name || c.B == a.Name {
				return fmt.Errorf("life: %s is correlated with %s: annual maxima are drawn independently of the member and of each other", a.Name, map[bool]string{true: c.B, false: c.A}[c.A == a.Name])
			}
		}
	}
	return nil
}

// exactIndex is the annual load integrated through its CDF: the one with
// the largest spread, whose sampling would add the most noise (-1: none).
func exactIndex(annual []sim.Variable) int {
	best, sd := -1, -1.0
	for i, a := range annual {
		if s := a.Dist.StdDev(); s > sd || math.IsNaN(s) && best < 0 {
			best, sd = i, s
		}
	}
	return best
}
