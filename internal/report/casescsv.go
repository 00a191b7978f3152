package report

import (
	"bytes"
	"encoding/csv"
	"strconv"
)

// casesCSV is the tidy table of every case of a run, cases.csv: one row
// per case (the study itself, each variant at the study's values, and
// the study and each variant at each swept value), one column per case
// key and per result, the unit of each column in its head. A case that
// did not run has no row.
func casesCSV(b *Bundle) ([]byte, error) {
	c, d := b.Cases, b.Doc
	label := b.SweepLabel
	if label == "" {
		label = "value"
	}
	head := []string{"variant", label}
	lam := len(b.SweepLambda) > 0
	if lam {
		head = append(head, lambdaHead(b)+" (-)")
	}
	head = append(head, "pf (-)", "pf_low (-)", "pf_high (-)", "beta (-)")
	rows := [][]string{head}
	g := func(v float64) string { return strconv.FormatFloat(v, 'g', 8, 64) }
	row := func(name, value string, x float64, pt Point) {
		r := []string{name, value}
		if lam {
			r = append(r, "")
			if l, ok := b.SweepLambda[x]; ok && value != "" && finite(l) {
				r[len(r)-1] = strconv.FormatFloat(l, 'f', 4, 64)
			}
		}
		rows = append(rows, append(r, g(pt.Pf), g(pt.PfCI[0]), g(pt.PfCI[1]), csvIndex(pt.Beta)))
	}
	study := "study"
	if c.StudyName != "" {
		study = "study (" + c.StudyName + ")"
	}
	if d.Pf != nil && d.Beta != nil {
		pt := Point{Pf: *d.Pf, Beta: *d.Beta}
		if len(d.PfCI) == 2 {
			pt.PfCI = [2]float64{d.PfCI[0], d.PfCI[1]}
		}
		row(study, "", 0, pt)
	}
	for _, v := range d.Variants {
		row(v.Name, "", 0, Point{Pf: v.Pf, Beta: v.Beta, PfCI: v.PfCI})
	}
	for s, line := range c.Grid {
		name := study
		if s > 0 && s-1 < len(d.Variants) {
			name = d.Variants[s-1].Name
		} else if s > 0 && s < len(b.Series) {
			name = b.Series[s].Name
		}
		for i, pt := range line {
			if pt != nil && i < len(c.Values) {
				row(name, g(c.Values[i]), c.Values[i], *pt)
			}
		}
	}
	var buf bytes.Buffer
	w := csv.NewWriter(&buf)
	if err := w.WriteAll(csvCells(rows...)); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}
