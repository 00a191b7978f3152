package life

import "strutrisk/sim"

// Crossing is where the annual reliability index first falls below a
// target. The life ends at the first year whose annual beta (the
// probability of failure within that year) is below the target: an
// annual index against an annual target, as targets for existing
// structures are set.
type Crossing struct {
	// Year is the first year whose estimated annual beta is below the
	// target, 0 when none up to the horizon is.
	Year int
	// Earliest and Latest bracket it by the sampling error (about two
	// standard deviations of each year's pf): the first year the beta may
	// be below the target, and the first year it is below it with
	// confidence; 0 when there is no such year up to the horizon.
	Earliest, Latest int
}

// Resolved reports whether sampling error leaves the crossing year in
// doubt by at most two evaluation steps (the bracket then says by how
// much), or there is no crossing in doubt. A crossing bracketed beyond
// the horizon, or more widely, is not resolved: no verdict may be drawn.
func (c Crossing) Resolved(r Result) bool {
	if c.Earliest == c.Latest {
		return true
	}
	if c.Earliest == 0 || c.Latest == 0 {
		return false
	}
	n := 0
	for _, pt := range r.Points {
		if pt.Year >= c.Earliest && pt.Year < c.Latest {
			n++
		}
	}
	return n <= 2
}

// FirstBelow finds where the annual beta of r first falls below target.
func (r Result) FirstBelow(target float64) Crossing {
	pfT := sim.PfFromBeta(target)
	var c Crossing
	for _, pt := range r.Points {
		hi, lo := pt.Pf*(1+2*pt.CoV), pt.Pf*(1-2*pt.CoV)
		if c.Earliest == 0 && hi > pfT {
			c.Earliest = pt.Year
		}
		if c.Year == 0 && pt.Pf > pfT {
			c.Year = pt.Year
		}
		if c.Latest == 0 && lo > pfT {
			c.Latest = pt.Year
		}
	}
	return c
}
