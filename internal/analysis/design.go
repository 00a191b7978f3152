package analysis

import (
	"fmt"
	"math"

	"strutrisk/internal/report"
)

// fillDesign writes into ff the design values, characteristic values and
// partial factors of the inputs at the target beta (FORM's own without a
// target), from the most probable design point. A design point FORM
// doubts (not converged) gives none.
func (r *Result) fillDesign(ff *report.FORM) {
	f, st := r.form, r.l.Study
	if f == nil || len(f.Points) == 0 {
		return
	}
	if !f.Converged {
		ff.DesignNote = "No design values or partial factors: the FORM design-point search did not converge, so its direction alpha is not to be trusted."
		return
	}
	p := f.Points[0]
	beta, whose := p.Beta, "FORM's own reliability index (the study has no target): these are the design point's coordinates"
	if st.HasTarget {
		beta, whose = st.Target, fmt.Sprintf("the target reliability index %.2f (%s)", st.Target, st.TargetSource)
	}
	dv, err := r.l.Model.DesignValues(p, beta)
	if err != nil {
		r.warnings = append(r.warnings, "design values: "+err.Error())
		return
	}
	ff.DesignBeta = &beta
	ff.DesignValues, ff.CharacteristicValues, ff.PartialFactors = map[string]float64{}, map[string]float64{}, map[string]float64{}
	ff.DesignRoles, ff.CharacteristicBasis = map[string]string{}, map[string]string{}
	for _, d := range dv {
		ff.DesignValues[d.Name] = d.Design
		ff.CharacteristicValues[d.Name] = d.Characteristic
		if !math.IsNaN(d.Factor) {
			ff.PartialFactors[d.Name] = d.Factor
		}
		ff.DesignRoles[d.Name] = d.Role
		ff.CharacteristicBasis[d.Name] = d.Basis
	}
	ff.DesignNote = "Design values at " + whose + ", along the FORM direction alpha of the most probable design point (EN 1990 Annex C, C.7): x_d = F^-1(Phi(-alpha beta)) for an independent input. " +
		"An input is a resistance when alpha > 0 (the margin grows with it), an action when alpha < 0; bow and eccentricity act by their magnitude; a load and its companion are actions whatever alpha. " +
		"Partial factor x_k / x_d for a resistance, x_d / x_k for an action."
	if c := st.Combination; c != nil && len(c.Cases) > 0 {
		psi := fmt.Sprintf("psi_0 = %g", st.CodeCheck.Psi0)
		if len(st.CodeCheck.Psi0By) > 0 {
			psi = "psi_0 of that load in code_check.psi_0, else " + fmt.Sprint(st.CodeCheck.Psi0)
		}
		ff.DesignNote += fmt.Sprintf(" A companion's characteristic value is the combination value psi_0 Q_k of the load it stands for (EN 1990 6.10, %s), not a fractile of its own distribution, so its partial factor compares with gamma_Q.", psi)
	}
	if len(f.Points) > 1 {
		ff.DesignNote += fmt.Sprintf(" FORM found %d design points; the values follow the most probable one only.", len(f.Points))
	}
}
