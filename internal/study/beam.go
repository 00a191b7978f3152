package study

import "strutrisk/internal/column"

// beamOpts are the beam-column settings of a study.
type beamOpts = column.BeamOptions

// beamOptions are the beam-column settings of a study.
func beamOptions(st *Study) column.BeamOptions {
	var o column.BeamOptions
	o.Profile = st.Profile
	if st.Limit != "" {
		o.Limit, _ = column.ParseBeamLimit(st.Limit)
	}
	if st.Residual != "" {
		o.Residual, _ = column.ParseResidual(st.Residual)
	}
	return o
}

// beamCapacity evaluates the numerical beam-column, with the end springs
// of the sample when the study gives them.
func (md *Model) beamCapacity(m *column.Member, sec column.Section, v *values, axis column.Axis) (column.Result, error) {
	opt := md.beam
	for a := range 2 {
		if md.springs[a] {
			opt.Springs[a] = [2]float64{v[fTop0+a], v[fBot0+a]}
		}
	}
	return column.BeamColumn(m, sec, axis, &opt)
}
