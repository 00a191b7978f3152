package analysis

import (
	"fmt"
	"strings"

	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// loadPeriodsDoc lists the loads that give a period, with their
// conversion to the reference period (study/period.go).
func loadPeriodsDoc(st *study.Study) []report.LoadPeriod {
	var out []report.LoadPeriod
	for _, q := range st.Loads {
		if q.Period == "" || !q.Random() {
			continue
		}
		lp := report.LoadPeriod{Load: q.Path, Period: q.Period, PeriodYears: q.PeriodYears,
			Written: q.Dist.String(), Mean: q.Dist.Mean(), SD: q.Dist.StdDev()}
		if q.MaximaN > 0 {
			lp.Written, lp.Converted = q.Written.String(), q.Dist.String()
			lp.ReferenceYears, lp.N = st.ReferenceYears, q.MaximaN
			lp.Method = "F^n"
			if _, ok := q.Dist.(sim.Gumbel); ok {
				lp.Method = "gumbel max-stability"
			}
		}
		out = append(out, lp)
	}
	return out
}

// loadPeriodText shows in check what each load's distribution describes
// and its conversion (forces in kN).
func loadPeriodText(st *study.Study) string {
	lps := loadPeriodsDoc(st)
	if len(lps) == 0 {
		return ""
	}
	var b strings.Builder
	b.WriteString("\nLoads in time (distributions in N):\n")
	for _, lp := range lps {
		switch {
		case lp.Period == study.PointInTime && lp.N > 0:
			fmt.Fprintf(&b, "  %s: one pulse (point-in-time), %s\n    %.4g repetitions in the reference period, their maximum (%s): %s, mean %.1f kN, sd %.1f kN\n",
				lp.Load, lp.Written, lp.N, lp.Method, lp.Converted, lp.Mean/1e3, lp.SD/1e3)
		case lp.Period == study.PointInTime:
			fmt.Fprintf(&b, "  %s: point-in-time value, %s\n", lp.Load, lp.Written)
		case lp.N > 0:
			fmt.Fprintf(&b, "  %s: maxima over %s, %s\n    to maxima over the reference period (n = %.4g, %s): %s, mean %.1f kN, sd %.1f kN\n",
				lp.Load, lp.Period, lp.Written, lp.N, lp.Method, lp.Converted, lp.Mean/1e3, lp.SD/1e3)
		default:
			fmt.Fprintf(&b, "  %s: maxima over %s, %s (not converted)\n", lp.Load, lp.Period, lp.Written)
		}
	}
	return b.String()
}
