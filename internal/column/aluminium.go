package column

import (
	"fmt"
	"math"
)

// HAZWidth returns the extent b_haz (mm) of the heat-affected zone beside
// a MIG weld joining parts of thickness t (mm), EN 1999-1-1:2007 6.1.6.3
// (from memory): 20 mm up to 6 mm, 30 mm to 12 mm, 35 mm to 25 mm and
// 40 mm above.
func HAZWidth(t float64) float64 {
	switch {
	case t <= 6:
		return 20
	case t <= 12:
		return 30
	case t <= 25:
		return 35
	}
	return 40
}

// HAZArea returns the area (mm^2) of the heat-affected zones of a member
// welded along its length, each zone b wide (mm) beside a weld (the HAZ
// extends b from the weld into every part it joins, never past the part):
//
//   - a welded I (Shape I): two web-to-flange welds; in each flange the
//     zone spans the web thickness and b on each side of it, in the web b
//     below each flange;
//   - a welded box (Shape RHS): four corner welds; in each wall b from each
//     corner.
//
// Other shapes have no longitudinal welds and return an error.
func HAZArea(s Section, b float64) (float64, error) {
	if !(b >= 0) || math.IsInf(b, 0) {
		return 0, fmt.Errorf("column: HAZ width %g must be zero or positive", b)
	}
	t := s.ThicknessLoss
	switch s.Shape {
	case ShapeI:
		tf, tw := s.Flange-2*t, s.Web-2*t
		w, h := s.Width-2*t, s.Depth-2*t
		flange := math.Min(w, tw+2*b) * tf
		web := math.Min(h-2*tf, 2*b) * tw
		return 2*flange + web, nil
	case ShapeRHS:
		th := s.Thickness - t
		h, w := s.Depth-2*t, s.Width-2*t
		return 2*math.Min(h, 2*b)*th + 2*math.Min(w, 2*b)*th, nil
	}
	return 0, fmt.Errorf("column: a %s section has no longitudinal welds to give a heat-affected zone", s.Shape)
}

// WeldedKappa returns the factor kappa of an aluminium member with
// longitudinal welds, EN 1999-1-1:2007 Table 6.5 (from memory), for
// buckling class A (classA true), eq. (6.68):
//
//	kappa = 1 - (1 - A1/A) 10^(-lam) - (0.05 + 0.1 A1/A) lam^(1.3 (1 - lam))
//
// and class B, eq. (6.69):
//
//	kappa = 1 + 0.04 (4 lam)^(0.5 - lam) - 0.22 lam^(1.4 (1 - lam))   lam > 0.2
//	kappa = 1                                                       lam <= 0.2
//
// with a1 = A1/A = 1 - (A_haz/A)(1 - rho_haz) the share of the area left
// when the heat-affected zones carry rho_haz of the strength, and lam the
// relative slenderness. The member resistance is kappa chi A f_o, never
// more than the resistance of its cross-section A1 f_o (see
// AluminiumWelded). kappa is at most 1.
func WeldedKappa(lam, a1 float64, classA bool) float64 {
	var k float64
	switch {
	case classA && !(lam > 0):
		k = a1
	case classA:
		k = 1 - (1-a1)*math.Pow(10, -lam) - (0.05+0.1*a1)*math.Pow(lam, 1.3*(1-lam))
	case lam <= 0.2:
		k = 1
	default:
		k = 1 + 0.04*math.Pow(4*lam, 0.5-lam) - 0.22*math.Pow(lam, 1.4*(1-lam))
	}
	return math.Min(1, k)
}

// AluminiumWelded returns the resistance of a welded aluminium member
// about one axis from its buckling curve's resistance chiAfo = chi A f_o
// (Curve), its relative slenderness lam, the share a1 = A1/A of the area
// left by the heat-affected zones and its buckling class:
// min(kappa chi A f_o, A1 f_o) (EN 1999-1-1:2007 eqs. 6.48 and 6.22, the
// cross-section resistance with the HAZ area reduced; from memory).
func AluminiumWelded(chiAfo, afo, lam, a1 float64, classA bool) float64 {
	return math.Min(WeldedKappa(lam, a1, classA)*chiAfo, a1*afo)
}
