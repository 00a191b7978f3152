package analysis

import (
	"context"
	"math"
	"strings"

	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// combinationDoc lists the load combination cases of the study without
// their results (check --json, and the run before they are filled).
func combinationDoc(st *study.Study) (*report.Combination, []report.CombinationCase) {
	c := st.Combination
	if c == nil {
		return nil, nil
	}
	if q := c.Combined; q != nil {
		m, sd := q.Dist.Mean(), q.Dist.StdDev()
		return &report.Combination{Rule: c.Rule, Variable: q.Path, Mean: &m, SD: &sd}, nil
	}
	var cases []report.CombinationCase
	for _, cs := range c.Cases {
		rc := report.CombinationCase{Case: cs.Name(), Leading: cs.Leading.Path, Companions: []string{}}
		for _, q := range cs.Loads {
			if q != cs.Leading {
				rc.Companions = append(rc.Companions, q.Path)
			}
		}
		cases = append(cases, rc)
	}
	return &report.Combination{Rule: c.Rule}, cases
}

// runCombination finds each combination case's FORM index and their
// first-order series system, and returns the warnings to add.
func runCombination(ctx context.Context, l *Loaded, fs *sim.FORMSettings) (*study.Combined, []string) {
	cb := l.Model.CaseIndices(ctx, fs)
	if cb == nil {
		return nil, nil
	}
	var warns []string
	for _, ci := range cb.Cases {
		switch {
		case ci.Err != nil:
			warns = append(warns, "load combination: case "+ci.Case+": FORM: "+ci.Err.Error())
		case !ci.FORM.Converged:
			warns = append(warns, "load combination: case "+ci.Case+": the FORM search did not converge ("+ci.FORM.Status+"); its beta is indicative only")
		}
	}
	return cb, warns
}

// fillCombination puts the cases' results into the document.
func fillCombination(d *report.Document, cb *study.Combined) {
	if d.Combination == nil || cb == nil {
		return
	}
	d.Combination.CaseMethod = "form"
	for i, ci := range cb.Cases {
		if i >= len(d.Combinations) || ci.FORM == nil || !strings.EqualFold(d.Combinations[i].Case, ci.Case) {
			continue
		}
		b, pf, conv := report.Index(ci.FORM.Beta), ci.FORM.Pf, ci.FORM.Converged
		d.Combinations[i].Beta, d.Combinations[i].Pf, d.Combinations[i].Converged = &b, &pf, &conv
	}
	if cb.Governing >= 0 {
		d.Combination.Governing = cb.Cases[cb.Governing].Case
	}
	if !math.IsNaN(cb.SeriesPf) {
		b, pf := report.Index(cb.SeriesBeta), cb.SeriesPf
		d.Combination.SeriesBeta, d.Combination.SeriesPf = &b, &pf
	}
}
