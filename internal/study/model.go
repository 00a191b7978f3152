package study

import (
	"errors"

	"strutrisk/internal/column"
	"strutrisk/sim"
)

// Fields of one evaluation: every input the capacity and the demand read.
const (
	fLength = iota
	fE
	fFy
	fBow
	fEcc
	fK0 // K major; fK0+1 minor
	fK1
	fAlpha0
	fAlpha1
	fModel  // model factor
	fEffect // effect factor
	fTop0   // end springs, per axis
	fTop1
	fBot0
	fBot1
	fSway  // out-of-plumb angle
	fLoads // sum of the loads
	fG     // shear modulus (0: E / 2.6)
	fKmod  // timber: k_mod of the combination evaluated (materialmodel.go)
	fDur0  // timber: the sum of the loads of each load-duration class
	fDur1
	fDur2
	fDur3
	fDur4
	fFu   // stainless: ultimate strength
	fHAZw // aluminium: width of the heat-affected zone
	fHAZr // aluminium: its strength ratio
	fSec0 // section dimensions in the order of sectionDims (shapes.go)
)

// fCase0 is the first of MaxCombined fields, the sum of the combined
// loads of each combination case (see combination_model.go).
const fCase0 = fSec0 + len(sectionDims)

const nFields = fBendEnd // bending_model.go

// values holds one evaluation's inputs.
type values [nFields]float64

// binding places one random variable into the fields it sets.
type binding struct {
	fields []int
	add    bool // loads add up
}

// Model is the reliability model of a study: the sim.Model whose limit
// state is g = (model factor x capacity) - (effect factor x sum of loads),
// with outputs "capacity" (model factor included) and "demand".
type Model struct {
	// Sim is the model to hand to the sim package.
	Sim *sim.Model
	// Study is the study it was built from.
	Study *Study

	base       values
	binds      []binding
	feeds      feeds     // binds flattened (feed.go)
	flat       flatClass // yields that leave a fixed section's class below 4 (classrange.go)
	relBow     bool      // bow and eccentricity are fractions of the length
	relEcc     bool
	lcrBow     bool // bow and eccentricity are fractions of the buckling length
	lcrEcc     bool
	perAxis    bool // the member differs by axis (see axisMember)
	equivalent bool // capacity.imperfection = "equivalent"
	secRandom  bool
	// secVary are the indices in sectionDims of the random dimensions,
	// set in each sample's section.
	secVary []int
	// radiusGiven: the RHS corner radius is given (else the fabrication's);
	// classify: the shape has a section class to find; propsDynamic: the
	// properties change per sample (the section or, for its class, the
	// yield strength is random); shellOK: a class 4 CHS is accepted
	// (see class.go).
	radiusGiven, classify, propsDynamic, shellOK bool
	gross                                        column.Props // of a fixed section
	sec                                          column.Section
	props                                        column.Props
	springs                                      [2]bool
	kDynamic                                     bool // spring K depends on random inputs
	k                                            [2]float64
	kernel                                       kernel // of the capacity model
	curve                                        bool   // the model is a buckling curve
	planar                                       bool   // the model bends in one plane
	beam                                         column.BeamOptions
	// cases is the number of load combination cases (0: the loads add
	// up); only, when not 0, is 1 + the one case the limit state takes
	// (see combination_model.go).
	cases, only int
	mat         materialModel // materialmodel.go
	fast        fastModel     // fastg.go
}

// Outputs of the model, in the order of Model.Sim.Outputs.
const (
	OutCapacity = 0
	OutDemand   = 1
)

// targets lists the fields each quantity of st sets.
func targets(st *Study) map[*Quantity][]int {
	t := map[*Quantity][]int{}
	add := func(q *Quantity, f int) {
		if q != nil {
			t[q] = append(t[q], f)
		}
	}
	add(st.Length, fLength)
	add(st.Modulus, fE)
	add(st.Shear, fG)
	add(st.Yield, fFy)
	add(st.Bow, fBow)
	add(st.Ecc, fEcc)
	add(st.Sway, fSway)
	add(st.ModelFactor, fModel)
	add(st.EffectFactor, fEffect)
	c := st.Combination
	for _, q := range st.Loads {
		if !c.combined(q) {
			add(q, fLoads)
		}
	}
	if c != nil {
		add(c.Combined, fLoads)
		for i, cs := range c.Cases {
			for _, q := range cs.Loads {
				add(q, fCase0+i)
			}
		}
	}
	for a := range 2 {
		e := st.Ends[a]
		switch e.How {
		case "springs":
			add(e.Top, fTop0+a)
			add(e.Bottom, fBot0+a)
		default:
			add(e.K, fK0+a)
		}
		add(st.Alpha[a], fAlpha0+a)
	}
	for i, d := range sectionDims {
		add(st.Section.Dims[d.info.Name], fSec0+i)
	}
	materialTargets(st, add) // materialmodel.go
	bendTargets(st, add)     // bending_model.go
	return t
}

