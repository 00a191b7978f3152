package column

import "fmt"

var shapeNames = [...]string{
	ShapeI:       "I",
	ShapeRHS:     "RHS",
	ShapeCHS:     "CHS",
	ShapeRect:    "rect",
	ShapeRound:   "round",
	ShapeCustom:  "custom",
	ShapeAngle:   "angle",
	ShapeChannel: "channel",
	ShapeTee:     "tee",
}

// String returns the study-file name of the shape: "I", "RHS", "CHS",
// "rect", "round", "custom", "angle", "channel" or "tee".
func (s Shape) String() string {
	if s >= 0 && int(s) < len(shapeNames) {
		return shapeNames[s]
	}
	return fmt.Sprintf("Shape(%d)", int(s))
}

// ParseShape returns the shape named as in a study file (see
// Shape.String).
func ParseShape(name string) (Shape, error) {
	for s, n := range shapeNames {
		if n == name {
			return Shape(s), nil
		}
	}
	return 0, fmt.Errorf("column: unknown section shape %q (want I, RHS, CHS, rect, round, custom, angle, channel or tee)", name)
}

// ParseAxis returns the axis named "major", "minor" or "both".
func ParseAxis(name string) (Axis, error) {
	switch name {
	case "major":
		return Major, nil
	case "minor":
		return Minor, nil
	case "both":
		return Both, nil
	}
	return 0, fmt.Errorf("column: unknown axis %q (want major, minor or both)", name)
}

// BeamLimitNames returns the study-file names of the beam-column limits
// (BeamLimit.String), in the order of their constants.
func BeamLimitNames() []string {
	return []string{FirstYieldLimit.String(), UltimateLimit.String()}
}

// ResidualNames returns the study-file names of the residual stress
// patterns (Residual.String), in the order of their constants.
func ResidualNames() []string {
	var names []string
	for r := ResidualNone; r <= ResidualColdFormed; r++ {
		names = append(names, r.String())
	}
	return names
}

// FabricationNames returns the study-file names of the fabrications
// (Fabrication.String), in the order of their constants.
func FabricationNames() []string {
	var names []string
	for f := HotRolled; f <= HotFinished; f++ {
		names = append(names, f.String())
	}
	return names
}
