package study

import "strutrisk/internal/column"

// beamColumn is capacity model "beam-column": the numerical beam-column
// of column.BeamColumn, to first yield or to its ultimate load with
// residual stresses (capacity.limit, residual_stress), with a measured
// bow profile (capacity.profile).
type beamColumn struct{}

func (beamColumn) String() string { return "beam-column" }

// Traits of the numerical beam-column with the limit and residual
// stresses of st.
func (beamColumn) Traits(st *Study) Traits {
	t := Traits{Planar: true, Bending: true, Expensive: true, Options: st.Limit.String()}
	switch {
	case st.Limit == column.UltimateLimit:
		t.Ultimate, t.FORMStep = true, numericalStep
		if st.Residual == column.ResidualNone {
			t.NoResidual = "the ultimate beam-column without residual stresses"
		}
	default:
		t.NoResidual = "the first-yield beam-column (a geometric imperfection alone)"
	}
	return t
}

func (beamColumn) keys() []string { return []string{"limit", "residual_stress", "profile"} }
func (beamColumn) kernel() kernel { return kernelBeam }

// options reads the limit, the residual stresses and the measured profile.
func (beamColumn) options(p *parser, t *table) {
	st := p.st
	limit, residual := false, false
	if l, ok := p.choice(t, "limit", choicesOf("capacity", "limit")); ok {
		var err error
		st.Limit, err = column.ParseBeamLimit(l)
		limit = p.parseError(t.key("limit"), err)
	}
	if r, ok := p.choice(t, "residual_stress", choicesOf("capacity", "residual_stress")); ok {
		var err error
		st.Residual, err = column.ParseResidual(r)
		residual = p.parseError(t.key("residual_stress"), err)
	}
	if v, ok := t.get("profile"); ok {
		st.Profile = p.profile(t.key("profile"), v)
	}
	if !limit {
		st.Limit = column.FirstYieldLimit
		if _, given := t.m["limit"]; !given {
			p.defaultf("capacity.limit: not given; the beam-column stops at first yield")
		}
	}
	if st.Limit == column.FirstYieldLimit && residual && st.Residual != column.ResidualNone {
		p.errorf(t.key("residual_stress"), "residual stresses act only with limit = \"ultimate\"")
	}
	if st.Limit == column.UltimateLimit && !residual {
		st.Residual = column.ResidualNone
		p.defaultf("capacity.residual_stress: not given; no residual stresses")
	}
}

// check asks for an imperfection to bend from.
func (beamColumn) check(p *parser) {
	st := p.st
	if st.Bow == nil && st.Ecc == nil && len(st.Profile) == 0 && st.Sway == nil && st.Imperfection != "equivalent" {
		p.errorf("imperfection.bow", "missing: model beam-column needs a bow, an eccentricity or capacity.profile")
	}
	if len(st.Profile) > 0 && st.Bow != nil {
		p.warnf("capacity.profile: the measured profile replaces imperfection.bow")
	}
}

// beamOptions are the beam-column settings of a study.
func beamOptions(st *Study) column.BeamOptions {
	return column.BeamOptions{Profile: st.Profile, Limit: st.Limit, Residual: st.Residual}
}

// beamCapacity evaluates the numerical beam-column, with the end springs
// of the sample when the study gives them.
func (md *Model) beamCapacity(m *column.Member, sec column.Section, v *values, axis column.Axis) (column.Result, error) {
	opt := md.beam
	for a := range 2 {
		if md.springs[a] {
			opt.Springs[a] = [2]float64{v[fTop0+a], v[fBot0+a]}
		}
	}
	if md.mat.law {
		opt.Law = column.RambergOsgood{Fu: v[fFu], N: md.Study.Material.Exponent}
	}
	return column.BeamColumn(m, sec, axis, &opt)
}
