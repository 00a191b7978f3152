package study

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"strutrisk/internal/column"
)

// Bounds of the plausibility guards. They are not limits of any code:
// values beyond them are valid input but are far more often a slip (a
// unit, a digit) than a real member (common practice).
const (
	// MaxSlenderness is the largest K L / r a compression member is taken
	// to have on purpose.
	MaxSlenderness = 300
	// MinUtilisation and MaxUtilisation bound the utilisation at nominal
	// values of a study worth a reliability analysis.
	MinUtilisation, MaxUtilisation = 0.05, 3
	// MinSteelYield and MaxSteelYield bound the yield strength of
	// structural steel, in MPa.
	MinSteelYield, MaxSteelYield = 100, 1500
	// BowDivisor: an initial bow above L / BowDivisor is not a tolerance.
	BowDivisor = 50
)

// plausible is the range of the nominal value of one key, in N, mm, MPa.
type plausible struct {
	lo, hi float64
	what   string
	// advice says what was probably meant, when no unit explains it.
	advice string
	// hintOnly: warn only when a bare number read in another unit of the
	// system would fall inside.
	hintOnly bool
}

// plausibleRange returns the range of quantity q, false when there is none.
func (md *Model) plausibleRange(q *Quantity, n *Nominal) (plausible, bool) {
	st, L := md.Study, n.Member.Length
	switch {
	case q == st.Length:
		return plausible{lo: 100, hi: 100e3, what: "a member length"}, true
	case q == st.Yield:
		return st.strengthRange(), true // materials.go
	case q == st.Modulus:
		return plausible{lo: 1e3, hi: 400e3, what: "an elastic modulus"}, true
	case q == st.Bow && !st.ModelTraits().Curve:
		return plausible{lo: 0, hi: L / BowDivisor, what: fmt.Sprintf("L/%d = %s", BowDivisor, lengthText(L/BowDivisor)),
			advice: fmt.Sprintf("a bow that large is damage, not a straightness tolerance (those are near L/1000): was L/%d meant, or a bow in mm?", 10*BowDivisor)}, true
	case q == st.Ecc && !st.ModelTraits().Curve:
		return plausible{lo: 0, hi: L / 5, what: "L/5 = " + lengthText(L/5), hintOnly: true}, true
	}
	for _, d := range sectionDims {
		if st.Section.Dims[d.info.Name] == q && q != nil {
			return d.sane, d.sane.what != ""
		}
	}
	return plausible{}, false
}

// Plausibility returns warnings for values that are valid but probably
// not what was meant: K L / r above MaxSlenderness, a utilisation at
// nominal values outside MinUtilisation..MaxUtilisation, a yield strength
// outside MinSteelYield..MaxSteelYield MPa, a bow larger than
// L / BowDivisor, and a number written without a unit whose value would
// be plausible in another unit. Each names the key and its line and says
// what was probably meant; n is the nominal picture of md.
func (md *Model) Plausibility(n *Nominal) []string {
	var w []string
	for _, q := range md.Study.Quantities {
		if msg := md.plausibleValue(q, n); msg != "" {
			w = append(w, msg)
		}
	}
	for _, msg := range []string{md.slenderness(n), md.utilisation(n)} {
		if msg != "" {
			w = append(w, msg)
		}
	}
	return w
}

// nominalOf is q's value at nominal values (the mean magnitude of the
// imperfections), in N, mm, MPa.
func (md *Model) nominalOf(q *Quantity, n *Nominal) float64 {
	switch q {
	case md.Study.Bow:
		return math.Abs(n.Member.Bow)
	case md.Study.Ecc:
		return math.Abs(n.Member.Ecc)
	}
	return nominalValue(q, n.Member.Length)
}

// plausibleValue checks one quantity against its range.
func (md *Model) plausibleValue(q *Quantity, n *Nominal) string {
	r, ok := md.plausibleRange(q, n)
	if !ok {
		return ""
	}
	v := md.nominalOf(q, n)
	if v >= r.lo && v <= r.hi {
		return ""
	}
	at := fmt.Sprintf("%s (line %d)", q.Path, q.Line)
	sys := md.Study.Units
	shown := valueText(v, q.Dim)
	where := fmt.Sprintf("outside %s to %s, the plausible range of %s", valueText(r.lo, q.Dim), valueText(r.hi, q.Dim), r.what)
	if r.lo == 0 {
		where = fmt.Sprintf("larger than %s", r.what)
	}
	if q.bare {
		x := v / sys.Factor(q.Dim)
		if unit, ok := betterUnit(x, q.Dim, sys, r); ok {
			if q.Random() {
				return fmt.Sprintf("%s: the numbers of this distribution have no unit and are read in %s (units = %q): its mean is %s, %s; did you mean them in %s (e.g. mean = \"%s %s\")? Write the unit to be sure", at, sys.Unit(q.Dim), sys.Name, shown, where, unit, num(x), unit)
			}
			return fmt.Sprintf("%s: %s has no unit and is read in %s (units = %q): %s, %s; did you mean \"%s %s\"?", at, num(x), sys.Unit(q.Dim), sys.Name, shown, where, num(x), unit)
		}
	}
	if r.hintOnly {
		return ""
	}
	what := "the value is"
	if q.Random() {
		what = "the mean is"
	}
	advice := r.advice
	if advice == "" {
		advice = "check the value and its unit"
	}
	return fmt.Sprintf("%s: %s %s, %s: %s", at, what, shown, where, advice)
}