// Build makes the reliability model of a checked study.
func Build(st *Study) (*Model, error) {
	md := &Model{Study: st}
	md.base[fModel] = 1
	md.base[fEffect] = 1
	tg := targets(st)
	var vars []sim.Variable
	seen := map[*Quantity]bool{}
	isLoad := map[*Quantity]bool{}
	for _, q := range st.Loads {
		isLoad[q] = true
	}
	if c := st.Combination; c != nil {
		md.cases = len(c.Cases)
		if c.Combined != nil {
			isLoad[c.Combined] = true
		}
		for _, cs := range c.Cases {
			for _, q := range cs.Loads {
				isLoad[q] = true
			}
		}
	}
	place := func(q *Quantity) {
		if seen[q] {
			return
		}
		seen[q] = true
		fields := tg[q]
		if q.Random() {
			vars = append(vars, sim.Variable{Name: q.Path, Dist: q.Dist, Unit: q.Unit()})
			md.binds = append(md.binds, binding{fields: fields, add: isLoad[q]})
			return
		}
		for _, f := range fields {
			if isLoad[q] {
				md.base[f] += q.Value
			} else {
				md.base[f] = q.Value
			}
		}
	}
	// Quantities in file order, then the ones made up (K from ends or
	// defaults, alpha from a curve name).
	for _, q := range st.Quantities {
		if _, ok := tg[q]; ok {
			place(q)
		}
	}
	for q := range tg {
		if !seen[q] {
			if q.Random() {
				return nil, errors.New("study: internal: unregistered random quantity " + q.Path)
			}
			place(q)
		}
	}
	md.relBow = st.Bow != nil && st.Bow.Relative
	md.relEcc = st.Ecc != nil && st.Ecc.Relative
	md.lcrBow = st.Bow != nil && st.Bow.Lcr
	md.lcrEcc = st.Ecc != nil && st.Ecc.Lcr
	md.equivalent = st.Imperfection == "equivalent"
	md.perAxis = md.lcrBow || md.lcrEcc || st.Imperfection == "equivalent" || st.Sway != nil
	md.sec = column.Section{Shape: st.Section.Shape}
	for i, d := range sectionDims {
		if q := st.Section.Dims[d.info.Name]; q != nil {
			*md.sec.Field(d.dim) = md.base[fSec0+i]
			if q.Random() {
				md.secRandom = true
				md.secVary = append(md.secVary, i)
			}
		}
	}
	md.radiusGiven = st.Section.Dims["radius"] != nil
	corners(&md.sec, md.radiusGiven, st.Section.Fabrication)
	md.classifyOptions(st)
	if !md.secRandom {
		p, err := md.sec.Properties()
		if err != nil {
			return nil, err
		}
		md.gross = p
		if !md.propsDynamic {
			if p, err = md.sectionProps(&md.sec, md.base[fFy]); err != nil {
				return nil, err
			}
		}
		md.props = p // the gross I of p is all the static springs read
		md.flatRange()
	}
	for a := range 2 {
		md.springs[a] = st.Ends[a].How == "springs"
	}
	if md.springs[0] || md.springs[1] {
		for _, q := range []*Quantity{st.Length, st.Modulus, st.Ends[0].Top, st.Ends[0].Bottom, st.Ends[1].Top, st.Ends[1].Bottom} {
			if q != nil && q.Random() {
				md.kDynamic = true
			}
		}
		md.kDynamic = md.kDynamic || md.secRandom
		if !md.kDynamic {
			for a := range 2 {
				if md.springs[a] {
					k, err := md.springK(&md.base, &md.props, a)
					if err != nil {
						return nil, err
					}
					md.k[a] = k
				}
			}
		}
	}
	md.kernel = st.Model.kernel()
	md.curve, md.planar = st.ModelTraits().Curve, st.ModelTraits().Planar
	if md.kernel == kernelBeam {
		md.beam = beamOptions(st)
	}
	m := &sim.Model{
		Vars:    vars,
		Corr:    st.Corr,
		G:       md.g,
		Outputs: outputNames(st), // bending_model.go
	}
	md.Sim = m
	md.feeds = feedsOf(md.binds, -1)
	m.Expensive = md.expensive() // formsettings.go
	md.linear()
	md.setupMaterial() // materialmodel.go
	md.setupFast()     // fastg.go
	return md, nil
}

