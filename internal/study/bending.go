package study

import (
	"strings"

	"strutrisk/internal/column"
)

// BendingSpec is the [bending] table: end moments and a lateral load
// about one axis beside the axial loads. With it the limit state is the
// load factor (loadfactor_model.go).
type BendingSpec struct {
	// Axis is column.Major (default) or column.Minor.
	Axis column.Axis
	// Top and Bottom are the end moments; the same sign bends the member
	// to the same side (single curvature).
	Top, Bottom MomentSpec
	// Lateral is the uniform lateral load (N/mm), nil when not given; a
	// positive one bends the member to the side of positive end moments.
	Lateral *Quantity
	// Line is the line of [bending]; AxisGiven says that axis was written.
	Line      int
	AxisGiven bool
}

// MomentSpec is one end moment: a quantity of its own (Moment, N mm), or
// Ratio (mm) times the axial load Load (a moment that grows with that
// load), or nothing.
type MomentSpec struct {
	Moment      *Quantity
	Load, Ratio *Quantity
}

// Given reports whether the end has a moment.
func (m MomentSpec) Given() bool { return m.Moment != nil || m.Load != nil }

// bending reads [bending].
func (p *parser) bending(top *table) {
	t := p.sub(top, "bending")
	if t == nil {
		return
	}
	b := &BendingSpec{Axis: column.Major, Line: p.line("bending")}
	_, b.AxisGiven = t.m["axis"]
	if a, ok := p.choice(t, "axis", choicesOf("bending", "axis")); ok && a == "minor" {
		b.Axis = column.Minor
	}
	b.Top = p.moment(t, "top")
	b.Bottom = p.moment(t, "bottom")
	b.Lateral = p.q(t, "lateral", qopt{dim: LineLoad})
	p.unknown(t)
	if !b.Top.Given() && !b.Bottom.Given() && b.Lateral == nil {
		p.errorf("bending", "no moment and no lateral load: give top, bottom (end moments) or lateral (a force per length), or remove [bending]")
	}
	p.st.Bending = b
}

// moment reads an end moment: a quantity, or { load = "name", ratio = ... }.
func (p *parser) moment(t *table, key string) MomentSpec {
	v, ok := t.m[key]
	if !ok {
		return MomentSpec{}
	}
	m, isMap := v.(map[string]any)
	if !isMap || m["dist"] != nil || m["load"] == nil {
		return MomentSpec{Moment: p.q(t, key, qopt{dim: Moment})}
	}
	t.used[key] = true
	at := &table{path: t.key(key), m: m, used: map[string]bool{}}
	var ms MomentSpec
	if name, ok := p.str(at, "load"); ok {
		for _, q := range p.st.Loads {
			if q.Path == "loads."+name {
				ms.Load = q
			}
		}
		if ms.Load == nil {
			var names []string
			for _, q := range p.st.Loads {
				names = append(names, strings.TrimPrefix(q.Path, "loads."))
			}
			if near, ok := nearest(name, names); ok {
				p.errorf(at.key("load"), "%q is not a load in [loads]; did you mean %q?", name, near)
			} else {
				p.errorf(at.key("load"), "%q is not a load in [loads] (loads: %s)", name, strings.Join(names, ", "))
			}
		}
	}
	ms.Ratio = p.q(at, "ratio", qopt{dim: Length})
	if _, ok := m["ratio"]; !ok {
		p.errorf(at.path, "a moment tied to a load needs ratio, the moment per unit of that load (a length), e.g. { load = %q, ratio = \"0.1 m\" }", m["load"])
	}
	p.unknownOf(at, []string{"load", "ratio"})
	return ms
}

// checkBending checks [bending] against the rest of the study.
func (p *parser) checkBending() {
	st := p.st
	b := st.Bending
	if b == nil {
		return
	}
	shape := st.Section.Shape
	round := shape == column.ShapeRound || shape == column.ShapeCHS
	if round && !b.AxisGiven {
		p.errorf("bending", "a %s section has no major or minor axis of its own: say which axis the moments bend about, axis = \"major\" (the section is the same about both)",
			st.Section.Name)
	}
	if st.Axis != column.Both && st.Axis != b.Axis {
		p.errorf("capacity.axis", "%q checks one axis, but [bending] bends the member about its %s axis: check that axis or both", st.Axis, b.Axis)
	}
	if st.Sway != nil {
		p.errorf("imperfection.sway", "a sway imperfection is not combined with [bending]: give the sway's moments as end moments")
	}
	if st.Combination != nil {
		p.errorf("bending", "[bending] is not combined with a load combination yet: give the loads as they act together")
	}
	// Another material than steel is refused by checkMaterial.
	if st.ModelTraits().Curve {
		switch shape {
		case column.ShapeI, column.ShapeRHS, column.ShapeCHS, column.ShapeRect, column.ShapeRound:
		default:
			p.errorf("capacity.model", "model \"curve\" with [bending] is the EN 1993-1-1 6.3.3 interaction, made here for I, RHS, CHS, rect and round sections: use perry-robertson (first yield) for this %s section", st.Section.Name)
		}
	}
	if !st.ModelTraits().Curve && b.Axis == column.Major && open(shape) {
		p.warnf("bending: first yield in the plane of bending does not include lateral-torsional buckling of this open section bent about its major axis; model = \"curve\" (EN 1993-1-1 6.3.3 with chi_LT) does")
	}
	if k := st.Ends[b.Axis].K; k != nil && (k.Random() || k.Value != 1) && !st.ModelTraits().Curve {
		p.warnf("bending: the end moments act on the equivalent pinned member of length K L about the %s axis; with K other than 1 the moment distribution is an approximation", b.Axis)
	}
}

// open reports a section open to twisting (lateral-torsional buckling).
func open(s column.Shape) bool {
	switch s {
	case column.ShapeI, column.ShapeRect, column.ShapeChannel, column.ShapeTee, column.ShapeAngle, column.ShapeCustom:
		return true
	}
	return false
}

// ReserveActions returns what the reserve factor multiplies: the reserve
// loads (ReserveLoads; moments tied to them follow them) and the end
// moments and lateral load of [bending] given as quantities of their own,
// which count as variable actions (wind on a façade post, an imposed
// load's moment).
func (s *Study) ReserveActions() []*Quantity {
	out := s.ReserveLoads()
	if b := s.Bending; b != nil {
		for _, q := range []*Quantity{b.Top.Moment, b.Bottom.Moment, b.Lateral} {
			if q != nil {
				out = append(out, q)
			}
		}
	}
	return out
}

// bendingAction reports whether q is an end moment or the lateral load of
// [bending] given as a quantity of its own: a variable action (its
// characteristic value is that of a variable load, see
// Model.Characteristic).
func (s *Study) bendingAction(q *Quantity) bool {
	b := s.Bending
	return b != nil && q != nil && (q == b.Top.Moment || q == b.Bottom.Moment || q == b.Lateral)
}
