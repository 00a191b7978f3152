package sim

import (
	"fmt"
	"math"
)

// formMaxRadius bounds |u| during a design-point search: beyond it Phi(-|u|)
// is below 1e-300 and the search is taken to diverge.
const formMaxRadius = 37.0

// formSolver searches design points of a limit state in standard normal
// space by the improved HL-RF method.
type formSolver struct {
	dim     int
	g       func(u []float64) float64
	maxIter int
	tol     float64
	// gScale normalises |g| in the convergence test (|g(0)|, or 1).
	gScale float64
	// step is the relative finite-difference step (FORMSettings.Step),
	// enlarged up to formMaxStep when noise defeats a line search; noise is
	// the estimated absolute noise of g (0 until noise is seen). Both carry
	// over from one search to the next.
	step, noise float64
	evals       int
	// done, when not nil, is closed when the analysis is to stop: every
	// later evaluation returns NaN without calling g, so that the search
	// ends at once.
	done <-chan struct{}
	// par, when it holds two or more evaluators, evaluates each gradient's
	// points concurrently (FORMSettings.Workers); record, when not nil,
	// receives every point evaluated and its g.
	par    []func(u []float64) float64
	record func(u []float64, g float64)
}

// formDefaultStep is the default relative finite-difference step and
// formMaxStep the largest FORM enlarges it to: at 1e-2 a noise of 1e-5 of
// g moves a gradient component of order g by about 1e-3 of itself, while
// the truncation error of a central difference, h^2/6 times the third
// derivative of g, stays near
// 1e-4 of it for a limit state curved on the scale of one standard
// deviation.
const (
	formDefaultStep = 1e-4
	formMaxStep     = 1e-2
)

// formStall is the number of iterations without progress, within
// sqrt(tol) of convergence, after which a search ends at the noise of g.
const formStall = 6

// formSearch is the outcome of one design-point search.
type formSearch struct {
	u    []float64 // last iterate: the design point when converged
	grad []float64 // gradient of g at u
	g    float64   // g(u)
	iter int
	ok   bool
	// status says how the search ended.
	status string
}

// eval calls g and counts the call.
func (f *formSolver) eval(u []float64) float64 {
	if f.stopped() {
		return math.NaN()
	}
	f.evals++
	v := f.g(u)
	if f.record != nil {
		f.record(u, v)
	}
	return v
}

// stopped reports whether the analysis was asked to stop.
func (f *formSolver) stopped() bool {
	select {
	case <-f.done:
		return true
	default:
		return false
	}
}

// gradient stores in grad the central finite-difference gradient of g at u,
// with step h_i = step max(1, |u_i|) (common practice: the truncation error
// of the central difference is O(h^2), its rounding or noise error
// O(noise/h)).
func (f *formSolver) gradient(grad, u []float64) bool {
	if len(f.par) > 1 {
		return f.gradientPar(grad, u)
	}
	w := append([]float64(nil), u...)
	for i := range u {
		h := f.step * math.Max(1, math.Abs(u[i]))
		w[i] = u[i] + h
		gp := f.eval(w)
		w[i] = u[i] - h
		gm := f.eval(w)
		w[i] = u[i]
		grad[i] = (gp - gm) / (2 * h)
		if math.IsNaN(grad[i]) || math.IsInf(grad[i], 0) {
			return false
		}
	}
	return true
}

