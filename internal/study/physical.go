package study

import "strutrisk/internal/column"

// InUnits returns value, the value of variable i of Sim, in N, mm and MPa
// at the physical point x (one value per variable): a bow or eccentricity
// written as L/n with a random member length is sampled as a fraction of
// the length, and is here multiplied by the length at x; one written as
// Lcr/n is multiplied by the buckling length K L of the axis that governs
// at x. Every other variable is returned as it is.
func (md *Model) InUnits(i int, value float64, x []float64) float64 {
	v := md.Sim.Vars[i]
	if md.lcrBow && v.Name == md.Study.Bow.Path || md.lcrEcc && v.Name == md.Study.Ecc.Path {
		// A fraction of the buckling length of the governing axis.
		res, m, _, err := md.At(x)
		if err != nil || res.Axis == column.Both {
			return value * md.base[fLength]
		}
		return value * m.K[res.Axis] * m.Length
	}
	rel := md.relBow && md.Study.Bow != nil && v.Name == md.Study.Bow.Path ||
		md.relEcc && md.Study.Ecc != nil && v.Name == md.Study.Ecc.Path
	if !rel {
		return value
	}
	w := md.base
	for j, b := range md.binds {
		md.set(&w, b, x[j])
	}
	return value * w[fLength]
}

// Medians returns the point where every variable of Sim is at its median.
func (md *Model) Medians() []float64 {
	x := make([]float64, len(md.Sim.Vars))
	for i, v := range md.Sim.Vars {
		x[i] = v.Dist.Quantile(0.5)
	}
	return x
}
