package report

import (
	"fmt"
	"math"
	"strings"
)

// SummaryText returns the one text of a run: what strutrisk run prints on
// the terminal and writes to summary.txt, byte for byte. It gives the
// nominal capacity, the failure probability and reliability index with
// their intervals, the target and whether it is met ("undecided" when the
// interval of beta straddles the target or the estimate is not trusted),
// the reserve factor and the load to add or take away, the code check,
// the method and its evaluations, the three most influential inputs
// (RankInputs) and what each ranking answers (RankingNote), the design
// values, the remaining life, the cases of a sweep and variants, the
// inventory (its system and the members of concern), the warnings, the path of the HTML report (Bundle.ReportPath) and the
// caution.
//
// (It is not named Summary because Summary is the Document's type for a
// sampled distribution.)
func SummaryText(b *Bundle) string {
	var w strings.Builder
	d := doc(b)
	if b == nil {
		b = &Bundle{}
	}
	title := d.Title
	if title == "" {
		title = "strutrisk study"
	}
	fmt.Fprintln(&w, title)
	for _, kv := range RecordRows(d.Record) {
		summaryLine(&w, kv.Key, kv.Value)
	}
	if n := d.Nominal; n != nil {
		label := "nominal capacity"
		if n.LoadFactor > 0 {
			label = "nominal load factor"
		}
		summaryLine(&w, label, nominalText(b, n))
	}
	w.WriteString(estimateText(&d))
	w.WriteString(targetText(&d))
	w.WriteString(inventoryTargetText(&d)) // inventory_verdict.go
	summaryWrapped(&w, "code check", CodeCheckLine(d.CodeCheck))
	summaryWrapped(&w, "load combination", CombinationLine(&d))
	summaryWrapped(&w, "remaining life", plainGreek.Replace(LifeVerdict(&d)))
	summaryWrapped(&w, "calibration", CalibrationLine(d.Calibration))
	w.WriteString(calibrationCasesText(d.Calibration))
	w.WriteString(methodText(&d, b.MethodReason))
	if rk := RankInputs(&d, 3); len(rk.Inputs) > 0 {
		summaryLine(&w, "most influential", plainGreek.Replace(rk.Text()))
		summaryWrapped(&w, "rankings", plainGreek.Replace(RankingNote(&d)))
	}
	if rows, beta, _ := designTable(b, d.FORM); len(rows) > 0 {
		summaryLine(&w, "design values", "at beta "+beta+" (FORM, EN 1990 Annex C): characteristic -> design, partial factor")
		for _, r := range rows {
			summaryLine(&w, "", fmt.Sprintf("%s (%s): %s (%s) -> %s, gamma %s", r.Variable, r.Role, r.Characteristic, r.Basis, r.Design, r.Factor))
		}
	}
	w.WriteString(casesText(b, &d))
	w.WriteString(inventoryText(&d))
	for _, x := range d.Warnings {
		summaryLine(&w, "warning", x)
	}
	if b.ReportPath != "" {
		summaryLine(&w, "report", b.ReportPath+" in the results folder")
	}
	fmt.Fprintf(&w, "\n%s\n", CautionText)
	return w.String()
}

// nominalText is the nominal capacity, what governs it, and the demand
// and utilisation at the mean loads when the bundle has them.
func nominalText(b *Bundle, n *Nominal) string {
	governs := b.Governs
	if governs == "" && n.Axis != "" {
		governs = "the " + n.Axis + " axis"
	}
	if n.LoadFactor > 0 {
		// A study with [bending]: the capacity is a factor on every action.
		return fmt.Sprintf("%s on every action (%s), axial demand at mean loads %s kN", fixed(n.LoadFactor, 3), governs, fixed(b.NominalDemand/1e3, 1))
	}
	s := fixed(n.Capacity/1e3, 1) + " kN"
	if governs != "" {
		s += " (" + governs + ")"
	}
	if b.NominalDemand != 0 {
		s += fmt.Sprintf(", demand at mean loads %s kN, utilisation %s", fixed(b.NominalDemand/1e3, 1), fixed(b.Utilisation, 2))
	}
	return s
}

