package report

import (
	"bytes"
	"encoding/csv"
	"math"
	"strconv"
)

// casesCSV is the tidy table of every case of a run, cases.csv: one row
// per case (the study itself, each variant at the study's values, and
// the study and each variant at each swept point), one column per swept
// key and per result, the unit of every column in its head. When the
// sweep changes it, a column gives the study's nominal relative
// slenderness at the case's swept point (at its own values for the rows
// of no swept point). The last column, trusted, is "false" for a case
// whose estimate the engine does not trust (no result), "true" otherwise
// and empty when unknown. A case that did not run has no row.
func casesCSV(b *Bundle) ([]byte, error) {
	c, d := b.Cases, b.Doc
	keys, points := caseColumns(b)
	head := append([]string{"variant"}, keys...)
	lamAt := caseLambda(b)
	lam := lamAt != nil
	if lam {
		head = append(head, lambdaHead(b)+" (-)")
	}
	head = append(head, "pf (-)", "pf_low (-)", "pf_high (-)", "beta (-)", "trusted")
	rows := [][]string{head}
	g := func(v float64) string { return strconv.FormatFloat(v, 'g', 8, 64) }
	row := func(name string, i int, pt Point, trusted *bool) {
		r := []string{name}
		for a := range keys {
			if i >= 0 {
				r = append(r, g(points[i][a]))
			} else {
				r = append(r, "")
			}
		}
		if lam {
			r = append(r, "")
			if l := lamAt(i); finite(l) && l > 0 {
				r[len(r)-1] = strconv.FormatFloat(l, 'f', 4, 64)
			}
		}
		t := ""
		if trusted != nil {
			t = strconv.FormatBool(*trusted)
		}
		rows = append(rows, append(r, g(pt.Pf), g(pt.PfCI[0]), g(pt.PfCI[1]), csvIndex(pt.Beta), t))
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
		row(study, -1, pt, d.Trusted)
	}
	for _, v := range d.Variants {
		row(v.Name, -1, Point{Pf: v.Pf, Beta: v.Beta, PfCI: v.PfCI}, v.Trusted)
	}
	for s, line := range c.Grid {
		name := study
		if s < len(c.Names) {
			name = c.seriesName(s)
		} else if s > 0 && s-1 < len(d.Variants) {
			name = d.Variants[s-1].Name
		} else if s > 0 && s < len(b.Series) {
			name = b.Series[s].Name
		}
		for i, pt := range line {
			if pt != nil && i < len(points) {
				trusted := !pt.Doubtful
				row(name, i, *pt, &trusted)
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

// caseColumns are the heads of the swept keys' columns of cases.csv and
// the values of each swept point: one column per key, or one "value"
// column (left empty) when nothing is swept.
func caseColumns(b *Bundle) ([]string, [][]float64) {
	c := b.Cases
	if len(c.Points) > 0 && len(c.Keys) > 0 {
		return c.Keys, c.Points
	}
	label := b.SweepLabel
	if label == "" {
		label = "value"
	}
	points := make([][]float64, len(c.Values))
	for i, x := range c.Values {
		points[i] = []float64{x}
	}
	return []string{label}, points
}

// caseLambda returns the study's nominal relative slenderness at swept
// point i (-1: the study's own values), or nil when the sweep does not
// change it.
func caseLambda(b *Bundle) func(i int) float64 {
	c := b.Cases
	switch {
	case c.Lambda != nil:
		return func(i int) float64 {
			if i < 0 || i >= len(c.Lambda) {
				return c.BaseLambda
			}
			return c.Lambda[i]
		}
	case len(b.SweepLambda) > 0:
		return func(i int) float64 {
			if i < 0 || i >= len(c.Values) {
				return c.BaseLambda
			}
			if l, ok := b.SweepLambda[c.Values[i]]; ok {
				return l
			}
			return math.NaN()
		}
	}
	return nil
}
