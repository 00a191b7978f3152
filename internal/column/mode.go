package column

import "fmt"

// Mode is an elastic buckling mode of a member.
type Mode int

// The buckling modes. The zero value is flexural buckling about the major
// axis.
const (
	ModeFlexuralMajor     Mode = iota // bending about the major axis
	ModeFlexuralMinor                 // bending about the minor axis
	ModeTorsional                     // twisting about the shear centre
	ModeFlexuralTorsional             // bending and twisting together
)

var modeNames = [...]string{
	ModeFlexuralMajor:     "flexural-major",
	ModeFlexuralMinor:     "flexural-minor",
	ModeTorsional:         "torsional",
	ModeFlexuralTorsional: "flexural-torsional",
}

// String returns "flexural-major", "flexural-minor", "torsional" or
// "flexural-torsional".
func (m Mode) String() string {
	if m >= 0 && int(m) < len(modeNames) {
		return modeNames[m]
	}
	return fmt.Sprintf("Mode(%d)", int(m))
}

// Twists reports whether the mode twists the section (torsional or
// flexural-torsional).
func (m Mode) Twists() bool { return m == ModeTorsional || m == ModeFlexuralTorsional }

// flexuralMode is the flexural mode about axis a.
func flexuralMode(a Axis) Mode {
	if a == Major {
		return ModeFlexuralMajor
	}
	return ModeFlexuralMinor
}
