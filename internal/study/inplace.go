package study

import (
	"errors"
	"math"

	"strutrisk/internal/column"
)

// The evaluation of one sample works in place: the member and, when the
// section is random, the section are filled in buffers on the caller's
// stack and passed by pointer, so that no Member (256 bytes), Section or
// Props (168 bytes each) is copied between the steps. member and capacity
// wrap it for the callers that want values.

// errNotNumber is the refusal of a capacity that is NaN or infinite.
var errNotNumber = errors.New("study: capacity is not a number")

// memberInto fills m, which must be the zero Member, with the column member
// of one set of inputs. It returns the section of the sample: md.sec when
// the section is fixed, else buf filled with the sample's dimensions.
func (md *Model) memberInto(v *values, m *column.Member, buf *column.Section) (*column.Section, error) {
	m.E, m.G, m.Fy, m.Length, m.Bow, m.Ecc = v[fE], v[fG], v[fFy], v[fLength], v[fBow], v[fEcc]
	if md.relBow {
		m.Bow *= m.Length
	}
	if md.relEcc {
		m.Ecc *= m.Length
	}
	sec := &md.sec
	if md.secRandom {
		*buf = md.sec
		for _, i := range md.secVary {
			*buf.Field(sectionDims[i].dim) = v[fSec0+i]
		}
		corners(buf, md.radiusGiven, md.Study.Section.Fabrication)
		sec = buf
	}
	if md.propsDynamic {
		if err := md.propsInto(sec, m.Fy, &m.Props); err != nil {
			return sec, err
		}
	} else {
		m.Props = md.props
	}
	for a := range 2 {
		switch {
		case !md.springs[a]:
			m.K[a] = v[fK0+a]
		case md.kDynamic:
			k, err := md.springK(v, &m.Props, a)
			if err != nil {
				return sec, err
			}
			m.K[a] = k
		default:
			m.K[a] = md.k[a]
		}
	}
	m.Alpha = [2]float64{v[fAlpha0], v[fAlpha1]}
	md.materialMember(m, v) // materialmodel.go
	if md.curve {
		m.Bow, m.Ecc = 0, 0
	}
	return sec, nil
}

// capacityInto evaluates the capacity model (without the model factor)
// into the zero member m; buf is the section buffer of memberInto. With
// axis Both m ends as the member of the governing mode.
func (md *Model) capacityInto(v *values, axis column.Axis, m *column.Member, buf *column.Section) (column.Result, error) {
	sec, err := md.memberInto(v, m, buf)
	if err != nil {
		return column.Result{}, err
	}
	var res column.Result
	switch {
	case !md.perAxis && !md.mat.adjust && md.kernel == kernelFirstYield:
		res, err = column.FirstYield(m, axis) // evaluate's commonest case, without its call
	case !md.perAxis:
		res, err = md.evaluate(m, sec, v, axis)
	case axis != column.Both:
		md.axisMember(m, v, axis)
		res, err = md.evaluate(m, sec, v, axis)
	default:
		res, err = md.bothAxes(m, sec, v)
	}
	if err == nil && (math.IsNaN(res.N) || math.IsInf(res.N, 0)) {
		err = errNotNumber
	}
	return res, err
}

// imperfections are the fields of a member that axisMember and
// twistMember set: the only ones that differ between the modes.
type imperfections struct{ bow, ecc, sway float64 }

func (im *imperfections) from(m *column.Member) { im.bow, im.ecc, im.sway = m.Bow, m.Ecc, m.Sway }
func (im *imperfections) to(m *column.Member)   { m.Bow, m.Ecc, m.Sway = im.bow, im.ecc, im.sway }

// bothAxes evaluates both axes of a member whose imperfections differ by
// axis, each with its own (axisMember), and the modes that twist the
// section with the imperfections of column.TwistingAxis, as the column
// models do with Both: the weaker governs, a tie the mode of the lower
// elastic critical load (column.MinorGoverns, column.TwistingGoverns). It works on m itself: each mode
// sets its own imperfections on m (the column models never write to a
// member), and m ends with those of the mode that governs.
func (md *Model) bothAxes(m *column.Member, sec *column.Section, v *values) (column.Result, error) {
	var base, best imperfections
	base.from(m)
	md.axisMember(m, v, column.Major)
	rj, err := md.evaluate(m, sec, v, column.Major)
	if err != nil {
		return rj, err
	}
	best.from(m)
	base.to(m)
	md.axisMember(m, v, column.Minor)
	res, err := md.evaluate(m, sec, v, column.Minor)
	if err != nil {
		return res, err
	}
	if !column.MinorGoverns(m, res.N, rj.N) {
		res = rj
	} else {
		best.from(m)
	}
	if m.Props.It == 0 || md.planar {
		best.to(m)
		return res, nil
	}
	base.to(m)
	md.twistInPlace(m, v)
	governs := column.GovernsFirstYield
	if md.curve {
		governs = column.GovernsCurve
	}
	rt, err := column.Twisting(m, governs)
	if err != nil || column.TwistingGoverns(m, rt.N, res.N, res.Axis) {
		return rt, err
	}
	best.to(m)
	return res, nil
}

// twistInPlace gives m the imperfections of the modes that twist the
// section (see twistMember).
func (md *Model) twistInPlace(m *column.Member, v *values) {
	md.axisMember(m, v, column.TwistingAxis(&m.Props))
	if md.equivalent && !md.curve {
		m.Bow = md.twistingBow(m, v)
	}
}
