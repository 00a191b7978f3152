package main

import "strutrisk/internal/report"

// trace is the numerical beam-column's load-deflection path and deflected
// shape at the FORM design point (the most probable failing member), or at
// the nominal member when FORM found none; nil for other models.
func (r *results) trace() *report.Trace {
	if r.l.st.Model != "beam-column" {
		return nil
	}
	var x []float64
	if f := r.form; f != nil && len(f.Points) > 0 {
		x = f.Points[0].X
	}
	tr, err := r.l.md.TraceAt(x)
	if err != nil {
		r.warnings = append(r.warnings, "beam-column picture: "+err.Error())
		return nil
	}
	return &report.Trace{Deflection: tr.Deflection, Load: tr.Load, Position: tr.X, Shape: tr.Shape}
}
