package study

import (
	"errors"
	"fmt"
	"math"
	"slices"

	"strutrisk/internal/column"
	"strutrisk/internal/life"
	"strutrisk/sim"
)

// lossField is the field of member.section.thickness_loss.
var lossField = fSec0 + dimIndex("thickness_loss")

// lifeModel evaluates the study's member at a time of its remaining
// life: the inputs of a path are the study's random inputs but the
// variable loads, then the loss law's random parameters.
type lifeModel struct {
	md   Model // a copy whose section is rebuilt at every evaluation
	keep []int // the binds of the path's inputs, in their order
	// rate and exp are the path indices of r and b (-1: fixed at rateV,
	// expV).
	rate, exp   int
	rateV, expV float64
}

// lifeCopy returns a copy of md that rebuilds the section, its class and
// spring-derived K at every evaluation, so that a loss added to the
// sample's thickness_loss takes effect. Its demand leaves out the load
// combination cases: the remaining life adds the annual maxima of the
// variable loads itself.
func (md *Model) lifeCopy() Model {
	c := *md
	c.secRandom, c.propsDynamic = true, true
	if loss := lossField - fSec0; !slices.Contains(c.secVary, loss) {
		c.secVary = append(slices.Clip(c.secVary), loss)
	}
	c.kDynamic = md.springs[0] || md.springs[1]
	c.cases, c.only = 0, 0
	return c
}

// LifeProblem returns the remaining life of the study ([life]) as a
// problem of the life package: the limit state of a path in a year is
// g = capacity - effect factor x (loads other than the random variable
// ones) - effect factor x (sum of the variable loads' annual maxima), the
// capacity of the section that has lost thickness_loss + r t^b.
func (md *Model) LifeProblem(workers int) (life.Problem, error) {
	st := md.Study
	ls := st.Life
	if ls == nil {
		return life.Problem{}, errors.New("study: no [life] table")
	}
	lm := &lifeModel{md: md.lifeCopy(), rate: -1, exp: -1, expV: 1}
	var vars, ann []sim.Variable
	for _, a := range ls.Annual {
		ann = append(ann, sim.Variable{Name: a.Path, Dist: a.Dist, Unit: InternalUnit(Force)})
	}
	for i, v := range md.Sim.Vars {
		if md.binds[i].add && !isPermanentPath(st, v.Name) {
			// A variable load, a companion of a combination case or the
			// combined maximum of the loads: their annual maxima replace
			// them.
			continue
		}
		lm.keep = append(lm.keep, i)
		vars = append(vars, v)
	}
	add := func(q *Quantity, idx *int, fixed *float64) {
		switch {
		case q == nil:
		case q.Random():
			*idx = len(vars)
			vars = append(vars, sim.Variable{Name: q.Path, Dist: q.Dist, Unit: q.Unit()})
		default:
			*fixed = q.Value
		}
	}
	add(ls.Rate, &lm.rate, &lm.rateV)
	add(ls.Exponent, &lm.exp, &lm.expV)
	return life.Problem{
		Vars: vars, Corr: md.Sim.Corr, Annual: ann,
		Ends:  LifeEnds(ls.Years, ls.Step),
		Split: lm.split,
		Paths: ls.Paths, Seed: st.Analysis.Seed, Workers: workers,
	}, nil
}

// LifeEnds are the years evaluated: every step years, and the horizon.
func LifeEnds(years, step int) []int {
	var ends []int
	for y := step; y < years; y += step {
		ends = append(ends, y)
	}
	return append(ends, years)
}

// split is the limit state of the path x at t years from now.
func (lm *lifeModel) split(x []float64, t float64) (h, c float64) {
	md := &lm.md
	v := md.base
	for j, i := range lm.keep {
		md.set(&v, md.binds[i], x[j])
	}
	r, b := lm.rateV, lm.expV
	if lm.rate >= 0 {
		r = x[lm.rate]
	}
	if lm.exp >= 0 {
		b = x[lm.exp]
	}
	v[lossField] += r * math.Pow(t, b)
	capacity, demand := md.eval(&v)
	return capacity - demand, v[fEffect]
}

// LifeLoss returns the nominal loss from every face at t years from now:
// the nominal thickness_loss plus d(t) at the means of r and b.
func (md *Model) LifeLoss(t float64) float64 {
	v := md.nominalValues()
	ls := md.Study.Life
	if ls == nil {
		return v[lossField]
	}
	r, b := meanOf(ls.Rate, 0), meanOf(ls.Exponent, 1)
	return v[lossField] + r*math.Pow(t, b)
}

// LifeCapacity returns the capacity (model factor included) at nominal
// values with the nominal loss of t years from now, and the nominal
// demand.
func (md *Model) LifeCapacity(t float64) (capacity, demand float64) {
	v := md.nominalValues()
	v[lossField] = md.LifeLoss(t)
	c := md.lifeCopy()
	return c.eval(&v)
}

// meanOf is the mean of q, def when q is nil.
func meanOf(q *Quantity, def float64) float64 {
	switch {
	case q == nil:
		return def
	case q.Random():
		return q.Dist.Mean()
	}
	return q.Value
}

// LifeWarnings warns of what the loss over the remaining life does to
// the section at nominal values: a section the loss consumes before the
// horizon (members past that point have no capacity and count as
// failed), or a class that changes from now to the horizon (EN 1993-1-1
// Table 5.2), which the capacity follows year by year.
func (md *Model) LifeWarnings() []string {
	ls := md.Study.Life
	if ls == nil || md.Study.Section.Shape == column.ShapeCustom {
		return nil
	}
	c := md.lifeCopy()
	classAt := func(t float64) (int, error) {
		v := md.nominalValues()
		v[lossField] = md.LifeLoss(t)
		m, sec, err := c.member(&v)
		if err != nil {
			return 0, err
		}
		_, cl, err := sec.Classify(m.Fy)
		return cl.Class, err
	}
	now, err := classAt(0)
	if err != nil {
		return nil // reported by the nominal check
	}
	for y := 1; y <= ls.Years; y++ {
		if _, err := classAt(float64(y)); err != nil {
			return []string{fmt.Sprintf("life: at the nominal loss of year %d (%.3g mm from every face) the section cannot be evaluated (%v): from about that year on members have no capacity and count as failed; check the loss law (life.corrosion_rate, life.corrosion_exponent)", y, md.LifeLoss(float64(y)), err)}
		}
	}
	if end, _ := classAt(float64(ls.Years)); end != now && now > 0 {
		return []string{fmt.Sprintf("life: the section goes from class %d now to class %d in year %d at nominal values (a nominal loss of %.3g mm from every face; EN 1993-1-1 Table 5.2): the capacity of each year follows its class", now, end, ls.Years, md.LifeLoss(float64(ls.Years)))}
	}
	return nil
}
