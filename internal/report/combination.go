package report

import (
	"fmt"
	"strings"
)

// Combination says how the study's random variable loads combine, when
// two or more do.
type Combination struct {
	// Rule is the combination rule, "turkstra" or
	// "ferry-borges-castanheta".
	Rule string `json:"rule"`
	// Variable, Mean and SD are, for ferry-borges-castanheta, the one
	// variable that replaces the loads (the maximum over the reference
	// period of the sum of their pulses), its mean and sd (N).
	Variable string   `json:"variable,omitempty"`
	Mean     *float64 `json:"mean,omitempty"`
	SD       *float64 `json:"sd,omitempty"`
	// CaseMethod is how each case's beta was found: "form" (the first-
	// order index of the case alone).
	CaseMethod string `json:"case_method,omitempty"`
	// SeriesBeta and SeriesPf are the first-order series system of the
	// cases (their FORM indices combined with the correlation of their
	// design directions): a check on the union the run sampled, whose pf
	// and beta are the document's own. Absent when a case's FORM failed.
	SeriesBeta *Index   `json:"series_beta,omitempty"`
	SeriesPf   *float64 `json:"series_pf,omitempty"`
	// Governing is the case of the lowest beta, absent before a run.
	Governing string `json:"governing,omitempty"`
}

// CombinationCase is one case of the load combination.
type CombinationCase struct {
	// Case is the case's name, that of its leading load; Leading the
	// leading load's path (at its maximum over the reference period).
	Case    string `json:"case"`
	Leading string `json:"leading"`
	// Companions are the paths of the other loads' values in this case.
	Companions []string `json:"companions"`
	// Beta and Pf are the case's own reliability index and failure
	// probability (by Combination.CaseMethod), absent before a run or
	// when its analysis failed; Converged says whether it converged.
	Beta      *Index   `json:"beta,omitempty"`
	Pf        *float64 `json:"pf,omitempty"`
	Converged *bool    `json:"converged,omitempty"`
}

// CombinationLine is the summary's line on the load combination: the
// governing case and each case's beta.
func CombinationLine(d *Document) string {
	c := d.Combination
	if c != nil && c.Variable != "" && c.Mean != nil && c.SD != nil {
		return fmt.Sprintf("%s: the variable loads are pulse processes, combined into %s, the maximum of their sum over the reference period (mean %s, sd %s).",
			c.Rule, c.Variable, kN(*c.Mean), kN(*c.SD))
	}
	if c == nil || len(d.Combinations) == 0 {
		return ""
	}
	var parts []string
	for _, cs := range d.Combinations {
		s := cs.Case + " leading"
		if cs.Beta != nil {
			s += " beta " + BetaText(float64(*cs.Beta))
			if cs.Converged != nil && !*cs.Converged {
				s += " (not converged)"
			}
		}
		parts = append(parts, s)
	}
	s := fmt.Sprintf("%s's rule, %d cases, the member fails when any fails (the result above is of their union): %s", c.Rule, len(d.Combinations), strings.Join(parts, "; "))
	if c.CaseMethod != "" {
		s += " (" + strings.ToUpper(c.CaseMethod) + " per case)"
	}
	if c.Governing != "" {
		s += "; " + c.Governing + " governs"
	}
	if c.SeriesBeta != nil {
		s += "; first-order series system beta " + BetaText(float64(*c.SeriesBeta))
	}
	return s + "."
}

// CombinationRows are the rows of the combination table of the HTML and
// Markdown reports.
func CombinationRows(d *Document) []KV {
	c := d.Combination
	if c == nil {
		return nil
	}
	if c.Variable != "" {
		return []KV{{"rule", CombinationLine(d)}}
	}
	rows := []KV{{"rule", c.Rule + "'s rule: one case per variable load at its reference-period maximum, the others at their companions; the member fails when any case fails, so the reliability index of the result is that of the union of the cases"}}
	for _, cs := range d.Combinations {
		v := cs.Leading + " at its maximum; " + strings.Join(cs.Companions, ", ")
		if cs.Beta != nil {
			v += "; beta " + BetaText(float64(*cs.Beta))
			if cs.Pf != nil {
				v += ", pf " + prob(*cs.Pf)
			}
			if cs.Converged != nil && !*cs.Converged {
				v += " (FORM did not converge: indicative)"
			}
		}
		if cs.Case == c.Governing {
			v += " (governs)"
		}
		rows = append(rows, KV{"case " + cs.Case, v})
	}
	if c.CaseMethod != "" {
		rows = append(rows, KV{"beta of a case", "by " + strings.ToUpper(c.CaseMethod) + " on the case alone"})
	}
	if c.SeriesBeta != nil && c.SeriesPf != nil {
		rows = append(rows, KV{"first-order series system", "beta " + BetaText(float64(*c.SeriesBeta)) + ", pf " + prob(*c.SeriesPf) + " (the cases' FORM indices with the correlation of their design directions: a check on the sampled union)"})
	}
	return rows
}
