package study

import "strutrisk/sim"

// Loaded returns the reliability model of the study with the reserve
// loads (Study.ReserveLoads: the variable loads, or all of them when
// target.reserve_on = "all") multiplied by factor, and a deterministic
// axial load added (N, like the loads: the effect factor multiplies it).
// Loaded(1, 0) is the study's own model. The variables, their order and
// their distributions are those of md.Sim, so a point of one model is a
// point of the other; like the study's, its limit state does not allocate.
func (md *Model) Loaded(factor, added float64) *sim.Model {
	scaled := map[*Quantity]bool{}
	for _, q := range md.Study.ReserveActions() {
		scaled[q] = true
	}
	c := *md
	// Fixed loads sit in the base sum: rebuild it.
	for _, q := range md.Study.Loads {
		if !q.Random() && scaled[q] {
			c.base[fLoads] += (factor - 1) * q.Value
			if b := md.Study.Bending; b != nil { // moments tied to the load
				if b.Top.Load == q {
					c.base[fTieTop] *= factor
				}
				if b.Bottom.Load == q {
					c.base[fTieBot] *= factor
				}
			}
			c.scaleDuration(q, factor) // materialmodel.go
		}
	}
	c.base[fLoads] += added
	if b := md.Study.Bending; b != nil { // fixed moments and lateral load of their own
		for f, q := range map[int]*Quantity{fBendTop: b.Top.Moment, fBendBot: b.Bottom.Moment, fBendLat: b.Lateral} {
			if q != nil && !q.Random() && scaled[q] {
				c.base[f] *= factor
			}
		}
	}
	scale := make([]float64, len(md.binds))
	for i := range md.binds {
		scale[i] = 1
		if q := md.quantity(i); scaled[q] {
			scale[i] = factor
		}
	}
	cp := &c
	g := func(x, out []float64) float64 {
		v := cp.base
		for i, b := range cp.binds {
			cp.set(&v, b, scale[i]*x[i])
		}
		capacity, demand := cp.eval(&v)
		if out != nil {
			out[OutCapacity] = capacity
			out[OutDemand] = demand
			cp.bendOutputs(&v, out)
		}
		return capacity - demand
	}
	m := *md.Sim
	m.G = g
	cp.Sim = &m
	if l := md.Sim.Linear; l != nil {
		// g = h - c x_j still holds, with c scaled by the factor on x_j.
		j := l.Index
		m.Linear = &sim.Linear{
			Index: j,
			Split: func(x []float64) (h, c float64) {
				v := cp.base
				for i, b := range cp.binds {
					if i != j {
						cp.set(&v, b, scale[i]*x[i])
					}
				}
				capacity, demand := cp.eval(&v)
				return capacity - demand, v[fEffect] * scale[j]
			},
		}
	}
	return &m
}
