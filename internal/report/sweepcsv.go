package report

import (
	"bytes"
	"encoding/csv"
	"strconv"
)

// seriesCSV writes the sweep curves of b, one row per variant and swept
// value: series, the swept value (N, mm, MPa; a fraction of the length
// for L/n values), pf, its 95% interval and beta; when the swept values
// change it, a last column gives the study's nominal relative slenderness
// at the swept value, its axis named in the head.
func seriesCSV(b *Bundle) ([]byte, error) {
	var buf bytes.Buffer
	w := csv.NewWriter(&buf)
	label := b.SweepLabel
	if label == "" {
		label = "value"
	}
	rows := [][]string{{"series", label, "pf", "pf_low", "pf_high", "beta"}}
	lam := len(b.SweepLambda) > 0
	if lam {
		rows[0] = append(rows[0], lambdaHead(b))
	}
	g := func(v float64) string { return strconv.FormatFloat(v, 'g', 8, 64) }
	for _, s := range b.Series {
		name := s.Name
		if name == "" {
			name = "study"
		}
		for _, p := range s.Points {
			row := []string{name, g(p.Value), g(p.Pf), g(p.PfCI[0]), g(p.PfCI[1]), csvIndex(p.Beta)}
			if lam {
				l, ok := b.SweepLambda[p.Value]
				row = append(row, "")
				if ok && finite(l) {
					row[len(row)-1] = strconv.FormatFloat(l, 'f', 4, 64)
				}
			}
			rows = append(rows, row)
		}
	}
	if err := w.WriteAll(csvCells(rows...)); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// lambdaHead names the relative-slenderness column of the sweep table.
func lambdaHead(b *Bundle) string {
	return "relative_slenderness (nominal, " + b.SweepLambdaAxis + " axis)"
}
