package study

import (
	"fmt"
	"math"
)

// span is the plausible range of the magnitude of a value, in N, mm and
// MPa: zero, or between lo and hi. The bounds lie far outside any column
// (a length of 1 nm to 100 km, a force up to 1 TN) yet keep every product the
// mechanics forms (E I / L^2, A f_y, a sum of loads times its factor)
// finite, so a value that check accepts cannot overflow in run. (Values
// inside but far from a column's are warned of: plausible.go.)
type span struct{ lo, hi float64 }

// magnitude holds the range of each dimension. A plain number (K, a
// model or effect factor, alpha, and distribution parameters such as cov
// and shape) is at most 1000.
var magnitude = map[Dim]span{
	Dimensionless: {1e-9, 1e6},
	Length:        {1e-6, 1e8},
	Force:         {1e-6, 1e12},
	Stress:        {1e-6, 1e7},
	Moment:        {1e-6, 1e20},
	Spring:        {1e-6, 1e20},
	Area:          {1e-12, 1e16},
	SecondMoment:  {1e-24, 1e32},
	Warping:       {1e-36, 1e48},
}

// rangeOf returns the range of dimension d; a dimension added without a
// range here has none (every finite value), and TestEveryDimHasARange
// says so.
func rangeOf(d Dim) span {
	if r, ok := magnitude[d]; ok {
		return r
	}
	return span{0, math.MaxFloat64}
}

// maxFraction bounds a value written L/n: at most the member length.
const maxFraction = 1.0

// inRange reports a value outside its dimension's plausible range.
// Infinity (a rigid spring) is left to the caller's rules.
func (p *parser) inRange(path string, pv pval, o qopt) bool {
	m := math.Abs(pv.v)
	if m == 0 || math.IsInf(m, 1) {
		return true
	}
	if pv.rel {
		if m > maxFraction {
			p.errorf(path, "L/%g is more than the member length: write L/n with n of 1 or more (L/1000 for a bow of a thousandth of the length)", 1/pv.v)
			return false
		}
		return true
	}
	r := rangeOf(o.dim)
	if m >= r.lo && m <= r.hi {
		return true
	}
	unit := InternalUnit(o.dim)
	if unit != "" {
		unit = " " + unit
	}
	p.errorf(path, "%s is outside the range a study may use for %s (%g to %g%s, or 0): check the value and its unit",
		p.show(pv.v, o.dim), o.dim, r.lo, r.hi, unit)
	return false
}

// rangeHelp lists the ranges for the key help.
func rangeHelp() string {
	s := ""
	for d := Dimensionless; ; d++ {
		if d == Moment {
			continue
		}
		if _, ok := magnitude[d]; !ok {
			break
		}
		unit := InternalUnit(d)
		if unit != "" {
			unit = " " + unit
		}
		s += fmt.Sprintf("  %-24s 0, or %g to %g%s\n", d, magnitude[d].lo, magnitude[d].hi, unit)
	}
	return s
}
