package study

import (
	"fmt"

	"strutrisk/internal/column"
)

// Traces reports whether the study's capacity model has a load-deflection
// path to trace (TraceAt): the numerical beam-column's kernel.
func (md *Model) Traces() bool { return md.kernel == kernelBeam }

// TraceAt follows the numerical beam-column of a beam-column study at the
// physical point x (one value per variable of Sim; nil for the nominal
// member): the load-deflection path and the deflected shape at the limit
// of the governing axis.
func (md *Model) TraceAt(x []float64) (*column.Trace, error) {
	if md.kernel != kernelBeam {
		return nil, fmt.Errorf("study: a trace needs capacity.model = %q", beamColumn{})
	}
	v := md.nominalValues()
	if x != nil {
		v = md.base
		for i, b := range md.binds {
			md.set(&v, b, x[i])
		}
	}
	m, sec, err := md.member(&v)
	if err != nil {
		return nil, err
	}
	opt := md.beam
	for a := range 2 {
		if md.springs[a] {
			opt.Springs[a] = [2]float64{v[fTop0+a], v[fBot0+a]}
		}
	}
	return column.BeamColumnTrace(&m, sec, md.Study.Axis, &opt)
}
