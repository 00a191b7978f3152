package analysis

import (
	"strutrisk/internal/report"
	"strutrisk/internal/study"
)

// codeCheck makes the study's code check for the result document; for a
// study it cannot be made for it says why instead.
func codeCheck(md *study.Model) (*report.CodeCheck, string) {
	c, err := md.CodeCheck()
	if err != nil {
		return nil, "code_check: not made: " + err.Error()
	}
	r := &report.CodeCheck{
		Resistance: c.Resistance, DesignLoad: c.DesignLoad, Utilisation: c.Utilisation,
		CrossSectionResistance: c.CrossSection, BucklingResistance: c.Buckling,
		GammaM0: c.GammaM0, GammaM1: c.GammaM1, GammaG: c.Factors.GammaG, GammaQ: c.Factors.GammaQ, Psi0: c.Factors.Psi0,
		Chi: c.Chi, Curve: c.Curve, ImperfectionFactor: c.Alpha, CurveSource: c.CurveFrom,
		RelativeSlenderness: c.RelSlenderness, CriticalLoad: c.Critical, Axis: c.Axis.String(), Mode: c.Mode.String(),
		Yield: c.Fy, EffectiveArea: c.EffectiveArea, SectionClass: c.Class,
		Characteristic: map[string]float64{}, CharacteristicBasis: map[string]string{}, CharacteristicUnits: map[string]string{},
		Psi0Loads:   c.Factors.Psi0By,
		LoadFactors: map[string]float64{}, LeadingLoad: c.Combination.Leading, EffectFactor: c.EffectFactor,
		Combination: c.Rule(), Notes: c.Notes, AxialOnly: c.AxialOnly,
	}
	for _, in := range c.Inputs {
		r.Characteristic[in.Path], r.CharacteristicBasis[in.Path], r.CharacteristicUnits[in.Path] = in.Value, in.Basis, in.Unit
	}
	for i, l := range c.Loads {
		r.LoadFactors[l.Name] = c.Combination.Factors[i]
	}
	return r, ""
}
