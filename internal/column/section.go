package column

import (
	"fmt"
	"math"
)

// Properties returns the section properties after the thickness loss (see
// Reduced). The major axis is the one with the larger second moment: for
// a computed shape whose width makes the axis parallel to the depth
// stronger, the labels follow the stiffness (a tie keeps the axis
// parallel to the width as Major). A custom section with IMinor > IMajor is
// an error. Errors name the dimension that is wrong.
//
// Closed forms for the elastic properties of thin and solid sections, e.g.
// Young & Budynas, Roark's Formulas for Stress and Strain, Appendix A
// (from memory). The corners of a rectangular hollow section are rounded
// to Radius outside and InnerRadius inside (see rhsSection).
func (s Section) Properties() (Props, error) {
	r, err := s.Reduced()
	if err != nil {
		return Props{}, err
	}
	if d, ok := r.drawn(); ok {
		return d.principal(), nil
	}
	var a, ix, iy, cx, cy float64 // x: bending that stresses the depth
	switch r.Shape {
	case ShapeI:
		a, ix, iy = iSection(r.Depth, r.Width, r.Flange, r.Web, r.Root)
		cx, cy = r.Depth/2, r.Width/2
	case ShapeRHS:
		a, ix, iy = rhsSection(r.Depth, r.Width, r.Thickness, r.Radius, r.InnerRadius)
		cx, cy = r.Depth/2, r.Width/2
	case ShapeCHS:
		d, di := r.Diameter, r.Diameter-2*r.Thickness
		a = math.Pi / 4 * (d*d - di*di)
		ix = math.Pi / 64 * (d*d*d*d - di*di*di*di)
		iy, cx, cy = ix, d/2, d/2
	case ShapeRect:
		h, b := r.Depth, r.Width
		a = b * h
		ix, iy = b*h*h*h/12, h*b*b*b/12
		cx, cy = h/2, b/2
	case ShapeRound:
		d := r.Diameter
		a = math.Pi / 4 * d * d
		ix = math.Pi / 64 * d * d * d * d
		iy, cx, cy = ix, d/2, d/2
	case ShapeCustom:
		a, ix, iy, cx, cy = r.Area, r.IMajor, r.IMinor, r.CMajor, r.CMinor
	}
	var p Props
	p.It, p.Iw = r.torsion(iy) // iy bends the width: an I's flanges about the web
	if iy > ix {
		ix, iy, cx, cy = iy, ix, cy, cx
		p.Angle = math.Pi / 2
	}
	p.A = a
	p.I = [2]float64{ix, iy}
	p.CSide = [2][2]float64{{cx, cx}, {cy, cy}}
	if r.Shape == ShapeCustom {
		p.S = r.ShearCentre
	}
	p.finish()
	return p, nil
}

