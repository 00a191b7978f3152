package column

import "fmt"

// Fabrication is how a section was made: it selects the row of EN
// 1993-1-1 Table 6.2 (the buckling curve) and the default corner radius of
// a rectangular hollow section.
type Fabrication int

// The fabrications. NoFabrication is the zero value: not stated.
const (
	NoFabrication Fabrication = iota
	HotRolled                 // rolled I or H section, solid bar
	Welded                    // welded I section or box
	ColdFormed                // cold-formed hollow section
	HotFinished               // hot-finished hollow section
)

var fabricationNames = [...]string{
	NoFabrication: "",
	HotRolled:     "hot-rolled",
	Welded:        "welded",
	ColdFormed:    "cold-formed",
	HotFinished:   "hot-finished",
}

// String returns the study-file name: "hot-rolled", "welded",
// "cold-formed" or "hot-finished" ("" when not stated).
func (f Fabrication) String() string {
	if f >= 0 && int(f) < len(fabricationNames) {
		return fabricationNames[f]
	}
	return fmt.Sprintf("Fabrication(%d)", int(f))
}

// ParseFabrication reads a fabrication's study-file name.
func ParseFabrication(name string) (Fabrication, error) {
	for f, n := range fabricationNames {
		if n == name && n != "" {
			return Fabrication(f), nil
		}
	}
	return 0, fmt.Errorf("column: unknown fabrication %q (want hot-rolled, welded, cold-formed or hot-finished)", name)
}

// Fabrications returns the fabrications a shape can have, the first being
// the default strutrisk takes when none is stated (the more severe rows of
// EN 1993-1-1 Table 6.2: welded for an I section, cold-formed for hollow
// sections, hot-rolled for solid bars, angles, channels and tees). A custom
// section has none.
func Fabrications(s Shape) []Fabrication {
	switch s {
	case ShapeI:
		return []Fabrication{Welded, HotRolled}
	case ShapeRHS:
		return []Fabrication{ColdFormed, HotFinished, Welded}
	case ShapeCHS:
		return []Fabrication{ColdFormed, HotFinished}
	case ShapeRect, ShapeRound, ShapeAngle, ShapeChannel, ShapeTee:
		return []Fabrication{HotRolled}
	}
	return nil
}