// linear marks the limit state as linear in the random load with the
// largest spread that is correlated with nothing: g = h - c x_j with c the
// effect factor.
func (md *Model) linear() {
	if md.cases > 0 || md.Study.Bending != nil {
		return // the smallest margin over the cases, a load factor: not linear in a load
	}
	corr := map[string]bool{}
	for _, c := range md.Study.Corr {
		corr[c.A], corr[c.B] = true, true
	}
	best, bestSD := -1, 0.0
	for i, b := range md.binds {
		v := md.Sim.Vars[i]
		if b.add && !corr[v.Name] && v.Dist.StdDev() > bestSD {
			best, bestSD = i, v.Dist.StdDev()
		}
	}
	if best < 0 {
		return
	}
	j := best
	fs := feedsOf(md.binds, j)
	md.Sim.Linear = &sim.Linear{
		Index: j,
		Split: func(x []float64) (h, c float64) {
			v := md.base
			fs.fill(&v, x)
			capacity, demand := md.eval(&v)
			return capacity - demand, v[fEffect]
		},
	}
}

func (md *Model) set(v *values, b binding, x float64) {
	for _, f := range b.fields {
		if b.add {
			v[f] += x
		} else {
			v[f] = x
		}
	}
}

// g is the limit state of the sim.Model.
func (md *Model) g(x, out []float64) float64 {
	v := md.base
	md.feeds.fill(&v, x)
	capacity, demand := md.eval(&v)
	if out != nil {
		out[OutCapacity] = capacity
		out[OutDemand] = demand
		md.bendOutputs(&v, out) // bending_model.go
	}
	return capacity - demand
}

// eval returns the capacity (model factor included) and the demand of one
// set of inputs. A member the mechanics cannot evaluate (a sample outside
// the physical range) has no capacity.
func (md *Model) eval(v *values) (capacity, demand float64) {
	if md.Study.Bending != nil {
		return md.evalFactor(v) // bending_model.go
	}
	if md.mat.timber {
		return md.timberEval(v)
	}
	return md.evalOne(v)
}

// evalOne is eval of one combination of loads.
func (md *Model) evalOne(v *values) (capacity, demand float64) {
	demand = md.demand(v)
	var m column.Member
	var buf column.Section
	res, err := md.capacityInto(v, md.Study.Axis, &m, &buf)
	if err != nil || !(res.N >= 0) {
		return 0, demand
	}
	return v[fModel] * res.N, demand
}

// member assembles the column member of one set of inputs.
func (md *Model) member(v *values) (column.Member, column.Section, error) {
	var m column.Member
	var buf column.Section
	sec, err := md.memberInto(v, &m, &buf)
	return m, *sec, err
}

func (md *Model) springK(v *values, p *column.Props, a int) (float64, error) {
	return column.SpringKFromStiffness(v[fTop0+a], v[fBot0+a], v[fE], p.I[a], v[fLength])
}

// capacity evaluates the capacity model (without the model factor). With
// axis Both it returns the member of the governing axis.
func (md *Model) capacity(v *values, axis column.Axis) (column.Result, column.Member, error) {
	var m column.Member
	var buf column.Section
	res, err := md.capacityInto(v, axis, &m, &buf)
	return res, m, err
}

// evaluate runs the kernel of the study's capacity model on the member.
// The closed forms without a material adjustment return their result as
// it is, from a small frame: the common case of every sample.
func (md *Model) evaluate(m *column.Member, sec *column.Section, v *values, axis column.Axis) (column.Result, error) {
	if !md.mat.adjust {
		switch md.kernel {
		case kernelFirstYield:
			return column.FirstYield(m, axis)
		case kernelCurve:
			return column.Curve(m, axis)
		}
	}
	return md.evaluateAll(m, sec, v, axis)
}

// evaluateAll is evaluate for every kernel and material.
func (md *Model) evaluateAll(m *column.Member, sec *column.Section, v *values, axis column.Axis) (column.Result, error) {
	var res column.Result
	var err error
	switch md.kernel {
	case kernelCurve:
		res, err = column.Curve(m, axis)
	case kernelBeam:
		res, err = md.beamCapacity(m, *sec, v, axis)
	default:
		res, err = column.FirstYield(m, axis)
	}
	if err == nil && md.mat.adjust {
		res = md.materialResult(res, m, sec, v, axis)
	}
	return res, err
}

// MarginModel returns the model with one output, "margin", equal to the
// limit state g: the output sensitivity measures look at.
func (md *Model) MarginModel() *sim.Model {
	m := *md.Sim
	m.Outputs = []string{"margin"}
	m.G = func(x, out []float64) float64 {
		g := md.g(x, nil)
		if out != nil {
			out[0] = g
		}
		return g
	}
	return &m
}
