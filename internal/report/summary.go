package report

import (
	"fmt"
	"strings"
)

// SummaryText returns the concise text a person reads in a terminal (and
// in summary.txt): the nominal capacity, the failure probability and
// reliability index with their intervals, the target and whether it is met
// ("undecided at this sample size" when the interval of beta straddles the
// target), the reserve factor when there is one, the method and its
// evaluations, the three most influential inputs (RankInputs) and what
// each ranking answers (RankingNote), the warnings and the
// caution. Numbers that are missing or not finite are written as "n/a".
//
// (It is not named Summary because Summary is the Document's type for a
// sampled distribution.)
func SummaryText(b *Bundle) string {
	var w strings.Builder
	d := doc(b)
	title := d.Title
	if title == "" {
		title = "strutrisk study"
	}
	fmt.Fprintln(&w, title)
	line := func(label, format string, args ...any) {
		fmt.Fprintf(&w, "  %-24s %s\n", label, fmt.Sprintf(format, args...))
	}
	f2 := func(x float64) string { return fixed(x, 2) }
	for _, r := range RecordRows(d.Record) {
		line(r.Key, "%s", r.Value)
	}
	if n := d.Nominal; n != nil {
		line("nominal capacity", "%s (%s axis, K = %s, relative slenderness %s)", kN(n.Capacity), n.Axis, fixed(n.K, 3), fixed(n.RelativeSlenderness, 3))
	}
	if d.Pf != nil {
		s := prob(*d.Pf)
		if len(d.PfCI) == 2 && sampled(&d) {
			s += "  (95% interval " + intervalText(d.PfCI, prob) + ")"
		}
		if d.PfCoV != nil && sampled(&d) {
			s += ", CoV " + percent(*d.PfCoV)
		}
		line("probability of failure", "%s", s)
	}
	if d.Beta != nil {
		s := BetaText(float64(*d.Beta))
		if len(d.BetaCI) == 2 && sampled(&d) {
			s += "  (95% interval " + betaIntervalText(d.BetaCI) + ")"
		}
		line("reliability index beta", "%s", s)
	}
	if v := targetVerdict(&d); v != noTarget {
		line("target beta", "%s: %s", f2(*d.TargetBeta), verdictText(&d, v))
		if t := d.Target; t != nil && t.Source != "" {
			line("", "from %s", t.Source)
		}
		if t := d.Target; v == undecided && t != nil && t.SamplesToDecide != nil {
			line("", "about %s evaluations would decide it", thousands(int64(*t.SamplesToDecide)))
		}
	}
	for i, l := range WrapText(CodeCheckLine(d.CodeCheck), 72) {
		label := ""
		if i == 0 {
			label = "code check"
		}
		line(label, "%s", l)
	}
	for i, l := range WrapText(CombinationLine(&d), 72) {
		label := ""
		if i == 0 {
			label = "load combination"
		}
		line(label, "%s", l)
	}
	if d.ReserveFactor != nil {
		line("reserve factor", "%s (load factor at which the target is just met)", f2(*d.ReserveFactor))
	}
	for i, l := range WrapText(plainGreek.Replace(LifeVerdict(&d)), 72) {
		label := ""
		if i == 0 {
			label = "remaining life"
		}
		line(label, "%s", l)
	}
	if d.Method != "" {
		s := d.Method
		if d.Evaluations != nil {
			s += ", " + thousands(*d.Evaluations) + " evaluations"
		}
		if d.Seed != nil {
			s += fmt.Sprintf(", seed %d", *d.Seed)
		}
		line("method", "%s", s)
	}
	if r := RankInputs(&d, 3); len(r.Inputs) > 0 {
		line("most influential", "%s", plainGreek.Replace(r.Text()))
		for i, l := range WrapText(plainGreek.Replace(RankingNote(&d)), 72) {
			label := ""
			if i == 0 {
				label = "rankings"
			}
			line(label, "%s", l)
		}
	}
	if rows, beta, _ := designTable(b, d.FORM); len(rows) > 0 {
		line("design values", "at beta %s (FORM, EN 1990 Annex C): characteristic -> design, partial factor", beta)
		for _, r := range rows {
			line("", "%s (%s): %s (%s) -> %s, gamma %s", r.Variable, r.Role, r.Characteristic, r.Basis, r.Design, r.Factor)
		}
	}
	for _, warn := range d.Warnings {
		line("warning", "%s", warn)
	}
	line("caution", "%s", Caution)
	return w.String()
}

// doc returns the bundle's document, or an empty one.
func doc(b *Bundle) Document {
	if b == nil || b.Doc == nil {
		return Document{}
	}
	return *b.Doc
}
