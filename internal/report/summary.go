package report

import (
	"fmt"
	"strings"
)

// SummaryText returns the concise text a person reads in a terminal (and in
// summary.txt): the failure probability and reliability index with their
// intervals, the target and whether it is met, the method and its
// evaluations, the three most influential inputs, the reserve factor when
// there is one, the warnings and the caution. Numbers that are missing or
// not finite are written as "n/a".
func SummaryText(b *Bundle) string {
	var w strings.Builder
	d := doc(b)
	title := d.Title
	if title == "" {
		title = "strutrisk study"
	}
	fmt.Fprintln(&w, title)
	if d.Nominal != nil {
		n := d.Nominal
		fmt.Fprintf(&w, "  nominal capacity      %s (%s axis, K = %s, relative slenderness %s)\n",
			kN(n.Capacity), n.Axis, fixed(n.K, 3), fixed(n.RelativeSlenderness, 3))
	}
	if d.Pf != nil {
		conf := "95%"
		fmt.Fprintf(&w, "  probability of failure %s  (%s interval %s)", prob(*d.Pf), conf, intervalText(d.PfCI, prob))
		if d.PfCoV != nil {
			fmt.Fprintf(&w, ", CoV %s", percent(*d.PfCoV))
		}
		fmt.Fprintln(&w)
	}
	if d.Beta != nil {
		fmt.Fprintf(&w, "  reliability index      %s  (95%% interval %s)\n", fixed(*d.Beta, 2), intervalText(d.BetaCI, func(x float64) string { return fixed(x, 2) }))
	}
	if v := targetVerdict(&d); v != noTarget {
		fmt.Fprintf(&w, "  target beta %s: %s\n", fixed(*d.TargetBeta, 2), verdictText(v))
	}
	if d.ReserveFactor != nil {
		fmt.Fprintf(&w, "  reserve factor         %s (load factor at which the target is just met)\n", fixed(*d.ReserveFactor, 2))
	}
	if d.Method != "" {
		fmt.Fprintf(&w, "  method                 %s", d.Method)
		if d.Evaluations != nil {
			fmt.Fprintf(&w, ", %s evaluations", thousands(*d.Evaluations))
		}
		if d.Seed != nil {
			fmt.Fprintf(&w, ", seed %d", *d.Seed)
		}
		fmt.Fprintln(&w)
	}
	if measure, top := topInfluences(&d, 3); len(top) > 0 {
		parts := make([]string, len(top))
		for i, t := range top {
			parts[i] = fmt.Sprintf("%s (%s)", t.Name, sig(t.Weight, 2))
		}
		fmt.Fprintf(&w, "  most influential       %s  [by %s]\n", strings.Join(parts, ", "), measure)
	}
	for _, warn := range d.Warnings {
		fmt.Fprintf(&w, "  warning: %s\n", warn)
	}
	fmt.Fprintf(&w, "  caution: %s\n", Caution)
	return w.String()
}

// doc returns the bundle's document, or an empty one.
func doc(b *Bundle) Document {
	if b == nil || b.Doc == nil {
		return Document{}
	}
	return *b.Doc
}
