package analysis

import (
	"fmt"
	"math"
	"path/filepath"
	"strings"

	"strutrisk/internal/report"
	"strutrisk/sim"
)

// Summary is the concise text of a run for the terminal and summary.txt:
// dir is the output folder and files the files written there.
func (r *Result) Summary(dir string, files []string) string {
	var w strings.Builder
	d := r.Document()
	res := r.Estimate
	fmt.Fprintf(&w, "%s\n", d.Title)
	for _, kv := range report.RecordRows(d.Record) {
		fmt.Fprintf(&w, "  %-18s %s\n", kv.Key, kv.Value)
	}
	n := r.l.Nominal
	if n.LoadFactor > 0 {
		fmt.Fprintf(&w, "  nominal load factor %.3f on every action (%s, %s), axial demand at mean loads %.1f kN\n",
			n.LoadFactor, governingText(n), n.Governs, n.Demand/1e3)
	} else {
		fmt.Fprintf(&w, "  nominal capacity   %.1f kN (%s, %s), demand at mean loads %.1f kN, utilisation %.2f\n",
			n.Capacity/1e3, governingText(n), n.Governs, n.Demand/1e3, n.Utilisation)
	}
	if res.Method == sim.FORMMethod {
		// A first-order approximation: no sampling, so no interval.
		fmt.Fprintf(&w, "  failure prob. pf   %s   (first-order approximation: no sampling interval)\n", pfText(res.Pf))
		fmt.Fprintf(&w, "  reliability beta   %s\n", betaText(res.Beta))
	} else {
		fmt.Fprintf(&w, "  failure prob. pf   %s   95 %% interval [%s, %s]\n", pfText(res.Pf), pfText(res.PfCI[0]), pfText(res.PfCI[1]))
		fmt.Fprintf(&w, "  reliability beta   %s   95 %% interval [%s, %s]\n", betaText(res.Beta), betaText(res.BetaCI[0]), betaText(res.BetaCI[1]))
	}
	switch {
	// Never a bare -inf or inf: say what it means (the warning below
	// gives the bounds).
	case math.IsInf(res.Beta, -1):
		fmt.Fprintf(&w, "                     (-inf: every one of the %d evaluations failed; not a result to read before the inputs are checked: see the warnings)\n", res.Evaluations)
	case math.IsInf(res.Beta, 1):
		fmt.Fprintf(&w, "                     (inf: none of the %d evaluations failed; beta is only known to be above %s: see the warnings)\n", res.Evaluations, betaText(res.BetaCI[0]))
	}
	w.WriteString(r.targetSummary(d))
	for i, l := range report.WrapText(report.CodeCheckLine(d.CodeCheck), 76) {
		label := ""
		if i == 0 {
			label = "code check"
		}
		fmt.Fprintf(&w, "  %-18s %s\n", label, l)
	}
	for i, l := range report.WrapText(report.CombinationLine(d), 76) {
		label := ""
		if i == 0 {
			label = "load combination"
		}
		fmt.Fprintf(&w, "  %-18s %s\n", label, l)
	}
	for i, l := range report.WrapText(report.PlainGreek(report.LifeVerdict(d)), 76) {
		label := ""
		if i == 0 {
			label = "remaining life"
		}
		fmt.Fprintf(&w, "  %-18s %s\n", label, l)
	}
	if res.Method == sim.FORMMethod {
		fmt.Fprintf(&w, "  method             %s, %d evaluations\n", res.Method, res.Evaluations)
	} else {
		cov := fmt.Sprintf("%.3f", res.PfCoV)
		if math.IsInf(res.PfCoV, 0) {
			cov = "unbounded (no failure seen)"
		}
		fmt.Fprintf(&w, "  method             %s, %d evaluations, cov of pf %s\n", res.Method, res.Evaluations, cov)
	}
	if res.Reason != "" {
		fmt.Fprintf(&w, "                     (%s)\n", res.Reason)
	}
	if rk := report.RankInputs(d, 3); len(rk.Inputs) > 0 {
		// The same ranking, measure and note as the report's (report.RankInputs).
		fmt.Fprintf(&w, "  most influential   %s\n", report.PlainGreek(rk.Text()))
		for i, l := range report.WrapText(report.PlainGreek(report.RankingNote(d)), 76) {
			label := ""
			if i == 0 {
				label = "rankings"
			}
			fmt.Fprintf(&w, "  %-18s %s\n", label, l)
		}
	}
	w.WriteString(r.cases.summary(r.l.Study, res))
	for _, x := range d.Warnings {
		fmt.Fprintf(&w, "  warning            %s\n", x)
	}
	if len(files) > 0 {
		fmt.Fprintf(&w, "  results in         %s/ (%d files: results.json, samples.csv, summary.txt, ...)\n", dir, len(files))
	}
	for _, f := range files {
		if filepath.Base(f) == "report.html" {
			fmt.Fprintf(&w, "  report             %s\n", f)
		}
	}
	fmt.Fprintf(&w, "\n%s\n", Caution)
	return w.String()
}

func pfText(p float64) string {
	if p != p {
		return "unknown"
	}
	if p == 0 {
		return "0"
	}
	return fmt.Sprintf("%.3g", p)
}

// betaText formats a reliability index for the terminal; an infinite one
// is "inf (unbounded)" or "-inf (unbounded)" (report.BetaText).
func betaText(b float64) string { return report.BetaText(b) }
