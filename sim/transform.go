package sim

import "errors"

// Transform maps standard normal space u to the physical space x of a Model
// through the Gaussian copula (Nataf): correlated normals are obtained from
// independent ones by the Cholesky factor of the normal-space correlation,
// then each is mapped through its marginal. It is safe for concurrent use.
type Transform struct {
	vars []Variable
}

// NewTransform builds the transformation of m, checking its variables and
// correlations.
func NewTransform(m *Model) (*Transform, error) {
	return nil, errors.New("sim: NewTransform is not implemented yet")
}

// Dim returns the number of random variables.
func (t *Transform) Dim() int { return len(t.vars) }

// ToX stores in x the physical point of the standard normal point u.
func (t *Transform) ToX(x, u []float64) {}

// ToU stores in u the standard normal point of the physical point x.
func (t *Transform) ToU(u, x []float64) {}
