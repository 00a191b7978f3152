package column

import (
	"errors"
	"fmt"
)

// S460Yield is the characteristic yield strength (MPa) from which
// BucklingCurve reads the S460 column of EN 1993-1-1 Table 6.2: the
// nominal yield strength of S460 is 460 MPa up to 40 mm and 440 MPa above
// (EN 1993-1-1:2005 Table 3.1), and that of the next grade down, S420, at
// most 420 MPa.
const S460Yield = 440

// BucklingCurve returns the buckling curve ("a0" to "d") of EN 1993-1-1:2005
// Table 6.2 for flexural buckling of the section s about axis (Major or
// Minor, labelled by stiffness as Properties does), made by fab, of a
// steel whose characteristic yield strength is fyk (MPa; the S460 column
// applies from S460Yield up). It also returns the row it read, in words,
// for messages. The dimensions are the nominal ones: the thickness loss
// of s is not removed (the table classifies the product).
//
// The rows (from the standard's table, transcribed from memory):
//   - rolled I or H, h/b > 1.2: tf <= 40 mm: y-y a, z-z b (S460 a0, a0);
//     40 < tf <= 100 mm: y-y b, z-z c (S460 a, a);
//   - rolled I or H, h/b <= 1.2: tf <= 100 mm: y-y b, z-z c (S460 a, a);
//     tf > 100 mm: d, d (S460 c, c); a section with h/b > 1.2 and
//     tf > 100 mm, which the table does not cover, takes this row too;
//   - welded I: tf <= 40 mm: y-y b, z-z c; tf > 40 mm: y-y c, z-z d (any
//     grade);
//   - hollow sections: hot-finished a (S460 a0); cold-formed c;
//   - welded box: b in general, c with thick welds and b/tf < 30,
//     h/tw < 30; the weld size is not known here, so c applies whenever
//     both ratios are below 30;
//   - solid sections: c;
//   - L-sections: b; U- and T-sections: c (any grade).
//
// y-y is the axis about which bending stresses the depth of an I section
// (its major axis unless the flanges are wider than the depth makes the
// web axis stiffer). A custom section, or a fabrication the shape cannot
// have (see Fabrications), is an error.
func BucklingCurve(s Section, fab Fabrication, fyk float64, axis Axis) (curve, row string, err error) {
	if axis != Major && axis != Minor {
		return "", "", ErrAxis
	}
	if err := s.check(); err != nil {
		return "", "", fmt.Errorf("column: %s", err)
	}
	if !fabricationFits(s.Shape, fab) {
		return "", "", fmt.Errorf("column: a %s section cannot be %q (use one of %s)", s.Shape, fab, fabricationList(s.Shape))
	}
	s460 := fyk >= S460Yield
	pick := func(normal, high string) string {
		if s460 {
			return high
		}
		return normal
	}
	switch s.Shape {
	case ShapeI:
		return iCurve(s, fab, axis, pick)
	case ShapeRHS, ShapeCHS:
		switch fab {
		case HotFinished:
			return pick("a", "a0"), "hollow section, hot-finished", nil
		case ColdFormed:
			return "c", "hollow section, cold-formed", nil
		}
		h, b, t := s.Depth, s.Width, s.Thickness
		if b/t < 30 && h/t < 30 {
			return "c", "welded box, b/t and h/t below 30 (thick welds not excluded)", nil
		}
		return "b", "welded box", nil
	case ShapeRect, ShapeRound:
		return "c", "solid section", nil
	case ShapeAngle:
		return "b", "L-section", nil
	case ShapeChannel, ShapeTee:
		return "c", "U- or T-section", nil
	}
	return "", "", errors.New("column: a custom section has no row in EN 1993-1-1 Table 6.2: give capacity.curve")
}

// iCurve is BucklingCurve for an I section.
func iCurve(s Section, fab Fabrication, axis Axis, pick func(normal, high string) string) (curve, row string, err error) {
	_, ix, iy := iSection(s.Depth, s.Width, s.Flange, s.Web, s.Root)
	yy := (axis == Major) == (ix >= iy) // the axis asked for is y-y
	name := "z-z"
	if yy {
		name = "y-y"
	}
	both := func(y, z string) string {
		if yy {
			return y
		}
		return z
	}
	tf, hb := s.Flange, s.Depth/s.Width
	if fab == Welded {
		if tf <= 40 {
			return both("b", "c"), "welded I, tf <= 40 mm, " + name, nil
		}
		return both("c", "d"), "welded I, tf > 40 mm, " + name, nil
	}
	switch {
	case hb > 1.2 && tf <= 40:
		return pick(both("a", "b"), "a0"), "rolled I, h/b > 1.2, tf <= 40 mm, " + name, nil
	case hb > 1.2 && tf <= 100:
		return pick(both("b", "c"), "a"), "rolled I, h/b > 1.2, 40 < tf <= 100 mm, " + name, nil
	case tf <= 100:
		return pick(both("b", "c"), "a"), "rolled I, h/b <= 1.2, tf <= 100 mm, " + name, nil
	}
	return pick("d", "c"), "rolled I, tf > 100 mm, " + name, nil
}

// fabricationFits reports whether a shape can have fab.
func fabricationFits(s Shape, fab Fabrication) bool {
	for _, f := range Fabrications(s) {
		if f == fab {
			return true
		}
	}
	return false
}

// fabricationList names the fabrications of a shape, for messages.
func fabricationList(s Shape) string {
	out := ""
	for i, f := range Fabrications(s) {
		if i > 0 {
			out += ", "
		}
		out += fmt.Sprintf("%q", f.String())
	}
	if out == "" {
		return "none"
	}
	return out
}

// CurveSeverity returns the rank of a buckling curve, 0 for "a0" to 4 for
// "d" (EN 1993-1-1 Table 6.1, least to most severe), -1 for an unknown
// name.
func CurveSeverity(name string) int {
	for i, n := range curveNames {
		if n == name {
			return i
		}
	}
	return -1
}
