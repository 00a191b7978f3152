package report

import (
	"fmt"
	"strings"
)

// CodeCheck is the deterministic code check beside the reliability
// result: the design resistance of EN 1993-1-1:2005 6.2.4 and 6.3.1 at
// characteristic values with partial factors, against the design load of
// EN 1990 expression 6.10 (forces in N, stresses in MPa, areas in mm2).
type CodeCheck struct {
	// Resistance is the smaller of CrossSectionResistance (N_c,Rd = A_eff
	// fy / gamma_M0) and BucklingResistance (N_b,Rd = chi A_eff fy /
	// gamma_M1); DesignLoad is N_Ed; Utilisation is N_Ed / Resistance.
	Resistance             float64 `json:"resistance"`
	DesignLoad             float64 `json:"design_load"`
	Utilisation            float64 `json:"utilisation"`
	CrossSectionResistance float64 `json:"cross_section_resistance"`
	BucklingResistance     float64 `json:"buckling_resistance"`
	// The factors used: partial factors of resistance and of actions and
	// the combination factor of accompanying variable loads.
	GammaM0 float64 `json:"gamma_m0"`
	GammaM1 float64 `json:"gamma_m1"`
	GammaG  float64 `json:"gamma_g"`
	GammaQ  float64 `json:"gamma_q"`
	Psi0    float64 `json:"psi_0"`
	// Psi0Loads holds the combination factors of the loads that
	// code_check.psi_0 names, by the load's path; the others take Psi0.
	Psi0Loads map[string]float64 `json:"psi_0_loads,omitempty"`
	// Chi is the reduction factor of the governing mode, Curve its
	// buckling curve ("" when an imperfection factor was given),
	// ImperfectionFactor its alpha, CurveSource where it came from.
	Chi                float64 `json:"chi"`
	Curve              string  `json:"curve,omitempty"`
	ImperfectionFactor float64 `json:"imperfection_factor"`
	CurveSource        string  `json:"curve_source,omitempty"`
	// RelativeSlenderness is sqrt(A_eff fy / N_cr) of the governing mode,
	// CriticalLoad its N_cr, Axis and Mode where it buckles.
	RelativeSlenderness float64 `json:"relative_slenderness"`
	CriticalLoad        float64 `json:"critical_load"`
	Axis                string  `json:"axis"`
	Mode                string  `json:"mode"`
	// Yield is the characteristic yield strength, EffectiveArea the area
	// (A_eff of a class 4 section), SectionClass the class (absent for
	// a custom section).
	Yield         float64 `json:"yield"`
	EffectiveArea float64 `json:"effective_area"`
	SectionClass  int     `json:"section_class,omitempty"`
	// Characteristic holds the characteristic values used, by the
	// input's path; CharacteristicBasis how each was taken and
	// CharacteristicUnits its internal unit.
	Characteristic      map[string]float64 `json:"characteristic"`
	CharacteristicBasis map[string]string  `json:"characteristic_basis"`
	CharacteristicUnits map[string]string  `json:"characteristic_units"`
	// LoadFactors is the factor each load took; LeadingLoad the leading
	// variable load; EffectFactor the effect factor applied to the sum.
	LoadFactors  map[string]float64 `json:"load_factors"`
	LeadingLoad  string             `json:"leading_load,omitempty"`
	EffectFactor float64            `json:"effect_factor"`
	// Combination states the combination rule, Notes what a reader must
	// know (the National Annex may differ...).
	Combination string   `json:"combination"`
	Notes       []string `json:"notes,omitempty"`
	// AxialOnly is true when the member also bends (end eccentricity,
	// sway, the beam-column model) and the check leaves the bending out:
	// its utilisation is then no verdict.
	AxialOnly bool `json:"axial_only,omitempty"`
}

// verdictOf says whether the check is satisfied, or why it gives no
// verdict.
func verdictOf(c *CodeCheck) string {
	switch {
	case c.AxialOnly:
		return "no verdict: axial buckling only, the bending of the member is not checked"
	case c.Utilisation <= 1:
		return "satisfied (utilisation at most 1)"
	}
	return "NOT satisfied (utilisation above 1)"
}