// Reduced returns the section with its ThicknessLoss t removed and set to
// zero: an I section loses t on both faces of the flanges and the web
// (depth and width shrink by 2t, flange and web by 2t, and the root
// radius, whose centre stays put, grows by t; a zero root radius, a sharp
// corner, stays zero); RHS and CHS lose t on the
// outside (depth, width or diameter shrink by 2t, the wall by t, the
// outer corner radius of an RHS by t, down to a sharp corner, and its
// inner radius stays); solid
// shapes lose t on every face. A custom section with a thickness loss is
// an error. Reduced also checks the dimensions before and after the loss.
func (s Section) Reduced() (Section, error) {
	if err := s.check(); err != nil {
		return Section{}, fmt.Errorf("section: %s", err)
	}
	t := s.ThicknessLoss
	if t == 0 {
		return s, nil
	}
	if !(t > 0 && t <= math.MaxFloat64) {
		return Section{}, fmt.Errorf("section: thickness loss %g mm must be zero or positive and finite", t)
	}
	r := s
	r.ThicknessLoss = 0
	switch s.Shape {
	case ShapeI:
		if s.Flange <= 2*t || s.Web <= 2*t {
			return Section{}, fmt.Errorf("section: thickness loss %g mm from each face consumes the %s (flange %g mm, web %g mm)",
				t, thinner(s.Flange, s.Web), s.Flange, s.Web)
		}
		r.Depth -= 2 * t
		r.Width -= 2 * t
		r.Flange -= 2 * t
		r.Web -= 2 * t
		if s.Root > 0 {
			r.Root += t
		}
	case ShapeRHS:
		if s.Thickness <= t {
			return Section{}, fmt.Errorf("section: thickness loss %g mm consumes the wall (thickness %g mm)", t, s.Thickness)
		}
		r.Depth -= 2 * t
		r.Width -= 2 * t
		r.Thickness -= t
		r.Radius = math.Max(s.Radius-t, 0) // the corner's centre stays put
	case ShapeCHS:
		if s.Thickness <= t {
			return Section{}, fmt.Errorf("section: thickness loss %g mm consumes the wall (thickness %g mm)", t, s.Thickness)
		}
		r.Diameter -= 2 * t
		r.Thickness -= t
	case ShapeRect:
		if math.Min(s.Depth, s.Width) <= 2*t {
			return Section{}, fmt.Errorf("section: thickness loss %g mm from each face consumes the bar (depth %g mm, width %g mm)", t, s.Depth, s.Width)
		}
		r.Depth -= 2 * t
		r.Width -= 2 * t
	case ShapeRound:
		if s.Diameter <= 2*t {
			return Section{}, fmt.Errorf("section: thickness loss %g mm consumes the bar (diameter %g mm)", t, s.Diameter)
		}
		r.Diameter -= 2 * t
	case ShapeAngle, ShapeChannel, ShapeTee:
		if err := r.reduceOpen(t); err != nil {
			return Section{}, err
		}
	case ShapeCustom:
		return Section{}, fmt.Errorf("section: a thickness loss (%g mm) cannot be applied to a custom section; give its reduced area, second moments and fibre distances instead", t)
	}
	if err := r.check(); err != nil {
		return Section{}, fmt.Errorf("section: after a thickness loss of %g mm: %s", t, err)
	}
	return r, nil
}

func thinner(flange, web float64) string {
	if flange <= web {
		return "flange"
	}
	return "web"
}

// sectionError is a message about a section's dimensions.
type sectionError string

func (e sectionError) Error() string { return string(e) }

