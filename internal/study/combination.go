package study

import (
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/column"
	"strutrisk/sim"
)

// Combination rules of [combination] rule.
const (
	// Turkstra takes each variable load in turn at its maximum over the
	// reference period, the others at their companion values, and fails
	// when any of these cases fails.
	Turkstra = "turkstra"
	// FerryBorges combines pulse processes (each load with repetitions)
	// into the maximum of their sum over the reference period
	// (sim.PulseMaximum), one random variable.
	FerryBorges = "ferry-borges-castanheta"
)

// CombinedPath is the path of the combined load of FerryBorges.
const CombinedPath = "loads.combined"

// MaxCombined is the largest number of random variable loads a
// combination takes.
const MaxCombined = 8

// Combination says how the random variable loads of a study combine when
// there are two or more of them.
//
// Turkstra's rule (Turkstra 1970; Melchers, Structural Reliability
// Analysis and Prediction, 2nd ed., 1999, ch. 9, from memory): case i has
// variable load i at its maximum over the reference period and every
// other variable load at its companion (point-in-time or the distribution
// the study gives). The member fails when any case fails, so the failure
// probability is that of the union of the cases: the limit state of a
// sample is the smallest margin over the cases, each case with its own
// draw of its companions (the instants the loads peak are taken as far
// apart, hence independent).
type Combination struct {
	// Rule is Turkstra or FerryBorges.
	Rule string
	// Loads are the combined loads, the random variable loads of the
	// study, in the order of the file.
	Loads []*Quantity
	// Cases holds one case per load (Turkstra): Cases[i] is led by
	// Loads[i].
	Cases []CombinationCase
	// Combined is the maximum over the reference period of the sum of the
	// loads' pulses (FerryBorges), the random variable CombinedPath that
	// takes the place of Loads.
	Combined *Quantity
}

// CombinationCase is one case of Turkstra's rule.
type CombinationCase struct {
	// Leading is the load at its maximum over the reference period.
	Leading *Quantity
	// Loads holds, for each of Combination.Loads, the quantity it takes
	// in this case: Leading itself, or that load's companion in this case
	// (its own random variable, named loads.<name>.companion when two
	// loads combine and loads.<name>.companion.<leading> when more do).
	Loads []*Quantity
}

// Name is the case's name: the name of its leading load.
func (c *CombinationCase) Name() string { return strings.TrimPrefix(c.Leading.Path, "loads.") }

// owns reports whether q is a companion of the combination (a quantity
// of some case that is not one of the study's loads) or its combined load.
func (c *Combination) owns(q *Quantity) bool {
	if c == nil {
		return false
	}
	if q == c.Combined {
		return true
	}
	for _, cs := range c.Cases {
		for _, x := range cs.Loads {
			if x == q && x != cs.Leading {
				return true
			}
		}
	}
	return false
}

// companionOf returns the load whose companion q is in a case of
// Turkstra's rule, or nil when q is none.
func (c *Combination) companionOf(q *Quantity) *Quantity {
	if c == nil {
		return nil
	}
	for _, cs := range c.Cases {
		for k, x := range cs.Loads {
			if x == q && x != cs.Leading && k < len(c.Loads) {
				return c.Loads[k]
			}
		}
	}
	return nil
}

// replaces reports whether q is a load the combined load of FerryBorges
// takes the place of.
func (c *Combination) replaces(q *Quantity) bool {
	return c != nil && c.Combined != nil && q != nil && c.combined(q)
}

// combined reports whether q is one of the combined loads.
func (c *Combination) combined(q *Quantity) bool {
	if c == nil {
		return false
	}
	for _, x := range c.Loads {
		if x == q {
			return true
		}
	}
	return false
}

