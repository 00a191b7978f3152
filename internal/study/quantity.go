package study

import (
	"fmt"
	"math"
	"strings"

	"strutrisk/sim"
)

// Quantity is one numeric input of a study, in N, mm and MPa.
type Quantity struct {
	// Path names it as in the file ("material.modulus"); random quantities
	// are the model's variables under this name.
	Path string
	Line int
	Dim  Dim
	// Dist is the distribution of a random quantity, nil for a fixed one.
	Dist sim.Dist
	// DistName and Params describe the quantity as written, for reports.
	DistName, Params string
	// Value is a fixed quantity's value.
	Value float64
	// Relative reports that the value (or the distribution's values) is a
	// fraction of the member length of the same sample ("L/1000").
	Relative bool
	// Lcr reports that the value (or the distribution's values) is a
	// fraction of the buckling length K L of the axis evaluated, in the
	// same sample ("Lcr/1000"; see lcr.go). It is never turned into
	// millimetres at parse time.
	Lcr bool

	// perLength reports that the quantity was written as L/n and turned
	// into millimetres with the fixed member length.
	perLength bool

	// update is the measurement that updated the distribution, if any.
	update *Measurement

	// bare reports that the value (or a parameter of the distribution that
	// carries the quantity's dimension) was written without a unit, so the
	// study's unit system gave it one (see plausible.go).
	bare bool

	// Period is what a load's distribution describes: "" when not given
	// (maxima over the reference period), PointInTime, or a duration as
	// read ("1 year"); PeriodYears is it in years, 0 unless a duration.
	Period      string
	PeriodYears float64
	// Duration is a timber load's load-duration class as written ("" when
	// not given; see materials.go).
	Duration string
	// MaximaN is the n of the conversion of a load's maxima to the
	// reference period (Dist = Written^n, see period.go), 0 when none was
	// made; Written is then the distribution as written.
	MaximaN float64
	Written sim.Dist
	// Companion is the distribution (or value) a variable load takes in
	// the combination cases another load leads (nil: see combination.go);
	// Repetitions is its number of independent pulses in the reference
	// period, 0 when not given.
	Companion   *Quantity
	Repetitions int

	// spec is the distribution as parsed, before it is built.
	spec *distSpec
}

// Random reports whether the quantity is a random variable.
func (q *Quantity) Random() bool { return q.Dist != nil }

// Unit is the internal unit of the quantity's values ("L" for values
// relative to the member length).
func (q *Quantity) Unit() string {
	if q.Relative {
		return "L"
	}
	if q.Lcr {
		return "Lcr"
	}
	return InternalUnit(q.Dim)
}

// need says which values a quantity may physically take.
type need int

const (
	anyValue    need = iota
	positive         // > 0
	nonNegative      // >= 0
)

func (n need) String() string {
	if n == positive {
		return "positive"
	}
	return "zero or positive"
}

// qopt are the rules of one key.
type qopt struct {
	dim  Dim
	need need
	rel  bool // "L/n" and "Lcr/n" allowed
	frac bool // "a/b" allowed (an angle such as "1/200")
	inf  bool // +inf allowed (rigid springs)
	// period: the distribution may say the period it describes (a
	// variable load, see period.go).
	period bool
}

// pval is one parsed number: a value in N, mm, MPa, or a fraction of the
// member length when rel is set.
type pval struct {
	v   float64
	rel bool
	lcr bool // a fraction of the buckling length K L
}

// scalar reads one number written as a TOML number or a string, reporting
// problems against path; its magnitude must be plausible (ranges.go).
func (p *parser) scalar(path string, v any, o qopt) (pval, bool) {
	pv, ok := p.scalarAny(path, v, o)
	if ok && !p.inRange(path, pv, o) {
		return pval{}, false
	}
	return pv, ok
}

