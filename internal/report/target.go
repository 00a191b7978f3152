package report

import (
	"fmt"
	"strings"
)

// TargetCheck details how a result compares with the target reliability
// index: the verdict, how many evaluations would decide an undecided one,
// and the margin: the reserve factor (Document.ReserveFactor) confirmed by
// sampling and the largest added load.
type TargetCheck struct {
	// Beta is the target reliability index, Pf = Phi(-Beta).
	Beta float64 `json:"beta"`
	Pf   float64 `json:"pf"`
	// Source says where Beta came from: "target.beta as given", or the
	// table (EN 1990 Annex B, ISO 2394) and the conversion to the
	// reference period.
	Source string `json:"source,omitempty"`
	// ReferencePeriod is the reference period ("50 years", or the study's
	// free text); ReferenceYears is it in years, absent when the study
	// gives none or free text.
	ReferencePeriod string   `json:"reference_period,omitempty"`
	ReferenceYears  *float64 `json:"reference_period_years,omitempty"`
	// Verdict is "met", "not met" or "undecided" (the interval of beta
	// straddles the target); empty without a sampling result.
	Verdict string `json:"verdict,omitempty"`
	// Reason says why the verdict is "undecided": the interval straddles
	// the target, or the estimate cannot be trusted (Document.Status).
	Reason string `json:"reason,omitempty"`
	// SamplesToDecide estimates, for an undecided verdict, the
	// evaluations whose interval would clear the target at the present
	// estimate: n (CoV / CoV needed)^2.
	SamplesToDecide *float64 `json:"samples_to_decide,omitempty"`
	// ReserveOn is "variable" or "all"; ReserveLoads lists the loads the
	// reserve factor multiplies.
	ReserveOn    string   `json:"reserve_on,omitempty"`
	ReserveLoads []string `json:"reserve_loads,omitempty"`
	// ReserveFORMFactor is the factor at which the FORM index equals the
	// target; Document.ReserveFactor is that factor corrected for the
	// difference between FORM and sampling. ReserveFORMBeta is the FORM
	// index at the reserve factor, Confirmation the sampling run there.
	ReserveFORMFactor *float64      `json:"reserve_factor_form,omitempty"`
	ReserveFORMBeta   *float64      `json:"reserve_form_beta,omitempty"`
	Confirmation      *Confirmation `json:"confirmation,omitempty"`
	// LargestAddedLoad is the deterministic axial load (N) that can be
	// added to the study's loads with the FORM index at the target;
	// negative: the load to take away to reach it.
	LargestAddedLoad *float64 `json:"largest_added_load,omitempty"`
	// Notes say what could not be found and why.
	Notes []string `json:"notes,omitempty"`
}

// Confirmation is a sampling run of the study with the reserve loads
// multiplied by the reserve factor.
type Confirmation struct {
	// Confirmed is true only when the run can be trusted, rests on enough
	// failures, and its interval of beta holds the target; otherwise the
	// notes of the target say what the run found.
	Confirmed bool `json:"confirmed"`
	// Status is the trust status of the run (see Document.Status).
	Status      string     `json:"status,omitempty"`
	Method      string     `json:"method"`
	Evaluations int64      `json:"evaluations"`
	Pf          float64    `json:"pf"`
	PfCI        [2]float64 `json:"pf_ci"`
	Beta        Index      `json:"beta"`
	BetaCI      [2]Index   `json:"beta_ci"`
}

// Measurement is an input updated from test results (Bayes' rule,
// conjugate normal model of the logarithm).
type Measurement struct {
	Variable string `json:"variable"`
	Unit     string `json:"unit"`
	// N is the number of test results; Variance is "known" (a known
	// coefficient of variation) or "unknown".
	N          int     `json:"n"`
	Variance   string  `json:"variance"`
	PriorTests float64 `json:"prior_tests"`
	PriorDoF   float64 `json:"prior_dof"`
	// Prior describes the distribution written in the study, Updated the
	// predictive distribution used in the run.
	Prior   Described `json:"prior"`
	Updated Described `json:"updated"`
}

