package study

import (
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/column"
)

// MaterialLines describes the study's material for check, one line each:
// nothing for carbon steel; the standard, the curve and the laws the
// other kinds bring, at nominal values.
func (md *Model) MaterialLines() []string {
	st := md.Study
	ms := &st.Material
	if ms.Kind == column.Steel {
		return nil
	}
	var out []string
	v := md.nominalValues()
	switch ms.Kind {
	case column.Timber:
		var ks, ds []string
		for d, used := range md.mat.used {
			if used {
				ks = append(ks, fmt.Sprintf("%.2f %s", md.mat.kmod[d], column.Duration(d)))
			}
		}
		for _, q := range st.Loads {
			ds = append(ds, strings.TrimPrefix(q.Path, "loads.")+" "+q.Duration)
		}
		out = append(out,
			fmt.Sprintf("material timber (EN 1995-1-1), service class %d: k_mod %s (Table 3.1), k_def %.2f (Table 3.2); durations: %s",
				ms.Service, strings.Join(ks, ", "), md.mat.kdef, strings.Join(ds, ", ")),
			"each sample takes the least margin over the combinations of the loads of each duration with all longer-acting ones, at k_mod of the shortest (3.1.3); the capacity below is that of all loads")
	case column.Stainless:
		s := "material stainless steel (EN 1993-1-4): buckling curves of Table 5.2"
		if md.mat.law {
			s += fmt.Sprintf("; the ultimate beam-column follows the compound Ramberg-Osgood law (Annex C), n = %g, f_u = %.0f MPa", ms.Exponent, v[fFu])
		}
		out = append(out, s)
	case column.Aluminium:
		s := "material aluminium (EN 1999-1-1): buckling class " + map[bool]string{true: "A", false: "B"}[ms.ClassA]
		if md.mat.haz {
			m, sec, err := md.member(&v)
			if ahaz, e2 := column.HAZArea(sec, v[fHAZw]); err == nil && e2 == nil && m.Props.A > 0 {
				a1 := 1 - math.Min(1, ahaz/m.Props.A)*(1-math.Min(1, v[fHAZr]))
				s += fmt.Sprintf("; welded: heat-affected zones %.0f mm wide at rho_o,haz %.2f, A_haz = %.0f mm2, A1/A = %.3f (6.1.6, Table 6.5)", v[fHAZw], v[fHAZr], ahaz, a1)
			}
		}
		out = append(out, s)
	}
	return out
}
