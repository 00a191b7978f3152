package sim

import (
	"context"
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"sort"
)

// FORMSettings control FORM. Zero fields take their defaults.
type FORMSettings struct {
	// MaxIter bounds the iterations of one design-point search; default 100.
	MaxIter int
	// Tol is the convergence tolerance on g and on the direction; default 1e-6.
	Tol float64
	// MaxPoints bounds the number of design points searched; default 4.
	MaxPoints int
	// Step is the relative step of the central finite differences of the
	// gradient in standard normal space, h_i = Step max(1, |u_i|);
	// default 1e-4, right for a smooth limit state. A limit state computed
	// numerically carries noise (an iterative capacity model, about 1e-5 of
	// g): give it a larger step, 1e-3 to 1e-2. Whatever the start, FORM
	// enlarges the step itself when a line search fails to noise.
	Step float64
	// Screen, when set, searches for a further design point from a
	// restart only when one is likely there (formLikely): one evaluation
	// of g at the start instead of a whole search, for a limit state that
	// is expensive to evaluate.
	Screen bool
	// Workers is the number of goroutines that evaluate the 2n points of
	// each finite-difference gradient; default 1. Worth it only for a
	// limit state that is expensive to evaluate: Run sets it to
	// Settings.Workers for a Model marked Expensive. The result is the
	// same for any value.
	Workers int
}

// FORM runs a first-order reliability analysis of m: the improved HL-RF
// search for design points, combined as a series system.
//
// The first search starts at the origin of standard normal space (the
// median of every input). Further design points are sought by restarts
// from the found points mirrored in their important components, mirrored
// as a whole, and randomly perturbed (with a fixed seed); a restart that
// ends at a known point is ignored, and the search stops when the restarts
// find nothing new or MaxPoints points are known. A converged point at a
// kink where g falls on both sides of an input (as g = R - S(1 + |e|) at
// e = 0) is not a design point: the search restarts on both sides of it.
//
// The points, most probable first, are combined as a series system:
// Pf = 1 - Phi_m(beta; R) with R_ij = Alpha_i·Alpha_j, and Beta =
// -Phi^-1(Pf). When the first search fails, Converged is false and Status
// says why (iteration limit, g undefined, zero gradient, divergence); the
// last iterate is then reported as the only point and Beta and Pf come from
// it, for diagnosis only. The error is for a model that cannot be analysed
// at all.
func FORM(m *Model, s *FORMSettings) (*FORMResult, error) {
	return FORMContext(context.Background(), m, s)
}

// FORMContext is FORM that stops promptly when ctx is done: no limit
// state is evaluated after that, and the error wraps ctx.Err() (the
// result, marked not converged, is the state at the stop).
func FORMContext(ctx context.Context, m *Model, s *FORMSettings) (*FORMResult, error) {
	if m == nil || m.G == nil {
		return nil, errors.New("sim: FORM needs a Model with a limit state G")
	}
	t, err := NewTransform(m)
	if err != nil {
		return nil, err
	}
	res := formRunContext(ctx, modelSpace(m, t), s)
	if err := ctx.Err(); err != nil {
		res.Converged = false
		res.Status = "interrupted"
		return res, fmt.Errorf("sim: FORM interrupted after %d evaluations: %w", res.Evaluations, err)
	}
	for i := range res.Points {
		p := &res.Points[i]
		p.X = make([]float64, t.Dim())
		t.ToX(p.X, p.U)
	}
	return res, nil
}

// formSettings returns s with defaults filled in.
func formSettings(s *FORMSettings) FORMSettings {
	var c FORMSettings
	if s != nil {
		c = *s
	}
	if c.MaxIter <= 0 {
		c.MaxIter = 100
	}
	if c.Tol <= 0 {
		c.Tol = 1e-6
	}
	if c.MaxPoints <= 0 {
		c.MaxPoints = 4
	}
	if c.Step <= 0 {
		c.Step = formDefaultStep
	}
	return c
}

// formRun is FORM in standard normal space; the points' X are left nil.
func formRun(sp *uSpace, s *FORMSettings) *FORMResult {
	return formRunContext(context.Background(), sp, s)
}

// formRunContext is formRun that stops when ctx is done.
func formRunContext(ctx context.Context, sp *uSpace, s *FORMSettings) *FORMResult {
	return formRunRecorded(ctx, sp, s, nil)
}

