package analysis

import (
	"fmt"

	"strutrisk/internal/column"
	"strutrisk/internal/report"
	"strutrisk/internal/study"
)

// bendingText is check's account of [bending] at nominal values: the
// moments and the lateral load (effect factor included), the sign
// convention and the load factor. Empty for an axial study.
func bendingText(st *study.Study, n *study.Nominal) string {
	if st.Bending == nil || n.Bending == nil {
		return ""
	}
	b := n.Bending
	s := fmt.Sprintf("Bending about the %s axis at nominal values: top %.3g kN m, bottom %.3g kN m (the same sign at both ends is single curvature), lateral load %.3g kN/m\n",
		b.Axis, b.Top/1e6, b.Bottom/1e6, b.Lateral)
	s += fmt.Sprintf("Load factor %.3f on every action (%s, %s): the margin is the factor minus one, %.3f\n",
		n.LoadFactor, governingText(n), n.Governs, n.LoadFactor-1)
	if st.ModelTraits().Curve {
		s += "  the curve model with bending is the member interaction of EN 1993-1-1 6.3.3 with the factors of Annex B (Table B.3 C_m), chi_LT of 6.3.2 for an I or rectangular section bent about its major axis\n"
	}
	return s
}

// bendingDoc is the nominal bending of the result document (nil for an
// axial study).
func bendingDoc(n *study.Nominal) *report.NominalBending {
	if n.Bending == nil {
		return nil
	}
	b := n.Bending
	return &report.NominalBending{Axis: b.Axis.String(), Top: b.Top, Bottom: b.Bottom, Lateral: b.Lateral}
}

// outputUnit is the unit of an output column of samples.csv: N for the
// capacity, demand and margin of an axial study; for a study with
// [bending] the load factor, its demand 1 and margin are dimensionless,
// the axial load is in N and the moment in N*mm.
func outputUnit(st *study.Study, name string) string {
	if st.Bending == nil {
		return "N"
	}
	switch name {
	case "axial":
		return "N"
	case "moment":
		return "N*mm"
	}
	return "-"
}

// bendingBundle gives the report of a study with [bending] its pictures:
// the interaction chart in place of the slenderness picture (whose
// capacities are axial) and dimensionless margins.
func (r *Result) bendingBundle(b *report.Bundle) {
	l := r.l
	if l.Study.Bending == nil {
		return
	}
	b.Slenderness = nil
	b.TornadoOutput = "margin g = load factor - 1 (-)"
	b.SobolOutput = "margin g = load factor - 1"
	n, m, err := l.Model.InteractionCurve(48)
	if err != nil {
		return
	}
	c := &report.InteractionChart{N: n, M: m, Axis: l.Study.Bending.Axis.String(), Model: l.Study.Model.String()}
	if nb := l.Nominal.Bending; nb != nil {
		c.NominalN = l.Nominal.Demand
		c.NominalM, _ = column.SecondOrderMoment(0, 1, l.Nominal.Member.Length, nb.Bottom, nb.Top, nb.Lateral)
	}
	b.Interaction = c
}
