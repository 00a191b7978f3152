package report

import (
	"sort"

	"strutrisk/sim"
)

// table is a table of text: column heads and rows.
type table struct {
	Head []string
	Rows [][]string
}

// sweepCurvesTable tabulates every curve of the sweep (the study and each
// variant): one row per swept value, with the study's nominal relative
// slenderness when the sweep changes it, then β and its 95% interval of
// each curve. Nil when there is no sweep.
func sweepCurvesTable(b *Bundle) *table {
	if len(b.Series) == 0 {
		return nil
	}
	label := b.SweepLabel
	if label == "" {
		label = "value"
	}
	t := &table{Head: []string{label}}
	lam := len(b.SweepLambda) > 0
	if lam {
		t.Head = append(t.Head, "relative slenderness λ ("+b.SweepLambdaAxis+" axis, –)")
	}
	seen := map[float64]bool{}
	var xs []float64
	at := make([]map[float64]Point, len(b.Series))
	for k, s := range b.Series {
		name := s.Name
		if name == "" {
			name = "study"
		}
		t.Head = append(t.Head, name+": β (–)")
		at[k] = map[float64]Point{}
		for _, p := range s.Points {
			at[k][p.Value] = p
			if !seen[p.Value] {
				seen[p.Value] = true
				xs = append(xs, p.Value)
			}
		}
	}
	sort.Float64s(xs)
	for _, x := range xs {
		row := []string{sig(x, 4)}
		if lam {
			row = append(row, fixed(b.SweepLambda[x], 3))
		}
		for k := range b.Series {
			p, ok := at[k][x]
			if !ok {
				row = append(row, notAvailable)
				continue
			}
			// The upper pf gives the lower β.
			ci := Indices(sim.BetaFromPf(p.PfCI[1]), sim.BetaFromPf(p.PfCI[0]))
			row = append(row, BetaText(float64(p.Beta))+" ("+betaIntervalText(ci)+")")
		}
		t.Rows = append(t.Rows, row)
	}
	return t
}