// CodeCheckRows formats the code check for reading, one key and value a
// row; nil without one.
func CodeCheckRows(c *CodeCheck) []KV {
	if c == nil {
		return nil
	}
	verdict := verdictOf(c)
	curve := fmt.Sprintf("alpha %s", fixed(c.ImperfectionFactor, 2))
	if c.Curve != "" {
		curve = fmt.Sprintf("curve %s (alpha %s)", c.Curve, fixed(c.ImperfectionFactor, 2))
	}
	if c.CurveSource != "" {
		curve += ", from " + c.CurveSource
	}
	rows := []KV{
		{"utilisation N_Ed / N_Rd", fixed(c.Utilisation, 3) + ": " + verdict},
		{"design resistance N_Rd", kN(c.Resistance)},
		{"design load N_Ed", fmt.Sprintf("%s (%s)", kN(c.DesignLoad), c.Combination)},
		{"buckling resistance N_b,Rd = chi A fy / gamma_M1", fmt.Sprintf("%s: chi %s, gamma_M1 %s", kN(c.BucklingResistance), fixed(c.Chi, 3), sig(c.GammaM1, 3))},
		{"cross-section resistance N_c,Rd = A fy / gamma_M0", fmt.Sprintf("%s: A %s, fy %s, gamma_M0 %s", kN(c.CrossSectionResistance), withUnit(c.EffectiveArea, "mm2"), withUnit(c.Yield, "MPa"), sig(c.GammaM0, 3))},
		{"governing mode", fmt.Sprintf("%s (%s axis), N_cr %s, relative slenderness %s, %s", c.Mode, c.Axis, kN(c.CriticalLoad), fixed(c.RelativeSlenderness, 3), curve)},
		{"load factors", fmt.Sprintf("gamma_G %s, gamma_Q %s, %s", sig(c.GammaG, 3), sig(c.GammaQ, 3), psi0Text(c))},
	}
	for _, k := range sortedKeys(c.Characteristic) {
		s := withUnit(c.Characteristic[k], c.CharacteristicUnits[k]) + " (" + c.CharacteristicBasis[k]
		if f, ok := c.LoadFactors[k]; ok {
			s += ", factor " + sig(f, 3)
		}
		rows = append(rows, KV{"characteristic " + k, s + ")"})
	}
	if len(c.Notes) > 0 {
		rows = append(rows, KV{"notes", strings.Join(c.Notes, " ")})
	}
	return rows
}

// CodeCheckText is the code check as a terminal shows it: a heading and
// one indented line a row; "" without one.
func CodeCheckText(c *CodeCheck) string {
	rows := CodeCheckRows(c)
	if rows == nil {
		return ""
	}
	var b strings.Builder
	b.WriteString("\nCode check at characteristic values (EN 1993-1-1 6.3.1, EN 1990 6.10):\n")
	w := 0
	for _, r := range rows {
		w = max(w, len(r.Key))
	}
	for _, r := range rows {
		fmt.Fprintf(&b, "  %-*s  %s\n", w, r.Key, r.Value)
	}
	return b.String()
}

// CodeCheckLine is the code check in one sentence, for the summaries; ""
// without one.
func CodeCheckLine(c *CodeCheck) string {
	if c == nil {
		return ""
	}
	verdict := verdictOf(c)
	return fmt.Sprintf("utilisation %s, %s: N_Ed %s / N_Rd %s at characteristic values (EN 1993-1-1 6.3.1, EN 1990 6.10; gamma_M0 %s, gamma_M1 %s, gamma_G %s, gamma_Q %s, %s). Recommended factors unless set: the National Annex may differ.",
		fixed(c.Utilisation, 3), verdict, kN(c.DesignLoad), kN(c.Resistance), sig(c.GammaM0, 3), sig(c.GammaM1, 3), sig(c.GammaG, 3), sig(c.GammaQ, 3), psi0Text(c))
}

// psi0Text gives the combination factors of c: "psi_0 0.7", or with
// factors by load "psi_0 of loads.snow 0.5, loads.stock 1, of the other
// loads 0.7".
func psi0Text(c *CodeCheck) string {
	if len(c.Psi0Loads) == 0 {
		return "psi_0 " + sig(c.Psi0, 2)
	}
	return psi0Loads(c.Psi0Loads) + ", of the other loads " + sig(c.Psi0, 2)
}

// psi0Loads lists the combination factors of named loads, "psi_0 of
// loads.snow 0.5, loads.stock 1", or "" when there are none.
func psi0Loads(m map[string]float64) string {
	if len(m) == 0 {
		return ""
	}
	var parts []string
	for _, k := range sortedKeys(m) {
		parts = append(parts, k+" "+sig(m[k], 2))
	}
	return "psi_0 of " + strings.Join(parts, ", ")
}
