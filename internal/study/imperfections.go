package study

import (
	"fmt"
	"math"

	"strutrisk/internal/column"
)

// checkImperfections checks the sway imperfection and the equivalent
// imperfection against the rest of the study.
func (p *parser) checkImperfections() {
	st := p.st
	if st.Imperfection == "" {
		st.Imperfection = "geometric"
	}
	if st.Imperfection == "equivalent" {
		p.checkEquivalent()
	}
	if st.Sway != nil {
		p.checkSway()
	}
}

// checkEquivalent checks a study with capacity.imperfection = "equivalent"
// and gives each axis its imperfection factor.
func (p *parser) checkEquivalent() {
	st := p.st
	const key = "capacity.imperfection"
	switch {
	case st.ModelTraits().Curve:
		p.errorf(key, "the buckling curve already carries its equivalent imperfection: use model = \"perry-robertson\" with imperfection = \"equivalent\", or remove imperfection")
		return
	case st.ModelTraits().Ultimate:
		p.errorf(key, "the equivalent imperfection stands for the bow and the residual stresses in a first-yield check; the ultimate beam-column takes them apart: use limit = \"first-yield\", or imperfection = \"geometric\" with a bow and residual_stress")
		return
	}
	if st.Bow != nil {
		p.defaultf("capacity.imperfection: equivalent with imperfection.bow: the bow replaces the geometric part Lcr/1000 of the EN 1993-1-1 equivalent imperfection (e0 = max(0, alpha (lambda - 0.2) W/A - Lcr/1000) + |bow|)")
	}
	if len(st.Profile) > 0 {
		p.errorf("capacity.profile", "capacity.imperfection = \"equivalent\" replaces the bow: remove profile, or use imperfection = \"geometric\"")
	}
	if st.Alpha[0] != nil && st.Alpha[1] != nil {
		return
	}
	if st.Section.Shape == column.ShapeCustom {
		p.errorf("capacity.curve", "missing: capacity.imperfection = \"equivalent\" needs the buckling curve of a custom section: add curve = \"b\" (a0, a, b, c, d; once or { major, minor }) or alpha")
		return
	}
	var curves, rows [2]string
	for a := column.Major; a <= column.Minor; a++ {
		c, row, err := st.Table62(a)
		if err != nil {
			p.errorf("member.section", "%v", err)
			return
		}
		curves[a], rows[a] = c, row
		if st.Alpha[a] == nil {
			st.Curve[a] = c
			st.Alpha[a] = &Quantity{Path: "capacity.curve", Line: p.line("capacity.imperfection"), Value: curveAlpha(c)}
		}
	}
	row := rows[0]
	if rows[1] != rows[0] {
		row += "; " + rows[1]
	}
	p.defaultf("capacity.curve: not given; EN 1993-1-1 Table 6.2 gives curve %q (major axis) and %q (minor axis) for this section (%s, fabrication %s), and the equivalent imperfection follows them", curves[0], curves[1], row, st.Section.Fabrication)
}

// checkSway decides about which axes a sway imperfection acts: an axis
// whose ends sway (ends = "fixed-free", or K given above 1). End springs
// and K <= 1 describe a braced member.
func (p *parser) checkSway() {
	st := p.st
	q := st.Sway
	if st.ModelTraits().Curve {
		p.errorf(q.Path, "a sway imperfection needs a first-yield model (perry-robertson, secant) or the beam-column: the buckling curve has no place for the sway moment")
		return
	}
	var braced []string
	for a := column.Major; a <= column.Minor; a++ {
		if st.Axis != column.Both && st.Axis != a {
			continue
		}
		e := st.Ends[a]
		k := 1.0
		if e.K != nil && (e.How == "k" || e.How == "ends") {
			k = nominalValue(e.K, 0)
		}
		if k > 1 {
			st.SwayAxes[a] = true
			continue
		}
		how := fmt.Sprintf("K = %.3g", k)
		if e.How == "springs" {
			how = "end springs, held laterally"
		}
		braced = append(braced, fmt.Sprintf("%s (%s)", a, how))
	}
	switch {
	case !st.SwayAxes[0] && !st.SwayAxes[1]:
		p.errorf(q.Path, "the member is braced about the axes checked (%s): a sway imperfection is for a member whose ends sway (ends = \"fixed-free\", or k above 1); remove sway, or give the end conditions", joinAnd(braced))
		return
	case len(braced) > 0:
		p.warnf("imperfection.sway: acts only about the axis whose ends sway; braced: %s", joinAnd(braced))
	}
	p.swayReference(q)
}

// swayReference warns when the nominal sway is below the basic value of
// EN 1993-1-1:2005 5.3.2(3) for a single column of height L: phi = phi0
// alpha_h alpha_m with phi0 = 1/200, alpha_h = 2/sqrt(h) (h in m, 2/3 <=
// alpha_h <= 1) and alpha_m = 1 (m = 1). strutrisk takes phi as given: the
// reductions (alpha_h, alpha_m for m columns in a row) are the user's.
func (p *parser) swayReference(q *Quantity) {
	st := p.st
	if st.Length == nil {
		return
	}
	phi := math.Abs(q.Value)
	if q.Random() {
		phi = meanMagnitude(q.Dist)
	}
	h := nominalValue(st.Length, 0) / 1000
	ah := math.Min(1, math.Max(2.0/3, 2/math.Sqrt(h)))
	ref := ah / 200
	if phi > 0 && phi < ref*(1-1e-9) {
		p.warnf("imperfection.sway (line %d): phi = 1/%.0f is below the EN 1993-1-1 5.3.2(3) value for one column of height %.3g m, phi0 alpha_h = 1/%.0f (phi0 = 1/200, alpha_h = %.3f, alpha_m = 1); a smaller value needs its reason (alpha_m for m columns in a row, or a measured plumbness)", q.Line, 1/phi, h, 1/ref, ah)
	}
}

// joinAnd joins items with commas and a final "and".
func joinAnd(items []string) string {
	switch len(items) {
	case 0:
		return ""
	case 1:
		return items[0]
	}
	out := items[0]
	for _, s := range items[1 : len(items)-1] {
		out += ", " + s
	}
	return out + " and " + items[len(items)-1]
}
