package study

import (
	"fmt"

	"strutrisk/internal/column"
)

// RefCurve is a deterministic capacity curve N / (A fy) against relative
// slenderness.
type RefCurve struct {
	Name string
	X, Y []float64
}

// ReferenceCurves returns, beside the study's own model (CurveChart), the
// closed-form models a researcher compares it with, for the nominal member
// as its length varies (model factor excluded), at n points up to relative
// slenderness lamMax:
//   - Perry-Robertson first yield with the study's nominal bow, when the
//     study has a bow and its model is not perry-robertson;
//   - the secant formula with the study's nominal eccentricity, when it has
//     one and its model is not secant;
//   - the EN 1993-1-1 buckling curve of the study, or curve "b" as a
//     reference when the study's model is not "curve" (EN 1993-1-1:2005
//     6.3.1.2, Table 6.1).
func (md *Model) ReferenceCurves(n int, lamMax float64) []RefCurve {
	nom, err := md.Nominal()
	if err != nil {
		return nil
	}
	a := nom.Axis
	v := md.nominalValues()
	lam0 := nom.RelSlenderness[a]
	if !(lam0 > 0) {
		return nil
	}
	type kind struct {
		name string
		eval func(m *column.Member) (column.Result, error)
	}
	var kinds []kind
	bow, ecc := nom.Member.Bow, nom.Member.Ecc
	// An imperfection written as L/n is labelled so: it follows the length.
	label := func(q *Quantity, x float64) string {
		if q != nil && q.perLength {
			return fmt.Sprintf("L/%.0f", nom.Member.Length/x)
		}
		return fmt.Sprintf("%.3g mm", x)
	}
	if bow > 0 && md.Study.Model != "perry-robertson" {
		kinds = append(kinds, kind{"perry-robertson, bow " + label(md.Study.Bow, bow), func(m *column.Member) (column.Result, error) {
			m.Ecc = 0
			return column.PerryRobertson(m, a)
		}})
	}
	if ecc > 0 && md.Study.Model != "secant" {
		kinds = append(kinds, kind{"secant, e = " + label(md.Study.Ecc, ecc), func(m *column.Member) (column.Result, error) {
			m.Bow = 0
			return column.Secant(m, a)
		}})
	}
	if md.Study.Model != "curve" {
		alphaB, _ := column.CurveAlpha("b")
		kinds = append(kinds, kind{"EN 1993-1-1 curve b (reference)", func(m *column.Member) (column.Result, error) {
			m.Alpha = [2]float64{alphaB, alphaB}
			return column.Curve(m, a)
		}})
	}
	curves := make([]RefCurve, len(kinds))
	for k := range kinds {
		curves[k].Name = kinds[k].name
	}
	l0 := v[fLength]
	for i := 1; i <= n; i++ {
		scale := lamMax * float64(i) / float64(n) / lam0
		w := v
		w[fLength] = l0 * scale
		// Imperfections written as L/n follow the length.
		if q := md.Study.Bow; q != nil && q.perLength {
			w[fBow] *= scale
		}
		if q := md.Study.Ecc; q != nil && q.perLength {
			w[fEcc] *= scale
		}
		m, _, err := md.member(&w)
		if err != nil {
			continue
		}
		for k, kd := range kinds {
			mk := m
			res, err := kd.eval(&mk)
			if err != nil {
				continue
			}
			curves[k].X = append(curves[k].X, column.RelativeSlenderness(&mk, a))
			curves[k].Y = append(curves[k].Y, res.N/(mk.Props.A*mk.Fy))
		}
	}
	return curves
}
