package study

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// Sweep repeats a study over the values of one quantity or one parameter
// of a distribution.
type Sweep struct {
	// Parameter is the swept key path: a quantity ("member.length",
	// "imperfection.bow", "member.k") or a parameter of a distribution
	// ("loads.imposed.mean").
	Parameter string
	// Values are the swept values in N, mm and MPa; a value written L/n
	// keeps Relative set and its Value is the fraction 1/n of the length.
	Values []*Quantity
	// Scale is "list" for listed values, else "linear" or "log" for
	// values made from from, to and steps.
	Scale string

	dim Dim
	rel bool
	lcr bool // values written Lcr/n: fractions of the buckling length
	// raw are the values as put into the study document.
	raw []any
}

// Unit is the unit of the swept values as Label gives it: "mm", "N",
// "MPa"..., "" for plain numbers and "fraction of L" for values written
// L/n.
func (s *Sweep) Unit() string {
	if s.rel {
		return "fraction of L"
	}
	if s.lcr {
		return "fraction of Lcr"
	}
	return InternalUnit(s.dim)
}

// Label names the swept parameter and the unit of its values for a
// chart axis or a table head: "member.length (mm)", "imperfection.bow
// (fraction of L)".
func (s *Sweep) Label() string {
	switch {
	case s.rel:
		return s.Parameter + " (fraction of L)"
	case s.lcr:
		return s.Parameter + " (fraction of Lcr)"
	case InternalUnit(s.dim) == "":
		return s.Parameter
	}
	return s.Parameter + " (" + InternalUnit(s.dim) + ")"
}

// sweepOpt returns the rules of the swept key: a quantity's own, or for
// a distribution parameter its quantity's dimension (plain numbers for
// cov, shape and the like).
func (p *parser) sweepOpt(name string) (qopt, bool) {
	if q := p.byPath[name]; q != nil {
		return p.opts[q], true
	}
	i := strings.LastIndexByte(name, '.')
	if i < 0 || !p.dists[name[:i]] {
		return qopt{}, false
	}
	q := p.byPath[name[:i]]
	if q == nil {
		return qopt{}, false
	}
	o := p.opts[q]
	if plainParams[name[i+1:]] {
		return qopt{dim: Dimensionless}, true
	}
	return qopt{dim: o.dim, rel: o.rel}, true
}

func (p *parser) sweep(top *table) {
	t := p.sub(top, "sweep")
	if t == nil {
		return
	}
	defer p.unknown(t)
	sw := &Sweep{}
	name, ok := p.str(t, "parameter")
	if !ok {
		if _, given := t.m["parameter"]; !given {
			p.required(t, "parameter", "the quantity to sweep, e.g. parameter = \"member.length\" (or a distribution's parameter, e.g. \"loads.imposed.mean\")")
		}
		p.markAll(t)
		return
	}
	sw.Parameter = name
	o, known := p.sweepOpt(name)
	if !known {
		p.unknownPath(t.key("parameter"), name)
		p.markAll(t)
		return
	}
	sw.dim = o.dim
	o.need = anyValue // the study's own checks apply to each value
	_, hasValues := t.m["values"]
	_, hasFrom := t.m["from"]
	_, hasTo := t.m["to"]
	_, hasSteps := t.m["steps"]
	switch {
	case hasValues && (hasFrom || hasTo || hasSteps):
		p.errorf(t.key("values"), "give values, or from, to and steps, not both")
	case hasValues:
		p.sweepList(t, sw, o)
	case hasFrom || hasTo || hasSteps:
		p.sweepRange(t, sw, o)
	default:
		p.required(t, "values", "the values to sweep, e.g. values = [\"3 m\", \"4 m\"], or from, to and steps")
	}
	for i, q := range sw.Values {
		if i > 0 && q.Lcr != sw.Values[0].Lcr {
			p.errorf(q.Path, "the swept values mix Lcr/n with L/n or values with a unit: write all of them one way")
			break
		}
		if i > 0 && q.Relative != sw.Values[0].Relative {
			p.errorf(q.Path, "the swept values mix L/n and values with a unit: write all of them one way")
			break
		}
		sw.rel, sw.lcr = q.Relative, q.Lcr
	}
	p.st.Sweep = sw
}

