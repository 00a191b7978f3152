package analysis

import (
	"strings"

	"strutrisk/internal/column"
	"strutrisk/internal/study"
)

// strengthSymbol is the symbol of the material's strength in check's
// text: fy for carbon steel, f_0.2 for stainless steel, f_o for aluminium
// and f_c,0 for timber.
func strengthSymbol(st *study.Study) string {
	switch st.Material.Kind {
	case column.Stainless:
		return "f_0.2"
	case column.Aluminium:
		return "f_o"
	case column.Timber:
		return "f_c,0"
	}
	return "fy"
}

// materialText is the material of a study other than carbon steel as
// check prints it, under the nominal member.
func materialText(md *study.Model, n *study.Nominal) string {
	var b strings.Builder
	for _, l := range md.MaterialLines() {
		b.WriteString("  " + l + "\n")
	}
	return b.String()
}

// plateau is the plateau lambda_0 of the nominal member's buckling curve.
func plateau(n *study.Nominal) float64 {
	if n.Member.Kind == column.Steel {
		return 0.2
	}
	return n.Member.Lambda0
}
