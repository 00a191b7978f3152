package report

import "sort"

// designRow is one input's design value and partial factor, formatted.
type designRow struct{ Variable, Role, Characteristic, Basis, Design, Factor string }

// designTable formats the design values of the FORM result, most
// important input first; nil when there are none.
func designTable(b *Bundle, f *FORM) (rows []designRow, beta, note string) {
	if f == nil || len(f.DesignValues) == 0 || f.DesignBeta == nil {
		return nil, "", ""
	}
	names := sortedKeys(f.DesignValues)
	sort.SliceStable(names, func(i, j int) bool { return f.Importance[names[i]] > f.Importance[names[j]] })
	for _, k := range names {
		u := inputUnit(b, k)
		if u == "L" {
			u = "mm" // L/n values are given in mm at the design point
		}
		r := designRow{Variable: k, Role: f.DesignRoles[k], Basis: f.CharacteristicBasis[k], Factor: notAvailable,
			Characteristic: withUnit(f.CharacteristicValues[k], u), Design: withUnit(f.DesignValues[k], u)}
		if g, ok := f.PartialFactors[k]; ok {
			r.Factor = fixed(g, 3)
		}
		rows = append(rows, r)
	}
	return rows, fixed(*f.DesignBeta, 2), f.DesignNote
}