// scalarAny reads one number of any finite size.
func (p *parser) scalarAny(path string, v any, o qopt) (pval, bool) {
	switch x := v.(type) {
	case int64:
		return pval{v: float64(x) * p.sys.Factor(o.dim)}, true
	case float64:
		if math.IsNaN(x) || math.IsInf(x, -1) || math.IsInf(x, 1) && !o.inf {
			p.errorf(path, "%v is not a usable number (write a finite value)", x)
			return pval{}, false
		}
		return pval{v: x * p.sys.Factor(o.dim)}, true
	case string:
		s := strings.TrimSpace(x)
		if pv, done, ok := p.lcrForm(path, s, o); done {
			return pv, ok
		}
		if pv, done, ok := p.fraction(path, s, o); done {
			return pv, ok
		}
		if rest, ok := strings.CutPrefix(s, "L/"); ok || strings.HasPrefix(s, "L /") {
			if !ok {
				rest = strings.TrimPrefix(s, "L /")
			}
			if !o.rel {
				p.errorf(path, "%q: the form L/n is only for imperfections (bow, eccentricity); write a value with a unit", x)
				return pval{}, false
			}
			n, ok := parseNumber(strings.TrimSpace(rest))
			if !ok || n == 0 {
				p.errorf(path, "%q: write L/n with a non-zero number n, e.g. \"L/1000\"", x)
				return pval{}, false
			}
			return pval{v: 1 / n, rel: true}, true
		}
		if o.inf && (s == "inf" || s == "+inf" || s == "rigid") {
			return pval{v: math.Inf(1)}, true
		}
		val, err := convert(s, o.dim, p.sys)
		if err != nil {
			p.errorf(path, "%v", err)
			return pval{}, false
		}
		return pval{v: val}, true
	}
	p.errorf(path, "%s must be a number, a string with a unit or a distribution table, not %s", o.dim, tomlType(v))
	return pval{}, false
}

// quantity reads the quantity at path: a number, a string or a
// distribution table.
func (p *parser) quantity(path string, v any, o qopt) *Quantity {
	q := &Quantity{Path: path, Line: p.line(path), Dim: o.dim}
	if m, ok := v.(map[string]any); ok {
		spec := p.distTable(path, m, o)
		if spec == nil {
			return nil
		}
		q.Duration = spec.duration
		if spec.name == "fixed" {
			if spec.companion != nil || spec.repetitions > 0 {
				p.errorf(path, "companion and repetitions apply to a random variable load: give the load a distribution, or remove them")
				return nil
			}
			q.Value, q.Relative = spec.params["value"].v, spec.params["value"].rel
			q.Lcr = spec.params["value"].lcr
			q.bare = bareTable(m, o)
			if !p.checkFixed(path, q.Value, o) {
				return nil
			}
			return q
		}
		q.bare = bareTable(m, o)
		q.spec = spec
		q.Period, q.PeriodYears = spec.period, spec.periodYears
		q.Companion, q.Repetitions = spec.companion, spec.repetitions
		q.DistName = spec.name
		q.Params = spec.written
		return q
	}
	pv, ok := p.scalar(path, v, o)
	if !ok {
		return nil
	}
	q.Value, q.Relative, q.Lcr = pv.v, pv.rel, pv.lcr
	q.bare = writtenBare(v, o)
	if !p.checkFixed(path, q.Value, o) {
		return nil
	}
	return q
}

// writtenBare reports whether v, a number of dimension o.dim, was written
// without a unit: a TOML number, or text with a number alone.
func writtenBare(v any, o qopt) bool {
	if o.dim == Dimensionless {
		return false
	}
	switch x := v.(type) {
	case int64, float64:
		return true
	case string:
		s := strings.TrimSpace(x)
		if strings.HasPrefix(s, "L") || s == "rigid" || strings.HasSuffix(s, "inf") {
			return false
		}
		_, unit := splitValue(s)
		return unit == ""
	}
	return false
}

// bareTable reports whether a distribution table has a parameter of the
// quantity's dimension written without a unit (mu of a lognormal is the
// log of such a number).
func bareTable(m map[string]any, o qopt) bool {
	for k, v := range m {
		if k == "mu" && o.dim != Dimensionless {
			return true
		}
		if k != "dist" && !plainParams[k] && writtenBare(v, o) {
			return true
		}
	}
	return false
}

func (p *parser) checkFixed(path string, v float64, o qopt) bool {
	switch {
	case o.need == positive && !(v > 0):
		p.errorf(path, "%s must be positive (got %v)", o.dim, p.show(v, o.dim))
		return false
	case o.need == nonNegative && !(v >= 0):
		p.errorf(path, "%s must be zero or positive (got %v)", o.dim, p.show(v, o.dim))
		return false
	}
	return true
}

// show formats an internal value back in the study's units for messages.
func (p *parser) show(v float64, d Dim) string {
	u := p.sys.Unit(d)
	x := v / p.sys.Factor(d)
	if u == "" {
		return fmt.Sprintf("%g", x)
	}
	return fmt.Sprintf("%g %s", x, u)
}

func tomlType(v any) string {
	switch v.(type) {
	case bool:
		return "true/false"
	case []any, []map[string]any:
		return "a list"
	case map[string]any:
		return "a table"
	case string:
		return "text"
	}
	return fmt.Sprintf("%T", v)
}
