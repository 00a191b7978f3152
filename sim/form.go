package sim

import "errors"

// FORMSettings control FORM. Zero fields take their defaults.
type FORMSettings struct {
	// MaxIter bounds the iterations of one design-point search; default 100.
	MaxIter int
	// Tol is the convergence tolerance on g and on the direction; default 1e-6.
	Tol float64
	// MaxPoints bounds the number of design points searched; default 4.
	MaxPoints int
}

// FORM runs a first-order reliability analysis of m: the improved HL-RF
// search for design points, combined as a series system.
func FORM(m *Model, s *FORMSettings) (*FORMResult, error) {
	return nil, errors.New("sim: FORM is not implemented yet")
}
