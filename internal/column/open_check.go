package column

import (
	"fmt"
	"math"
)

// checkOpen validates the dimensions of an angle, a channel or a tee.
func (s Section) checkOpen() error {
	pos := func(name string, x float64) error {
		if !positive(x) {
			return sectionError(fmt.Sprintf("%s %g mm must be positive and finite", name, x))
		}
		return nil
	}
	for _, c := range [...]struct {
		name string
		x    float64
	}{{"depth", s.Depth}, {"width", s.Width}} {
		if err := pos(c.name, c.x); err != nil {
			return err
		}
	}
	switch s.Shape {
	case ShapeAngle:
		if err := pos("leg thickness", s.Thickness); err != nil {
			return err
		}
		leg := math.Min(s.Depth, s.Width)
		switch {
		case s.Thickness >= leg:
			return sectionError(fmt.Sprintf("leg thickness %g mm leaves no leg: legs %g and %g mm (use a solid rect)", s.Thickness, s.Depth, s.Width))
		case !(s.Root >= 0 && s.Root <= math.MaxFloat64):
			return sectionError(fmt.Sprintf("root radius %g mm must be zero or positive and finite", s.Root))
		case s.Thickness+s.Root > leg:
			return sectionError(fmt.Sprintf("root radius %g mm does not fit on a leg of %g mm with thickness %g mm", s.Root, leg, s.Thickness))
		}
		return nil
	}
	if err := pos("flange thickness", s.Flange); err != nil {
		return err
	}
	if err := pos("web thickness", s.Web); err != nil {
		return err
	}
	flanges := 2.0 // a channel has two
	if s.Shape == ShapeTee {
		flanges = 1
	}
	switch {
	case flanges*s.Flange >= s.Depth:
		return sectionError(fmt.Sprintf("flange thickness %g mm leaves no web: depth %g mm", s.Flange, s.Depth))
	case s.Web >= s.Width && s.Shape == ShapeChannel:
		return sectionError(fmt.Sprintf("web thickness %g mm leaves no flange outstand: width %g mm", s.Web, s.Width))
	case s.Web > s.Width:
		return sectionError(fmt.Sprintf("web thickness %g mm is wider than the flange: width %g mm", s.Web, s.Width))
	}
	return nil
}

// checkCustomTorsion validates the torsional properties of a custom
// section.
func (s Section) checkCustomTorsion() error {
	switch {
	case !(s.It >= 0 && s.It <= math.MaxFloat64):
		return sectionError(fmt.Sprintf("torsion constant it %g mm^4 must be zero or positive and finite", s.It))
	case !(s.Iw >= 0 && s.Iw <= math.MaxFloat64):
		return sectionError(fmt.Sprintf("warping constant iw %g mm^6 must be zero or positive and finite", s.Iw))
	case s.It == 0 && (s.Iw != 0 || s.ShearCentre != [2]float64{}):
		return sectionError("a warping constant or shear-centre position needs the torsion constant it too")
	}
	for k, x := range s.ShearCentre {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return sectionError(fmt.Sprintf("shear-centre coordinate along the %s axis %g mm must be finite", Axis(k), x))
		}
	}
	return nil
}

// reduceOpen removes the thickness loss t from every face of an angle,
// channel or tee in place: legs, depth and width shrink by 2t (heel and
// toe, back and tips), each plate by 2t, and a root radius grows by t.
func (r *Section) reduceOpen(t float64) error {
	if r.Shape == ShapeAngle {
		if r.Thickness <= 2*t {
			return fmt.Errorf("section: thickness loss %g mm from each face consumes the legs (thickness %g mm)", t, r.Thickness)
		}
		r.Thickness -= 2 * t
		if r.Root > 0 {
			r.Root += t
		}
	} else {
		if r.Flange <= 2*t || r.Web <= 2*t {
			return fmt.Errorf("section: thickness loss %g mm from each face consumes the %s (flange %g mm, web %g mm)",
				t, thinner(r.Flange, r.Web), r.Flange, r.Web)
		}
		r.Flange -= 2 * t
		r.Web -= 2 * t
	}
	r.Depth -= 2 * t
	r.Width -= 2 * t
	return nil
}
