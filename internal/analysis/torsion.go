package analysis

import (
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/study"
)

// governingText names what governs the nominal capacity: "the minor axis"
// or, for a mode that twists the section, "flexural-torsional buckling".
func governingText(n *study.Nominal) string {
	if n.CapacityMode.Twists() {
		return n.CapacityMode.String() + " buckling"
	}
	return "the " + n.Axis.String() + " axis"
}

// torsionText gives the torsional properties and the critical loads of
// the nominal member for check, or nothing when its torsion constant is
// unknown.
func torsionText(n *study.Nominal) string {
	p := &n.Member.Props
	if p.It == 0 {
		return ""
	}
	var b strings.Builder
	fmt.Fprintf(&b, "\nTorsion: It = %.4g mm4, Iw = %.4g mm6, shear centre from the centroid %.1f mm (major) / %.1f mm (minor)",
		p.It, p.Iw, p.S[0], p.S[1])
	if p.Angle != 0 && p.Angle != math.Pi/2 {
		fmt.Fprintf(&b, "; principal axes at %.1f degrees to the width", p.Angle*180/math.Pi)
	}
	fmt.Fprintf(&b, "\n  %s buckling at %.1f kN; governing elastic critical load %.1f kN (%s)\n",
		n.TwistingMode, n.Twisting/1e3, n.Critical/1e3, n.Mode)
	return b.String()
}