// Described is a distribution by its mean, coefficient of variation and
// 5 % fractile. For an updated distribution with unknown variance (a
// log-Student-t, which has no finite moments) Mean and CoV are those of
// the lognormal with the same log-mean and log-scale; P05 is the
// predictive fractile, the characteristic value of EN 1990:2002 Annex D,
// D.7.
type Described struct {
	Dist string  `json:"dist"`
	Mean float64 `json:"mean"`
	CoV  float64 `json:"cov"`
	P05  float64 `json:"p05"`
	// DoF is the degrees of freedom of a log-Student-t (0 otherwise).
	DoF float64 `json:"dof,omitempty"`
}

// targetRows formats the target check for reading.
func targetRows(d *Document) []KV {
	t := d.Target
	if t == nil {
		return nil
	}
	f2 := func(x float64) string { return fixed(x, 2) }
	rows := []KV{{"target β", f2(t.Beta) + " (pf " + prob(t.Pf) + ")"}}
	if t.Source != "" {
		rows = append(rows, KV{"target from", t.Source})
	}
	if t.ReferencePeriod != "" {
		rows = append(rows, KV{"reference period", t.ReferencePeriod})
	}
	if t.Verdict != "" {
		s := t.Verdict
		if t.Verdict == "undecided" {
			s = "undecided at this sample size"
			if d.Trusted != nil && !*d.Trusted && t.Reason != "" {
				s = "undecided (" + t.Reason + ")"
			}
			if t.SamplesToDecide != nil {
				s += fmt.Sprintf("; about %s evaluations would decide it", thousands(int64(*t.SamplesToDecide)))
			}
		}
		rows = append(rows, KV{"verdict", s})
	}
	if d.ReserveFactor != nil {
		on := "the variable loads"
		if t.ReserveOn == "all" {
			on = "all loads"
		}
		s := f2(*d.ReserveFactor) + " on " + on
		if len(t.ReserveLoads) > 0 {
			s += " (" + strings.Join(t.ReserveLoads, ", ") + ")"
		}
		rows = append(rows, KV{"reserve factor (β = target)", s})
		if t.ReserveFORMFactor != nil {
			rows = append(rows, KV{"reserve factor by FORM alone", f2(*t.ReserveFORMFactor)})
		}
		if c := t.Confirmation; c != nil && c.Method != "form" {
			label := "confirmed by " + c.Method
			if !c.Confirmed {
				label = "not confirmed by " + c.Method
			}
			rows = append(rows, KV{label, "β " + BetaText(float64(c.Beta)) + " (95% interval " + betaIntervalText(c.BetaCI[:]) + "), " + thousands(c.Evaluations) + " evaluations"})
		}
	}
	if t.LargestAddedLoad != nil {
		a := *t.LargestAddedLoad
		label := "largest added load (deterministic, β = target)"
		if a < 0 {
			label = "load to take away to reach the target"
			a = -a
		}
		rows = append(rows, KV{label, kN(a)})
	}
	for _, n := range t.Notes {
		rows = append(rows, KV{"note", n})
	}
	return rows
}

// measuredRow is one update for reading.
type measuredRow struct {
	Variable, N, Variance, PriorMean, PriorCoV, PriorP05, Mean, CoV, P05 string
}

// measuredRows formats the updates for reading.
func measuredRows(d *Document) []measuredRow {
	var rows []measuredRow
	for _, m := range d.Measurements {
		w := func(x float64) string { return withUnit(x, m.Unit) }
		cov := func(x float64) string {
			if x == 0 {
				return notAvailable
			}
			return fixed(x, 3)
		}
		v := m.Variance + " variance"
		if m.Updated.DoF > 0 {
			v += fmt.Sprintf(", ν″ = %g", m.Updated.DoF)
		}
		rows = append(rows, measuredRow{m.Variable, fmt.Sprint(m.N), v,
			w(m.Prior.Mean), cov(m.Prior.CoV), w(m.Prior.P05), w(m.Updated.Mean), cov(m.Updated.CoV), w(m.Updated.P05)})
	}
	return rows
}
