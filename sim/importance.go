package sim

import (
	"context"
	"errors"
)

// importanceSampling estimates Pf by sampling around the FORM design points.
func importanceSampling(ctx context.Context, m *Model, t *Transform, form *FORMResult, s *Settings) (*Result, error) {
	return nil, errors.New("sim: importance sampling is not implemented yet")
}
