package sim

import "math"

// likely reports whether a search from start may find a further design
// point (FORMSettings.Screen), from one evaluation of g there. With g0 =
// g(0) > 0 and the linear prediction gl = g(u*) + grad g(u*)·(start -
// u*) from the nearest design point found, a further point is likely only
// when g at the start is no larger than at the median point (a single
// failure region makes the far side of the median safer than the median
// itself) and falls below gl by more than a quarter of g0 (the limit
// state bends towards failure there far more than the curvature of one
// smooth region does: on the ultimate beam-column of the demos the random
// restart, 2.6 from the design point, fell 0.13 g0 below the plane). A
// limit state with one region, as a column's resistance against its load,
// then costs one evaluation per restart instead of a search (50 to 100);
// the four-branch system's mirrored starts all pass (g there is 0 against
// g0 = 3 and gl = 3), and so would the mirror of a second, less likely
// region: for g = min(3 - u1, 4 + u1), g = 1 at the mirror (-3, 0) against
// g0 = 3 and gl = 6.
func (f *formSolver) likely(start []float64, found []formSearch, g0 float64) bool {
	gs := f.eval(start)
	if math.IsNaN(gs) {
		return false
	}
	near, dmin := 0, math.Inf(1)
	for i, r := range found {
		var d float64
		for j, v := range start {
			e := v - r.u[j]
			d += e * e
		}
		if d < dmin {
			near, dmin = i, d
		}
	}
	r := found[near]
	gl := r.g
	for j, v := range start {
		gl += r.grad[j] * (v - r.u[j])
	}
	return gs <= g0 && gs < gl-0.25*g0
}
