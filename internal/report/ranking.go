package report

import (
	"fmt"
	"math"
	"sort"
	"strings"
)

// Influence is one input's weight in a ranking of influential inputs.
type Influence struct {
	Name   string
	Weight float64
}

// Ranking is the inputs of a study ranked by one measure of influence,
// most influential first. It is the one ranking every summary and report
// prints, so that all of them name the same inputs in the same order.
type Ranking struct {
	// Measure names the measure, e.g. "FORM importance α²"; empty when
	// the document has none.
	Measure string
	Inputs  []Influence
}

// Measures of influence, in the order RankInputs prefers them.
const (
	measureFORM    = "FORM importance α²"
	measureSobol   = "total Sobol index of the margin"
	measureTornado = "share of the tornado swings of the margin"
)

// RankInputs ranks the inputs of d by the first measure it has: the FORM
// importance factors α² of a converged design point (which inputs' scatter decides failure at the most
// likely failure point, the question a reliability study asks), else the
// total Sobol indices of the margin, else each input's share of the sum of
// the tornado swings. It keeps the n largest (all when n <= 0); ties go by
// name. Weights that are not finite are left out.
func RankInputs(d *Document, n int) Ranking {
	var r Ranking
	if d == nil {
		return r
	}
	switch {
	case formRanks(d):
		r.Measure = measureFORM
		for _, k := range sortedKeys(d.FORM.Importance) {
			if v := d.FORM.Importance[k]; finite(v) {
				r.Inputs = append(r.Inputs, Influence{k, v})
			}
		}
	case len(d.Sobol) > 0:
		r.Measure = measureSobol
		for _, s := range d.Sobol {
			if finite(s.Total) {
				r.Inputs = append(r.Inputs, Influence{s.Variable, s.Total})
			}
		}
	case len(d.Tornado) > 0:
		r.Measure = measureTornado
		total := 0.0
		for _, t := range d.Tornado {
			if sw := math.Abs(t.High - t.Low); finite(sw) {
				r.Inputs = append(r.Inputs, Influence{t.Variable, sw})
				total += sw
			}
		}
		for i := range r.Inputs {
			if total > 0 {
				r.Inputs[i].Weight /= total
			}
		}
	default:
		return r
	}
	sort.SliceStable(r.Inputs, func(i, j int) bool {
		a, b := r.Inputs[i], r.Inputs[j]
		if a.Weight != b.Weight {
			return a.Weight > b.Weight
		}
		return a.Name < b.Name
	})
	if n > 0 && len(r.Inputs) > n {
		r.Inputs = r.Inputs[:n]
	}
	return r
}

// formRanks tells whether d has FORM importance factors that may rank its
// inputs: present, and from a design point that converged.
func formRanks(d *Document) bool {
	f := d.FORM
	return f != nil && len(f.Importance) > 0 && (f.Converged == nil || *f.Converged)
}

// Text writes the ranking on one line, each input with its weight to two
// significant digits, and names the measure:
// "loads.imposed (0.62), material.yield (0.11)  [by FORM importance α²]".
// It is "" when the ranking is empty.
func (r Ranking) Text() string {
	if len(r.Inputs) == 0 {
		return ""
	}
	parts := make([]string, len(r.Inputs))
	for i, in := range r.Inputs {
		parts[i] = fmt.Sprintf("%s (%s)", in.Name, sig(in.Weight, 2))
	}
	return strings.Join(parts, ", ") + "  [by " + r.Measure + "]"
}

// RankingNote returns one sentence saying which question each ranking of
// d answers (FORM importance, the tornado, the Sobol indices: those d
// has), since they can order the same inputs differently; "" when d has
// none of them.
func RankingNote(d *Document) string {
	if d == nil {
		return ""
	}
	var parts []string
	if formRanks(d) {
		parts = append(parts, "FORM importance α² answers whose scatter drives failure at the most likely failure point (what to measure)")
	}
	if len(d.Tornado) > 0 {
		parts = append(parts, "the tornado answers how far the result moves with one input fixed at a low or high fractile")
	}
	if len(d.Sobol) > 0 {
		p := "the total Sobol index answers what share of the margin's variance an input explains over its whole range, mostly far from failure"
		if formRanks(d) {
			p += ", hence its different order"
		}
		parts = append(parts, p)
	}
	switch len(parts) {
	case 0:
		return ""
	case 1:
		return strings.ToUpper(parts[0][:1]) + parts[0][1:] + "."
	}
	return "The rankings answer different questions: " + strings.Join(parts, "; ") + "."
}

// plainGreek writes the Greek letters of report texts in ASCII for a
// terminal or a plain-text file.
var plainGreek = strings.NewReplacer("α²", "alpha^2", "β", "beta", "ρ", "rho")

// WrapText breaks s at spaces into lines of at most width bytes (a word
// longer than width gets a line of its own).
func WrapText(s string, width int) []string {
	var lines []string
	line := ""
	for _, w := range strings.Fields(s) {
		if line != "" && len(line)+1+len(w) > width {
			lines = append(lines, line)
			line = ""
		}
		if line != "" {
			line += " "
		}
		line += w
	}
	if line != "" {
		lines = append(lines, line)
	}
	return lines
}

// PlainGreek writes the Greek letters of a report text (α², β, ρ) in ASCII,
// for a terminal or a plain-text file.
func PlainGreek(s string) string { return plainGreek.Replace(s) }
