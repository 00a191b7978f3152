package study

import (
	"fmt"
	"math"
	"regexp"
	"strconv"
	"strings"
	"unicode"
)

// Dim is the physical dimension of a quantity.
type Dim int

// The dimensions a study uses.
const (
	Dimensionless Dim = iota
	Length
	Force
	Stress
	Moment       // N*mm
	Spring       // rotational stiffness, N*mm/rad
	Area         // mm^2
	SecondMoment // mm^4
	Warping      // warping constant, mm^6
	LineLoad     // force per length, N/mm (a lateral load)
)

// String names the dimension for messages.
func (d Dim) String() string {
	switch d {
	case Dimensionless:
		return "a plain number"
	case Length:
		return "a length"
	case Force:
		return "a force"
	case Stress:
		return "a stress"
	case Moment:
		return "a moment"
	case Spring:
		return "a rotational stiffness"
	case Area:
		return "an area"
	case SecondMoment:
		return "a second moment of area"
	case Warping:
		return "a warping constant"
	case LineLoad:
		return "a force per length"
	}
	return "dim(?)"
}

// Exact conversion factors to N, mm and MPa. The inch and the pound-force
// are exact by definition (NIST Special Publication 811, 2008 edition,
// Appendix B: 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N).
const (
	inch = 25.4
	foot = 12 * inch
	lbf  = 4.4482216152605
	kip  = 1000 * lbf
	psi  = lbf / (inch * inch) // N/mm^2
	ksi  = 1000 * psi
)

type unitDef struct {
	dim    Dim
	factor float64 // to N, mm, MPa
}

// units maps every accepted unit string to its dimension and factor.
var units = map[string]unitDef{
	"mm": {Length, 1}, "cm": {Length, 10}, "m": {Length, 1000},
	"in": {Length, inch}, "ft": {Length, foot},

	"N": {Force, 1}, "kN": {Force, 1e3}, "MN": {Force, 1e6},
	"lbf": {Force, lbf}, "kip": {Force, kip},

	"Pa": {Stress, 1e-6}, "kPa": {Stress, 1e-3}, "MPa": {Stress, 1},
	"GPa": {Stress, 1e3}, "psi": {Stress, psi}, "ksi": {Stress, ksi},
	"N/mm2": {Stress, 1}, "N/mm^2": {Stress, 1},

	"N*mm": {Moment, 1}, "N*m": {Moment, 1e3}, "kN*mm": {Moment, 1e3},
	"kN*m": {Moment, 1e6}, "kip*in": {Moment, kip * inch},
	"kip*ft": {Moment, kip * foot}, "lbf*in": {Moment, lbf * inch},
	"lbf*ft": {Moment, lbf * foot},

	"mm2": {Area, 1}, "cm2": {Area, 100}, "m2": {Area, 1e6},
	"in2": {Area, inch * inch},

	"mm4": {SecondMoment, 1}, "cm4": {SecondMoment, 1e4},
	"m4": {SecondMoment, 1e12}, "in4": {SecondMoment, inch * inch * inch * inch},

	"mm6": {Warping, 1}, "cm6": {Warping, 1e6}, "m6": {Warping, 1e18},
	"in6": {Warping, inch * inch * inch * inch * inch * inch},

	"N/mm": {LineLoad, 1}, "N/m": {LineLoad, 1e-3}, "kN/m": {LineLoad, 1},
	"lbf/in": {LineLoad, lbf / inch}, "lbf/ft": {LineLoad, lbf / foot},
	"kip/in": {LineLoad, kip / inch}, "kip/ft": {LineLoad, kip / foot},
}

func init() {
	// Springs: every moment unit per radian; "mm^2" forms of areas and
	// second moments.
	for name, u := range units {
		switch u.dim {
		case Moment:
			units[name+"/rad"] = unitDef{Spring, u.factor}
		case Area:
			units[strings.TrimSuffix(name, "2")+"^2"] = u
		case SecondMoment:
			units[strings.TrimSuffix(name, "4")+"^4"] = u
		case Warping:
			units[strings.TrimSuffix(name, "6")+"^6"] = u
		}
	}
}

// unitOrder lists the units in the order messages show them.
var unitOrder = []string{
	"mm", "cm", "m", "in", "ft",
	"N", "kN", "MN", "lbf", "kip",
	"Pa", "kPa", "MPa", "GPa", "psi", "ksi", "N/mm2",
	"N*mm", "N*m", "kN*mm", "kN*m", "lbf*in", "lbf*ft", "kip*in", "kip*ft",
	"N*mm/rad", "N*m/rad", "kN*mm/rad", "kN*m/rad", "lbf*in/rad", "lbf*ft/rad", "kip*in/rad", "kip*ft/rad",
	"mm2", "cm2", "m2", "in2",
	"mm4", "cm4", "m4", "in4",
	"mm6", "cm6", "m6", "in6",
	"N/mm", "N/m", "kN/m", "lbf/in", "lbf/ft", "kip/in", "kip/ft",
}

