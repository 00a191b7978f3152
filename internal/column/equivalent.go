package column

// EquivalentBow returns the amplitude e0 (mm) of the equivalent bow that
// stands for the geometric imperfections and the residual stresses of a
// member about axis a, for the imperfection factor alpha of its buckling
// curve:
//
//	e0 = alpha (lam - 0.2) W/A   (0 for lam <= 0.2)
//
// with lam the relative slenderness about a (eq. 6.50), W = I/c the
// elastic section modulus and A the area of Props. This is the
// generalised imperfection behind the buckling curves of EN 1993-1-1:2005
// 6.3.1.2: with it, the first-yield (Perry) condition of a pinned member,
// N/A + N e0 / (W (1 - N/Ncr)) = fy, gives exactly chi of eq. (6.49).
// EN 1993-1-1:2005 5.3.2(11), eq. (5.9), states the same amplitude for an
// imperfection in the shape of the elastic critical buckling mode, with
// M_Rk/N_Rk = W/A (the elastic resistance, which first yield uses) and
// gamma_M1 = 1 (no partial factor: strutrisk evaluates resistances).
// Applied to the equivalent pinned member of length K L, the bow is in
// the shape of the buckling mode.
//
// The member is not checked (see Member.Validate); a negative or NaN
// alpha gives 0.
func EquivalentBow(m *Member, a Axis, alpha float64) float64 {
	lam := RelativeSlenderness(m, a)
	if !(lam > 0.2) || !(alpha > 0) {
		return 0
	}
	r, c := m.Props.R[a], m.Props.C[a]
	return alpha * (lam - 0.2) * r * (r / c)
}
