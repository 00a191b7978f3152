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
	LineLoad:      {1e-9, 1e9},
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

// maxReach bounds the values a distribution takes out to the 1e-16
// fractiles (eight standard normal units), which FORM, subset simulation
// and importance sampling visit: products of a few such values stay
// finite.
const maxReach = 1e30

// distInRange reports a distribution whose median lies outside the range
// of its dimension, or whose far tails are not finite or beyond maxReach
// (a lognormal with mu = 600, a Weibull of shape 0.02).
func (p *parser) distInRange(q *Quantity, d interface {
	Quantile(float64) float64
	FromStdNormal(float64) float64
}, o qopt) bool {
	med := d.Quantile(0.5)
	r, m := rangeOf(o.dim), math.Abs(med)
	if q.Relative {
		r = span{0, maxFraction}
	}
	if m != 0 && (m < r.lo || m > r.hi) {
		p.errorf(q.Path, "the median of the distribution, %s, is outside the range a study may use for %s (%g to %g%s, or 0): check its parameters and their unit",
			p.showShort(med, o.dim, q.Relative), o.dim, r.lo, r.hi, unitSuffix(o.dim, q.Relative))
		return false
	}
	for _, u := range []float64{-8.3, 8.3} {
		x := d.FromStdNormal(u)
		if math.IsNaN(x) || math.Abs(x) > maxReach {
			p.errorf(q.Path, "the distribution reaches %s at its 1e-16 fractile, beyond what can be computed with: check its parameters (a smaller spread, a shape nearer 1)", p.showShort(x, o.dim, q.Relative))
			return false
		}
	}
	return true
}

// showShort formats a value in the study's units with 3 digits, or as a
// fraction of L.
func (p *parser) showShort(v float64, d Dim, rel bool) string {
	if rel {
		return fmt.Sprintf("%.3g L", v)
	}
	u := p.sys.Unit(d)
	x := v / p.sys.Factor(d)
	if u == "" {
		return fmt.Sprintf("%.3g", x)
	}
	return fmt.Sprintf("%.3g %s", x, u)
}

// unitSuffix is " mm" for a length, " L" for a fraction of the length.
func unitSuffix(d Dim, rel bool) string {
	switch {
	case rel:
		return " L"
	case InternalUnit(d) == "":
		return ""
	}
	return " " + InternalUnit(d)
}