// combinationKey reads companion or repetitions inside the distribution
// table of a load at path kp.
func (p *parser) combinationKey(spec *distSpec, kp, k string, v any, o qopt) bool {
	if k == "companion" {
		if _, nested := v.(map[string]any); nested {
			if m := v.(map[string]any); m["companion"] != nil || m["repetitions"] != nil || m["period"] != nil {
				p.errorf(kp, "a companion is one distribution (or a value) without period, repetitions or companion of its own")
				return false
			}
		}
		co := qopt{dim: o.dim}
		q := p.register(p.quantity(kp, v, co), co)
		spec.companion = q
		return q != nil
	}
	r, ok := tomlNumber(v)
	if !ok {
		p.errorf(kp, "repetitions must be a whole number, the independent values (pulses) of the load in the reference period, e.g. 50")
		return false
	}
	if !(r >= 1 && r <= 1e6) || r != math.Trunc(r) {
		p.errorf(kp, "repetitions = %v must be a whole number from 1 to 1,000,000", v)
		return false
	}
	spec.repetitions = int(r)
	return true
}

// convertPulses makes a load that gives its repetitions r the maximum of
// r independent pulses, each with the distribution as written: F^r.
func (p *parser) convertPulses(q *Quantity) {
	key := q.Path + ".repetitions"
	if isPermanentPath(p.st, q.Path) {
		p.errorf(key, "%s is a permanent load: a permanent load has no repetitions; remove the key (or leave the load out of target.permanent)", q.Path)
		return
	}
	if q.Period != "" && q.Period != PointInTime {
		p.errorf(key, "repetitions says the distribution is of one pulse (a point-in-time value), but period = %s says it is of maxima: remove one of the two", q.Period)
		return
	}
	if !q.Random() {
		return
	}
	if q.Period == "" {
		q.Period = PointInTime
		p.defaultf("%s.period: not given with repetitions; the distribution is of one pulse (point-in-time)", q.Path)
	}
	if q.Repetitions == 1 {
		return
	}
	d, err := sim.MaximumOf(q.Dist, float64(q.Repetitions))
	if err != nil {
		p.errorf(key, "%v", err)
		return
	}
	q.Written, q.Dist, q.MaximaN = q.Dist, d, float64(q.Repetitions)
}

// combinationTable reads [combination].
func (p *parser) combinationTable(top *table) {
	t := p.sub(top, "combination")
	if t == nil {
		return
	}
	rule := Turkstra
	if r, ok := p.choice(t, "rule", choicesOf("combination", "rule")); ok {
		rule = r
	} else if _, given := t.m["rule"]; given {
		return
	}
	p.st.Combination = &Combination{Rule: rule}
	p.unknown(t)
}

// combine sets up the combination of the random variable loads: with two
// or more, Turkstra's rule (or the rule [combination] gives).
func (p *parser) combine() {
	st := p.st
	var loads []*Quantity
	for _, q := range st.Loads {
		perm := isPermanentPath(st, q.Path)
		if q.Companion != nil && (perm || !q.Random()) {
			p.errorf(q.Path+".companion", "a companion applies to a random variable load; %s is permanent: remove it", q.Path)
			continue
		}
		if q.Random() && !perm {
			loads = append(loads, q)
		}
	}
	rule := Turkstra
	if st.Combination != nil {
		rule = st.Combination.Rule
	}
	if len(loads) < 2 {
		if st.Combination != nil {
			p.warnf("combination (line %d): fewer than two random variable loads: there is nothing to combine", p.line("combination"))
		}
		for _, q := range loads {
			if q.Companion != nil {
				p.warnf("%s.companion (line %d): %s is the only random variable load: its companion is not used", q.Path, p.line(q.Path+".companion"), q.Path)
			}
		}
		st.Combination = nil
		return
	}
	if len(loads) > MaxCombined {
		p.errorf("loads", "%d random variable loads combine; at most %d can: sum some of them into one load", len(loads), MaxCombined)
		return
	}
	if !p.combinable(loads) {
		return
	}
	st.Combination = &Combination{Rule: rule, Loads: loads}
	if rule == FerryBorges {
		p.ferryBorges(st.Combination)
		return
	}
	p.turkstra(st.Combination)
}

