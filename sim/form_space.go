package sim

// uSpace is a limit state in independent standard normal space: the form in
// which FORM, importance sampling and subset simulation see a Model.
type uSpace struct {
	// dim is the number of standard normal variables.
	dim int
	// newG returns an evaluator of g(u) with its own scratch memory; each
	// goroutine calls newG once and keeps the evaluator.
	newG func() func(u []float64) float64
}

// modelSpace returns the limit state of m seen through t in standard
// normal space.
func modelSpace(m *Model, t *Transform) *uSpace {
	n := t.Dim()
	return &uSpace{
		dim: n,
		newG: func() func(u []float64) float64 {
			x := make([]float64, n)
			return func(u []float64) float64 {
				t.ToX(x, u)
				return m.G(x, nil)
			}
		},
	}
}

// funcSpace wraps a limit state written directly in standard normal space.
func funcSpace(dim int, g func(u []float64) float64) *uSpace {
	return &uSpace{dim: dim, newG: func() func(u []float64) float64 { return g }}
}
