package sim

import (
	"context"
	"errors"
)

// subsetSimulation estimates Pf by subset simulation (Au and Beck, 2001).
func subsetSimulation(ctx context.Context, m *Model, t *Transform, s *Settings) (*Result, error) {
	return nil, errors.New("sim: subset simulation is not implemented yet")
}
