package analysis

import (
	"fmt"
	"math/rand/v2"

	"strutrisk/sim"
)

// systemPlan is how the joint sample evaluates its members. Members
// that take a shared normal through the same marginal take the same
// value: each such pair of a shared normal and a distribution (a slot)
// is transformed once a sample, not once a member (the 2,000 generated
// members take their four shared inputs through 32 slots, where each
// Gumbel load cost a logarithm or two per member). The values are those
// of the member's own transformation, bit for bit: an uncorrelated
// variable's value is its marginal at its normal (sim.Transform.ToX).
type systemPlan struct {
	ms      []systemMember
	nShared int
	dim     int // the most variables of a member
	slots   []systemSlot
	// src gives, per member and variable, its slot or -1 (a normal of
	// the member's own, drawn in the order of its variables); nil for a
	// member whose variables are correlated, which goes through its
	// transformation.
	src [][]int
}

// systemSlot is a shared normal z taken through the marginal d.
type systemSlot struct {
	z int
	d sim.Dist
}

// newSystemPlan plans the joint sample of ms over nShared shared normals.
// Two distributions are one marginal when their type and every field
// print alike (%#v prints floats exactly; a pointer or function field by
// its address, so two copies are at worst two slots).
func newSystemPlan(ms []systemMember, nShared int) *systemPlan {
	p := &systemPlan{ms: ms, nShared: nShared, src: make([][]int, len(ms))}
	at := map[string]int{}
	for i := range ms {
		m := &ms[i]
		p.dim = max(p.dim, m.t.Dim())
		if correlates(m.t) {
			continue
		}
		src := make([]int, m.t.Dim())
		for k, v := range m.t.Vars() {
			src[k] = -1
			z := m.shared[k]
			if z < 0 {
				continue
			}
			key := fmt.Sprintf("%d %T %#v", z, v.Dist, v.Dist)
			j, ok := at[key]
			if !ok {
				j = len(p.slots)
				at[key] = j
				p.slots = append(p.slots, systemSlot{z: z, d: v.Dist})
			}
			src[k] = j
		}
		p.src[i] = src
	}
	return p
}

// correlates reports whether t correlates any of its variables.
func correlates(t *sim.Transform) bool {
	for k := range t.Dim() {
		if t.Correlated(k) {
			return true
		}
	}
	return false
}

// systemWorker holds one worker's buffers: the shared normals z of a
// sample, the slots' values xs, and a member's u and x.
type systemWorker struct {
	p           *systemPlan
	z, xs, u, x []float64
}

// worker returns a worker of the plan, its buffers its own.
func (p *systemPlan) worker() *systemWorker {
	return &systemWorker{p: p, z: make([]float64, p.nShared), xs: make([]float64, len(p.slots)),
		u: make([]float64, p.dim), x: make([]float64, p.dim)}
}

// block draws n joint samples from the stream of (seed, b): in each the
// shared normals, then member after member its own normals, in the
// order of its variables.
func (w *systemWorker) block(seed, b uint64, n int64) *systemCounts {
	ms := w.p.ms
	c := &systemCounts{n: n, members: make([]int64, len(ms))}
	r := rand.New(rand.NewPCG(seed, b))
	for range n {
		for k := range w.z {
			w.z[k] = r.NormFloat64()
		}
		for j, s := range w.p.slots {
			w.xs[j] = s.d.FromStdNormal(w.z[s.z])
		}
		failing := int64(0)
		for i := range ms {
			if ms[i].m.G(w.point(i, r), nil) < 0 {
				c.members[i]++
				failing++
			}
		}
		if failing > 0 {
			c.failures++
			c.failing += failing
		}
	}
	return c
}

// point returns member i's physical point in the current sample, its own
// normals drawn from r.
func (w *systemWorker) point(i int, r *rand.Rand) []float64 {
	m := &w.p.ms[i]
	d := m.t.Dim()
	x := w.x[:d]
	if src := w.p.src[i]; src != nil {
		vs := m.t.Vars()
		for k, j := range src {
			if j >= 0 {
				x[k] = w.xs[j]
			} else {
				x[k] = vs[k].Dist.FromStdNormal(r.NormFloat64())
			}
		}
		return x
	}
	u := w.u[:d]
	for k, s := range m.shared {
		if s >= 0 {
			u[k] = w.z[s]
		} else {
			u[k] = r.NormFloat64()
		}
	}
	m.t.ToX(x, u)
	return x
}
