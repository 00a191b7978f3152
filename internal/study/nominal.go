package study

import (
	"fmt"

	"strutrisk/internal/column"
)

// Nominal is the deterministic picture of a study at nominal values: every
// input at its mean, bow and eccentricity at the mean of their magnitude,
// the model factor at its mean.
type Nominal struct {
	// Member is the nominal member (N, mm, MPa), Section its section.
	Member  column.Member
	Section column.Section
	// Per axis (indexed by column.Major, column.Minor): Euler load, K L / r,
	// relative slenderness and capacity (model factor included; 0 for an
	// axis that is not checked).
	Euler, Slenderness, RelSlenderness, AxisCapacity [2]float64
	// Capacity is the governing capacity, Axis its axis and Governs the
	// limit that governs it.
	Capacity float64
	Axis     column.Axis
	Governs  string
	// ModelFactor and EffectFactor are the factors' means; Demand is the
	// effect factor times the sum of the mean loads.
	ModelFactor, EffectFactor, Demand float64
	// Utilisation is Demand / Capacity.
	Utilisation float64
	// Class is the section's class in pure compression at the nominal
	// yield strength (EN 1993-1-1 Table 5.2; Class.Class 0 for a custom
	// section) and EffectiveArea the area that carries the load: A_eff of
	// a class 4 section (EN 1993-1-5 4.4), else A.
	Class         column.Classification
	EffectiveArea float64
	// Critical is the governing elastic critical load over the flexural
	// modes of the checked axes and, with axis both, the modes that twist
	// the section; Mode is its mode. Twisting is the lowest critical load
	// of the modes that twist (+Inf when the torsion constant is unknown)
	// and TwistingMode that mode.
	Critical, Twisting float64
	Mode, TwistingMode column.Mode
	// CapacityMode is the buckling mode of the governing capacity and
	// ModeSlenderness its relative slenderness sqrt(A fy / N_cr).
	CapacityMode    column.Mode
	ModeSlenderness float64
	// LoadFactor is, for a study with [bending], the factor on all actions
	// at which the member reaches its limit (model factor included); then
	// Capacity is LoadFactor times Demand, Utilisation 1/LoadFactor and
	// Bending the nominal end moments and lateral load (effect factor
	// included). 0 and nil for an axial study.
	LoadFactor float64
	Bending    *column.Bending
}

// Nominal evaluates the model at nominal values.
func (md *Model) Nominal() (*Nominal, error) {
	st := md.Study
	v := md.nominalValues()
	n := &Nominal{ModelFactor: v[fModel], EffectFactor: v[fEffect]}
	n.Demand = md.demand(&v)
	m, sec, err := md.member(&v)
	if err != nil {
		return nil, fmt.Errorf("at nominal values: %v", err)
	}
	if err := m.Validate(column.Both); err != nil {
		return nil, fmt.Errorf("at nominal values: %v", err)
	}
	n.Member, n.Section = m, sec
	n.EffectiveArea = m.Props.EffectiveArea()
	if _, cl, err := sec.Classify(m.Fy); err == nil {
		n.Class = cl
	}
	for a := column.Major; a <= column.Minor; a++ {
		n.Euler[a] = column.Euler(&m, a)
		n.Slenderness[a] = column.Slenderness(&m, a)
		n.RelSlenderness[a] = column.RelativeSlenderness(&m, a)
		if st.Axis != column.Both && st.Axis != a {
			continue
		}
		res, ma, err := md.capacity(&v, a)
		if err != nil {
			return nil, fmt.Errorf("at nominal values, %s axis: %v", a, err)
		}
		n.AxisCapacity[a] = v[fModel] * res.N
		// The weaker axis governs; a tie reports minor.
		if n.Governs == "" || n.AxisCapacity[a] <= n.Capacity {
			n.Capacity, n.Axis, n.Governs = n.AxisCapacity[a], a, res.Governs
			n.CapacityMode, n.ModeSlenderness = res.Mode, n.RelSlenderness[a]
			if md.perAxis {
				n.Member = ma // with the imperfections of the governing axis
			}
		}
	}
	if md.perAxis && m.Props.It != 0 {
		m = md.twistMember(m, &v) // Lcr/n, sway and equivalent imperfections
	}
	if err := md.nominalTwisting(n, &m); err != nil {
		return nil, err
	}
	if n.Capacity > 0 {
		n.Utilisation = n.Demand / n.Capacity
	}
	if st.Bending != nil {
		if err := md.nominalFactor(n, &v); err != nil { // bending_model.go
			return nil, err
		}
	}
	return n, nil
}

// nominalValues are the inputs at nominal values.
func (md *Model) nominalValues() values {
	st := md.Study
	v := md.base
	for i, b := range md.binds {
		q := md.quantity(i)
		x := q.Dist.Mean()
		if q == st.Bow || q == st.Ecc {
			x = meanMagnitude(q.Dist)
		}
		if q.update != nil {
			x = q.MeanValue() // the predictive may have no finite mean
		}
		md.set(&v, b, x)
	}
	return v
}

// quantity returns the study quantity of the i-th random variable.
func (md *Model) quantity(i int) *Quantity {
	name := md.Sim.Vars[i].Name
	for _, q := range md.Study.Quantities {
		if q.Path == name {
			return q
		}
	}
	panic("study: no quantity for variable " + name)
}
