package column

// rhsSection returns the area and the second moments of a rectangular
// hollow section of outside depth h, width b and wall t whose corners are
// rounded to the outer radius ro and the inner radius ri: ix bends the
// depth, iy the width. The section is the rounded outer rectangle less
// the rounded inner one; each rounded rectangle is the full rectangle less
// its four corner spandrels (the square r x r less the quarter disc),
// whose area, centroid and own second moment are exact (the filletA,
// filletC, filletI terms also used for the root fillets of an I section).
// Zero radii give square corners. The area is the formula of EN 10219-2
// and EN 10210-2, 2t(b + h - 2t) - (4 - pi)(ro^2 - ri^2) (from memory).
func rhsSection(h, b, t, ro, ri float64) (a, ix, iy float64) {
	ao, ixo, iyo := roundedRect(h, b, ro)
	ai, ixi, iyi := roundedRect(h-2*t, b-2*t, ri)
	return ao - ai, ixo - ixi, iyo - iyi
}

// roundedRect returns the area and the centroidal second moments of an
// h x b rectangle whose four corners are rounded to radius r (ix bends
// the depth h).
func roundedRect(h, b, r float64) (a, ix, iy float64) {
	a = b * h
	ix = b * h * h * h / 12
	iy = h * b * b * b / 12
	if r > 0 {
		af := filletA * r * r
		io := filletI * r * r * r * r
		dx := h/2 - filletC*r
		dy := b/2 - filletC*r
		a -= 4 * af
		ix -= 4 * (io + af*dx*dx)
		iy -= 4 * (io + af*dy*dy)
	}
	return a, ix, iy
}

// RHSCornerRadii returns the default outer and inner corner radii of a
// rectangular hollow section of wall thickness t made by fab, as the
// product standards take them for the section properties (from memory):
// cold-formed (EN 10219-2) ro = 2t, ri = t for t <= 6 mm; 2.5t, 1.5t for
// 6 < t <= 10 mm; 3t, 2t above; hot-finished (EN 10210-2) ro = 1.5t,
// ri = t. Any other fabrication (a welded box) has square corners.
func RHSCornerRadii(t float64, fab Fabrication) (ro, ri float64) {
	switch fab {
	case ColdFormed:
		switch {
		case t <= 6:
			return 2 * t, t
		case t <= 10:
			return 2.5 * t, 1.5 * t
		}
		return 3 * t, 2 * t
	case HotFinished:
		return 1.5 * t, t
	}
	return 0, 0
}
