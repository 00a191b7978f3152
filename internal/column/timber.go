package column

import "fmt"

// Duration is a load-duration class of EN 1995-1-1:2004 Table 2.1, from
// the longest (Permanent) to the shortest (Instantaneous).
type Duration int

// The load-duration classes.
const (
	Permanent     Duration = iota // more than 10 years
	LongTerm                      // 6 months to 10 years
	MediumTerm                    // 1 week to 6 months
	ShortTerm                     // less than 1 week
	Instantaneous                 // wind gusts, accidental actions
)

// durationNames are the names of the classes as a study file writes them.
var durationNames = [...]string{"permanent", "long", "medium", "short", "instantaneous"}

// String returns the name of the class ("permanent", "long", "medium",
// "short" or "instantaneous").
func (d Duration) String() string {
	if d >= 0 && int(d) < len(durationNames) {
		return durationNames[d]
	}
	return fmt.Sprintf("Duration(%d)", int(d))
}

// DurationNames returns the names of the load-duration classes, the
// longest first.
func DurationNames() []string { return append([]string(nil), durationNames[:]...) }

// ParseDuration returns the load-duration class named name.
func ParseDuration(name string) (Duration, error) {
	for i, n := range durationNames {
		if n == name {
			return Duration(i), nil
		}
	}
	return 0, fmt.Errorf("column: unknown load duration %q (want permanent, long, medium, short or instantaneous)", name)
}

// kmodTable is k_mod of solid timber, glued laminated timber and LVL,
// EN 1995-1-1:2004 Table 3.1, by service class (1 to 3) and load-duration
// class.
var kmodTable = [3][5]float64{
	{0.60, 0.70, 0.80, 0.90, 1.10},
	{0.60, 0.70, 0.80, 0.90, 1.10},
	{0.50, 0.55, 0.65, 0.70, 0.90},
}

// kdefTable is k_def of solid and glued laminated timber,
// EN 1995-1-1:2004 Table 3.2, by service class (1 to 3).
var kdefTable = [3]float64{0.60, 0.80, 2.00}

// KMod returns the modification factor k_mod of solid timber, glued
// laminated timber and LVL for service class 1, 2 or 3 and load-duration
// class d (EN 1995-1-1:2004 Table 3.1): the strength a load of that
// duration sees is k_mod times the short-term test strength.
func KMod(service int, d Duration) (float64, error) {
	if service < 1 || service > 3 {
		return 0, fmt.Errorf("column: service class %d (want 1, 2 or 3)", service)
	}
	if d < Permanent || d > Instantaneous {
		return 0, fmt.Errorf("column: unknown load duration %d", int(d))
	}
	return kmodTable[service-1][d], nil
}

// KDef returns the deformation factor k_def of solid and glued laminated
// timber for service class 1, 2 or 3 (EN 1995-1-1:2004 Table 3.2): the
// creep deformation of a permanent load is k_def times its instantaneous
// deformation.
func KDef(service int) (float64, error) {
	if service < 1 || service > 3 {
		return 0, fmt.Errorf("column: service class %d (want 1, 2 or 3)", service)
	}
	return kdefTable[service-1], nil
}

// CreepModulus is the modulus E / (1 + k_def psi) with which a closed-form
// model amplifies the bow of a timber member when the share psi (0 to 1)
// of its load acts long enough to creep (EN 1995-1-1:2004 2.3.2.2, eq.
// 2.15, with psi the quasi-permanent share of the load).
func CreepModulus(e, kdef, psi float64) float64 {
	return e / (1 + kdef*psi)
}
