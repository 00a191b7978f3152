package study

import (
	"fmt"
	"math"

	"strutrisk/internal/column"
)

// RefCurve is a deterministic capacity curve N / (A fy) against relative
// slenderness about one axis.
type RefCurve struct {
	// Name labels the curve for a legend; Model is the name of the
	// capacity model it is drawn with (capmodel.go), so that a picture
	// can style every curve of one model alike.
	Name, Model string
	// Note says where the curve comes from, for a caption (the row of EN
	// 1993-1-1 Table 6.2 for a buckling curve); "" when the name says it.
	Note string
	// Axis is the axis whose relative slenderness X is.
	Axis column.Axis
	X, Y []float64
}

// axes returns the axes the study checks.
func (md *Model) axes() []column.Axis {
	if a := md.Study.Axis; a == column.Major || a == column.Minor {
		return []column.Axis{a}
	}
	return []column.Axis{column.Major, column.Minor}
}

// ReferenceCurve returns the EN 1993-1-1 buckling curve the slenderness
// picture draws about axis a: the study's own when its model is "curve"
// (by letter, or by its imperfection factor alpha), else the curve EN
// 1993-1-1:2005 Table 6.2 gives the section (Study.Table62, with the
// study's fabrication and characteristic yield). name is the curve's label ("b", or "alpha = 0.4"), row says why
// (the row of Table 6.2, or "the study's curve"). A section the table does
// not cover (custom) takes curve "b", labelled as a reference only.
func (md *Model) ReferenceCurve(a column.Axis) (name, row string, alpha float64) {
	st := md.Study
	if md.curve {
		v := md.nominalValues()
		alpha = v[fAlpha0+int(a)]
		if st.Curve[a] != "" {
			return st.Curve[a], "the study's curve", alpha
		}
		return fmt.Sprintf("alpha = %.3g", alpha), "the study's curve", alpha
	}
	if st.Material.Kind != column.Steel {
		return md.kindReference(a) // materialpicture.go
	}
	if c, why, err := st.Table62(a); err == nil {
		if al, err := column.CurveAlpha(c); err == nil {
			return c, "Table 6.2: " + why, al
		}
	}
	alpha, _ = column.CurveAlpha("b")
	return "b", "a reference: Table 6.2 does not cover the section", alpha
}

// refKind is one curve family of the slenderness picture.
type refKind struct {
	name, model, note string
	eval              func(m *column.Member, a column.Axis) (column.Result, error)
}

// ReferenceCurves returns the curves of the slenderness picture for the
// nominal member as its length varies (model factor excluded), at n
// points up to relative slenderness lamMax, about each axis the study
// checks (named "..., minor axis" when there are two; a curve the same
// about both is given once, about column.Both, named "..., both axes"):
//   - the study's own model;
//   - Perry-Robertson first yield with the study's nominal bow, when the
//     study has a bow and its model is not perry-robertson;
//   - the secant formula with the study's nominal eccentricity, when it has
//     one and its model is not secant;
//   - the EN 1993-1-1 buckling curve of ReferenceCurve, when the study's
//     model is not "curve" (EN 1993-1-1:2005 6.3.1.2, Tables 6.1 and 6.2).
func (md *Model) ReferenceCurves(n int, lamMax float64) []RefCurve {
	nom, err := md.Nominal()
	if err != nil {
		return nil
	}
	axes := md.axes()
	perAxis := make([][]RefCurve, len(axes))
	for i, a := range axes {
		for _, k := range md.refKinds(nom, a) {
			c := RefCurve{Name: k.name, Model: k.model, Note: k.note, Axis: a}
			c.X, c.Y = md.curveAbout(nom, a, n, lamMax, k.eval)
			perAxis[i] = append(perAxis[i], c)
		}
	}
	var curves []RefCurve
	if len(axes) == 2 && len(perAxis[0]) == len(perAxis[1]) {
		// A curve the same about both axes (a square or round section with
		// one K and one curve) is drawn once.
		for k := range perAxis[0] {
			if c := perAxis[0][k]; sameCurve(c, perAxis[1][k]) {
				c.Name += ", both axes"
				c.Axis = column.Both
				perAxis[0][k], perAxis[1][k] = c, RefCurve{}
			}
		}
	}
	for i, cs := range perAxis {
		for _, c := range cs {
			if len(c.X) == 0 {
				continue
			}
			if len(axes) > 1 && c.Axis != column.Both {
				c.Name += ", " + axes[i].String() + " axis"
			}
			curves = append(curves, c)
		}
	}
	return curves
}

