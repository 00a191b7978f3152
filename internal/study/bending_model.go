package study

import (
	"math"

	"strutrisk/internal/column"
)

// Fields of the bending (after the combination cases): the end moments
// and the lateral load given as quantities of their own, the loads tied
// moments go with and their ratios.
const (
	fBendTop = fCase0 + MaxCombined + iota
	fBendBot
	fBendLat
	fTieTop
	fTieBot
	fRatioTop
	fRatioBot
	fBendEnd
)

// bendTargets lists the fields the quantities of [bending] set.
func bendTargets(st *Study, add func(*Quantity, int)) {
	b := st.Bending
	if b == nil {
		return
	}
	add(b.Top.Moment, fBendTop)
	add(b.Top.Load, fTieTop)
	add(b.Top.Ratio, fRatioTop)
	add(b.Bottom.Moment, fBendBot)
	add(b.Bottom.Load, fTieBot)
	add(b.Bottom.Ratio, fRatioBot)
	add(b.Lateral, fBendLat)
}

// bendingOf returns the bending of one set of inputs, the effect factor
// applied, and the axial load (N, compression positive) it goes with.
func (md *Model) bendingOf(v *values) (column.Bending, float64) {
	e := v[fEffect]
	return column.Bending{
		Axis:    md.Study.Bending.Axis,
		Top:     e * (v[fBendTop] + v[fRatioTop]*v[fTieTop]),
		Bottom:  e * (v[fBendBot] + v[fRatioBot]*v[fTieBot]),
		Lateral: e * v[fBendLat],
	}, md.demand(v)
}

// evalFactor is eval for a study with [bending]: the capacity is the
// load factor times the model factor and the demand is 1, so the margin
// is the factor minus one. A member the mechanics cannot evaluate has no
// capacity (factor 0).
func (md *Model) evalFactor(v *values) (capacity, demand float64) {
	f, err := md.loadFactor(v, md.Study.Axis)
	if err != nil || !(f.Factor >= 0) {
		return 0, 1
	}
	return v[fModel] * math.Min(f.Factor, maxLoadFactor), 1
}

// maxLoadFactor bounds the load factor of a member that no action loads
// (+Inf): a margin the estimators can add up.
const maxLoadFactor = 1e6

// loadFactor returns the load factor of one set of inputs (without the
// model factor) about axis (the bending axis or Both).
func (md *Model) loadFactor(v *values, axis column.Axis) (column.Factor, error) {
	m, sec, err := md.member(v)
	if err != nil {
		return column.Factor{}, err
	}
	b, n := md.bendingOf(v)
	mb := m
	if md.perAxis {
		md.axisMember(&mb, v, b.Axis)
	}
	var f column.Factor
	switch {
	case md.kernel == kernelCurve:
		in, err := md.interaction(&mb, sec)
		if err != nil {
			return f, err
		}
		f, err = column.InteractionFactor(&mb, n, &b, &in)
		if err != nil {
			return f, err
		}
	case md.kernel == kernelBeam && n > 0:
		opt := md.beam
		for a := range 2 {
			if md.springs[a] {
				opt.Springs[a] = [2]float64{v[fTop0+a], v[fBot0+a]}
			}
		}
		opt.Bending, opt.Load = b, n
		r, err := column.BeamColumn(&mb, sec, b.Axis, &opt)
		if err != nil {
			return f, err
		}
		f = column.Factor{Factor: r.N / n, Axis: r.Axis, Mode: r.Mode, Governs: r.Governs}
	default: // first yield, and the beam-column without compression
		f, err = column.FirstYieldFactor(&mb, b.Axis, n, &b)
		if err != nil {
			return f, err
		}
	}
	if axis != column.Both || n <= 0 {
		return f, nil
	}
	// The other axis under the axial load alone. The closed forms take
	// both axes and the modes that twist (the bent axis's axial capacity
	// is no smaller than its load factor times n); the beam-column, the
	// other axis only.
	other := column.Both
	if md.kernel == kernelBeam {
		other = 1 - b.Axis
	}
	res, _, err := md.capacity(v, other)
	if err != nil {
		return f, err
	}
	if g := res.N / n; g < f.Factor {
		f = column.Factor{Factor: g, Axis: res.Axis, Mode: res.Mode, Governs: res.Governs}
	}
	return f, nil
}

// interaction returns the settings of the EN 1993-1-1 6.3.3 interaction
// of a sample's member and section.
func (md *Model) interaction(m *column.Member, sec column.Section) (column.Interaction, error) {
	in := column.Interaction{Class: 3}
	if _, cl, err := sec.ClassifyProps(m.Props, m.Fy); err == nil && cl.Class > 0 {
		in.Class = cl.Class
	}
	wpl, err := sec.PlasticModulus()
	if err != nil {
		return in, err
	}
	in.Plastic = wpl
	shape := sec.Shape
	in.Open = shape == column.ShapeI || shape == column.ShapeRect
	in.IShape = shape == column.ShapeI
	fab := md.Study.Section.Fabrication
	in.Rolled = shape == column.ShapeI
	hb := 0.0
	if sec.Width > 0 {
		hb = sec.Depth / sec.Width
	}
	in.AlphaLT = column.LTBCurveAlpha(shape, fab, hb, in.Rolled)
	return in, nil
}

// nominalFactor fills the load factor of a study with [bending] at the
// nominal values v.
func (md *Model) nominalFactor(n *Nominal, v *values) error {
	f, err := md.loadFactor(v, md.Study.Axis)
	if err != nil {
		return err
	}
	b, _ := md.bendingOf(v)
	n.Bending = &b
	n.LoadFactor = v[fModel] * f.Factor
	n.Capacity = n.LoadFactor * n.Demand
	n.Utilisation = 1 / n.LoadFactor
	n.Axis, n.Governs, n.CapacityMode = f.Axis, f.Governs, f.Mode
	n.ModeSlenderness = n.RelSlenderness[f.Axis]
	return nil
}
