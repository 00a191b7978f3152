package column

import (
	"fmt"
	"math"
)

// curveNames and curveAlphas are the buckling curves of EN 1993-1-1:2005
// Table 6.1 and their imperfection factors alpha, from the least to the
// most severe. They are written here once; everything else asks
// CurveAlpha.
var (
	curveNames  = [...]string{curveA0: "a0", curveA: "a", curveB: "b", curveC: "c", curveD: "d"}
	curveAlphas = [...]float64{curveA0: 0.13, curveA: 0.21, curveB: 0.34, curveC: 0.49, curveD: 0.76}
)

// The buckling curves by index into curveNames and curveAlphas.
const (
	curveA0 = iota
	curveA
	curveB
	curveC
	curveD
)

// CurveAlpha returns the imperfection factor alpha of the buckling curve
// named "a0", "a", "b", "c" or "d" (EN 1993-1-1:2005 Table 6.1:
// 0.13, 0.21, 0.34, 0.49, 0.76).
func CurveAlpha(name string) (float64, error) {
	for i, n := range curveNames {
		if n == name {
			return curveAlphas[i], nil
		}
	}
	return 0, fmt.Errorf("column: unknown buckling curve %q (want a0, a, b, c or d)", name)
}

// Curve returns the flexural buckling resistance chi A fy of the
// generalised-imperfection buckling curves of EN 1993-1-1:2005 6.3.1.2
// (eq. 6.49):
//
//	chi = 1 / (Phi + sqrt(Phi^2 - lam^2)) <= 1
//	Phi = 0.5 [1 + alpha (lam - 0.2) + lam^2]
//
// with the relative slenderness lam = sqrt(A fy / Ncr) (eq. 6.50),
// Ncr from K L, and alpha = Member.Alpha per axis (see CurveAlpha). For
// lam <= 0.2, chi = 1 (6.3.1.2(4)). Bow and Ecc are not used: the curves
// carry their own equivalent imperfection. No partial factor is applied.
//
// Curve evaluates axis, or both axes taking the weaker when axis is Both
// (a tie reports Minor). Invalid input returns an error, never NaN.
func Curve(m *Member, axis Axis) (Result, error) {
	if err := m.Validate(axis); err != nil {
		return Result{}, err
	}
	if axis == Major || axis == Both {
		if !(m.Alpha[Major] >= 0 && m.Alpha[Major] <= math.MaxFloat64) {
			return Result{}, ErrAlpha
		}
	}
	if axis == Minor || axis == Both {
		if !(m.Alpha[Minor] >= 0 && m.Alpha[Minor] <= math.MaxFloat64) {
			return Result{}, ErrAlpha
		}
	}
	return weaker(m, axis, GovernsCurve), nil
}

// curve is Curve about one axis of a validated member.
//
// A class 4 member (Props.AEff > 0) takes chi A_eff fy with the relative
// slenderness sqrt(A_eff fy / Ncr) (EN 1993-1-1:2005 eqs. 6.48 and 6.50).
func curve(m *Member, a Axis) float64 {
	lam := relSlenderness(m, a)
	return m.Props.EffectiveArea() * m.Fy * ReductionFactor(lam, m.Alpha[a], m.plateau())
}

// ReductionFactor is the reduction factor chi of the Ayrton-Perry buckling
// curves with the plateau lam0 that every material of strutrisk uses
// (EN 1993-1-1:2005 eq. 6.49 with lam0 = 0.2; EN 1993-1-4:2006 eq. 5.2;
// EN 1999-1-1:2007 eq. 6.49; EN 1995-1-1:2004 eqs. 6.25 to 6.29 with
// alpha = beta_c and lam0 = 0.3, where chi is k_c):
//
//	chi = 1 / (Phi + sqrt(Phi^2 - lam^2)) <= 1
//	Phi = 0.5 [1 + alpha (lam - lam0) + lam^2]
//
// and chi = 1 for lam <= lam0.
func ReductionFactor(lam, alpha, lam0 float64) float64 {
	if lam <= lam0 {
		return 1
	}
	if lam > 1e150 { // lam^2 would overflow; chi -> 1/lam^2
		return 1 / lam / lam
	}
	phi := 0.5 * (1 + alpha*(lam-lam0) + lam*lam)
	chi := 1 / (phi + math.Sqrt(phi*phi-lam*lam))
	return math.Min(chi, 1)
}
