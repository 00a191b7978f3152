package column

import "math"

// drawn returns the drawn geometry of the open shapes (angle, channel,
// tee), whose principal axes and shear centre are computed from it.
func (s Section) drawn() (drawn, bool) {
	switch s.Shape {
	case ShapeAngle:
		return angleDrawn(s.Depth, s.Width, s.Thickness, s.Root), true
	case ShapeChannel:
		return channelDrawn(s.Depth, s.Width, s.Flange, s.Web), true
	case ShapeTee:
		return teeDrawn(s.Depth, s.Width, s.Flange, s.Web), true
	}
	return drawn{}, false
}

// torsion returns the St Venant torsion constant It and the warping
// constant Iw of the doubly symmetric and the custom shapes; iz is the
// second moment that bends the width (about the web of an I section).
//
//	I:     It = (2 b tf^3 + (h - tf) tw^3)/3, the thin-wall sum of b t^3/3
//	       over the flanges and the web midline (root fillets neglected);
//	       Iw = Iz (h - tf)^2 / 4 (thin-walled I; Timoshenko & Gere,
//	       Theory of Elastic Stability, 2nd ed., 5.3)
//	RHS:   It = 4 Am^2 t / pm, Am = (h - t)(b - t), pm = 2 (h + b - 2t)
//	       (Bredt's formula for a thin closed tube); Iw ~ 0
//	CHS:   It = 2 I (the polar moment of a tube); Iw = 0
//	rect:  It = h b^3 (1/3 - 0.21 (b/h)(1 - b^4/(12 h^4))), b <= h
//	       (Young & Budynas, Roark's Formulas for Stress and Strain,
//	       Table 10.1; from memory); Iw ~ 0
//	round: It = pi d^4 / 32 = 2 I; Iw = 0
//	custom: It and Iw as given (0: unknown)
func (s Section) torsion(iz float64) (it, iw float64) {
	switch s.Shape {
	case ShapeI:
		h, b, tf, tw := s.Depth, s.Width, s.Flange, s.Web
		hf := h - tf
		return (2*b*tf*tf*tf + hf*tw*tw*tw) / 3, iz * hf * hf / 4
	case ShapeRHS:
		h, b, t := s.Depth, s.Width, s.Thickness
		am := (h - t) * (b - t)
		pm := 2 * (h + b - 2*t)
		return 4 * am * am * t / pm, 0
	case ShapeCHS:
		d, di := s.Diameter, s.Diameter-2*s.Thickness
		return math.Pi / 32 * (d*d*d*d - di*di*di*di), 0
	case ShapeRect:
		h, b := math.Max(s.Depth, s.Width), math.Min(s.Depth, s.Width)
		q := b / h
		return h * b * b * b * (1.0/3 - 0.21*q*(1-q*q*q*q/12)), 0
	case ShapeRound:
		d := s.Diameter
		return math.Pi / 32 * d * d * d * d, 0
	case ShapeCustom:
		return s.It, s.Iw
	}
	return 0, 0
}