// candidateUnits are the units tried, in order, for a bare number that is
// implausible in the study's system: those of the same family (metric or
// US customary) as the system's own.
var candidateUnits = map[bool]map[Dim][]string{
	false: {Length: {"mm", "m"}, Stress: {"MPa", "GPa", "kPa"}, Force: {"kN", "N", "MN"}},
	true:  {Length: {"in", "ft"}, Stress: {"ksi", "psi"}, Force: {"kip", "lbf"}},
}

// candidates returns the units other than the system's own to try for a
// bare number of dimension d.
func candidates(d Dim, sys System) []string {
	var out []string
	for _, u := range candidateUnits[sys.Name == "kip-in"][d] {
		if u != sys.Unit(d) {
			out = append(out, u)
		}
	}
	return out
}

// betterUnit returns the first unit, other than the system's, in which the
// bare number x falls inside r.
func betterUnit(x float64, d Dim, sys System, r plausible) (string, bool) {
	for _, u := range candidates(d, sys) {
		if v := x * units[u].factor; v >= r.lo && v <= r.hi && v > 0 {
			return u, true
		}
	}
	return "", false
}

// slenderness warns when K L / r of a checked axis is above
// MaxSlenderness (once, for the more slender axis).
func (md *Model) slenderness(n *Nominal) string {
	st := md.Study
	worst, axis := 0.0, column.Major
	for a := column.Major; a <= column.Minor; a++ {
		if (st.Axis == column.Both || st.Axis == a) && n.Slenderness[a] > worst {
			worst, axis = n.Slenderness[a], a
		}
	}
	if !(worst > MaxSlenderness) {
		return ""
	}
	return fmt.Sprintf("%s (line %d): K L / r = %s about the %s axis is above %d: no compression member is built that slender; the length (%s) or a section dimension is probably in the wrong unit, or K is wrong (check member.length, member.k and member.section)",
		st.Length.Path, st.Length.Line, num(worst), axis, MaxSlenderness, lengthText(n.Member.Length))
}

// utilisation warns when the utilisation at nominal values is outside
// MinUtilisation..MaxUtilisation, and says which unit of the bare loads
// would bring it inside.
func (md *Model) utilisation(n *Nominal) string {
	st := md.Study
	u := n.Utilisation
	if len(st.Loads) == 0 || !(n.Capacity > 0) || u >= MinUtilisation && u <= MaxUtilisation {
		return ""
	}
	first := st.Loads[0]
	at := fmt.Sprintf("loads (line %d)", first.Line)
	side := fmt.Sprintf("below %g: the member is hardly loaded", MinUtilisation)
	if u > MaxUtilisation {
		side = fmt.Sprintf("above %g: the member fails at nominal values by far", float64(MaxUtilisation))
	}
	msg := fmt.Sprintf("%s: the utilisation at nominal values is %s (demand %s, capacity %s), %s", at, num(u), forceText(n.Demand), forceText(n.Capacity), side)
	var bare, other float64
	for _, q := range st.Loads {
		if q.bare {
			bare += nominalValue(q, 0)
		} else {
			other += nominalValue(q, 0)
		}
	}
	sys := st.Units
	if bare != 0 {
		for _, c := range candidates(Force, sys) {
			f := units[c].factor / sys.Factor(Force)
			if v := n.EffectFactor * (bare*f + other) / n.Capacity; v >= MinUtilisation && v <= MaxUtilisation {
				return fmt.Sprintf("%s; loads without a unit are read in %s (units = %q): did you mean them in %s (utilisation %s)?", msg, sys.Unit(Force), sys.Name, c, num(v))
			}
		}
	}
	return msg + "; check the loads, the strength and the section and their units"
}

// num writes x with four significant digits and no exponent for everyday
// magnitudes.
func num(x float64) string {
	if x == 0 || math.IsNaN(x) || math.IsInf(x, 0) {
		return fmt.Sprint(x)
	}
	r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'g', 4, 64), 64)
	if a := math.Abs(r); a >= 1e-4 && a < 1e12 {
		return strconv.FormatFloat(r, 'f', -1, 64)
	}
	return strconv.FormatFloat(r, 'g', 4, 64)
}

// lengthText writes a length in mm, m or km, whichever reads best.
func lengthText(mm float64) string {
	switch a := math.Abs(mm); {
	case a >= 1e6:
		return num(mm/1e6) + " km"
	case a >= 1e3:
		return num(mm/1e3) + " m"
	}
	return num(mm) + " mm"
}

// forceText writes a force in kN.
func forceText(n float64) string { return num(n/1e3) + " kN" }

// valueText writes a value of dimension d held in N, mm, MPa.
func valueText(v float64, d Dim) string {
	switch d {
	case Length:
		return lengthText(v)
	case Force:
		return forceText(v)
	}
	return strings.TrimSpace(num(v) + " " + InternalUnit(d))
}