// unitsOf returns the accepted units of dimension d for messages.
func unitsOf(d Dim) string {
	var names []string
	for _, name := range unitOrder {
		if units[name].dim == d {
			names = append(names, name)
		}
	}
	return strings.Join(names, " ")
}

// System is a unit system of bare numbers in a study.
type System struct {
	Name   string
	factor [LineLoad + 1]float64
	unit   [LineLoad + 1]string
}

func newSystem(name string, names ...string) System {
	s := System{Name: name}
	s.factor[Dimensionless] = 1
	for i, n := range names {
		d := Dim(i + 1)
		s.unit[d] = n
		s.factor[d] = units[strings.TrimSuffix(n, "/rad")].factor
	}
	return s
}

// The unit systems of the "units" key.
var systems = map[string]System{
	"N-mm":   newSystem("N-mm", "mm", "N", "MPa", "N*mm", "N*mm/rad", "mm2", "mm4", "mm6", "N/mm"),
	"kN-m":   newSystem("kN-m", "m", "kN", "kPa", "kN*m", "kN*m/rad", "m2", "m4", "m6", "kN/m"),
	"kip-in": newSystem("kip-in", "in", "kip", "ksi", "kip*in", "kip*in/rad", "in2", "in4", "in6", "kip/in"),
}

// Unit returns the unit of bare numbers of dimension d ("" if none).
func (s System) Unit(d Dim) string { return s.unit[d] }

// Factor returns the factor that converts a bare number of dimension d to
// N, mm and MPa.
func (s System) Factor(d Dim) float64 { return s.factor[d] }

// InternalUnit is the unit of dimension d inside the program.
func InternalUnit(d Dim) string { return systems["N-mm"].unit[d] }

// parseNumber reads a decimal number as TOML writes it, underscores
// between digits allowed ("1_000").
func parseNumber(s string) (float64, bool) {
	if s == "" {
		return 0, false
	}
	if strings.Contains(s, "_") {
		b := []byte(s)
		for i, c := range b {
			if c == '_' && (i == 0 || i == len(b)-1 || !isDigit(b[i-1]) || !isDigit(b[i+1])) {
				return 0, false
			}
		}
		s = strings.ReplaceAll(s, "_", "")
	}
	for _, c := range s {
		if !(isDigit(byte(c)) || c == '.' || c == 'e' || c == 'E' || c == '+' || c == '-') {
			return 0, false // refuse "inf", "nan", hexadecimal and the like
		}
	}
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsInf(v, 0) || math.IsNaN(v) {
		return 0, false
	}
	return v, true
}

func isDigit(c byte) bool { return c >= '0' && c <= '9' }

// numberPrefix matches the number at the start of a quantity string.
var numberPrefix = regexp.MustCompile(`^[+-]?[0-9_]*\.?[0-9_]*(?:[eE][+-]?[0-9_]+)?`)

// splitValue splits "5.2 m" into its number and unit ("5.2", "m"); the
// unit may follow the number with or without a space.
func splitValue(s string) (num, unit string) {
	s = strings.TrimSpace(s)
	n := len(numberPrefix.FindString(s))
	return s[:n], strings.TrimSpace(s[n:])
}

// convert reads a quantity written as a string ("205 GPa", "1_000") of
// dimension d in system sys and returns it in N, mm and MPa.
func convert(s string, d Dim, sys System) (float64, error) {
	num, unit := splitValue(s)
	v, ok := parseNumber(num)
	if !ok {
		return 0, fmt.Errorf("%q is not a number with an optional unit (write e.g. %s)", s, example(d, sys))
	}
	if unit == "" {
		return v * sys.factor[d], nil
	}
	unit = strings.Map(func(r rune) rune {
		if unicode.IsSpace(r) {
			return -1
		}
		if r == '·' {
			return '*'
		}
		return r
	}, unit)
	u, ok := units[unit]
	if !ok {
		f, ok := foldUnit(unit)
		if !ok {
			return 0, fmt.Errorf("unknown unit %q in %q (%s takes %s)", unit, s, d, unitsOrNone(d))
		}
		return 0, fmt.Errorf("unit %q in %q: write %q (units are case-sensitive)", unit, s, f.name)
	}
	if d == Spring && u.dim == Moment {
		u.dim = Spring // a moment unit without /rad is read as per radian
	}
	if u.dim != d {
		return 0, fmt.Errorf("%q is %s but this key takes %s (%s)", s, u.dim, d, unitsOrNone(d))
	}
	return v * u.factor, nil
}

type foldedUnit struct {
	unitDef
	name string
}

// foldUnit finds a unit that differs from s only in letter case.
func foldUnit(s string) (foldedUnit, bool) {
	for name, u := range units {
		if strings.EqualFold(name, s) {
			return foldedUnit{u, name}, true
		}
	}
	return foldedUnit{}, false
}

func unitsOrNone(d Dim) string {
	if d == Dimensionless {
		return "no unit"
	}
	return "units " + unitsOf(d)
}

// example gives a sample of how to write a quantity of dimension d.
func example(d Dim, sys System) string {
	if d == Dimensionless {
		return "1.0"
	}
	return "\"12.5 " + sys.unit[d] + "\""
}
