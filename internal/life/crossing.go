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
// doubt by no more than one evaluation step (or there is no crossing in
// doubt).
func (c Crossing) Resolved(r Result) bool {
	if c.Earliest == c.Latest {
		return true
	}
	if c.Earliest == 0 || c.Latest == 0 {
		return false
	}
	for k, pt := range r.Points {
		if pt.Year == c.Earliest {
			return k+1 < len(r.Points) && r.Points[k+1].Year >= c.Latest
		}
	}
	return false
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
