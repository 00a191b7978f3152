package analysis

import (
	"fmt"
	"strings"

	"strutrisk/internal/study"
)

// classText is the section class at nominal values as check prints it:
// each compression part with its c/t, the limits of EN 1993-1-1 Table
// 5.2 and its class, and the effective area of a class 4 section.
func classText(n *study.Nominal) string {
	cl := n.Class
	if cl.Class == 0 {
		return "  section class: not classified (custom section; its whole area is taken as effective)\n"
	}
	var b strings.Builder
	fmt.Fprintf(&b, "  section class %d in compression (EN 1993-1-1 Table 5.2, eps = %.3f)", cl.Class, cl.Eps)
	if cl.N == 0 {
		b.WriteString(": a solid section\n")
		return b.String()
	}
	b.WriteString(":\n")
	for _, e := range cl.Elements[:cl.N] {
		ratio := "c/t"
		if e.Name == "wall" && n.Section.Shape.String() == "CHS" {
			ratio = "d/t"
		}
		lim := func(x float64) string { // angles have a class 3 limit only
			if x == 0 {
				return "-"
			}
			return fmt.Sprintf("%.1f", x)
		}
		switch e.Kind.String() {
		case "leg":
			ratio = "h/t"
		case "legs":
			ratio = "(b+h)/2t"
		}
		fmt.Fprintf(&b, "    %-13s %-9s %s %6.1f  limits %s / %s / %s  class %d", e.Name, e.Kind, ratio, e.Ratio, lim(e.Limits[0]), lim(e.Limits[1]), lim(e.Limits[2]), e.Class)
		if e.Rho < 1 {
			fmt.Fprintf(&b, ", rho %.3f (EN 1993-1-5 4.4)", e.Rho)
		}
		b.WriteString("\n")
	}
	if a := n.Member.Props.A; n.EffectiveArea < a {
		fmt.Fprintf(&b, "    effective area A_eff = %.0f mm2, %.1f %% of A (EN 1993-1-5 4.4); the capacity takes A_eff\n", n.EffectiveArea, 100*n.EffectiveArea/a)
	}
	return b.String()
}
