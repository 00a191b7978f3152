package analysis

import (
	"fmt"
	"strings"

	"strutrisk/internal/report"
	"strutrisk/internal/study"
)

// measurementsDoc describes the updates from measurements for the result
// document.
func measurementsDoc(st *study.Study) []report.Measurement {
	var out []report.Measurement
	for _, m := range st.Measurements {
		p, u := m.PriorSummary(), m.UpdatedSummary()
		prior := writtenName(m)
		r := report.Measurement{
			Variable: m.Path, Unit: m.Unit, N: len(m.Values), Variance: m.Variance(),
			PriorTests: m.PriorTests, PriorDoF: m.PriorDoF,
			Prior:   report.Described{Dist: prior, Mean: p.Mean, CoV: p.CoV, P05: p.P05},
			Updated: report.Described{Dist: "lognormal", Mean: u.Mean, CoV: u.CoV, P05: u.P05},
		}
		if m.Variance() == "unknown" {
			r.Updated.Dist, r.Updated.DoF = "log-Student-t", m.Posterior.Nu
		}
		out = append(out, r)
	}
	return out
}

// writtenName names the distribution the study wrote for the measured
// quantity.
func writtenName(m *study.Measurement) string {
	if m.Written == nil {
		return "fixed"
	}
	s := m.Written.String()
	if i := strings.IndexByte(s, '('); i > 0 {
		s = s[:i]
	}
	return s
}

// updates are the pictures of the updates: the written and the updated
// distribution with the test results.
func updates(st *study.Study) []report.Update {
	var out []report.Update
	for _, m := range st.Measurements {
		out = append(out, report.Update{Variable: m.Path, Unit: m.Unit, Prior: m.Written, After: m.After, Data: m.Values})
	}
	return out
}

// measureText is the table of updates in check: the distribution written
// in the study against the updated one.
func measureText(st *study.Study) string {
	if len(st.Measurements) == 0 {
		return ""
	}
	var b strings.Builder
	fmt.Fprintf(&b, "\nUpdated from measurements (Bayes, normal model of ln X; 5%% = predictive fractile, EN 1990 D.7):\n")
	fmt.Fprintf(&b, "  %-36s %4s  %-26s %-26s %s\n", "", "n", "prior mean / cov / 5%", "updated mean / cov / 5%", "spread")
	for _, m := range st.Measurements {
		p, u := m.PriorSummary(), m.UpdatedSummary()
		f := func(s study.Summary) string {
			if s.CoV == 0 {
				return fmt.Sprintf("%.4g (fixed)", s.Mean)
			}
			return fmt.Sprintf("%.4g / %.3f / %.4g", s.Mean, s.CoV, s.P05)
		}
		spread := "known cov"
		if m.Variance() == "unknown" {
			spread = fmt.Sprintf("unknown: log-Student-t, %g dof", m.Posterior.Nu)
		}
		fmt.Fprintf(&b, "  %-36s %4d  %-26s %-26s %s\n", m.Path+" ("+m.Unit+")", len(m.Values), f(p), f(u), spread)
	}
	return b.String()
}
