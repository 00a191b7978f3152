package study

import (
	"fmt"
	"math"

	"strutrisk/internal/assess"
	"strutrisk/sim"
)

// Characteristic returns the characteristic value of the i-th random
// input of md.Sim and how it is taken (EN 1990:2002 4.1.2 and 4.2, from
// memory; the geometric rule is this tool's choice):
//
//   - the yield strength: its 5 % fractile (a strength);
//   - the modulus: its mean (a stiffness, EN 1990 4.2);
//   - a permanent load: its mean (EN 1990 4.1.2, small variability);
//   - a variable load: the 98 % fractile of its annual maxima. Its
//     distribution describes maxima over n years (Quantity.MaximaYears:
//     the load's own period when given and not converted, else the
//     reference period, else 1 year), with independent years, so the
//     annual maxima have the distribution F^(1/n) and the value is
//     F^-1(0.98^n). A point-in-time load has no maxima: its own 98 %
//     fractile is taken, and the basis says so;
//   - a load's companion in a Turkstra case (its value while another
//     load leads, not a maximum over any period): the combination value
//     psi_0 Q_k of the load it stands for (EN 1990 6.10 and Table A1.1),
//     Q_k that load's characteristic value as above and psi_0 that of
//     [code_check], so that its partial factor x_d / (psi_0 Q_k) compares
//     with gamma_Q as 6.10 applies it to an accompanying action;
//   - geometric inputs (length, section, K, end springs, bow,
//     eccentricity, thickness loss), the model and the effect factor:
//     their mean, the nominal value (bow and eccentricity: the mean of
//     their magnitude, as at nominal values).
func (md *Model) Characteristic(i int) assess.Characteristic {
	st := md.Study
	q := md.quantity(i)
	d := q.Dist
	switch {
	case q == st.Yield:
		return assess.Characteristic{Value: d.Quantile(0.05), Basis: "5 % fractile"}
	case q == st.Bow || q == st.Ecc:
		return assess.Characteristic{Value: meanMagnitude(d), Basis: "mean of the magnitude"}
	case st.Combination.companionOf(q) != nil:
		of := st.Combination.companionOf(q)
		qk := md.variableCharacteristic(of)
		psi := st.CodeCheck.Psi0Of(of.Path)
		return assess.Characteristic{Value: psi * qk.Value,
			Basis: fmt.Sprintf("combination value psi_0 Q_k of %s (EN 1990 6.10): psi_0 = %g (code_check.psi_0) times Q_k, its %s", of.Path, psi, qk.Basis)}
	case (md.isLoad(q) || st.bendingAction(q)) && !md.isPermanent(q):
		return md.variableCharacteristic(q)
	}
	return assess.Characteristic{Value: q.MeanValue(), Basis: "mean"}
}

// variableCharacteristic is the characteristic value of the variable load
// q: the 98 % fractile of its annual maxima (see Characteristic).
func (md *Model) variableCharacteristic(q *Quantity) assess.Characteristic {
	d := q.Dist
	n := q.MaximaYears(md.Study.ReferenceYears)
	if n == 0 {
		return assess.Characteristic{Value: d.Quantile(0.98), Basis: "98 % fractile of the point-in-time value (period = point-in-time: no annual maxima given)"}
	}
	basis := "98 % fractile of annual maxima"
	if n != 1 {
		basis += fmt.Sprintf(" (%s maxima: fractile 0.98^%g)", assess.YearsText(n), n)
	}
	return assess.Characteristic{Value: d.Quantile(math.Pow(0.98, n)), Basis: basis}
}

func (md *Model) isLoad(q *Quantity) bool {
	for _, l := range md.Study.Loads {
		if l == q {
			return true
		}
	}
	return md.Study.companion(q)
}

func (md *Model) isPermanent(q *Quantity) bool {
	for _, p := range md.Study.PermanentLoads {
		if p == q.Path {
			return true
		}
	}
	return false
}

// DesignValues returns each random input's design value at the
// reliability index beta from the FORM design point p (its alpha, EN 1990
// Annex C, C.7), its characteristic value (Characteristic) and the partial
// factor, in N, mm and MPa: a bow or eccentricity written as L/n is
// converted with the member length at the same point. Bow and
// eccentricity act by their magnitude, so theirs are magnitudes and they
// count as actions; loads and their companions are actions whatever the
// sign of alpha.
func (md *Model) DesignValues(p sim.DesignPoint, beta float64) ([]assess.DesignValue, error) {
	n := len(md.Sim.Vars)
	char := make([]assess.Characteristic, n)
	xk := make([]float64, n)
	for i := range char {
		char[i] = md.Characteristic(i)
		xk[i] = char[i].Value
	}
	dv, err := assess.DesignValues(md.Sim, p.Alpha, beta, char)
	if err != nil {
		return nil, err
	}
	xd := make([]float64, n)
	for i := range dv {
		xd[i] = dv[i].Design
	}
	st := md.Study
	for i := range dv {
		d := &dv[i]
		d.Design, d.Characteristic = md.InUnits(i, xd[i], xd), md.InUnits(i, xk[i], xk)
		if q := md.quantity(i); q == st.Bow || q == st.Ecc {
			// Either sign of a bow is as bad: a larger magnitude acts
			// against the member, whatever the sign of alpha.
			d.Design, d.Role = math.Abs(d.Design), assess.Action
		}
		if md.isLoad(md.quantity(i)) {
			// A load and its companion act on the member even where
			// alpha is 0 (a load that does not enter the governing
			// case of a combination): never a resistance.
			d.Role = assess.Action
		}
		d.Factor = assess.PartialFactor(d.Role, d.Characteristic, d.Design)
	}
	return dv, nil
}
