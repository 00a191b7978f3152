package column

import "math"

// Twisting returns the resistance of the member in the modes that twist
// the section (torsional and flexural-torsional buckling) by the model
// that governs names (GovernsFirstYield or GovernsCurve), with Mode
// ModeTorsional or ModeFlexuralTorsional and Axis Minor. It is +Inf when
// Props.It is 0 (torsion unknown). FirstYield and Curve include it when
// they evaluate both axes.
//
// As EN 1993-1-1:2005 6.3.1.4 does for the buckling curves, the relative
// slenderness is lam_T = sqrt(A fy / N_cr) with N_cr from TwistingLoad
// (A_eff of a class 4 section, which also resists chi A_eff fy),
// and the reduction factor is that of a flexural mode of the same
// slenderness:
//
//   - curve: eq. (6.49) with the imperfection factor of the minor axis
//     (6.3.1.4(2): the curve of the z-z axis);
//   - first yield: the first-yield equation of FirstYield with P/PE
//     replaced by P/N_cr and the bow, eccentricity and sway of the axis with
//     the larger e c / r^2 (the larger relative bending stress). This
//     generalises the Perry-Robertson and secant formulas beyond their
//     ground (they are exact for flexure only); a caller should say so.
//
// Invalid input returns an error (see Member.Validate), never NaN.
func Twisting(m *Member, governs string) (Result, error) {
	if err := m.Validate(Both); err != nil {
		return Result{}, err
	}
	if governs == GovernsCurve && !(m.Alpha[Minor] >= 0 && m.Alpha[Minor] <= math.MaxFloat64) {
		return Result{}, ErrAlpha
	}
	if m.Props.It == 0 {
		return Result{N: math.Inf(1), Axis: Minor, Governs: governs, Mode: ModeTorsional}, nil
	}
	return twisting(m, governs), nil
}

// twisting is Twisting of a validated member whose It is not 0.
func twisting(m *Member, governs string) Result {
	ncr, mode := TwistingLoad(m)
	res := Result{Axis: Minor, Governs: governs, Mode: mode}
	p := &m.Props
	ae := p.EffectiveArea()
	rho := ae * m.Fy / ncr // lam_T^2
	if governs == GovernsCurve {
		res.N = ae * m.Fy * ReductionFactor(math.Sqrt(rho), m.Alpha[Minor], m.plateau())
		return res
	}
	a := TwistingAxis(p)
	// e c / r^2 = e A / W; a class 4 section takes A_eff / W_eff.
	k := ae / p.EffectiveModulus(a)
	eta := math.Abs(m.Bow) * k
	ecc := math.Abs(m.Ecc) * k
	sw := math.Abs(m.Sway*swayArm(m, a)) * k
	if p.AEff == 0 {
		eta = relImp(m.Bow, p.R[a], p.C[a])
		ecc = relImp(m.Ecc, p.R[a], p.C[a])
		sw = relImp(m.Sway*swayArm(m, a), p.R[a], p.C[a])
	}
	res.N = ae * m.Fy * firstYieldChi(rho, eta, ecc, sw)
	return res
}
