package study

import (
	"errors"

	"strutrisk/internal/column"
)

// TraceAt follows the numerical beam-column of a beam-column study at the
// physical point x (one value per variable of Sim; nil for the nominal
// member): the load-deflection path and the deflected shape at the limit
// of the governing axis.
func (md *Model) TraceAt(x []float64) (*column.Trace, error) {
	if md.model != modelBeam {
		return nil, errors.New("study: a trace needs capacity.model = \"beam-column\"")
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
