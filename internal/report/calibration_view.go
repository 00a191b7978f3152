package report

import (
	"fmt"
	"strings"

	"strutrisk/internal/assess"
)

// calView is a partial-factor calibration formatted for the HTML and
// Markdown reports: the summary line, the facts, one row per case.
type calView struct {
	Factor string
	// Head is CalibrationLine; Class "undecided" when the value lies at
	// an end of the range (no calibration), else "".
	Head, Class string
	Facts       []KV
	// AtValue and AtInitial head the columns of beta; AtInitial is ""
	// when the cases' betas at the initial value are not known.
	AtValue, AtInitial string
	Rows               []calRow
}

// calRow is one case of a calibration.
type calRow struct{ Case, Weight, Beta, BetaInitial, Gap, Note string }

// calibrationView formats c; nil when there is none.
func calibrationView(c *assess.Calibration) *calView {
	if c == nil {
		return nil
	}
	v := &calView{Factor: c.Factor, Head: CalibrationLine(c), AtValue: "β at " + c.Factor + " = " + fixed(c.Value, 3) + " (–)"}
	value := fixed(c.Value, 3)
	if c.AtBound {
		v.Class = "undecided"
		value += ": at an end of the range, no calibration (the best value may lie outside it; widen calibration.range)"
	}
	v.Facts = []KV{
		{"factor fitted", c.Factor + " ([code_check])"},
		{"range searched", fixed(c.Low, 3) + " to " + fixed(c.High, 3)},
		{"target β", fixed(c.TargetBeta, 2)},
		{"value found", value},
		{"spread of β at that value", fixed(c.Spread, 2) + " (largest minus smallest)"},
		{"weighted rms of β − target", fixed(c.Deviation, 2)},
		{"worst case (lowest β)", c.Worst + " at β " + fixed(worstBeta(c), 2)},
		{"cases", fmt.Sprintf("%d, each by FORM, read again at every trial value (loads normalised again when the study normalises them)", len(c.Cases))},
		{"objective", "Σ w (β − target)² over the cases, least squares as in EN 1990 Annex C"},
	}
	initial := len(c.Cases) > 0 && c.Cases[0].BetaInitial != nil
	if initial {
		v.AtInitial = "β at the study's " + fixed(c.Initial, 3) + " (–)"
	}
	for _, k := range c.Cases {
		r := calRow{Case: k.Case, Weight: sig(k.Weight, 3), Beta: fixed(k.Beta, 2), Gap: signed(k.Beta - c.TargetBeta)}
		if initial && k.BetaInitial != nil {
			r.BetaInitial = fixed(*k.BetaInitial, 2)
		}
		if k.Case == c.Worst {
			r.Note = "worst"
		}
		v.Rows = append(v.Rows, r)
	}
	return v
}

// signed formats x with two decimals and its sign.
func signed(x float64) string {
	if !finite(x) {
		return notAvailable
	}
	if x >= 0 {
		return "+" + fixed(x, 2)
	}
	return "−" + fixed(-x, 2)
}

// Columns is the table head of the cases.
func (v *calView) Columns() []string {
	h := []string{"case", "weight (–)", v.AtValue, "β − target (–)"}
	if v.AtInitial != "" {
		h = append(h, v.AtInitial)
	}
	return append(h, "note")
}

// cells are the row's cells under Columns.
func (v *calView) cells(r calRow) []string {
	c := []string{r.Case, r.Weight, r.Beta, r.Gap}
	if v.AtInitial != "" {
		c = append(c, r.BetaInitial)
	}
	return append(c, r.Note)
}

// Table is the cases' rows under Columns.
func (v *calView) Table() [][]string {
	rows := make([][]string, len(v.Rows))
	for i, r := range v.Rows {
		rows[i] = v.cells(r)
	}
	return rows
}

// mdCalibration writes the calibration section of the Markdown report.
func mdCalibration(w *strings.Builder, v *calView) {
	if v == nil {
		return
	}
	fmt.Fprintf(w, "## Calibration of %s\n\n**%s**\n\n", mdText(v.Factor), mdText(v.Head))
	mdKV(w, v.Facts)
	mdTable(w, v.Columns(), v.Table())
}
