package sim

import "math"

// formNoiseSpacing is the spacing, in standard normal space, of the points
// at which probe measures the noise of g: wide enough to meet the small
// jumps of a path-dependent capacity model, narrow enough that the fourth
// difference of a smooth g (spacing^4 times its fourth derivative) stays
// near 1e-9 of g.
const formNoiseSpacing = 5e-3

// probe measures the noise of g at u, where g = gv, and adapts the
// finite-difference step to it; it reports whether the step changed.
//
// The noise is estimated from the fourth difference of g at five points
// spaced formNoiseSpacing apart on a line through u: for independent noise
// of standard deviation e the fourth difference has variance 70 e^2
// (the difference-table estimate of Moré and Wild, "Estimating
// computational noise", SIAM J. Sci. Comput. 33 (2011) 1292-1314, with
// gamma_4 = (4!)^2/8! = 1/70; from memory), while for a smooth g it is
// negligible. The step then becomes (3e/gScale)^(1/3), the step that
// balances the noise error e/h of a central difference against its
// truncation error h^2 g3/6 for a third derivative g3 of the order of
// gScale (common practice), kept between the present step and
// formMaxStep.
func (f *formSolver) probe(u []float64, gv float64) bool {
	n := len(u)
	w := make([]float64, n)
	// A fixed direction that moves every input: alternate signs, unit length.
	s := formNoiseSpacing / math.Sqrt(float64(n))
	at := func(k float64) float64 {
		for i := range w {
			sign := 1.0
			if i%2 == 1 {
				sign = -1
			}
			w[i] = u[i] + k*sign*s
		}
		return f.eval(w)
	}
	d4 := at(-2) - 4*at(-1) + 6*gv - 4*at(1) + at(2)
	e := math.Abs(d4) / math.Sqrt(70)
	if math.IsNaN(e) || math.IsInf(e, 0) {
		return false
	}
	f.noise = math.Max(f.noise, e)
	h := math.Min(formMaxStep, math.Cbrt(3*f.noise/f.gScale))
	if h <= f.step {
		return false
	}
	f.step = h
	return true
}

// tolerances returns the convergence tolerances on |g| and on the
// direction error for a gradient of norm gn: tol gScale and tol, widened
// to the noise e of g when there is any. |g| within 2e is zero as far as
// g can tell. A noise e errs each gradient component by up to e/h, the
// gradient by sqrt(n) e/(h |grad|) relative, so the direction error
// 1 - cos(angle) cannot be told from half the square of that; the
// widened tolerance is four times it, at most sqrt(tol).
func (f *formSolver) tolerances(gn float64) (gTol, dirTol float64) {
	gTol, dirTol = f.tol*f.gScale, f.tol
	if f.noise == 0 {
		return gTol, dirTol
	}
	rel := math.Sqrt(float64(f.dim)) * f.noise / (f.step * gn)
	return math.Max(gTol, 2*f.noise), math.Max(dirTol, math.Min(math.Sqrt(f.tol), 2*rel*rel))
}
