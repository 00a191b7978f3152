package study

import (
	"math"

	"strutrisk/internal/column"
)

// materialModel is what the reliability model does for the material's
// kind beyond carbon steel.
type materialModel struct {
	kind    column.Kind
	lambda0 float64
	// adjust: materialResult changes the capacity (timber's k_mod on the
	// curve model, aluminium's heat-affected zones).
	adjust bool
	// timber: the limit state is the least margin over the combinations
	// of the loads of each duration class and the longer ones; kmod per
	// class, used[d] when some load has class d; kdef the creep factor.
	timber bool
	kmod   [5]float64
	used   [5]bool
	kdef   float64
	// haz: welded aluminium with heat-affected zones; classA its buckling
	// class.
	haz, classA bool
	// law: the ultimate beam-column follows the Ramberg-Osgood law.
	law bool
}

// materialTargets adds the fields the material's quantities set.
func materialTargets(st *Study, add func(*Quantity, int)) {
	ms := &st.Material
	add(ms.Ultimate, fFu)
	add(ms.HAZWidth, fHAZw)
	add(ms.HAZFactor, fHAZr)
	if ms.Kind != column.Timber {
		return
	}
	for _, q := range st.Loads {
		if d, err := column.ParseDuration(q.Duration); err == nil {
			add(q, fDur0+int(d))
		}
	}
}

// setupMaterial prepares the material's part of a built model.
func (md *Model) setupMaterial() {
	st := md.Study
	ms := &st.Material
	mm := &md.mat
	mm.kind, mm.lambda0 = ms.Kind, ms.Lambda0
	md.base[fKmod] = 1
	switch ms.Kind {
	case column.Timber:
		mm.timber = true
		mm.adjust = md.curve
		mm.kdef, _ = column.KDef(ms.Service)
		shortest, n := -1, 0
		for _, q := range st.Loads {
			if d, err := column.ParseDuration(q.Duration); err == nil {
				if !mm.used[d] {
					n++
				}
				mm.used[d] = true
				shortest = max(shortest, int(d))
			}
		}
		for d := range mm.kmod {
			mm.kmod[d], _ = column.KMod(ms.Service, column.Duration(d))
		}
		if shortest >= 0 {
			md.base[fKmod] = mm.kmod[shortest]
		}
		if n > 1 {
			md.Sim.Linear = nil // a least margin over combinations
		}
	case column.Aluminium:
		mm.haz = ms.HAZFactor != nil && ms.HAZWidth != nil
		mm.adjust = mm.haz
		mm.classA = ms.ClassA
	case column.Stainless:
		mm.law = md.kernel == kernelBeam && st.ModelTraits().Ultimate && ms.Ultimate != nil
	}
}

// materialMember gives the member of one evaluation its material: the
// kind and plateau, and for timber under a first-yield model the strength
// the combination sees (k_mod f) and the modulus with the creep of its
// lasting share (column.CreepModulus).
func (md *Model) materialMember(m *column.Member, v *values) {
	m.Kind, m.Lambda0 = md.mat.kind, md.mat.lambda0
	if md.mat.timber && m.G == 0 {
		m.G = m.E / 16 // G_mean = E_0,mean / 16, EN 338:2016 Table 1 (from memory)
	}
	if !md.mat.timber || md.curve {
		return
	}
	m.Fy *= v[fKmod]
	psi := 0.0
	if s := v[fLoads]; s > 0 {
		psi = math.Min(1, math.Max(0, (v[fDur0]+v[fDur1])/s))
	}
	m.E = column.CreepModulus(m.E, md.mat.kdef, psi)
}

// materialResult adjusts a capacity for the material: timber's curve
// model takes k_mod on the strength but not in the slenderness
// (EN 1995-1-1 eqs. 6.23 and 6.25); welded aluminium its heat-affected
// zones (column.AluminiumWelded).
func (md *Model) materialResult(res column.Result, m *column.Member, sec *column.Section, v *values, axis column.Axis) column.Result {
	if md.mat.timber {
		res.N *= v[fKmod]
		return res
	}
	if !md.mat.haz {
		return res
	}
	ahaz, err := column.HAZArea(*sec, v[fHAZw])
	if err != nil || !(m.Props.A > 0) {
		res.N = 0
		return res
	}
	a1 := 1 - math.Min(1, ahaz/m.Props.A)*(1-math.Min(1, v[fHAZr]))
	afo := m.Props.EffectiveArea() * m.Fy
	if !md.curve {
		res.N = math.Min(res.N, a1*afo)
		return res
	}
	lo, hi := axis, axis
	if axis == column.Both {
		lo, hi = column.Major, column.Minor
	}
	best := res
	if res.Mode == column.ModeFlexuralMajor || res.Mode == column.ModeFlexuralMinor {
		best.N = math.Inf(1)
	}
	for a := lo; a <= hi; a++ {
		r, err := column.Curve(m, a)
		if err != nil {
			res.N = 0
			return res
		}
		n := column.AluminiumWelded(r.N, afo, column.RelativeSlenderness(m, a), a1, md.mat.classA)
		if n <= best.N {
			best = column.Result{N: n, Axis: a, Governs: r.Governs, Mode: r.Mode}
		}
	}
	return best
}

// timberEval is eval for timber: the least margin over the combinations
// of the loads of each duration class present and all longer-acting
// ones, each with k_mod of its shortest load (EN 1995-1-1 3.1.3(2)).
//
// A load in the sum that no duration class holds (the deterministic load
// the reserve search adds, see Loaded) counts in every combination, as a
// permanent load would.
func (md *Model) timberEval(v *values) (capacity, demand float64) {
	best := math.Inf(1)
	cum := v[fLoads]
	for d := range md.mat.kmod {
		cum -= v[fDur0+d]
	}
	w := *v
	for d := range md.mat.kmod {
		cum += v[fDur0+d]
		if !md.mat.used[d] {
			continue
		}
		w[fLoads], w[fKmod] = cum, md.mat.kmod[d]
		c, s := md.evalOne(&w)
		if c-s < best {
			best, capacity, demand = c-s, c, s
		}
	}
	if math.IsInf(best, 1) {
		return md.evalOne(v)
	}
	return capacity, demand
}

// scaleDuration moves a fixed load's share of its duration class's sum
// when Loaded multiplies the load by factor.
func (md *Model) scaleDuration(q *Quantity, factor float64) {
	if !md.mat.timber {
		return
	}
	if d, err := column.ParseDuration(q.Duration); err == nil {
		md.base[fDur0+int(d)] += (factor - 1) * q.Value
	}
}
