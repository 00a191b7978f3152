package analysis

import (
	"strutrisk/internal/modelerror"
	"strutrisk/internal/outdir"
	"strutrisk/internal/report"
)

// ModelFactorOutput is what the model-factor command prints and writes
// for an evaluation of a study's model against tests (EN 1990 Annex D,
// D.8).
type ModelFactorOutput struct {
	// Eval is the evaluation.
	Eval *modelerror.Evaluation
	// JSON is the evaluation as a document (model-factor.json), ending in
	// a newline.
	JSON []byte
	// Text is the evaluation for people, the caution last (summary.txt).
	Text string
}

// ModelFactor is the output of the evaluation ev.
func ModelFactor(ev *modelerror.Evaluation) (*ModelFactorOutput, error) {
	doc, err := report.EncodeJSON(ev)
	if err != nil {
		return nil, err
	}
	return &ModelFactorOutput{Eval: ev, JSON: doc, Text: ev.Text() + "\n" + report.CautionText + "\n"}, nil
}

// Files are the files of the evaluation's folder: model-factor.json,
// model-factor.csv (r_e, r_t and delta per test), model-factor.png (r_e
// against r_t) and summary.txt.
func (o *ModelFactorOutput) Files() ([]outdir.File, error) {
	ev := o.Eval
	re, rt := make([]float64, len(ev.Rows)), make([]float64, len(ev.Rows))
	for i, r := range ev.Rows {
		re[i], rt[i] = r.Measured, r.Theory
	}
	png, err := report.TestsPicture(re, rt, ev.B)
	if err != nil {
		return nil, err
	}
	return []outdir.File{{Name: "model-factor.json", Data: o.JSON}, {Name: "model-factor.csv", Data: ev.CSV()},
		{Name: "model-factor.png", Data: png}, {Name: "summary.txt", Data: []byte(o.Text)}}, nil
}
