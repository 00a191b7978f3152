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
// each sample, with only the first fields of the values copied and the
// member copied from a template whose fixed fields Build filled.

// nFast is the number of leading fields fastG reads: up to the sum of the
// loads and the shear modulus (see the field constants in model.go).
const nFast = fG + 1

// fastValues are the fields of one evaluation fastG reads.
type fastValues [nFast]float64

// fastModel is the state of fastG, set by setupFast.
type fastModel struct {
	base   fastValues
	member column.Member // the fixed fields of every sample's member
	feeds  feeds         // every one targets a field below nFast
}

// setupFast chooses fastG as the limit state when the study is the common
// case; it is called last in Build.
func (md *Model) setupFast() {
	if !md.fastOK() {
		return
	}
	f := &md.fast
	copy(f.base[:], md.base[:nFast])
	f.feeds = md.feeds
	f.member.Props = md.props
	f.member.Kind, f.member.Lambda0 = md.mat.kind, md.mat.lambda0
	md.Sim.G = md.fastG
}

// fastOK reports whether fastG evaluates the study as g does.
func (md *Model) fastOK() bool {
	if md.Study.Bending != nil || md.mat.timber || md.mat.adjust || md.cases != 0 ||
		md.kernel != kernelFirstYield || md.perAxis || md.curve ||
		md.secRandom || md.propsDynamic || md.springs[0] || md.springs[1] {
		return false
	}
	for _, fd := range md.feeds.set {
		if fd.field >= nFast || fd.field == fLoads {
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

// fastG is g for the common study (see setupFast): the member of memberInto
// evaluated as capacityInto's first case does, the demand of a study
// without combination cases.
func (md *Model) fastG(x, out []float64) float64 {
	f := &md.fast
	v := f.base
	for _, fd := range f.feeds.set {
		v[fd.field] = x[fd.src]
	}
	for _, fd := range f.feeds.add {
		v[fd.field] += x[fd.src]
	}
	// The loads' sum starts at +0, so adding caseLoad's 0 changes nothing.
	demand := v[fEffect] * v[fLoads]
	m := f.member
	m.E, m.G, m.Fy, m.Length, m.Bow, m.Ecc = v[fE], v[fG], v[fFy], v[fLength], v[fBow], v[fEcc]
	if md.relBow {
		m.Bow *= m.Length
	}
	if md.relEcc {
		m.Ecc *= m.Length
	}
	m.K = [2]float64{v[fK0], v[fK1]}
	m.Alpha = [2]float64{v[fAlpha0], v[fAlpha1]}
	capacity := 0.0
	res, err := column.FirstYield(&m, md.Study.Axis)
	if err == nil && !math.IsNaN(res.N) && !math.IsInf(res.N, 0) && res.N >= 0 {
		capacity = v[fModel] * res.N
	}
	if out != nil {
		out[OutCapacity] = capacity
		out[OutDemand] = demand
	}
	return capacity - demand
}
