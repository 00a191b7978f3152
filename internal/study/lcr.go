package study

import (
	"math"
	"strings"

	"strutrisk/internal/column"
)

// Imperfections in the shape of the buckling mode.
//
// A bow or eccentricity written "Lcr/n" is the fraction 1/n of the
// buckling length K L of the axis evaluated, in each sample (K random or
// from end springs included): the amplitude of the imperfection in the
// shape of the buckling mode, as EN 1993-1-1:2005 5.3.2(11) takes it. The
// capacity models apply it to the equivalent pinned member of length K L,
// so a cantilever of length L with Lcr/1000 is the same problem as a pinned
// member of length 2 L with L/1000. A value written "L/n" stays a fraction
// of the member length L, whatever K is.

// lcrForm reads s written as "Lcr/n". done reports that s has that form
// (ok then says whether it was read without a problem).
func (p *parser) lcrForm(path, s string, o qopt) (pv pval, done, ok bool) {
	rest, has := strings.CutPrefix(s, "Lcr")
	if !has {
		return pval{}, false, false
	}
	rest, has = strings.CutPrefix(strings.TrimSpace(rest), "/")
	if !has {
		return pval{}, false, false
	}
	if !o.rel {
		p.errorf(path, "%q: the form Lcr/n is only for imperfections (bow, eccentricity and measured bows); write a value with a unit", s)
		return pval{}, true, false
	}
	n, good := parseNumber(strings.TrimSpace(rest))
	if !good || n == 0 {
		p.errorf(path, "%q: write Lcr/n with a non-zero number n, e.g. \"Lcr/1000\" (a fraction of the buckling length K L)", s)
		return pval{}, true, false
	}
	return pval{v: 1 / n, lcr: true}, true, true
}

// fraction reads s written as "a/b" (an angle such as "1/200") for a key
// that allows it. done reports that s has that form.
func (p *parser) fraction(path, s string, o qopt) (pv pval, done, ok bool) {
	if !o.frac {
		return pval{}, false, false
	}
	num, den, has := strings.Cut(s, "/")
	if !has {
		return pval{}, false, false
	}
	a, okA := parseNumber(strings.TrimSpace(num))
	b, okB := parseNumber(strings.TrimSpace(den))
	if !okA || !okB || b == 0 {
		p.errorf(path, "%q: write an angle as a fraction of two numbers, e.g. \"1/200\", or as a number in radians, e.g. 0.005", s)
		return pval{}, true, false
	}
	return pval{v: a / b}, true, true
}

// resolveLcr marks a quantity whose distribution is written in Lcr/n as a
// fraction of the buckling length, and reports whether q is such a
// quantity (then resolve leaves it alone).
func (p *parser) resolveLcr(q *Quantity) bool {
	if q == nil {
		return false
	}
	if q.spec == nil {
		return q.Lcr
	}
	lcr, other := false, false
	for k, v := range q.spec.params {
		if plainParams[k] {
			continue
		}
		if v.lcr {
			lcr = true
		} else if v.rel || v.v != 0 {
			other = true
		}
	}
	if !lcr {
		return false
	}
	if other {
		p.errorf(q.Path, "mixes Lcr/n with L/n or lengths with a unit: write every length of this distribution as Lcr/n")
		return true
	}
	for k, v := range q.spec.params {
		v.lcr = false
		q.spec.params[k] = v
	}
	q.Lcr = true
	return true
}

// axisMember sets the imperfections of member m that depend on the axis a
// evaluated: a bow or eccentricity written Lcr/n (v holds the fraction),
// the equivalent bow of capacity.imperfection = "equivalent", and the sway
// about an axis whose ends sway.
func (md *Model) axisMember(m *column.Member, v *values, a column.Axis) {
	if md.curve {
		return // the curve carries its own imperfection
	}
	lcr := m.K[a] * m.Length
	if md.lcrBow {
		m.Bow = v[fBow] * lcr
	}
	if md.lcrEcc {
		m.Ecc = v[fEcc] * lcr
	}
	if md.equivalent {
		if md.Study.Bow == nil {
			m.Bow = column.EquivalentBow(m, a, m.Alpha[a])
		} else { // the study's bow replaces the geometric part
			m.Bow = column.ResidualBow(m, a, m.Alpha[a]) + math.Abs(m.Bow)
		}
	}
	m.Sway = 0
	if md.Study.SwayAxes[a] {
		m.Sway = v[fSway]
	}
}

// measuredLcr puts a measured bow val into the unit of the study's bow q:
// a fraction of the buckling length when q is written Lcr/n (then every
// measured value must be written Lcr/n too), millimetres otherwise (a
// value written Lcr/n then needs one fixed buckling length K L). It
// reports problems against key at and returns false.
func (p *parser) measuredLcr(at string, q *Quantity, pv pval, val *float64, length float64) bool {
	switch {
	case q.Lcr && !pv.lcr:
		p.errorf(at, "%s is written as Lcr/n (a fraction of the buckling length): write the measured bows as Lcr/n too, e.g. \"Lcr/850\"", q.Path)
		return false
	case q.Lcr || !pv.lcr:
		return true
	}
	// A value written Lcr/n for a bow in millimetres.
	var k [2]float64
	for a, e := range p.st.Ends {
		if e.How == "springs" || e.K == nil || e.K.Random() {
			p.errorf(at, "Lcr/n needs a fixed buckling length to turn into millimetres, and the K of the %s axis is random or from end springs: write the measured bow in mm or as L/n", column.Axis(a))
			return false
		}
		k[a] = e.K.Value
	}
	if k[0] != k[1] || !(length > 0) {
		p.errorf(at, "Lcr/n needs one fixed buckling length to turn into millimetres (K differs by axis or the length is random): write the measured bow in mm or as L/n")
		return false
	}
	*val *= k[0] * length
	return true
}

// twistMember returns m with the imperfections the modes that twist the
// section take: those of column.TwistingAxis, and the equivalent bow of
// the twisting modes with capacity.imperfection = "equivalent".
func (md *Model) twistMember(m column.Member, v *values) column.Member {
	md.twistInPlace(&m, v)
	return m
}

// twistingBow is the equivalent bow of the twisting modes (the curve of the
// minor axis, EN 1993-1-1 6.3.1.4(2)), with the study's own bow in place
// of its geometric part as in axisMember.
func (md *Model) twistingBow(m *column.Member, v *values) float64 {
	e0 := column.EquivalentTwistingBow(m, m.Alpha[column.Minor])
	if md.Study.Bow == nil {
		return e0
	}
	a := column.TwistingAxis(&m.Props)
	own := v[fBow]
	switch {
	case md.lcrBow:
		own *= m.K[a] * m.Length
	case md.relBow:
		own *= m.Length
	}
	return math.Max(0, e0-column.CalibrationBow*m.K[a]*m.Length) + math.Abs(own)
}
