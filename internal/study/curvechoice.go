package study

import (
	"errors"

	"strutrisk/internal/column"
)

// tableCurves gives model "curve" the buckling curve of EN 1993-1-1 Table
// 6.2 (column.BucklingCurve) about each axis that has none, and warns
// when a curve or alpha the study gives is less severe than the table's.
// The S460 rows are read from the characteristic yield strength: the 5 %
// fractile of a random material.yield, else its value.
func (p *parser) tableCurves() {
	st := p.st
	if !st.ModelTraits().Curve || st.Section.Dims == nil || st.Yield == nil || st.Material.Kind != column.Steel {
		return
	}
	missing := st.Alpha[0] == nil || st.Alpha[1] == nil
	if st.Section.Shape == column.ShapeCustom {
		if missing {
			p.errorf("capacity.model", "model \"curve\" on a custom section needs a buckling curve (EN 1993-1-1 Table 6.2 has no row for it): add curve = \"b\" (a0, a, b, c, d) or alpha = 0.34")
		}
		return
	}
	fyk, from := st.characteristicYield()
	fab := st.Section.Fabrication
	var chosen [2]string
	var rows [2]string
	for a := column.Major; a <= column.Minor; a++ {
		c, row, err := st.Table62(a)
		if err != nil {
			p.errorf("member.section", "%v", err)
			return
		}
		chosen[a], rows[a] = c, row
		given := st.Alpha[a]
		if given == nil {
			st.Curve[a] = c
			st.Alpha[a] = &Quantity{Path: "capacity.curve", Line: p.line("capacity"), Value: curveAlpha(c)}
			continue
		}
		table := curveAlpha(c)
		alpha := nominalValue(given, 0)
		// An axis the study does not check (capacity.axis) takes no
		// curve, so a milder one there is no concern.
		checked := st.Axis == column.Both || st.Axis == a
		if alpha < table && checked {
			name := "alpha"
			if st.Curve[a] != "" {
				name = "curve \"" + st.Curve[a] + "\""
			}
			p.warnf("capacity.curve: the %s axis takes %s, less severe than EN 1993-1-1 Table 6.2 curve \"%s\" (alpha %.2f) for this section: %s, fabrication %s, fyk %.0f MPa from %s", a, name, c, table, row, fab, fyk, from)
		}
	}
	if missing {
		p.defaultf("capacity.curve: not given; EN 1993-1-1 Table 6.2 gives \"%s\" about the major axis (%s) and \"%s\" about the minor (%s), for a %s section with fyk %.0f MPa from %s", chosen[0], rows[0], chosen[1], rows[1], fab, fyk, from)
	}
}

// characteristicYield is the yield strength that picks the grade's
// column of EN 1993-1-1 Table 6.2: the 5 % fractile of a random
// material.yield, else its value, and where it comes from in words.
func (st *Study) characteristicYield() (fyk float64, from string) {
	if st.Yield.Random() && st.Yield.Dist != nil {
		return st.Yield.Dist.Quantile(0.05), "the 5 % fractile of material.yield"
	}
	return nominalValue(st.Yield, 0), "material.yield"
}

// Table62 returns the buckling curve EN 1993-1-1:2005 Table 6.2 gives the
// study's section about axis a (column.BucklingCurve: nominal dimensions,
// the study's fabrication, given or default, and its characteristic yield,
// see characteristicYield) and the row it read, in words. A custom section
// is an error.
func (st *Study) Table62(a column.Axis) (curve, row string, err error) {
	if st.Section.Dims == nil || st.Yield == nil {
		return "", "", errors.New("study: no section or yield strength")
	}
	fyk, _ := st.characteristicYield()
	sec := st.Section.at(func(q *Quantity) float64 { return nominalValue(q, 0) })
	return column.BucklingCurve(sec, st.Section.Fabrication, fyk, a)
}
