package report

import (
	"fmt"
	"math"
	"strings"
)

// CaseTable is the sweep and the variants of a run as the summary
// tabulates them.
type CaseTable struct {
	// StudyName says briefly what the study itself assumes, to tell it
	// from its variants ("perry-robertson", "curve b"...).
	StudyName string
	// Values are the swept values of a one-key sweep, in the units of the
	// document; nil with several swept keys.
	Values []float64
	// Keys name the swept keys with their units ("member.length (mm)"),
	// one per axis; Points[i][a] is axis a at swept point i.
	Keys   []string
	Params []string // the swept key paths, one per axis
	Points [][]float64
	// Lambda, when the swept values change it, is the study's nominal
	// relative slenderness at each swept point (about the axis of
	// Bundle.SweepLambdaAxis); BaseLambda is the same at the study's own
	// values (NaN when unknown).
	Lambda     []float64
	BaseLambda float64
	// Names are the names of the rows of Grid: the study's, then each
	// variant's.
	Names []string
	// Models are the capacity models of the rows of Grid, as
	// Series.Model names them (they choose the lines' styles).
	Models []string
	// Zipped is set when several keys are swept in step (combine =
	// "zip"): Points are then a list, not every combination.
	Zipped bool
	// Grid[s][i] is series s (the study first, then each variant, as
	// Bundle.Series) at swept point i; nil where the case did not run.
	Grid [][]*Point
}

// casesText is the compact table of the cases: the variants at the
// study's values, then beta (and pf) against the swept values.
func casesText(b *Bundle, d *Document) string {
	c := b.Cases
	if c == nil {
		return ""
	}
	var w strings.Builder
	infinite := false // a beta printed as inf or -inf needs its statement
	doubted := false  // a case marked ? needs its statement
	beta := func(pt *Point) string {
		s := caseBeta(pt)
		infinite = infinite || strings.Contains(s, "inf")
		if pt.Doubtful {
			s += "?"
			doubted = true
		}
		return s
	}
	if len(d.Variants) > 0 {
		w.WriteString(variantsText(c, d, beta))
	}
	switch {
	case c.manyKeys():
		w.WriteString(gridText(b, beta))
	case len(c.Values) > 0:
		w.WriteString(sweepText(b, beta))
	}
	if doubted {
		w.WriteString("    (beta followed by ?: the case's estimate is not trusted, it is no result and no verdict is drawn from it; the warnings say why)\n")
	}
	if infinite {
		w.WriteString("    (beta inf: no sample of the case failed, beta is only bounded below; -inf: every sample failed, not a result to read before the inputs are checked)\n")
	}
	return w.String()
}

// variantsText is the table of the study and its variants. A case whose
// estimate the engine does not trust is marked "not trusted (?)" and
// said below the table, with the reason: it is no result.
func variantsText(c *CaseTable, d *Document, beta func(*Point) string) string {
	var w strings.Builder
	var doubts []string
	row := func(name string, pf float64, ci [2]float64, b Index, untrusted bool, reason string) {
		pt := &Point{Pf: pf, Beta: b}
		fmt.Fprintf(&w, "    %-28s %10s  [%9s, %9s]  %6s", name, PfText(pf), PfText(ci[0]), PfText(ci[1]), beta(pt))
		if untrusted {
			w.WriteString("  " + untrustedMark)
			doubts = append(doubts, untrustedLine(name, reason))
		}
		w.WriteString("\n")
	}
	summaryLine(&w, "variants", "(same seed and blocks as the main run)")
	fmt.Fprintf(&w, "    %-28s %10s  %-22s  %6s\n", "variant", "pf", "95 % interval", "beta")
	pf, ci, b := math.NaN(), [2]float64{math.NaN(), math.NaN()}, Index(math.NaN())
	if d.Pf != nil {
		pf = *d.Pf
	}
	if len(d.PfCI) == 2 {
		ci = [2]float64{d.PfCI[0], d.PfCI[1]}
	}
	if d.Beta != nil {
		b = *d.Beta
	}
	row("study ("+c.StudyName+")", pf, ci, b, d.Trusted != nil && !*d.Trusted, d.StatusReason)
	for _, v := range d.Variants {
		row(v.Name, v.Pf, v.PfCI, v.Beta, v.Untrusted(), v.StatusReason)
	}
	for _, s := range doubts {
		w.WriteString("    " + s + "\n")
	}
	return w.String()
}

// sweepText is the table of beta (with pf for a single series) against
// the swept values, with the nominal relative slenderness when the sweep
// changes it.
func sweepText(b *Bundle, beta func(*Point) string) string {
	c := b.Cases
	var w strings.Builder
	summaryLine(&w, "sweep", "beta against "+b.SweepLabel)
	showLam := b.SweepLambda != nil
	if showLam {
		summaryLine(&w, "", "(rel.sl.: the study's nominal relative slenderness, "+b.SweepLambdaAxis+" axis)")
	}
	if len(b.Series) > 1 {
		for k, s := range b.Series {
			fmt.Fprintf(&w, "    (%d) %s\n", k+1, s.Name)
		}
	}
	fmt.Fprintf(&w, "    %12s", "value")
	dec := sweepDecimals(c.Values)
	if showLam {
		fmt.Fprintf(&w, " %8s", "rel.sl.")
	}
	for k := range c.Grid {
		if len(c.Grid) > 1 {
			fmt.Fprintf(&w, " %7s", fmt.Sprintf("(%d)", k+1))
		} else {
			fmt.Fprintf(&w, " %7s %10s", "beta", "pf")
		}
	}
	w.WriteString("\n")
	for i, x := range c.Values {
		fmt.Fprintf(&w, "    %12.*f", dec, x)
		if showLam {
			fmt.Fprintf(&w, " %8.3f", b.SweepLambda[x])
		}
		writeCaseCells(&w, c.Grid, i, beta)
	}
	return w.String()
}

// caseBeta is a case's beta as text ("inf (unbounded)" when no sample
// failed).
func caseBeta(pt *Point) string {
	if pt.Pf == 0 {
		return BetaText(math.Inf(1))
	}
	return BetaText(float64(pt.Beta))
}

// sweepDecimals is the number of decimals that gives every swept value at
// least five significant digits, at most six, so the column lines up.
func sweepDecimals(values []float64) int {
	dec := 0
	for _, x := range values {
		if a := math.Abs(x); a > 0 && !math.IsInf(a, 0) {
			dec = max(dec, 4-int(math.Floor(math.Log10(a))))
		}
	}
	return min(dec, 6)
}

// writeCaseCells ends a row of a sweep's table with point i of each
// series of grid: beta alone when there are several series, beta and pf
// when there is one, "-" where the case has no result.
func writeCaseCells(w *strings.Builder, grid [][]*Point, i int, beta func(*Point) string) {
	for s := range grid {
		pt := grid[s][i]
		switch {
		case pt == nil:
			fmt.Fprintf(w, " %7s", "-")
		case len(grid) > 1:
			fmt.Fprintf(w, " %7s", beta(pt))
		default:
			fmt.Fprintf(w, " %7s %10s", beta(pt), PfText(pt.Pf))
		}
	}
	w.WriteString("\n")
}