// combinable refuses a combination of loads the model cannot take yet:
// timber, whose k_mod follows load-duration classes that Turkstra's cases
// would have to be crossed with, and [bending], whose load factor the
// largest case sum of axial loads does not decide.
func (p *parser) combinable(loads []*Quantity) bool {
	st := p.st
	var what string
	switch {
	case st.Material.Kind == column.Timber:
		what = "timber (its k_mod follows the load-duration classes, not yet crossed with the combination cases)"
	case st.Bending != nil:
		what = "[bending] (the load factor of a case is not decided by its axial sum alone, and the cases are not yet evaluated one by one there)"
	default:
		return true
	}
	p.errorf(loads[1].Path, "%d random variable loads combine, which is not supported with %s: give one random variable load (their sum, conservative) or make the others fixed values", len(loads), what)
	return false
}

// ferryBorges combines the loads' pulses into their maximum sum over the
// reference period.
func (p *parser) ferryBorges(c *Combination) {
	var pulses []sim.Dist
	var reps []int
	for _, q := range c.Loads {
		if q.Repetitions == 0 {
			p.errorf(q.Path, "combination.rule = %q needs repetitions = n in the distribution of every random variable load (its independent pulses in the reference period; the distribution is of one pulse)", FerryBorges)
			continue
		}
		if q.Companion != nil {
			p.warnf("%s.companion (line %d): not used by rule %s, which combines the pulses themselves", q.Path, p.line(q.Path+".companion"), FerryBorges)
		}
		d := q.Dist
		if q.Written != nil {
			d = q.Written
		}
		pulses, reps = append(pulses, d), append(reps, q.Repetitions)
	}
	if len(pulses) != len(c.Loads) {
		return
	}
	if p.byPath[CombinedPath] != nil {
		p.errorf(CombinedPath, "rule %s names the combined load %s: give this load another name", FerryBorges, CombinedPath)
		return
	}
	d, err := sim.PulseMaximum(pulses, reps)
	if err != nil {
		p.errorf("combination.rule", "%v: give repetitions that divide one another (e.g. 1, 10 and 50)", err)
		return
	}
	key := "combination.rule"
	c.Combined = p.placed(&Quantity{Path: CombinedPath, Line: p.line(key), Dim: Force, Dist: d, DistName: FerryBorges, Params: d.String()})
}

// turkstra builds the cases of Turkstra's rule.
func (p *parser) turkstra(c *Combination) {
	base := make([]*Quantity, len(c.Loads))
	for j, q := range c.Loads {
		base[j] = p.companionOf(q)
	}
	for i, lead := range c.Loads {
		cs := CombinationCase{Leading: lead, Loads: make([]*Quantity, len(c.Loads))}
		for j, q := range c.Loads {
			switch {
			case i == j:
				cs.Loads[j] = q
			case len(c.Loads) == 2:
				cs.Loads[j] = p.placed(base[j])
			default:
				cs.Loads[j] = p.placed(cloneAs(base[j], base[j].Path+"."+strings.TrimPrefix(lead.Path, "loads.")))
			}
		}
		c.Cases = append(c.Cases, cs)
	}
	if len(c.Loads) > 2 {
		// Each case has its own copy of a companion read from the file:
		// the one read is no variable of the model.
		for _, q := range base {
			if p.byPath[q.Path] == q {
				p.drop(q)
			}
		}
	}
}

// drop removes q from the study's quantities.
func (p *parser) drop(q *Quantity) {
	delete(p.byPath, q.Path)
	qs := p.st.Quantities[:0]
	for _, x := range p.st.Quantities {
		if x != q {
			qs = append(qs, x)
		}
	}
	p.st.Quantities = qs
}

