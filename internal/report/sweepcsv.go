package report

import (
	"bytes"
	"encoding/csv"
	"strconv"
)

// seriesCSV writes the sweep curves of b, one row per variant and swept
// value: series, the swept value (N, mm, MPa; a fraction of the length
// for L/n values), pf, its 95% interval and beta.
func seriesCSV(b *Bundle) ([]byte, error) {
	var buf bytes.Buffer
	w := csv.NewWriter(&buf)
	label := b.SweepLabel
	if label == "" {
		label = "value"
	}
	rows := [][]string{{"series", label, "pf", "pf_low", "pf_high", "beta"}}
	g := func(v float64) string { return strconv.FormatFloat(v, 'g', 8, 64) }
	for _, s := range b.Series {
		name := s.Name
		if name == "" {
			name = "study"
		}
		for _, p := range s.Points {
			rows = append(rows, []string{name, g(p.Value), g(p.Pf), g(p.PfCI[0]), g(p.PfCI[1]), g(p.Beta)})
		}
	}
	if err := w.WriteAll(csvCells(rows...)); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}
