package column

import "fmt"

// Kind is the material of a member. The zero value is Steel.
type Kind int

// The materials.
const (
	Steel     Kind = iota // carbon steel, EN 1993-1-1
	Stainless             // stainless steel, EN 1993-1-4
	Aluminium             // aluminium alloy, EN 1999-1-1
	Timber                // solid or glued laminated timber, EN 1995-1-1
)

// kindNames are the names of the kinds as a study file writes them.
var kindNames = [...]string{"steel", "stainless", "aluminium", "timber"}

// String returns "steel", "stainless", "aluminium" or "timber".
func (k Kind) String() string {
	if k >= 0 && int(k) < len(kindNames) {
		return kindNames[k]
	}
	return fmt.Sprintf("Kind(%d)", int(k))
}

// KindNames returns the names of the materials, Steel first.
func KindNames() []string { return append([]string(nil), kindNames[:]...) }

// ParseKind returns the material named name ("steel", "stainless",
// "aluminium", "timber").
func ParseKind(name string) (Kind, error) {
	for i, n := range kindNames {
		if n == name {
			return Kind(i), nil
		}
	}
	return 0, fmt.Errorf("column: unknown material %q (want steel, stainless, aluminium or timber)", name)
}

// plateau is the relative slenderness up to which the member's buckling
// curve gives chi = 1: 0.2 for steel (EN 1993-1-1:2005 6.3.1.2(4)),
// Lambda0 for the other materials.
func (m *Member) plateau() float64 {
	if m.Kind == Steel {
		return 0.2
	}
	return m.Lambda0
}

// CurveParams are the imperfection factor alpha and the plateau lambda_0
// of a buckling curve of the form of ReductionFactor, for each axis.
type CurveParams struct {
	Alpha   [2]float64
	Lambda0 float64
}

// materialCurve is one named buckling curve of a material other than
// carbon steel.
type materialCurve struct {
	kind Kind
	name string
	p    CurveParams
}

// materialCurves are the buckling curves of the materials other than
// carbon steel (whose curves are those of CurveAlpha):
//
//   - stainless steel, EN 1993-1-4:2006 Table 5.2, flexural buckling (from
//     memory): cold-formed open sections alpha 0.49, lambda_0 0.40; hollow
//     sections (welded and seamless) 0.49, 0.40; welded open sections
//     0.49 about the major axis and 0.76 about the minor, lambda_0 0.20;
//   - aluminium, EN 1999-1-1:2007 Table 6.6 (from memory): buckling class
//     A (heat-treated alloys) alpha 0.20, lambda_0 0.10; class B 0.32,
//     0.00;
//   - timber, EN 1995-1-1:2004 6.3.2 eqs. (6.27) to (6.29): beta_c 0.2
//     for solid timber and 0.1 for glued laminated timber (and LVL), the
//     plateau 0.3 of eq. (6.25) and (6.26).
var materialCurves = [...]materialCurve{
	{Stainless, "cold-formed-open", CurveParams{[2]float64{0.49, 0.49}, 0.40}},
	{Stainless, "hollow", CurveParams{[2]float64{0.49, 0.49}, 0.40}},
	{Stainless, "welded-open", CurveParams{[2]float64{0.49, 0.76}, 0.20}},
	{Aluminium, "A", CurveParams{[2]float64{0.20, 0.20}, 0.10}},
	{Aluminium, "B", CurveParams{[2]float64{0.32, 0.32}, 0.00}},
	{Timber, "solid", CurveParams{[2]float64{0.2, 0.2}, 0.3}},
	{Timber, "glulam", CurveParams{[2]float64{0.1, 0.1}, 0.3}},
}

// MaterialCurve returns the buckling curve named name of material k (see
// MaterialCurveNames). For Steel it returns alpha of CurveAlpha on both
// axes and the plateau 0.2.
func MaterialCurve(k Kind, name string) (CurveParams, error) {
	if k == Steel {
		a, err := CurveAlpha(name)
		return CurveParams{[2]float64{a, a}, 0.2}, err
	}
	for _, c := range materialCurves {
		if c.kind == k && c.name == name {
			return c.p, nil
		}
	}
	return CurveParams{}, fmt.Errorf("column: %s has no buckling curve %q (want one of %v)", k, name, MaterialCurveNames(k))
}

// MaterialCurveNames returns the names of the buckling curves of material
// k: "a0" to "d" for steel, "cold-formed-open", "hollow", "welded-open"
// for stainless steel, "A" and "B" for aluminium, "solid" and "glulam" for
// timber.
func MaterialCurveNames(k Kind) []string {
	if k == Steel {
		return append([]string(nil), curveNames[:]...)
	}
	var out []string
	for _, c := range materialCurves {
		if c.kind == k {
			out = append(out, c.name)
		}
	}
	return out
}
