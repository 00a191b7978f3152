package report

import (
	"fmt"
	"strings"
)

// targetText is the target's part of the summary: the verdict, the
// reserve factor and its confirmation by sampling, the load to add or
// take away, and the notes of the reserve search.
func targetText(d *Document) string {
	v := TargetVerdict(d)
	if v == NoTarget {
		return ""
	}
	var w strings.Builder
	t := d.Target
	s := fmt.Sprintf("%.2f", *d.TargetBeta)
	if t != nil {
		s += " (pf " + PfText(t.Pf)
		if t.ReferencePeriod != "" {
			s += ", " + t.ReferencePeriod
		}
		s += ")"
	}
	s += ": " + verdictText(d, v)
	if v == Undecided && t != nil && t.SamplesToDecide != nil {
		summaryLine(&w, "target beta", s+";")
		summaryLine(&w, "", fmt.Sprintf("about %.3g evaluations would decide it", *t.SamplesToDecide))
	} else {
		summaryLine(&w, "target beta", s)
	}
	if t == nil {
		return w.String() + reserveText(d)
	}
	if t.Source != "" && !strings.HasPrefix(t.Source, "target.beta") {
		summaryLine(&w, "", "(target from "+t.Source+")")
	}
	w.WriteString(reserveText(d))
	for _, n := range t.Notes {
		summaryLine(&w, "note", n)
	}
	return w.String()
}

// reserveText is the reserve factor with its sampling confirmation and
// the largest load to add (or the load to take away).
func reserveText(d *Document) string {
	t := d.Target
	var w strings.Builder
	if d.ReserveFactor != nil && t == nil {
		summaryLine(&w, "reserve factor", factorText(*d.ReserveFactor)+" (load factor at which the target is just met)")
	}
	if t == nil {
		return w.String()
	}
	if d.ReserveFactor != nil && t.ReserveFORMBeta != nil {
		on := "the variable loads"
		if t.ReserveOn == "all" {
			on = "all loads"
		}
		if d.Nominal != nil && d.Nominal.LoadFactor > 0 {
			on += " and the bending" // a study with [bending]: study.ReserveActions
		}
		summaryLine(&w, "reserve factor", fmt.Sprintf("%s on %s (FORM beta %s there)", factorText(*d.ReserveFactor), on, BetaText(*t.ReserveFORMBeta)))
		if c := t.Confirmation; c != nil && c.Method != "form" {
			how := "confirmed by"
			if !c.Confirmed {
				how = "not confirmed by"
			}
			summaryLine(&w, "", fmt.Sprintf("%s %s: beta %s, 95 %% interval [%s, %s], %d evaluations",
				how, c.Method, BetaText(float64(c.Beta)), BetaText(float64(c.BetaCI[0])), BetaText(float64(c.BetaCI[1])), c.Evaluations))
		}
	}
	if a := t.LargestAddedLoad; a != nil {
		if *a >= 0 {
			summaryLine(&w, "largest added load", fmt.Sprintf("%.1f kN (a deterministic load added to the others that brings beta to the target)", *a/1e3))
		} else {
			summaryLine(&w, "load to take away", fmt.Sprintf("%.1f kN (brings beta to the target)", -*a/1e3))
		}
	}
	return w.String()
}

// factorText writes a reserve factor wherever a run shows one: three
// decimals.
func factorText(x float64) string { return fixed(x, 3) }
