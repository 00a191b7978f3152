package sim

import (
	"math"
	"sync"
	"sync/atomic"
)

// gradientPar is gradient with the 2n points evaluated on the evaluators
// of f.par at once. It counts, records and returns exactly as the serial
// gradient does (which stops at the first component that is not finite),
// so a FORM analysis gives the same numbers for any number of workers.
func (f *formSolver) gradientPar(grad, u []float64) bool {
	n := len(u)
	if f.stopped() {
		return false
	}
	pts := make([][]float64, 2*n)
	hs := make([]float64, n)
	for i := range u {
		hs[i] = f.step * math.Max(1, math.Abs(u[i]))
		for k, sgn := range [2]float64{1, -1} {
			p := append([]float64(nil), u...)
			p[i] = u[i] + sgn*hs[i]
			pts[2*i+k] = p
		}
	}
	vals := make([]float64, 2*n)
	var next atomic.Int64
	var wg sync.WaitGroup
	for _, g := range f.par {
		wg.Add(1)
		go func(g func(u []float64) float64) {
			defer wg.Done()
			for k := int(next.Add(1) - 1); k < len(pts); k = int(next.Add(1) - 1) {
				vals[k] = g(pts[k])
			}
		}(g)
	}
	wg.Wait()
	for i := range u {
		f.evals += 2
		if f.record != nil {
			f.record(pts[2*i], vals[2*i])
			f.record(pts[2*i+1], vals[2*i+1])
		}
		grad[i] = (vals[2*i] - vals[2*i+1]) / (2 * hs[i])
		if math.IsNaN(grad[i]) || math.IsInf(grad[i], 0) {
			return false
		}
	}
	return true
}
