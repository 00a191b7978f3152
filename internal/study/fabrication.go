package study

import (
	"fmt"
	"strings"

	"strutrisk/internal/column"
)

// fabrication reads member.section.fabrication, checks that the shape can
// have it, and takes the shape's default (listed) when it is absent.
func (p *parser) fabrication(t *table, spec *SectionSpec) {
	allowed := column.Fabrications(spec.Shape)
	name, given := p.choice(t, "fabrication", choicesOf("member.section", "fabrication"))
	_, written := t.m["fabrication"]
	if len(allowed) == 0 {
		if written {
			p.errorf(t.key("fabrication"), "a %s section has no fabrication: its buckling curve is given with capacity.curve", spec.Name)
		}
		return
	}
	if given {
		f, _ := column.ParseFabrication(name)
		for _, a := range allowed {
			if a == f {
				spec.Fabrication = f
				return
			}
		}
		p.errorf(t.key("fabrication"), "a %s section cannot be %q: use %s", spec.Name, name, fabNames(allowed))
		return
	}
	if written { // given but not a choice: already reported
		return
	}
	spec.Fabrication = allowed[0]
	switch spec.Shape {
	case column.ShapeI:
		p.defaultf("member.section.fabrication: not given; \"welded\" is taken for the I section, the more severe rows of EN 1993-1-1 Table 6.2 (write fabrication = \"hot-rolled\" for a rolled section)")
	case column.ShapeRHS:
		p.defaultf("member.section.fabrication: not given; \"cold-formed\" is taken for the RHS (EN 1993-1-1 Table 6.2 curve c and the EN 10219-2 corner radii; write \"hot-finished\" or \"welded\" if it is)")
	case column.ShapeCHS:
		p.defaultf("member.section.fabrication: not given; \"cold-formed\" is taken for the CHS (EN 1993-1-1 Table 6.2 curve c; write \"hot-finished\" if it is)")
	}
}

// fabNames lists fabrications for a message: "hot-rolled" or "welded".
func fabNames(fs []column.Fabrication) string {
	q := make([]string, len(fs))
	for i, f := range fs {
		q[i] = fmt.Sprintf("%q", f.String())
	}
	if len(q) == 1 {
		return q[0]
	}
	return strings.Join(q[:len(q)-1], ", ") + " or " + q[len(q)-1]
}

// corners sets the corner radii of an RHS from its nominal wall: the
// given outer radius (given) with the inner one radius - thickness (a
// sharp inner corner when that is negative), or the product standard's
// pair for the fabrication fab (column.RHSCornerRadii). Other shapes are
// left alone. It is on the sampling path: no allocation.
func corners(sec *column.Section, given bool, fab column.Fabrication) {
	if sec.Shape != column.ShapeRHS {
		return
	}
	if given {
		sec.InnerRadius = max(sec.Radius-sec.Thickness, 0)
		return
	}
	sec.Radius, sec.InnerRadius = column.RHSCornerRadii(sec.Thickness, fab)
}