func (p *parser) sweepList(t *table, sw *Sweep, o qopt) {
	sw.Scale = "list"
	v, _ := t.get("values")
	list, isList := v.([]any)
	if !isList || len(list) == 0 {
		p.errorf(t.key("values"), "values is a non-empty list of numbers or quantities, e.g. [\"3 m\", \"4 m\"]")
		return
	}
	if len(list) > MaxCases {
		p.errorf(t.key("values"), "%d values are more than the %d cases a study may run: sweep fewer values", len(list), MaxCases)
		return
	}
	for i, x := range list {
		key := fmt.Sprintf("%s[%d]", t.key("values"), i)
		pv, ok := p.scalar(key, x, o)
		if !ok {
			continue
		}
		sw.Values = append(sw.Values, &Quantity{Path: key, Line: p.line(key), Dim: o.dim, Value: pv.v, Relative: pv.rel, Lcr: pv.lcr})
		sw.raw = append(sw.raw, x)
	}
}

// maxSteps bounds sweep.steps.
const maxSteps = 200

func (p *parser) sweepRange(t *table, sw *Sweep, o qopt) {
	sw.Scale = "linear"
	if s, ok := p.choice(t, "scale", choicesOf("sweep", "scale")); ok {
		sw.Scale = s
	}
	var ends [2]pval
	good := true
	for i, k := range []string{"from", "to"} {
		v, ok := t.get(k)
		if !ok {
			p.required(t, k, "a sweep by range needs from, to and steps, e.g. from = \"2 m\", to = \"8 m\", steps = 7")
			good = false
			continue
		}
		pv, ok := p.scalar(t.key(k), v, o)
		if !ok {
			good = false
			continue
		}
		ends[i] = pv
	}
	n, ok := p.count(t, "steps", maxSteps)
	switch {
	case !ok:
		if _, given := t.m["steps"]; !given {
			p.required(t, "steps", "the number of values from from to to, e.g. steps = 7")
		}
		good = false
	case n < 2:
		p.errorf(t.key("steps"), "steps = %g: a range needs 2 or more values", n)
		good = false
	}
	if !good {
		return
	}
	if ends[0].lcr != ends[1].lcr {
		p.errorf(t.key("to"), "from and to mix Lcr/n with L/n or a value with a unit: write both one way")
		return
	}
	if ends[0].rel != ends[1].rel {
		p.errorf(t.key("to"), "from and to mix L/n and a value with a unit: write both one way")
		return
	}
	if sw.Scale == "log" && !(ends[0].v > 0 && ends[1].v > 0) {
		p.errorf(t.key("scale"), "a log scale needs positive from and to")
		return
	}
	rel, lcr := ends[0].rel, ends[0].lcr
	line := p.line(t.key("from"))
	for i := 0; i < int(n); i++ {
		f := float64(i) / (n - 1)
		var v float64
		if sw.Scale == "log" {
			v = math.Exp((1-f)*math.Log(ends[0].v) + f*math.Log(ends[1].v))
		} else {
			v = (1-f)*ends[0].v + f*ends[1].v
		}
		if i == int(n)-1 {
			v = ends[1].v // exactly as written
		}
		sw.Values = append(sw.Values, &Quantity{Path: t.key("from"), Line: line, Dim: o.dim, Value: v, Relative: rel, Lcr: lcr})
		// Written back as the study would write it: L/n, Lcr/n, or a bare
		// number in the study's units.
		switch {
		case rel:
			sw.raw = append(sw.raw, "L/"+strconv.FormatFloat(1/v, 'g', -1, 64))
		case lcr:
			sw.raw = append(sw.raw, "Lcr/"+strconv.FormatFloat(1/v, 'g', -1, 64))
		default:
			sw.raw = append(sw.raw, v/p.sys.Factor(o.dim))
		}
	}
}

