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
	// at is the table the key is swept in ("sweep", "sweep.axis[1]");
	// countKey is its key that sets the number of values ("sweep.values",
	// "sweep.axis[1].steps").
	at, countKey string
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
	if _, many := t.m["axis"]; many {
		p.sweepAxes(t)
		return
	}
	if _, given := t.m["combine"]; given {
		t.used["combine"] = true
		p.errorf(t.key("combine"), "combine joins several [[sweep.axis]] tables; a [sweep] with one parameter has nothing to combine: remove it")
	}
	if sw := p.sweepOne(t); sw != nil {
		p.st.Sweep = sw
	}
}

// sweepOne reads one swept key from t: [sweep] itself or one
// [[sweep.axis]] table. It returns nil when the key is not known.
func (p *parser) sweepOne(t *table) *Sweep {
	sw := &Sweep{at: t.path}
	name, ok := p.str(t, "parameter")
	if !ok {
		if _, given := t.m["parameter"]; !given {
			p.required(t, "parameter", "the quantity to sweep, e.g. parameter = \"member.length\" (or a distribution's parameter, e.g. \"loads.imposed.mean\")")
		}
		p.markAll(t)
		return nil
	}
	sw.Parameter = name
	o, known := p.sweepOpt(name)
	if !known {
		p.unknownPath(t.key("parameter"), name)
		p.markAll(t)
		return nil
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
	sw.countKey = t.key("values")
	if !hasValues {
		sw.countKey = t.key("steps")
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
	return sw
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
