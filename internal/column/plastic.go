package column

import (
	"fmt"
	"math"
)

// PlasticModulus returns the plastic section moduli Wpl (mm^3) about the
// major and the minor axis (labelled as Properties labels them) of an I,
// RHS, CHS, rect or round section after its thickness loss: the first
// moment of area of each half about the axis through the centroid, for a
// doubly symmetric section the sum of |A_i z_i|. The root fillets of an I
// and the rounded corners of an RHS are the exact spandrels (area
// (1 - pi/4) r^2, centroid (10 - 3 pi)/(12 - 3 pi) r from the straight
// edges), which gives the section tables' formula
//
//	Wpl,y = tw h^2/4 + (b - tw)(h - tf) tf + (4 - pi)/2 r^2 (h - 2tf) + (3 pi - 10)/3 r^3
//
// for an I (e.g. the IPE and HE tables of the producers, from memory).
// Other shapes have no plastic modulus here (an error says so).
func (s Section) PlasticModulus() ([2]float64, error) {
	r, err := s.Reduced()
	if err != nil {
		return [2]float64{}, err
	}
	var wx, wy float64 // x bends the depth
	switch r.Shape {
	case ShapeI:
		h, b, tf, tw, rr := r.Depth, r.Width, r.Flange, r.Web, r.Root
		af := 4 * filletA * rr * rr
		wx = tw*h*h/4 + (b-tw)*(h-tf)*tf + af*(h/2-tf-filletC*rr)
		wy = tf*b*b/2 + (h-2*tf)*tw*tw/4 + af*(tw/2+filletC*rr)
	case ShapeRHS:
		ox, oy := roundedRectPlastic(r.Depth, r.Width, r.Radius)
		ix, iy := roundedRectPlastic(r.Depth-2*r.Thickness, r.Width-2*r.Thickness, r.InnerRadius)
		wx, wy = ox-ix, oy-iy
	case ShapeCHS:
		d, di := r.Diameter, r.Diameter-2*r.Thickness
		wx = (d*d*d - di*di*di) / 6
		wy = wx
	case ShapeRect:
		wx, wy = r.Width*r.Depth*r.Depth/4, r.Depth*r.Width*r.Width/4
	case ShapeRound:
		wx = r.Diameter * r.Diameter * r.Diameter / 6
		wy = wx
	default:
		return [2]float64{}, fmt.Errorf("section: no plastic modulus for this shape (I, RHS, CHS, rect and round have one)")
	}
	p, err := s.Properties()
	if err != nil {
		return [2]float64{}, err
	}
	if p.Angle == math.Pi/2 { // the width is the stronger direction
		wx, wy = wy, wx
	}
	return [2]float64{wx, wy}, nil
}

// roundedRectPlastic returns the plastic moduli of a solid h x b
// rectangle whose corners are rounded to radius r (x bends the depth).
func roundedRectPlastic(h, b, r float64) (wx, wy float64) {
	af := 4 * filletA * r * r
	return b*h*h/4 - af*(h/2-filletC*r), h*b*b/4 - af*(b/2-filletC*r)
}