// search runs the improved HL-RF iteration (iHL-RF) of Zhang and Der
// Kiureghian ("Two improved algorithms for reliability analysis", IFIP
// WG 7.5 conference, 1995; restated in Der Kiureghian, "First- and
// second-order reliability methods", Engineering Design Reliability
// Handbook, CRC 2005; citations from memory) from start: the HL-RF
// (Hasofer-Lind, Rackwitz-Fiessler) direction
//
//	d = [(grad·u - g)/|grad|^2] grad - u
//
// with a step length from an Armijo line search on the merit function
// m(u) = |u|^2/2 + c|g(u)|, c > |u|/|grad|, which makes every step a descent
// step. Convergence needs both |g|/gScale <= tol and
// 1 - |grad·u|/(|grad||u|) <= tol (u parallel to the gradient).
//
// A limit state computed numerically carries noise (an iterative capacity
// model), and a line search fails, or the iterates jitter about the design
// point without meeting tol, once the changes asked for sink below that
// noise. So when a search first comes within sqrt(tol) of convergence, or
// its line search fails, it measures the noise of g at the point (probe)
// and, when there is noise, enlarges the finite-difference step to suit it
// and goes on from the same point. With noise e known the line search
// accepts a point whose merit rises by no more than 2ce (the relaxed
// Armijo test of Berahas, Byrd and Nocedal, "Derivative-free optimization
// of noisy functions via quasi-Newton methods", SIAM J. Optim. 29 (2019)
// 965-993; from memory) and the tolerances widen to what the noise allows
// (tolerances).
func (f *formSolver) search(start []float64) formSearch {
	n := f.dim
	u := append([]float64(nil), start...)
	grad := make([]float64, n)
	d := make([]float64, n)
	trial := make([]float64, n)
	res := formSearch{u: u, grad: grad}
	probed := false // the noise was measured in this search
	// best is the smallest residual relative to the tolerances within
	// sqrt(tol) of convergence, stall the iterations since it halved.
	best, stall := math.Inf(1), 0
	gv := f.eval(u)
	for it := 0; ; it++ {
		res.g, res.iter = gv, it
		if math.IsNaN(gv) || math.IsInf(gv, 0) {
			res.status = fmt.Sprintf("limit state undefined (g = %v) at iteration %d", gv, it)
			return res
		}
		if !f.gradient(grad, u) {
			res.status = fmt.Sprintf("limit state gradient undefined at iteration %d", it)
			return res
		}
		gn := formNorm(grad)
		if gn == 0 {
			res.status = fmt.Sprintf("zero gradient of the limit state at iteration %d (g = %.6g): g does not depend on the inputs there", it, gv)
			return res
		}
		un := formNorm(u)
		gu := formDot(grad, u)
		dirErr := 0.0
		if un > 0 {
			dirErr = 1 - math.Abs(gu)/(gn*un)
		}
		gTol, dirTol := f.tolerances(gn)
		if math.Abs(gv) <= gTol && dirErr <= dirTol {
			res.ok = true
			res.status = fmt.Sprintf("converged in %d iterations", it)
			if 2*f.noise > f.tol*f.gScale {
				res.status += fmt.Sprintf(" to the limit state's noise (about %.2g of g0; finite-difference step %.2g)", f.noise/f.gScale, f.step)
			}
			return res
		}
		if loose := math.Sqrt(f.tol); math.Abs(gv) <= loose*f.gScale && dirErr <= loose {
			if !probed {
				probed = true
				if f.probe(u, gv) {
					continue // the step changed: a new gradient at u
				}
			}
			// Progress near the point: the residual q must halve at
			// least every formStall iterations, as it does by far on a
			// smooth g; else the iterates only jitter in the noise.
			q := math.Max(math.Abs(gv)/gTol, dirErr/dirTol)
			if q < best/2 {
				best, stall = q, 0
			} else if stall++; stall >= formStall {
				f.noise = math.Max(f.noise, math.Abs(gv)/2)
				res.ok = true
				res.status = fmt.Sprintf("converged in %d iterations to the limit state's numerical noise (|g|/g0 = %.2g, direction error %.2g)", it, math.Abs(gv)/f.gScale, dirErr)
				return res
			}
		}
		if it >= f.maxIter {
			res.status = fmt.Sprintf("not converged after %d iterations (|g|/g0 = %.3g, direction error %.3g)", it, math.Abs(gv)/f.gScale, dirErr)
			return res
		}
		// HL-RF direction.
		a := (gu - gv) / (gn * gn)
		for i := range d {
			d[i] = a*grad[i] - u[i]
		}
		// Merit function penalty, c > |u|/|grad| (Zhang and Der Kiureghian
		// 1997); twice the larger of the current and the HL-RF radius.
		c := 2 * math.Max(un, math.Abs(a)*gn) / gn
		m0 := 0.5*un*un + c*math.Abs(gv)
		// Directional derivative of the merit function along d:
		// u·d + c sign(g) grad·d, where grad·d = -g.
		slope := a*gu - un*un - c*math.Abs(gv)
		lambda := 1.0
		accepted := false
		var gt float64
		for ls := 0; ls < 30; ls++ {
			for i := range trial {
				trial[i] = u[i] + lambda*d[i]
			}
			gt = f.eval(trial)
			if !math.IsNaN(gt) && !math.IsInf(gt, 0) {
				tn := formNorm(trial)
				mt := 0.5*tn*tn + c*math.Abs(gt)
				if mt <= m0+0.5*lambda*slope+2*c*f.noise || slope >= 0 {
					accepted = true
					break
				}
			}
			lambda *= 0.5
		}
		if !accepted && !probed {
			probed = true
			if f.probe(u, gv) {
				continue
			}
		}
		if !accepted && f.step < formMaxStep {
			// Noise the probe missed: try a tenfold step.
			f.step = math.Min(10*f.step, formMaxStep)
			continue
		}
		if !accepted {
			// The step is as large as it gets and noise still defeats
			// the line search. Accept the point when it satisfies a
			// looser test, sqrt(tol) on both g and the direction, and
			// say so.
			if loose := math.Sqrt(f.tol); math.Abs(gv)/f.gScale <= loose && dirErr <= loose {
				res.ok = true
				res.status = fmt.Sprintf("converged in %d iterations to the limit state's numerical noise (|g|/g0 = %.2g, direction error %.2g)", it, math.Abs(gv)/f.gScale, dirErr)
				return res
			}
			res.status = fmt.Sprintf("line search failed at iteration %d (g = %.6g)", it, gv)
			return res
		}
		copy(u, trial)
		gv = gt
		if formNorm(u) > formMaxRadius {
			res.status = fmt.Sprintf("search diverged: |u| exceeded %g after %d iterations (g may never be negative)", formMaxRadius, it+1)
			res.g = gv
			return res
		}
	}
}

func formDot(a, b []float64) float64 {
	var s float64
	for i := range a {
		s += a[i] * b[i]
	}
	return s
}

func formNorm(a []float64) float64 { return math.Sqrt(formDot(a, a)) }