// summaryWidth is the width of the summary's labels, summaryWrap that of
// its wrapped texts.
const (
	summaryWidth = 18
	summaryWrap  = 76
)

// summaryLine writes one labelled line of the summary.
func summaryLine(w *strings.Builder, label, text string) {
	fmt.Fprintf(w, "  %-*s %s\n", summaryWidth, label, text)
}

// summaryWrapped writes text wrapped under its label; nothing when empty.
func summaryWrapped(w *strings.Builder, label, text string) {
	for i, l := range WrapText(text, summaryWrap) {
		if i > 0 {
			label = ""
		}
		summaryLine(w, label, l)
	}
}

// estimateText is the failure probability and the reliability index with
// their intervals (none for FORM, an approximation), and what an
// unbounded index means.
func estimateText(d *Document) string {
	if d.Method == "" {
		return ""
	}
	var w strings.Builder
	pf, beta := math.NaN(), math.NaN()
	if d.Pf != nil {
		pf = *d.Pf
	}
	if d.Beta != nil {
		beta = float64(*d.Beta)
	}
	if !sampled(d) || len(d.PfCI) != 2 || len(d.BetaCI) != 2 {
		// A first-order approximation: no sampling, so no interval.
		summaryLine(&w, "failure prob. pf", PfText(pf)+"   (first-order approximation: no sampling interval)")
		summaryLine(&w, "reliability beta", BetaText(beta))
	} else {
		summaryLine(&w, "failure prob. pf", fmt.Sprintf("%s   95 %% interval [%s, %s]", PfText(pf), PfText(d.PfCI[0]), PfText(d.PfCI[1])))
		summaryLine(&w, "reliability beta", fmt.Sprintf("%s   95 %% interval [%s, %s]", BetaText(beta), BetaText(float64(d.BetaCI[0])), BetaText(float64(d.BetaCI[1]))))
	}
	var n int64
	if d.Evaluations != nil {
		n = *d.Evaluations
	}
	// Never a bare -inf or inf: say what it means (the warnings give the
	// bounds).
	switch {
	case math.IsInf(beta, -1):
		summaryLine(&w, "", fmt.Sprintf("(-inf: every one of the %d evaluations failed; not a result to read before the inputs are checked: see the warnings)", n))
	case math.IsInf(beta, 1):
		lo := math.Inf(1)
		if len(d.BetaCI) == 2 {
			lo = float64(d.BetaCI[0])
		}
		summaryLine(&w, "", fmt.Sprintf("(inf: none of the %d evaluations failed; beta is only known to be above %s: see the warnings)", n, BetaText(lo)))
	}
	return w.String()
}

// methodText is the method, its evaluations and the CoV of its estimate,
// with why the method was chosen.
func methodText(d *Document, reason string) string {
	if d.Method == "" {
		return ""
	}
	var w strings.Builder
	var n int64
	if d.Evaluations != nil {
		n = *d.Evaluations
	}
	s := fmt.Sprintf("%s, %d evaluations", d.Method, n)
	if sampled(d) {
		switch {
		case d.PfCoV != nil:
			s += fmt.Sprintf(", cov of pf %.3f", *d.PfCoV)
		case d.Pf != nil && *d.Pf == 0:
			s += ", cov of pf unbounded (no failure seen)"
		}
	}
	if d.Seed != nil {
		s += fmt.Sprintf(", seed %d", *d.Seed)
	}
	summaryLine(&w, "method", s)
	if reason != "" {
		summaryLine(&w, "", "("+reason+")")
	}
	return w.String()
}

// PfText writes a probability of failure as every text of a run does
// (summary, case tables, reports): scientific with three significant
// digits below 0.01 ("1.24e-4"), else three significant digits; "n/a"
// when missing.
func PfText(p float64) string { return prob(p) }

// doc returns the bundle's document, or an empty one.
func doc(b *Bundle) Document {
	if b == nil || b.Doc == nil {
		return Document{}
	}
	return *b.Doc
}
