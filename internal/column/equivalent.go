package column

import "math"

// EquivalentBow returns the amplitude e0 (mm) of the equivalent bow that
// stands for the geometric imperfections and the residual stresses of a
// member about axis a, for the imperfection factor alpha of its buckling
// curve:
//
//	e0 = alpha (lam - lam0) W/A   (0 for lam <= lam0)
//
// with lam0 the plateau of the member's material (0.2 for steel, see
// Member.Kind and MaterialCurve), lam the relative slenderness about a (eq. 6.50; 6.51 with A_eff),
// W = I/c the elastic section modulus and A the area of Props (W_eff and
// A_eff for a class 4 section). This is the
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
	lam, lam0 := RelativeSlenderness(m, a), m.plateau()
	if !(lam > lam0) || !(alpha > 0) {
		return 0
	}
	return alpha * (lam - lam0) * bowPerEta(&m.Props, a)
}

// bowPerEta is the bow whose relative bending stress e A/W is 1 about a:
// W/A = r^2/c, or W_eff/A_eff for a class 4 section (as FirstYield takes
// it).
func bowPerEta(p *Props, a Axis) float64 {
	if p.AEff > 0 {
		return p.EffectiveModulus(a) / p.AEff
	}
	return p.R[a] * (p.R[a] / p.C[a])
}

// TwistingAxis is the axis whose bow, eccentricity and sway the first-yield
// check of the twisting modes takes (see Twisting): the one with the larger
// c/r^2.
func TwistingAxis(p *Props) Axis {
	if p.C[Minor]/(p.R[Minor]*p.R[Minor]) >= p.C[Major]/(p.R[Major]*p.R[Major]) {
		return Minor
	}
	return Major
}

// EquivalentTwistingBow is EquivalentBow for the modes that twist the
// section: alpha (lam_T - 0.2) W/A about TwistingAxis, with lam_T =
// sqrt(A fy / N_cr) and N_cr of TwistingLoad, so that the first-yield check
// of Twisting gives the buckling curve of EN 1993-1-1:2005 6.3.1.4 (eq.
// (6.49) with lam_T) as the curve model does. It returns 0 when the
// section's torsion is not known (Props.It = 0).
func EquivalentTwistingBow(m *Member, alpha float64) float64 {
	if m.Props.It == 0 || !(alpha > 0) {
		return 0
	}
	ncr, _ := TwistingLoad(m)
	lam, lam0 := math.Sqrt(m.Props.EffectiveArea()*m.Fy/ncr), m.plateau()
	if !(lam > lam0) {
		return 0
	}
	return alpha * (lam - lam0) * bowPerEta(&m.Props, TwistingAxis(&m.Props))
}

// CalibrationBow is the initial bow, as a fraction of the buckling length,
// of the member simulations from which the European buckling curves (and
// so EN 1993-1-1 Table 6.1) were derived: L/1000 with measured residual
// stresses (ECCS, Beer & Schulz 1970; from memory).
const CalibrationBow = 1.0 / 1000

// ResidualBow returns the part of EquivalentBow that stands for the
// residual stresses and what else the curves carry beyond a geometric bow
// of CalibrationBow times K L: max(0, e0 - K L/1000). A study that gives
// its own (random) geometric bow adds it to this part, so that a bow of
// K L/1000 gives back the curve wherever e0 >= K L/1000 (at relative
// slenderness below about 0.3 the result is then below the curve, on the
// safe side). This split of the generalised imperfection is an
// approximation: the share of the residual stresses is not linear in the
// bow.
func ResidualBow(m *Member, a Axis, alpha float64) float64 {
	return math.Max(0, EquivalentBow(m, a, alpha)-CalibrationBow*m.K[a]*m.Length)
}
