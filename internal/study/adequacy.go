package study

import (
	"fmt"
	"math"

	"strutrisk/internal/column"
)

// Adequacy returns the warnings about the imperfection model of the study
// that need the nominal member n of md:
//   - a bow or eccentricity written L/n on a member whose K is not 1 (the
//     fraction is of L, not of the buckling length);
//   - a first-yield model with a geometric imperfection alone (no residual
//     stresses) for a hot-rolled or welded I section or a welded box, with
//     its capacity at nominal values against the EN 1993-1-1 buckling curve
//     of Table 6.2 and the ultimate beam-column with the fabrication's
//     residual stresses, when it is above either.
//
// Each names the key and its line.
func (md *Model) Adequacy(n *Nominal) []string {
	var w []string
	for _, q := range []*Quantity{md.Study.Bow, md.Study.Ecc} {
		if msg := md.lengthFraction(q, n); msg != "" {
			w = append(w, msg)
		}
	}
	if msg := md.residualAdequacy(n); msg != "" {
		w = append(w, msg)
	}
	return w
}

// checkedAxes are the axes the study checks.
func (md *Model) checkedAxes() []column.Axis {
	if a := md.Study.Axis; a != column.Both {
		return []column.Axis{a}
	}
	return []column.Axis{column.Major, column.Minor}
}

// lengthFraction warns when q is written L/n and a checked axis has K != 1
// (not for a bow updated by measurements: that is the member's own bow).
func (md *Model) lengthFraction(q *Quantity, n *Nominal) string {
	if q == nil || !(q.perLength || q.Relative) || md.curve || q.update != nil {
		return "" // a measured bow is the member's own, over its length
	}
	var ks []string
	ratio := 0.0
	for _, a := range md.checkedAxes() {
		k := n.Member.K[a]
		if math.Abs(k-1) > 1e-9 {
			ks = append(ks, fmt.Sprintf("%.3g (%s axis)", k, a))
			if a == n.Axis || ratio == 0 {
				ratio = k
			}
		}
	}
	if len(ks) == 0 {
		return ""
	}
	if len(ks) == 2 && n.Member.K[0] == n.Member.K[1] {
		ks = []string{fmt.Sprintf("%.3g (both axes)", n.Member.K[0])}
	}
	return fmt.Sprintf("%s (line %d): written as L/n on a member whose K is %s: it is a fraction of the member length L. Written \"Lcr/n\" it would be a fraction of the buckling length K L, the amplitude of the imperfection in the shape of the buckling mode (EN 1993-1-1 5.3.2(11)), here %.3g times this value", q.Path, q.Line, joinAnd(ks), ratio)
}

// residualAdequacy warns when a first-yield model with a geometric bow
// alone is used for a hot-rolled I section and gives more than the
// buckling curve or the ultimate beam-column with residual stresses.
func (md *Model) residualAdequacy(n *Nominal) string {
	st := md.Study
	residual, ok := adequacyResidual(st.Section)
	if st.Imperfection == "equivalent" || !ok {
		return ""
	}
	what := st.ModelTraits().NoResidual
	if what == "" {
		return ""
	}
	own, curve, ult, c := md.referenceCapacities(residual)
	if !(own > 0) || !(own > 1.01*curve || ult > 0 && own > 1.01*ult) {
		return ""
	}
	line := 0
	if q := st.Bow; q != nil {
		line = q.Line
	}
	ultText := "could not be evaluated"
	if ult > 0 {
		ultText = fmt.Sprintf("%s (%+.0f %%)", kNText(ult), 100*(ult/own-1))
	}
	return fmt.Sprintf("capacity.model (imperfection.bow, line %d): %s leaves out the residual stresses of a %s %s section: at nominal values it gives %s, against %s (%+.0f %%) by the EN 1993-1-1 buckling curve %s (Table 6.2) and %s by the ultimate beam-column with %s residual stresses and the same imperfections. Use capacity.imperfection = \"equivalent\" (the EN 1993-1-1 equivalent imperfection, residual stresses included), model = \"curve\", or model = \"beam-column\" with limit = \"ultimate\" and residual_stress = \"%s\"",
		line, what, st.Section.Fabrication, st.Section.Name, kNText(own), kNText(curve), 100*(curve/own-1), c, ultText, residual, residual)
}

// adequacyResidual is the residual stress pattern of a section whose
// fabrication leaves residual stresses the first-yield models miss: a
// hot-rolled or welded I section, a welded box; false otherwise.
func adequacyResidual(s SectionSpec) (column.Residual, bool) {
	switch {
	case s.Shape == column.ShapeI && s.Fabrication == column.HotRolled:
		return column.ResidualHotRolled, true
	case (s.Shape == column.ShapeI || s.Shape == column.ShapeRHS) && s.Fabrication == column.Welded:
		return column.ResidualWelded, true
	}
	return column.ResidualNone, false
}

// referenceCapacities returns, at nominal values and model factor
// excluded, the capacity by the study's model, by the EN 1993-1-1 curve of
// Table 6.2 and by the ultimate beam-column with the residual stresses
// residual (0 when it cannot be evaluated), each the weaker of the axes
// checked, and the curve letters used.
func (md *Model) referenceCapacities(residual column.Residual) (own, curve, ult float64, letters string) {
	v := md.nominalValues()
	m, sec, err := md.member(&v)
	if err != nil {
		return 0, 0, 0, ""
	}
	var curves [2]string
	for a := column.Major; a <= column.Minor; a++ {
		if curves[a], _, err = md.Study.Table62(a); err != nil {
			return 0, 0, 0, ""
		}
	}
	own, curve, ult = math.Inf(1), math.Inf(1), math.Inf(1)
	for _, a := range md.checkedAxes() {
		res, _, err := md.capacity(&v, a)
		if err == nil {
			own = math.Min(own, res.N)
		}
		mc := m
		mc.Alpha[a], _ = column.CurveAlpha(curves[a])
		if r, err := column.Curve(&mc, a); err == nil {
			curve = math.Min(curve, r.N)
		}
		mu := m
		if md.perAxis {
			md.axisMember(&mu, &v, a)
		}
		opt := column.BeamOptions{Limit: column.UltimateLimit, Residual: residual, Profile: md.Study.Profile}
		if md.curve {
			mu.Bow, mu.Ecc = 0, 0
		}
		for b := range 2 {
			if md.springs[b] {
				opt.Springs[b] = [2]float64{v[fTop0+b], v[fBot0+b]}
			}
		}
		if r, err := column.BeamColumn(&mu, sec, a, &opt); err == nil {
			ult = math.Min(ult, r.N)
		} else {
			ult = 0
		}
	}
	if math.IsInf(ult, 1) {
		ult = 0
	}
	if len(md.checkedAxes()) == 2 {
		letters = fmt.Sprintf("%q (major), %q (minor)", curves[0], curves[1])
	} else {
		letters = fmt.Sprintf("%q", curves[md.Study.Axis])
	}
	return own, curve, ult, letters
}

// kNText writes a force in N as kN.
func kNText(n float64) string { return fmt.Sprintf("%.0f kN", n/1000) }
