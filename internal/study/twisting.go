package study

import (
	"fmt"
	"math"

	"strutrisk/internal/column"
)

// nominalTwisting adds the modes that twist the section to the nominal
// picture: the critical loads and, when both axes are checked, the
// resistance in the twisting mode, which governs when it is the lowest.
// The beam-column, which bends in one plane, cannot give that resistance:
// a member whose lowest critical load twists is an error for it.
func (md *Model) nominalTwisting(n *Nominal, m *column.Member) error {
	st := md.Study
	n.Twisting, n.TwistingMode = column.TwistingLoad(m)
	n.Critical, n.Mode = column.CriticalLoad(m, st.Axis)
	if st.Axis != column.Both || m.Props.It == 0 {
		return nil
	}
	if md.planar {
		if n.Mode.Twists() {
			return fmt.Errorf("at nominal values: %v", column.ErrTwisting)
		}
		return nil
	}
	governs := column.GovernsFirstYield
	if md.curve {
		governs = column.GovernsCurve
	}
	res, err := column.Twisting(m, governs)
	if err != nil {
		return fmt.Errorf("at nominal values, torsional mode: %v", err)
	}
	if c := n.ModelFactor * res.N; column.TwistingGoverns(m, c, n.Capacity, n.Axis) {
		n.Capacity, n.Axis, n.Governs, n.CapacityMode = c, column.Minor, res.Governs, res.Mode
		n.ModeSlenderness = math.Sqrt(m.Props.EffectiveArea() * m.Fy / n.Twisting)
	}
	return nil
}

// twistingNotes are the warnings and the refusal about the modes that
// twist the section, at nominal values: a beam-column member whose lowest
// critical load twists is refused (key capacity.model); a first-yield
// formula applied to a twisting mode and a single checked axis below the
// twisting load are warned of; a custom section without a torsion
// constant is listed under the defaults.
func (p *parser) twistingNotes() {
	st := p.st
	if openShape(st.Section.Shape) && st.ModelTraits().Ultimate {
		key := "capacity.limit"
		p.errorf(key, "the ultimate beam-column has no fibre section for a%s %s (its bending and twisting interact): use limit = \"first-yield\" or model = \"curve\"",
			map[bool]string{true: "n", false: ""}[st.Section.Name == "angle"], st.Section.Name)
		return
	}
	md, err := Build(st)
	if err != nil {
		return // reported by checkSection
	}
	v := md.nominalValues()
	m, _, err := md.member(&v)
	if err != nil || m.Validate(column.Both) != nil {
		return
	}
	if st.Section.Shape == column.ShapeCustom && m.Props.It == 0 {
		p.defaultf("member.section.it: not given; torsional and flexural-torsional buckling are not checked (give it, and iw, y0, z0, for an open section)")
		return
	}
	nt, mode := column.TwistingLoad(&m)
	ncr, cmode := column.CriticalLoad(&m, column.Both)
	if st.Shear == nil {
		if st.Material.Kind == column.Timber {
			p.defaultf("material.shear_modulus: not given; G = E / 16 for torsional buckling (timber, EN 338 Table 1)")
		} else {
			p.defaultf("material.shear_modulus: not given; G = E / (2 (1 + 0.3)) for torsional buckling")
		}
	}
	kN := func(x float64) string { return fmt.Sprintf("%.4g kN", x/1e3) }
	if !cmode.Twists() {
		if flex := ncr; st.ModelTraits().Planar && st.Axis == column.Both && nt < 1.25*flex {
			p.warnf("capacity.model: %s buckling at %s is within 25 %% of the flexural critical load %s at nominal values; the beam-column bends in one plane, and a sample in which the twisting mode comes first has no capacity (it counts as a failure): model \"curve\" checks both modes",
				mode, kN(nt), kN(flex))
		}
		return
	}
	switch {
	case st.Axis != column.Both:
		if e := column.Euler(&m, st.Axis); nt < e {
			p.warnf("capacity.axis: %s alone is checked, but %s buckling at %s comes before the %s axis's Euler load %s; use axis = \"both\" to check it",
				st.Axis, mode, kN(nt), st.Axis, kN(e))
		}
	case st.ModelTraits().Planar:
		p.errorf(p.modelKey(), "the lowest elastic critical load is %s buckling at %s (flexural: %s); the beam-column bends in one plane and cannot follow it: use model \"curve\" (EN 1993-1-1 6.3.1.4) or \"perry-robertson\"",
			mode, kN(ncr), kN(math.Min(column.Euler(&m, column.Major), column.Euler(&m, column.Minor))))
	case !st.ModelTraits().Curve:
		p.warnf("capacity.model: %s buckling (%s) governs the elastic critical load; the first-yield formula is applied to it through its relative slenderness sqrt(A fy / N_cr) with the bow of the axis with the larger e c / r^2, a generalisation outside the formula's ground (exact for flexure only); EN 1993-1-1 6.3.1.4 checks this mode by the buckling curve (model \"curve\")",
			mode, kN(ncr))
	}
}

// modelKey is the key the capacity model was given at, or the capacity
// table when it is the default.
func (p *parser) modelKey() string {
	if p.line("capacity.model") > 0 {
		return "capacity.model"
	}
	return "capacity"
}