// check validates the dimensions of the section's shape.
func (s Section) check() error {
	pos := func(name string, x float64) error {
		if !positive(x) {
			return sectionError(fmt.Sprintf("%s %g mm must be positive and finite", name, x))
		}
		return nil
	}
	first := func(errs ...error) error {
		for _, err := range errs {
			if err != nil {
				return err
			}
		}
		return nil
	}
	switch s.Shape {
	case ShapeI:
		if err := first(pos("depth", s.Depth), pos("width", s.Width), pos("flange thickness", s.Flange), pos("web thickness", s.Web)); err != nil {
			return err
		}
		switch {
		case !(s.Root >= 0 && s.Root <= math.MaxFloat64):
			return sectionError(fmt.Sprintf("root radius %g mm must be zero or positive and finite", s.Root))
		case 2*s.Flange >= s.Depth:
			return sectionError(fmt.Sprintf("flange thickness %g mm leaves no web: depth %g mm", s.Flange, s.Depth))
		case s.Web > s.Width:
			return sectionError(fmt.Sprintf("web thickness %g mm is wider than the flanges: width %g mm", s.Web, s.Width))
		case s.Web+2*s.Root > s.Width:
			return sectionError(fmt.Sprintf("root radius %g mm does not fit beside a web of %g mm within the width %g mm", s.Root, s.Web, s.Width))
		case 2*(s.Flange+s.Root) > s.Depth:
			return sectionError(fmt.Sprintf("root radius %g mm does not fit between flanges of %g mm within the depth %g mm", s.Root, s.Flange, s.Depth))
		}
	case ShapeRHS:
		if err := first(pos("depth", s.Depth), pos("width", s.Width), pos("wall thickness", s.Thickness)); err != nil {
			return err
		}
		if 2*s.Thickness >= math.Min(s.Depth, s.Width) {
			return sectionError(fmt.Sprintf("wall thickness %g mm leaves no hollow: depth %g mm, width %g mm (use a solid rect)", s.Thickness, s.Depth, s.Width))
		}
		if !(s.Radius >= 0 && 2*s.Radius <= math.Min(s.Depth, s.Width)) {
			return sectionError(fmt.Sprintf("corner radius %g mm must be zero or positive and at most half the smaller side (depth %g mm, width %g mm)", s.Radius, s.Depth, s.Width))
		}
		if !(s.InnerRadius >= 0 && 2*s.InnerRadius <= math.Min(s.Depth, s.Width)-2*s.Thickness) {
			return sectionError(fmt.Sprintf("inner corner radius %g mm must be zero or positive and fit inside the hollow (depth %g mm, width %g mm, wall %g mm)", s.InnerRadius, s.Depth, s.Width, s.Thickness))
		}
	case ShapeCHS:
		if err := first(pos("diameter", s.Diameter), pos("wall thickness", s.Thickness)); err != nil {
			return err
		}
		if 2*s.Thickness >= s.Diameter {
			return sectionError(fmt.Sprintf("wall thickness %g mm leaves no hollow: diameter %g mm (use a solid round)", s.Thickness, s.Diameter))
		}
	case ShapeRect:
		return first(pos("depth", s.Depth), pos("width", s.Width))
	case ShapeRound:
		return pos("diameter", s.Diameter)
	case ShapeCustom:
		area := func(name string, x float64) error {
			if !positive(x) {
				return sectionError(fmt.Sprintf("%s %g must be positive and finite", name, x))
			}
			return nil
		}
		if err := first(area("area", s.Area), area("second moment (major)", s.IMajor), area("second moment (minor)", s.IMinor),
			pos("extreme-fibre distance (major)", s.CMajor), pos("extreme-fibre distance (minor)", s.CMinor)); err != nil {
			return err
		}
		if !(s.EffArea >= 0 && s.EffArea <= s.Area) {
			return sectionError(fmt.Sprintf("effective area %g mm^2 must be zero or positive and at most the area %g mm^2", s.EffArea, s.Area))
		}
		if s.IMinor > s.IMajor {
			return sectionError(fmt.Sprintf("second moment about the minor axis %g mm^4 exceeds the major %g mm^4 (the major axis is the stiffer one; swap them)", s.IMinor, s.IMajor))
		}
		return s.checkCustomTorsion()
	case ShapeAngle, ShapeChannel, ShapeTee:
		return s.checkOpen()
	default:
		return sectionError(fmt.Sprintf("unknown shape %d", int(s.Shape)))
	}
	return nil
}

// Root fillet (spandrel between a quarter circle of radius r and the
// corner it rounds), per unit r: area 1 - pi/4, centroid filletC r from
// each of the two faces it joins, second moment about its own centroidal
// axis parallel to a face filletI r^4.
var (
	filletA = 1 - math.Pi/4
	filletC = (5.0/6 - math.Pi/4) / filletA
	filletI = (1 - 5*math.Pi/16) - filletA*filletC*filletC
)

// iSection returns the area and the second moments of a doubly symmetric
// I section, including its four root fillets: ix bends the depth, iy the
// width.
func iSection(h, b, tf, tw, r float64) (a, ix, iy float64) {
	hw := h - 2*tf
	a = 2*b*tf + hw*tw
	ix = (b*h*h*h - (b-tw)*hw*hw*hw) / 12
	iy = (2*tf*b*b*b + hw*tw*tw*tw) / 12
	if r > 0 {
		af := filletA * r * r
		io := filletI * r * r * r * r
		dx := hw/2 - filletC*r // from the centroid, across the depth
		dy := tw/2 + filletC*r // across the width
		a += 4 * af
		ix += 4 * (io + af*dx*dx)
		iy += 4 * (io + af*dy*dy)
	}
	return a, ix, iy
}
