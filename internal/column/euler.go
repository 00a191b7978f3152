package column

import "math"

// EulerLoad returns the elastic critical load pi^2 E I / Le^2 of a
// perfectly straight, centrally loaded strut of effective length Le
// (Euler 1744; e.g. Timoshenko & Gere, Theory of Elastic Stability,
// ch. 2). The inputs are not checked.
func EulerLoad(e, i, le float64) float64 {
	return math.Pi * math.Pi * e * i / (le * le)
}

// EulerStress returns the elastic critical stress pi^2 E / lambda^2 for the
// slenderness lambda = Le/r (Timoshenko & Gere, ch. 2). The inputs are not
// checked.
func EulerStress(e, slenderness float64) float64 {
	return math.Pi * math.Pi * e / (slenderness * slenderness)
}

// Slenderness returns K L / r about axis; with Both it returns the larger
// of the two. The member is not checked (see Member.Validate).
func Slenderness(m *Member, axis Axis) float64 {
	if axis == Both {
		return math.Max(slenderness(m, Major), slenderness(m, Minor))
	}
	return slenderness(m, axis)
}

func slenderness(m *Member, a Axis) float64 {
	return m.K[a] * m.Length / m.Props.R[a]
}

// RelativeSlenderness returns the relative slenderness
// sqrt(A fy / Ncr) = (K L / r) / (pi sqrt(E / fy)) of EN 1993-1-1:2005
// eq. (6.50) about axis, or sqrt(A_eff fy / Ncr) (eq. 6.51) for a class 4
// section (Props.AEff > 0); with Both it returns the larger of the two. The
// member is not checked (see Member.Validate).
func RelativeSlenderness(m *Member, axis Axis) float64 {
	if axis == Both {
		return math.Max(relSlenderness(m, Major), relSlenderness(m, Minor))
	}
	return relSlenderness(m, axis)
}

// relSlenderness is RelativeSlenderness about one axis.
func relSlenderness(m *Member, a Axis) float64 {
	lam := slenderness(m, a) / (math.Pi * math.Sqrt(m.E/m.Fy))
	if m.Props.AEff > 0 {
		lam *= math.Sqrt(m.Props.AEff / m.Props.A)
	}
	return lam
}

// Euler returns the elastic critical load pi^2 E A r^2 / (K L)^2 about
// axis, using Props.A and Props.R; with Both it returns the smaller of the
// two. The member is not checked (see Member.Validate).
func Euler(m *Member, axis Axis) float64 {
	return m.Props.A * EulerStress(m.E, Slenderness(m, axis))
}
