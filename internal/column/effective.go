package column

import "math"

// EffectiveArea returns the area that carries the axial load: AEff of a
// class 4 section, else A.
func (p *Props) EffectiveArea() float64 {
	if p.AEff > 0 {
		return p.AEff
	}
	return p.A
}

// EffectiveModulus returns the elastic section modulus about a (Major or
// Minor) that resists bending: WEff of a class 4 section, else W.
func (p *Props) EffectiveModulus(a Axis) float64 {
	if p.WEff[a] > 0 {
		return p.WEff[a]
	}
	return p.W[a]
}

// PlateRho returns the reduction factor rho of a plate element in uniform
// compression (stress ratio psi = 1) of EN 1993-1-5:2006 4.4(2): for an
// internal element (eq. 4.2, k_sigma = 4.0, Table 4.1)
//
//	rho = (lp - 0.055 (3 + psi)) / lp^2 <= 1 for lp > 0.673, else 1,
//
// and for an outstand (eq. 4.3, k_sigma = 0.43, Table 4.2)
//
//	rho = (lp - 0.188) / lp^2 <= 1 for lp > 0.748, else 1,
//
// with the plate slenderness lp = (b/t) / (28.4 eps sqrt(k_sigma)),
// eps = sqrt(235/fy), where ratio is b/t. The refinement of 4.4(4) for a
// stress below fy is not used (the result is on the safe side).
func PlateRho(ratio, eps float64, outstand bool) float64 {
	k := 4.0
	if outstand {
		k = 0.43
	}
	lp := PlateSlenderness(ratio, eps, k)
	if outstand {
		if lp <= 0.748 {
			return 1
		}
		return math.Min(1, (lp-0.188)/(lp*lp))
	}
	if lp <= 0.673 {
		return 1
	}
	return math.Min(1, (lp-0.22)/(lp*lp))
}

// PlateSlenderness returns the plate slenderness of EN 1993-1-5:2006
// 4.4(2), lp = (b/t) / (28.4 eps sqrt(k_sigma)), for the width-to-thickness
// ratio b/t, eps = sqrt(235/fy) and the buckling factor ksigma.
func PlateSlenderness(ratio, eps, ksigma float64) float64 {
	return ratio / (28.4 * eps * math.Sqrt(ksigma))
}