// sameCurve tells whether two curves have the same name and points (to
// one part in 1e9).
func sameCurve(a, b RefCurve) bool {
	if a.Name != b.Name || len(a.X) != len(b.X) || len(a.Y) != len(b.Y) || len(a.X) == 0 {
		return false
	}
	close := func(x, y float64) bool { return math.Abs(x-y) <= 1e-9*math.Max(1, math.Abs(y)) }
	for i := range a.X {
		if !close(a.X[i], b.X[i]) || !close(a.Y[i], b.Y[i]) {
			return false
		}
	}
	return true
}

// refKinds lists the curve families of the slenderness picture about a.
func (md *Model) refKinds(nom *Nominal, a column.Axis) []refKind {
	st := md.Study
	kinds := []refKind{{"study: " + md.ownName(a), st.Model.String(), "", nil}}
	bow, ecc := nom.Member.Bow, nom.Member.Ecc
	// An imperfection written as L/n is labelled so: it follows the length.
	label := func(q *Quantity, x float64) string {
		if q != nil && q.perLength {
			return fmt.Sprintf("L/%.0f", nom.Member.Length/x)
		}
		return fmt.Sprintf("%.3g mm", x)
	}
	if pr := (perryRobertson{}); bow > 0 && st.Model != pr {
		kinds = append(kinds, refKind{pr.String() + ", bow " + label(st.Bow, bow), pr.String(), "", func(m *column.Member, a column.Axis) (column.Result, error) {
			m.Ecc = 0
			return column.PerryRobertson(m, a)
		}})
	}
	if sc := (secant{}); ecc > 0 && st.Model != sc {
		kinds = append(kinds, refKind{sc.String() + ", e = " + label(st.Ecc, ecc), sc.String(), "", func(m *column.Member, a column.Axis) (column.Result, error) {
			m.Bow = 0
			return column.Secant(m, a)
		}})
	}
	if !md.curve {
		name, row, alpha := md.ReferenceCurve(a)
		kmod := md.nominalValues()[fKmod]
		timber := md.mat.timber
		kinds = append(kinds, refKind{curveLabel(st.Material.Kind, name), bucklingCurve{}.String(), row, func(m *column.Member, a column.Axis) (column.Result, error) {
			m.Alpha[a] = alpha
			if !timber {
				return column.Curve(m, a)
			}
			// k_c from the unreduced strength, on k_mod f (EN 1995-1-1 6.3.2)
			m.Fy /= kmod
			r, err := column.Curve(m, a)
			r.N *= kmod
			return r, err
		}})
	}
	return kinds
}

// ownName names the study's own model about a for a legend: its EN
// 1993-1-1 curve, or the model's name and options ("beam-column,
// ultimate").
func (md *Model) ownName(a column.Axis) string {
	st := md.Study
	if md.curve {
		name, _, _ := md.ReferenceCurve(a)
		return curveLabel(st.Material.Kind, name)
	}
	if opts := st.ModelTraits().Options; opts != "" {
		return st.Model.String() + ", " + opts
	}
	return st.Model.String()
}

// curveAbout evaluates eval (the study's own model when nil) for the
// nominal member about a, its length scaled so that the relative
// slenderness runs over n points up to lamMax.
func (md *Model) curveAbout(nom *Nominal, a column.Axis, n int, lamMax float64, eval func(m *column.Member, a column.Axis) (column.Result, error)) (x, y []float64) {
	lam0 := nom.RelSlenderness[a]
	if !(lam0 > 0) {
		return nil, nil
	}
	v := md.nominalValues()
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
		var res column.Result
		var m column.Member
		var err error
		if eval == nil {
			res, m, err = md.capacity(&w, a)
		} else if m, _, err = md.member(&w); err == nil {
			if md.perAxis {
				md.axisMember(&m, &w, a) // Lcr/n, equivalent and sway imperfections
			}
			res, err = eval(&m, a)
		}
		if err != nil {
			continue
		}
		lam, fy := column.RelativeSlenderness(&m, a), m.Fy
		if md.mat.timber {
			lam, fy = timberAxes(&m, &w, a)
		}
		x = append(x, lam)
		y = append(y, res.N/(m.Props.EffectiveArea()*fy))
	}
	return x, y
}
