package study

import (
	"errors"

	"strutrisk/internal/column"
)

// The numerical beam-column of internal/column is not part of this build
// yet: the parser refuses model "beam-column" with a clear message until
// it is (see beamAvailable).

const beamAvailable = false

type beamOpts struct{}

func beamOptions(st *Study) beamOpts { return beamOpts{} }

func (md *Model) beamCapacity(m *column.Member, sec column.Section, v *values, axis column.Axis) (column.Result, error) {
	return column.Result{}, errors.New("study: the beam-column model is not available in this build")
}