// formRunRecorded is formRunContext that passes every point it evaluates
// and its g to record (when not nil), in an order that does not depend on
// the workers.
func formRunRecorded(ctx context.Context, sp *uSpace, s *FORMSettings, record func(u []float64, g float64)) *FORMResult {
	set := formSettings(s)
	n := sp.dim
	f := &formSolver{dim: n, g: sp.newG(), maxIter: set.MaxIter, tol: set.Tol, gScale: 1, step: set.Step, done: ctx.Done(), record: record}
	for w := 0; set.Workers > 1 && w < min(set.Workers, 2*n); w++ {
		f.par = append(f.par, sp.newG())
	}
	origin := make([]float64, n)
	g0 := f.eval(origin)
	if math.IsNaN(g0) || math.IsInf(g0, 0) {
		return &FORMResult{Evaluations: f.evals, Status: fmt.Sprintf("limit state undefined at the median point (g = %v)", g0)}
	}
	if g0 != 0 {
		f.gScale = math.Abs(g0)
	}
	sign := 1.0
	if g0 < 0 {
		sign = -1
	}

	rng := rand.New(rand.NewPCG(0xf0f0, 0x0d0d)) // perturbed starts, reproducible
	queue := [][]float64{origin}
	var (
		found     []formSearch
		first     *formSearch
		kinkPoint *formSearch
		tries     int
		failed    int
		screened  int
	)
	maxTries := 2 + set.MaxPoints*12
	for len(queue) > 0 && len(found) < set.MaxPoints && tries < maxTries && !f.stopped() {
		start := queue[0]
		queue = queue[1:]
		if set.Screen && len(found) > 0 && g0 > 0 && !f.likely(start, found, g0) {
			screened++
			continue
		}
		tries++
		r := f.search(start)
		if first == nil {
			first = &r
		}
		if !r.ok && !(r.iter == 0 && formNorm(r.grad) == 0) {
			failed++
			continue
		}
		// A converged point, or a start with a zero gradient, may sit on
		// a kink of g (g = b - |u1| at the origin).
		if k := f.kinks(&r); len(k) > 0 {
			if kinkPoint == nil {
				kinkPoint = &r
			}
			// Search both sides of the kink first.
			var sides [][]float64
			for _, i := range k {
				for _, sgn := range []float64{1, -1} {
					v := append([]float64(nil), r.u...)
					v[i] += sgn * 0.5
					sides = append(sides, v)
				}
			}
			queue = append(sides, queue...)
			continue
		}
		if !r.ok {
			failed++
			continue
		}
		if formKnown(r.u, found) {
			continue
		}
		found = append(found, r)
		queue = append(queue, formRestarts(r, rng)...)
	}
	if first == nil { // stopped before the first search
		return &FORMResult{Evaluations: f.evals, Status: "interrupted"}
	}
	onKink := false
	if len(found) == 0 && kinkPoint != nil {
		found = append(found, *kinkPoint)
		onKink = true
	}

	res := &FORMResult{}
	if len(found) == 0 {
		p := formPoint(*first, sign)
		res.Points = []DesignPoint{p}
		res.Beta = p.Beta
		res.Pf = formTail(p.Beta)
		res.Evaluations = f.evals
		res.Status = first.status
		return res
	}
	for _, r := range found {
		res.Points = append(res.Points, formPoint(r, sign))
	}
	sort.SliceStable(res.Points, func(i, j int) bool { return res.Points[i].Beta < res.Points[j].Beta })
	betas := make([]float64, len(res.Points))
	alphas := make([][]float64, len(res.Points))
	for i, p := range res.Points {
		betas[i], alphas[i] = p.Beta, p.Alpha
	}
	res.Pf = formSeriesPf(betas, alphas)
	res.Beta = BetaFromPf(res.Pf)
	if len(found) == 1 {
		res.Beta = res.Points[0].Beta // exact, without the Phi round trip
	}
	res.Converged = true
	res.Evaluations = f.evals
	switch {
	case len(found) >= set.MaxPoints:
		res.Status = fmt.Sprintf("converged: %d design points (the MaxPoints limit)", len(found))
	case tries >= maxTries:
		res.Status = fmt.Sprintf("converged: %d design point(s); restart limit reached", len(found))
	default:
		res.Status = fmt.Sprintf("converged: %d design point(s); %d restart(s) found no other", len(found), tries-len(found))
	}
	if onKink {
		res.Status += "; the point lies on a kink of g that restarts could not leave"
	}
	if failed > 0 {
		res.Status += fmt.Sprintf("; %d restart(s) did not converge", failed)
	}
	if screened > 0 {
		res.Status += fmt.Sprintf("; %d restart(s) not searched, no further design point being likely there", screened)
	}
	return res
}

