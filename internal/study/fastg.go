package study

import (
	"math"

	"strutrisk/internal/column"
)

// The common study (a closed-form first-yield model, axial load only, a
// material without adjustment, one fixed section, no end springs, no
// combination cases, imperfections that do not differ by axis) takes a
// limit state chosen once by Build: fastG. It does what g does for such a
// study, in the same order of operations (the same numbers bit for bit),
// without the dispatch over models, materials, bending and load cases of
// each sample and without the values of g: the random inputs go straight
// into a member copied from a template whose fixed inputs Build filled.

// fastModel is the state of fastG, set by setupFast.
type fastModel struct {
	// member has the fixed inputs of every sample's member: a bow or
	// eccentricity given as a fraction of the length is stored as the
	// fraction, as in the values of g.
	member               column.Member
	model, effect, loads float64 // the fixed model and effect factors, the fixed loads' sum
	set                  []feed  // random inputs, each into one of the fields fastField takes
	add                  []int32 // the random loads, in the order of g's sum
}

// setupFast chooses fastG as the limit state when the study is the common
// case; it is called last in Build.
func (md *Model) setupFast() {
	if !md.fastOK() {
		return
	}
	f := &md.fast
	b := &md.base
	m := &f.member
	m.Props = md.props
	m.Kind, m.Lambda0 = md.mat.kind, md.mat.lambda0
	m.E, m.G, m.Fy, m.Length, m.Bow, m.Ecc = b[fE], b[fG], b[fFy], b[fLength], b[fBow], b[fEcc]
	m.K = [2]float64{b[fK0], b[fK1]}
	m.Alpha = [2]float64{b[fAlpha0], b[fAlpha1]}
	f.model, f.effect, f.loads = b[fModel], b[fEffect], b[fLoads]
	f.set = md.feeds.set
	for _, fd := range md.feeds.add {
		f.add = append(f.add, fd.src)
	}
	md.Sim.G = md.fastG
}

// fastOK reports whether fastG evaluates the study as g does.
func (md *Model) fastOK() bool {
	if md.Study.Bending != nil || md.mat.timber || md.mat.adjust || md.cases != 0 ||
		md.kernel != kernelFirstYield || md.perAxis || md.curve ||
		md.secRandom || md.propsDynamic || md.springs[0] || md.springs[1] {
		return false
	}
	var m column.Member
	var model, effect float64
	for _, fd := range md.feeds.set {
		if !fastField(&m, &model, &effect, fd.field, 0) {
			return false
		}
	}
	for _, fd := range md.feeds.add {
		if fd.field != fLoads {
			return false
		}
	}
	return true
}

// fastField stores x in the input of the member or the factors that the
// field f of g's values stands for, and reports whether f is one fastG
// takes.
func fastField(m *column.Member, model, effect *float64, f int32, x float64) bool {
	switch f {
	case fE:
		m.E = x
	case fG:
		m.G = x
	case fFy:
		m.Fy = x
	case fLength:
		m.Length = x
	case fBow:
		m.Bow = x
	case fEcc:
		m.Ecc = x
	case fK0, fK1:
		m.K[f-fK0] = x
	case fAlpha0, fAlpha1:
		m.Alpha[f-fAlpha0] = x
	case fModel:
		*model = x
	case fEffect:
		*effect = x
	default:
		return false
	}
	return true
}

// fastG is g for the common study (see setupFast): the member of memberInto
// evaluated as capacityInto's first case does, the demand of a study
// without combination cases.
func (md *Model) fastG(x, out []float64) float64 {
	f := &md.fast
	m := f.member
	model, effect, loads := f.model, f.effect, f.loads
	for _, fd := range f.set {
		fastField(&m, &model, &effect, fd.field, x[fd.src])
	}
	for _, i := range f.add {
		loads += x[i]
	}
	// The loads' sum starts at +0, so adding caseLoad's 0 changes nothing.
	demand := effect * loads
	if md.relBow {
		m.Bow *= m.Length
	}
	if md.relEcc {
		m.Ecc *= m.Length
	}
	capacity := 0.0
	res, err := column.FirstYield(&m, md.Study.Axis)
	if err == nil && !math.IsNaN(res.N) && !math.IsInf(res.N, 0) && res.N >= 0 {
		capacity = model * res.N
	}
	if out != nil {
		out[OutCapacity] = capacity
		out[OutDemand] = demand
	}
	return capacity - demand
}
