package study

import (
	"strutrisk/internal/column"
)

// curveLabel names a buckling curve of the material for a legend:
// "EN 1993-1-1 curve b", "EN 1993-1-4 hollow", "EN 1999-1-1 class A",
// "EN 1995-1-1 k_c, solid".
func curveLabel(k column.Kind, name string) string {
	switch k {
	case column.Stainless:
		return "EN 1993-1-4 " + name
	case column.Aluminium:
		return "EN 1999-1-1 class " + name
	case column.Timber:
		return "EN 1995-1-1 k_c, " + name
	}
	return "EN 1993-1-1 curve " + name
}

// kindReference is ReferenceCurve for a material other than steel: the
// curve the study gives by name, else the material's default for the
// section (materialcheck.go), with its source.
func (md *Model) kindReference(a column.Axis) (name, row string, alpha float64) {
	st := md.Study
	name, row = st.Curve[a], "the study's curve"
	if name == "" {
		name = map[column.Kind]string{column.Stainless: "welded-open", column.Aluminium: "B", column.Timber: "solid"}[st.Material.Kind]
		if s := st.Section.Shape; st.Material.Kind == column.Stainless && (s == column.ShapeRHS || s == column.ShapeCHS) {
			name = "hollow"
		}
		row = map[column.Kind]string{column.Stainless: "EN 1993-1-4 Table 5.2", column.Aluminium: "EN 1999-1-1 Table 6.6, the more severe class",
			column.Timber: "EN 1995-1-1 6.3.2"}[st.Material.Kind]
	}
	c, _ := column.MaterialCurve(st.Material.Kind, name)
	return name, row, c.Alpha[a]
}

// timberAxes are the slenderness picture's coordinates of a timber
// member: the relative slenderness of EN 1995-1-1 eq. 6.21 from the
// strength as tested, and the strength k_mod f that the ratio N / (A f)
// divides by, so that k_c of the curve model and the first-yield models
// meet on one picture.
func timberAxes(m *column.Member, v *values, a column.Axis) (lam, fy float64) {
	mm := *m
	mm.Fy, mm.E = v[fFy], v[fE] // as tested, without creep
	return column.RelativeSlenderness(&mm, a), v[fFy] * v[fKmod]
}
