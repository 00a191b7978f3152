package analysis

import "strutrisk/internal/report"

// addTrace puts the numerical beam-column's load-deflection path and
// deflected shape into b: at the FORM design point (the most probable
// failing member), or at the nominal member when FORM found none. Other
// models have no trace.
func (r *Result) addTrace(b *report.Bundle) {
	if !r.l.Model.Traces() {
		return
	}
	var x []float64
	if f := r.form; f != nil && len(f.Points) > 0 {
		x = f.Points[0].X
	}
	tr, err := r.l.Model.TraceAt(x)
	if err != nil {
		b.Doc.Warnings = append(b.Doc.Warnings, "beam-column picture: "+err.Error())
		return
	}
	b.Trace = &report.Trace{Deflection: tr.Deflection, Load: tr.Load, Position: tr.X, Shape: tr.Shape}
}