// unknownPath reports a name that should be a quantity's path.
func (p *parser) unknownPath(key, name string) {
	paths := sortedKeys(p.byPath)
	if near, ok := nearest(name, paths); ok {
		p.errorf(key, "%q is not a quantity of this study; did you mean %q?", name, near)
	} else {
		p.errorf(key, "%q is not a quantity of this study (they are %s; a distribution's parameter is written e.g. \"loads.imposed.mean\")", name, strings.Join(paths, ", "))
	}
}

// overrides are the changes of one case: variant v (-1 for none) at
// swept value i (-1 for none).
func (s *Study) overrides(v, i int) []override {
	var ovs []override
	label := "the study"
	if v >= 0 {
		va := s.Variants[v]
		label = fmt.Sprintf("variant %q", va.Name)
		for _, o := range va.set {
			o.label = label
			ovs = append(ovs, o)
		}
	}
	if i >= 0 && s.Sweep != nil {
		sw := s.Sweep
		at := sw.Values[i].Path
		if sw.Scale != "list" {
			at = "sweep"
		}
		where := fmt.Sprintf("%s = %v", sw.Parameter, sw.raw[i])
		if v >= 0 {
			where = label + " at " + where
		}
		for k := range ovs {
			ovs[k].label = where
		}
		// The swept value comes last: it wins over a variant's setting.
		ovs = append(ovs, override{key: sw.Parameter, value: sw.raw[i], at: at, label: where})
	}
	return ovs
}

// Derive returns the study as variant v (an index of Variants, -1 for the
// study itself) at swept value i (an index of Sweep.Values, -1 for none):
// the study file read again with the variant's keys and the swept value
// set, without its sweep and variants. Parse has checked every case, so
// an error here is unexpected.
func (s *Study) Derive(v, i int) (*Study, error) {
	if v < -1 || v >= len(s.Variants) || i < -1 || i >= 0 && (s.Sweep == nil || i >= len(s.Sweep.Values)) {
		return nil, fmt.Errorf("study: no case variant %d, value %d", v, i)
	}
	st, probs := derive(s.File, s.src, s.overrides(v, i))
	if len(probs) > 0 {
		return nil, &Error{Problems: probs}
	}
	st.File, st.SHA256, st.Data = s.File, s.SHA256, s.Data
	return st, nil
}

// checkCases reads every variant at every swept value (and each alone)
// and returns their problems, each reported once.
func (s *Study) checkCases() *Error {
	if s.Sweep == nil && len(s.Variants) == 0 {
		return nil
	}
	n := 0
	if s.Sweep != nil {
		n = len(s.Sweep.Values)
	}
	if cases := s.Cases(); cases > MaxCases {
		key, line := "variant", s.src.parts["sweep"]["variant"]
		if n > len(s.Variants) {
			key, line = "sweep", s.src.parts["sweep"]["sweep"]
		}
		return &Error{Problems: []Problem{{File: s.File, Line: line, Key: key, Msg: fmt.Sprintf(
			"%d cases (the study and %d variants, at %d swept values) are more than the %d a study may run: split it into several studies",
			cases, len(s.Variants), n, MaxCases)}}}
	}
	var out []Problem
	seen := map[string]bool{}
	more := 0
	for v := -1; v < len(s.Variants); v++ {
		for i := -1; i < n; i++ {
			if v < 0 && i < 0 {
				continue
			}
			_, probs := derive(s.File, s.src, s.overrides(v, i))
			for _, pr := range probs {
				pr.File = s.File
				if k := pr.String(); !seen[k] {
					seen[k] = true
					if len(out) >= maxProblems {
						more++
						continue
					}
					out = append(out, pr)
				}
			}
		}
	}
	if len(out) == 0 {
		return nil
	}
	return &Error{Problems: out, Unlisted: more}
}

// Cases is the number of runs after the study's own: each variant, and
// the study and each variant at each swept value.
func (s *Study) Cases() int {
	n := 0
	if s.Sweep != nil {
		n = len(s.Sweep.Values)
	}
	return (len(s.Variants)+1)*(n+1) - 1
}
