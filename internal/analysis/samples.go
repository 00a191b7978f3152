package analysis

import (
	"strutrisk/sim"
)

// samplesInUnits returns the kept sample table as samples.csv holds it:
// every value in N, mm and MPa (a bow or eccentricity written as L/n with
// a random length is multiplied by the sampled length) and every column
// name followed by its unit, e.g. "material.yield (MPa)", or "(-)" for a
// dimensionless one. The kept table itself is left as the engine wrote it.
func (r *Result) samplesInUnits() *sim.Samples {
	kept := r.Estimate.Kept
	if kept == nil {
		return nil
	}
	md := r.l.Model
	nv := len(md.Sim.Vars)
	units := make(map[string]string, len(r.l.Study.Quantities))
	for _, q := range r.l.Study.Quantities {
		u := q.Unit()
		if q.Relative || q.Lcr {
			u = "mm"
		}
		units[q.Path] = u
	}
	out := &sim.Samples{Names: make([]string, len(kept.Names)), Rows: make([][]float64, len(kept.Rows))}
	for j, name := range kept.Names {
		u, ok := units[name]
		if !ok && j >= nv {
			u = outputUnit(r.l.Study, name) // bending.go
		}
		if u == "" {
			u = "-"
		}
		out.Names[j] = name + " (" + u + ")"
	}
	for i, row := range kept.Rows {
		conv := append([]float64(nil), row...)
		if len(row) >= nv {
			for j := 0; j < nv; j++ {
				conv[j] = md.InUnits(j, row[j], row[:nv])
			}
		}
		out.Rows[i] = conv
	}
	return out
}