// formPoint converts a search result to a DesignPoint (X left nil); sign is
// that of g at the origin, negative when the median point fails.
func formPoint(r formSearch, sign float64) DesignPoint {
	n := len(r.u)
	p := DesignPoint{
		Beta:       sign * formNorm(r.u),
		U:          append([]float64(nil), r.u...),
		Alpha:      make([]float64, n),
		Importance: make([]float64, n),
	}
	gn := formNorm(r.grad)
	for i := range p.Alpha {
		if gn > 0 {
			p.Alpha[i] = r.grad[i] / gn // equals -U/Beta at a design point
		}
		p.Importance[i] = p.Alpha[i] * p.Alpha[i]
	}
	return p
}

// formKnown reports whether u is within 0.05 max(1, |v|) of a found point
// v: such points describe the same failure mode (their alpha vectors
// correlate above 0.998).
func formKnown(u []float64, found []formSearch) bool {
	for _, r := range found {
		var d float64
		for i := range u {
			d += (u[i] - r.u[i]) * (u[i] - r.u[i])
		}
		if math.Sqrt(d) <= 0.05*math.Max(1, formNorm(r.u)) {
			return true
		}
	}
	return false
}

// formRestarts returns the starting points tried after a new design point
// u: u with each of its (at most six) most important components negated,
// -u as a whole, and u moved by a random normal vector of length
// 0.5 max(1, |u|).
func formRestarts(r formSearch, rng *rand.Rand) [][]float64 {
	n := len(r.u)
	gn := formNorm(r.grad)
	idx := make([]int, n)
	for i := range idx {
		idx[i] = i
	}
	imp := func(i int) float64 { return (r.grad[i] / gn) * (r.grad[i] / gn) }
	sort.SliceStable(idx, func(a, b int) bool { return imp(idx[a]) > imp(idx[b]) })
	var starts [][]float64
	for k, i := range idx {
		if k >= 6 || imp(i) < 0.02 || r.u[i] == 0 {
			break
		}
		v := append([]float64(nil), r.u...)
		v[i] = -v[i]
		starts = append(starts, v)
	}
	if n > 1 {
		v := make([]float64, n)
		for i := range v {
			v[i] = -r.u[i]
		}
		starts = append(starts, v)
	}
	z := make([]float64, n)
	for i := range z {
		z[i] = rng.NormFloat64()
	}
	scale := 0.5 * math.Max(1, formNorm(r.u)) / math.Max(formNorm(z), 1e-300)
	v := make([]float64, n)
	for i := range v {
		v[i] = r.u[i] + scale*z[i]
	}
	return append(starts, v)
}

// kinks returns the inputs along which g falls on both sides of the point
// r (one-sided slopes both below -1e-3 |grad|, or -1e-3 |g(0)| where the
// gradient is zero, and a drop beyond twice the noise of g): the point is
// then a ridge of the safe set, not a most probable failure point. Only
// inputs with a negligible gradient component are checked.
func (f *formSolver) kinks(r *formSearch) []int {
	gn := formNorm(r.grad)
	if gn == 0 {
		gn = f.gScale
	}
	var out []int
	w := append([]float64(nil), r.u...)
	for i := range w {
		if math.Abs(r.grad[i]) > 1e-3*gn {
			continue
		}
		h := 1e-3 * math.Max(1, formNorm(r.u))
		w[i] = r.u[i] + h
		gp := f.eval(w)
		w[i] = r.u[i] - h
		gm := f.eval(w)
		w[i] = r.u[i]
		drop := math.Max(1e-3*gn*h, 2*f.noise) // a drop within noise is no kink
		if gp < r.g-drop && gm < r.g-drop {
			out = append(out, i)
		}
	}
	return out
}
