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
	b, n := md.bendingOf(v)
	return md.factorOf(v, axis, n, &b)
}

// factorOf is loadFactor under the axial load n and the bending b.
func (md *Model) factorOf(v *values, axis column.Axis, n float64, bp *column.Bending) (column.Factor, error) {
	b := *bp
	m, sec, err := md.member(v)
	if err != nil {
		return column.Factor{}, err
	}
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

// Outputs of a study with [bending] besides capacity (the load factor)
// and demand (1): the axial load (N) and the largest first-order moment
// (N mm) of the sample, effect factor included.
const (
	OutAxial  = 2
	OutMoment = 3
)

// outputNames are the outputs of the study's sim.Model.
func outputNames(st *Study) []string {
	if st.Bending != nil {
		return []string{"capacity", "demand", "axial", "moment"}
	}
	return []string{"capacity", "demand"}
}

// bendOutputs writes the axial load and the largest first-order moment of
// the inputs v into out (a study with [bending] only).
func (md *Model) bendOutputs(v *values, out []float64) {
	if md.Study.Bending == nil || len(out) <= OutMoment {
		return
	}
	b, n := md.bendingOf(v)
	out[OutAxial] = n
	out[OutMoment], _ = column.SecondOrderMoment(0, 1, v[fLength], b.Bottom, b.Top, b.Lateral)
}

// InteractionCurve returns the limit of the member at nominal values in
// the plane of the axial load N (N) and the largest first-order moment M
// (N mm): k + 1 points from pure compression to pure bending, each the
// load factor times actions in a fixed proportion, the moment diagram of
// the nominal bending (a uniform moment when it has none) scaled so that
// its largest moment is M. The model factor is included.
func (md *Model) InteractionCurve(k int) (n, m []float64, err error) {
	if md.Study.Bending == nil || k < 1 {
		return nil, nil, nil
	}
	v := md.nominalValues()
	b, _ := md.bendingOf(&v)
	l := v[fLength]
	m0, _ := column.SecondOrderMoment(0, 1, l, b.Bottom, b.Top, b.Lateral)
	if !(m0 > 0) {
		b, m0 = column.Bending{Axis: b.Axis, Top: 1, Bottom: 1}, 1
	}
	mem, _, err := md.member(&v)
	if err != nil {
		return nil, nil, err
	}
	p := &mem.Props
	// The rays are spread evenly between the two ends of the curve: a
	// first pass finds them on the squash load and the elastic moment.
	ref := [2]float64{p.EffectiveArea() * mem.Fy, p.EffectiveModulus(b.Axis) * mem.Fy}
	at := func(phi float64) (float64, float64, error) {
		c, s := math.Cos(phi), math.Sin(phi)
		if phi == math.Pi/2 {
			c = 0
		}
		sc := s * ref[1] / m0
		bi := column.Bending{Axis: b.Axis, Top: b.Top * sc, Bottom: b.Bottom * sc, Lateral: b.Lateral * sc}
		f, err := md.factorOf(&v, md.Study.Axis, c*ref[0], &bi)
		lf := v[fModel] * math.Min(f.Factor, maxLoadFactor)
		return lf * c * ref[0], lf * s * ref[1], err
	}
	n0, _, err := at(0)
	if err != nil {
		return nil, nil, err
	}
	_, mm0, err := at(math.Pi / 2)
	if err != nil {
		return nil, nil, err
	}
	if n0 > 0 && mm0 > 0 {
		ref = [2]float64{n0, mm0}
	}
	for i := 0; i <= k; i++ {
		ni, mi, err := at(math.Pi / 2 * float64(i) / float64(k))
		if err != nil {
			return nil, nil, err
		}
		n, m = append(n, ni), append(m, mi)
	}
	return n, m, nil
}
