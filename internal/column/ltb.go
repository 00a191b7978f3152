package column

import "math"

// MomentFactorC1 returns the factor C1 of the elastic critical moment for
// the moment diagram of a pinned member of length l (mm) with end moments
// ma, mb (N mm, the same sign is single curvature) and a uniform load q
// (N/mm) at the shear centre:
//   - end moments alone, psi = the smaller over the larger:
//     C1 = 1.88 - 1.40 psi + 0.52 psi^2 <= 2.70 (common practice; the
//     approximation used with ENV 1993-1-1 Annex F, from memory);
//   - the uniform load alone: C1 = 1.13 (the simply supported beam
//     under a uniform load, from memory);
//   - both: 1.0, the uniform moment, the most severe diagram (on the
//     safe side).
func MomentFactorC1(ma, mb, q float64) float64 {
	if q != 0 {
		if ma == 0 && mb == 0 {
			return 1.13
		}
		return 1
	}
	big, small := ma, mb
	if math.Abs(mb) > math.Abs(ma) {
		big, small = mb, ma
	}
	if big == 0 {
		return 1
	}
	psi := small / big
	return math.Min(1.88-1.40*psi+0.52*psi*psi, 2.70)
}

// CriticalMoment returns the elastic critical moment Mcr (N mm) of
// lateral-torsional buckling of a doubly symmetric member bent about its
// major axis, with fork supports at both ends, the load at the shear
// centre and the factor c1 for the moment diagram (Timoshenko & Gere,
// Theory of Elastic Stability, ch. 6, for the uniform moment):
//
//	Mcr = c1 (pi^2 E Iz / Lz^2) sqrt(Iw/Iz + Lz^2 G It / (pi^2 E Iz))
//
// with Lz = K_minor L, Iz = Props.I[Minor] (A r^2 when absent), It and Iw
// of Props and G of ShearModulus. It is +Inf without torsion constant It.
func CriticalMoment(m *Member, c1 float64) float64 {
	p := &m.Props
	if p.It == 0 {
		return math.Inf(1)
	}
	iz := p.I[Minor]
	if iz <= 0 {
		iz = p.A * p.R[Minor] * p.R[Minor]
	}
	lz := m.K[Minor] * m.Length
	pz := math.Pi * math.Pi * m.E * iz / (lz * lz)
	return c1 * pz * math.Sqrt(p.Iw/iz+lz*lz*ShearModulus(m)*p.It/(math.Pi*math.Pi*m.E*iz))
}

// ChiLT returns the reduction factor for lateral-torsional buckling at the
// relative slenderness lam = sqrt(W fy / Mcr) with the imperfection factor
// alpha (EN 1993-1-1:2005 Table 6.3: 0.21, 0.34, 0.49, 0.76 for curves a
// to d). rolled selects 6.3.2.3 (rolled sections or equivalent welded
// ones), eq. (6.57) with the recommended lambda_LT,0 = 0.4 and beta = 0.75:
//
//	chi = 1 / (Phi + sqrt(Phi^2 - beta lam^2)) <= 1 and <= 1/lam^2
//	Phi = 0.5 [1 + alpha (lam - 0.4) + beta lam^2]
//
// otherwise the general case of 6.3.2.2, eq. (6.56): the same with
// lambda_LT,0 = 0.2 and beta = 1. The modification factor f of 6.3.2.3(2)
// is not applied (on the safe side: f <= 1 raises chi).
func ChiLT(lam, alpha float64, rolled bool) float64 {
	lam0, beta := 0.2, 1.0
	if rolled {
		lam0, beta = 0.4, 0.75
	}
	if lam <= lam0 {
		return 1
	}
	if lam > 1e150 {
		return 0
	}
	phi := 0.5 * (1 + alpha*(lam-lam0) + beta*lam*lam)
	chi := 1 / (phi + math.Sqrt(phi*phi-beta*lam*lam))
	return math.Min(chi, math.Min(1, 1/(lam*lam)))
}

// LTBCurveAlpha returns the imperfection factor of the lateral-torsional
// buckling curve of a section: for 6.3.2.3 (rolled true) EN 1993-1-1:2005
// Table 6.5, rolled I h/b <= 2 curve b, > 2 c, welded I h/b <= 2 c, > 2
// d; for the general case Table 6.4, rolled I h/b <= 2 a, > 2 b, welded I
// h/b <= 2 c, > 2 d, other sections d. Table 6.3 gives curves a to d the
// factors of Table 6.1's curves of the same names (0.21, 0.34, 0.49,
// 0.76), read from curveAlphas.
func LTBCurveAlpha(shape Shape, fab Fabrication, hb float64, rolled bool) float64 {
	if shape != ShapeI {
		return curveAlphas[curveD]
	}
	slim := hb > 2
	switch {
	case fab == HotRolled && rolled && !slim:
		return curveAlphas[curveB]
	case fab == HotRolled && rolled:
		return curveAlphas[curveC]
	case fab == HotRolled && !slim:
		return curveAlphas[curveA]
	case fab == HotRolled:
		return curveAlphas[curveB]
	case !slim:
		return curveAlphas[curveC]
	}
	return curveAlphas[curveD]
}
