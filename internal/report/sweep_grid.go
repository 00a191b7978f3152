package report

import (
	"fmt"
	"math"
	"strings"

	"strutrisk/sim"
)

// manyKeys tells whether c sweeps several keys ([[sweep.axis]]).
func (c *CaseTable) manyKeys() bool {
	return c != nil && len(c.Keys) > 1 && len(c.Points) > 0
}

// seriesName is the name of row s of c.Grid: the study first, then each
// variant.
func (c *CaseTable) seriesName(s int) string {
	if s < len(c.Names) && c.Names[s] != "" {
		return c.Names[s]
	}
	if s == 0 {
		if c.StudyName != "" {
			return "study (" + c.StudyName + ")"
		}
		return "study"
	}
	return fmt.Sprintf("variant %d", s)
}

// pointName writes the values of a swept point of several keys, in the
// order of the keys: "3000, 0.002".
func pointName(values []float64) string {
	parts := make([]string, len(values))
	for i, x := range values {
		parts[i] = sig(x, 4)
	}
	return strings.Join(parts, ", ")
}

// gridCasesTable tabulates every case of a sweep of several keys: one row
// per swept point with each key's value, the study's nominal relative
// slenderness when the sweep changes it, then β and its 95% interval of
// the study and of each variant. Nil for other sweeps.
func gridCasesTable(b *Bundle) *table {
	c := b.Cases
	if !c.manyKeys() {
		return nil
	}
	t := &table{Head: append([]string(nil), c.Keys...)}
	lam := c.Lambda != nil
	if lam {
		t.Head = append(t.Head, "relative slenderness λ ("+b.SweepLambdaAxis+" axis, –)")
	}
	for s := range c.Grid {
		t.Head = append(t.Head, c.seriesName(s)+": β (–)")
	}
	for i, values := range c.Points {
		var row []string
		for _, x := range values {
			row = append(row, sig(x, 4))
		}
		if lam {
			row = append(row, fixed(c.Lambda[i], 3))
		}
		for s := range c.Grid {
			p := c.Grid[s][i]
			if p == nil {
				row = append(row, notAvailable)
				continue
			}
			// The upper pf gives the lower β.
			ci := Indices(sim.BetaFromPf(p.PfCI[1]), sim.BetaFromPf(p.PfCI[0]))
			cell := caseBeta(p) + " (" + betaIntervalText(ci) + ")"
			if p.Doubtful {
				cell += " " + untrustedMark
			}
			row = append(row, cell)
		}
		t.Rows = append(t.Rows, row)
	}
	return t
}

// gridText is the summary's table of a sweep of several keys: a row per
// swept point, each key's value, then beta of the study (with pf when it
// is alone) and of each variant.
func gridText(b *Bundle, beta func(*Point) string) string {
	c := b.Cases
	var w strings.Builder
	summaryLine(&w, "sweep", fmt.Sprintf("beta at %d points of %s", len(c.Points), strings.Join(c.Keys, " and ")))
	showLam := c.Lambda != nil
	if showLam {
		summaryLine(&w, "", "(rel.sl.: the study's nominal relative slenderness, "+b.SweepLambdaAxis+" axis)")
	}
	if len(c.Grid) > 1 {
		for s := range c.Grid {
			fmt.Fprintf(&w, "    (%d) %s\n", s+1, c.seriesName(s))
		}
	}
	for a, k := range c.Keys {
		fmt.Fprintf(&w, "    key %d: %s\n", a+1, k)
	}
	decs := make([]int, len(c.Keys))
	w.WriteString("   ")
	for a := range c.Keys {
		col := make([]float64, len(c.Points))
		for i, p := range c.Points {
			col[i] = p[a]
		}
		decs[a] = sweepDecimals(col)
		fmt.Fprintf(&w, " %12s", fmt.Sprintf("key %d", a+1))
	}
	if showLam {
		fmt.Fprintf(&w, " %8s", "rel.sl.")
	}
	for s := range c.Grid {
		if len(c.Grid) > 1 {
			fmt.Fprintf(&w, " %7s", fmt.Sprintf("(%d)", s+1))
		} else {
			fmt.Fprintf(&w, " %7s %10s", "beta", "pf")
		}
	}
	w.WriteString("\n")
	for i, p := range c.Points {
		w.WriteString("   ")
		for a, x := range p {
			fmt.Fprintf(&w, " %12.*f", decs[a], x)
		}
		if showLam {
			l := c.Lambda[i]
			if math.IsNaN(l) {
				fmt.Fprintf(&w, " %8s", "-")
			} else {
				fmt.Fprintf(&w, " %8.3f", l)
			}
		}
		writeCaseCells(&w, c.Grid, i, beta)
	}
	return w.String()
}

// pointOf is the values of p in the order of c.Keys (c.Params names
// them).
func pointOf(c *CaseTable, p Point) []float64 {
	out := make([]float64, len(c.Params))
	for a, k := range c.Params {
		out[a] = p.Values[k]
	}
	return out
}