// placed registers a companion made here (one read from the file is
// registered already) and returns it.
func (p *parser) placed(q *Quantity) *Quantity {
	if p.byPath[q.Path] == q {
		return q
	}
	p.byPath[q.Path] = q
	p.st.Quantities = append(p.st.Quantities, q)
	return q
}

// cloneAs returns a copy of q named path.
func cloneAs(q *Quantity, path string) *Quantity {
	c := *q
	c.Path = path
	c.spec = nil
	return &c
}

// companionOf returns the companion of load q as given, or the one taken
// by default: one pulse of a load with repetitions, the distribution of a
// point-in-time load, the maxima over its own period of a load converted
// to the reference period, else (a load given as maxima over the
// reference period) that maximum itself, with a warning: the sum of
// maxima counts the loads' peaks as simultaneous.
func (p *parser) companionOf(q *Quantity) *Quantity {
	if q.Companion != nil {
		return q.Companion
	}
	c := &Quantity{Path: q.Path + ".companion", Line: q.Line, Dim: q.Dim, DistName: q.DistName, Params: q.Params, Dist: q.Dist, Period: q.Period, PeriodYears: q.PeriodYears}
	switch {
	case q.Repetitions > 0:
		if q.Written != nil {
			c.Dist = q.Written
		}
		c.Period, c.PeriodYears = PointInTime, 0
		p.defaultf("%s.companion: not given; while another load leads, %s takes one pulse (the distribution as written)", q.Path, q.Path)
	case q.Period == PointInTime:
		p.defaultf("%s.companion: not given; while another load leads, %s takes its point-in-time distribution as written", q.Path, q.Path)
	case q.MaximaN > 0:
		c.Dist = q.Written
		p.defaultf("%s.companion: not given; while another load leads, %s takes its maxima over %s as written (more than a point-in-time value: conservative)", q.Path, q.Path, q.Period)
	default:
		p.warnf("%s (line %d): no companion and no period shorter than the reference period: while another load leads, %s takes its maximum over the reference period too, so the cases add maxima that do not occur together (conservative); give companion = { dist = ... } (its point-in-time distribution), period or repetitions",
			q.Path, q.Line, q.Path)
	}
	return c
}

// companion reports whether q is a companion of the study's load
// combination.
func (s *Study) companion(q *Quantity) bool { return s.Combination.owns(q) }

// CombinationText describes the combination cases for check, forces in
// kN: each case's leading load and the distributions of the others.
func (s *Study) CombinationText() string {
	c := s.Combination
	if c == nil {
		return ""
	}
	var b strings.Builder
	if q := c.Combined; q != nil {
		fmt.Fprintf(&b, "\nLoad combination (%s: pulse processes, distributions in N):\n  %s: %s\n    mean %.1f kN, sd %.1f kN, the maximum over the reference period of the sum of the loads\n",
			c.Rule, q.Path, q.Dist.String(), q.Dist.Mean()/1e3, q.Dist.StdDev()/1e3)
		return b.String()
	}
	fmt.Fprintf(&b, "\nLoad combination (%s's rule: the member fails when any case fails; %d cases; distributions in N):\n", c.Rule, len(c.Cases))
	for _, cs := range c.Cases {
		fmt.Fprintf(&b, "  case %s: %s at its reference-period maximum (mean %.1f kN, sd %.1f kN)\n", cs.Name(), cs.Leading.Path, cs.Leading.Dist.Mean()/1e3, cs.Leading.Dist.StdDev()/1e3)
		for _, q := range cs.Loads {
			if q == cs.Leading {
				continue
			}
			if !q.Random() {
				fmt.Fprintf(&b, "    %s = %.1f kN\n", q.Path, q.Value/1e3)
				continue
			}
			fmt.Fprintf(&b, "    %s: %s (mean %.1f kN, sd %.1f kN)\n", q.Path, q.Dist.String(), q.Dist.Mean()/1e3, q.Dist.StdDev()/1e3)
		}
	}
	return b.String()
}
