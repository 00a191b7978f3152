package study

import (
	"context"
	"errors"
	"fmt"
	"math"

	"strutrisk/sim"
)

// Reserve is the margin of a study against a target reliability index,
// found by FORM.
type Reserve struct {
	// Target is the target reliability index.
	Target float64
	// On is "variable" or "all"; Loads are the paths of the loads the
	// factor multiplies.
	On    string
	Loads []string
	// Factor is the reserve factor: the factor on Loads at which the FORM
	// reliability index equals Target (above 1: the target is met with
	// room to spare). FactorBeta is the FORM index found there.
	Factor, FactorBeta float64
	// Added is the largest added load (N): the deterministic axial load
	// that, added to the study's loads (and multiplied by the effect
	// factor as they are), brings the FORM index down to Target. It is
	// negative when the target is missed: the load to take away.
	// AddedErr says why it was not found (then Added is NaN).
	Added    float64
	AddedErr error
	// FORMCalls counts the FORM analyses of the search.
	FORMCalls int
}

// ReserveTol is the tolerance on the reliability index of the searches.
const ReserveTol = 1e-4

// Reserve finds the reserve factor and the largest added load of the
// study for the target reliability index target, by root finding on the
// FORM index: beta(factor) and beta(added load) both fall as the load
// grows. fs are passed to sim.FORM (nil: those of Model.FORMSettings).
func (md *Model) Reserve(ctx context.Context, target float64, fs *sim.FORMSettings) (*Reserve, error) {
	r, err := md.ReserveFactor(ctx, target, fs, nil)
	if err != nil {
		return nil, err
	}
	var calls int
	r.Added, calls, err = md.AddedFor(ctx, target, fs)
	r.FORMCalls += calls
	if err != nil {
		r.Added, r.AddedErr = math.NaN(), fmt.Errorf("largest added load: %v", err)
	}
	return r, nil
}

// ReserveFactor is Reserve without the largest added load (Added NaN,
// AddedErr nil): half the FORM analyses, for a caller that reports the
// factor alone (an inventory's members). at1, when not nil and
// converged, is the FORM result of the study's own loads (factor 1) with
// settings fs, which the search then takes instead of analysing it again,
// stepping from it by secants (fewer analyses; the factor found is
// another within the tolerance ReserveTol on the index).
func (md *Model) ReserveFactor(ctx context.Context, target float64, fs *sim.FORMSettings, at1 *sim.FORMResult) (*Reserve, error) {
	st := md.Study
	r := &Reserve{Target: target, On: st.ReserveOn, Added: math.NaN()}
	if r.On == "" {
		r.On = "variable"
	}
	for _, q := range st.ReserveActions() {
		r.Loads = append(r.Loads, q.Path)
	}
	if len(r.Loads) == 0 {
		return nil, errors.New("no load to multiply: every load is permanent")
	}
	var err error
	r.Factor, r.FactorBeta, r.FORMCalls, err = md.factorFor(ctx, target, fs, at1)
	if err != nil {
		return nil, err // the caller says it is the reserve factor that failed
	}
	return r, nil
}

// formBeta is the FORM index of the study with the reserve loads
// multiplied by factor and the load added. nil fs are the settings that
// suit the capacity model (Model.FORMSettings). A search that does not
// converge is tried once more with the finite-difference step of a noisy
// model, numericalStep, before the root search is given up.
func (md *Model) formBeta(ctx context.Context, factor, added float64, fs *sim.FORMSettings) (float64, error) {
	if fs == nil {
		fs = md.FORMSettings()
	}
	m := md.Loaded(factor, added)
	f, err := sim.FORMContext(ctx, m, fs)
	if err != nil {
		return math.NaN(), err
	}
	if !f.Converged && (fs == nil || fs.Step < numericalStep) {
		retry := sim.FORMSettings{Step: numericalStep}
		if fs != nil {
			retry = *fs
			retry.Step = numericalStep
		}
		if f2, err := sim.FORMContext(ctx, m, &retry); err == nil && f2.Converged {
			return f2.Beta, nil
		}
	}
	if !f.Converged {
		at := fmt.Sprintf("a factor of %.4g on the loads", factor)
		if added != 0 {
			at = fmt.Sprintf("an added load of %.4g N", added)
		}
		return math.NaN(), fmt.Errorf("FORM did not converge at %s (%s)", at, f.Status)
	}
	return f.Beta, nil
}

// FactorFor returns the factor on the reserve loads at which the FORM
// reliability index equals beta, the index found there and the number of
// FORM analyses used. The search is on the logarithm of the factor,
// between 1e-3 and 1e3.
func (md *Model) FactorFor(ctx context.Context, beta float64, fs *sim.FORMSettings) (factor, found float64, calls int, err error) {
	return md.factorFor(ctx, beta, fs, nil)
}

// factorFor is FactorFor, taking at1 (not nil and converged) as the FORM
// result at factor 1, which calls does not count, and searching from it
// by the secant method (secantRoot) before bracketing: the root is then
// another point within ReserveTol of the index.
func (md *Model) factorFor(ctx context.Context, beta float64, fs *sim.FORMSettings, at1 *sim.FORMResult) (factor, found float64, calls int, err error) {
	// The root is a point the search evaluated last: its index is kept,
	// not found again.
	lastT, lastB := math.NaN(), math.NaN()
	f := func(t float64) (float64, error) {
		if t == 0 && at1 != nil && at1.Converged {
			lastT, lastB = t, at1.Beta
			return at1.Beta - beta, nil
		}
		calls++
		b, err := md.formBeta(ctx, math.Exp(t), 0, fs)
		lastT, lastB = t, b
		return b - beta, err
	}
	lo, hi := math.Log(1e-3), math.Log(1e3)
	var t float64
	ok := false
	if at1 != nil && at1.Converged {
		t, ok, err = secantRoot(f, 0, at1.Beta-beta, lo, hi)
	}
	if !ok && err == nil {
		t, err = fallingRoot(f, 0, math.Ln2, lo, hi)
	}
	var be *boundError
	if errors.As(err, &be) {
		be.bound = fmt.Sprintf("a factor of %.4g", math.Exp(be.at)) // not its logarithm
	}
	if err != nil {
		return math.NaN(), math.NaN(), calls, err
	}
	factor = math.Exp(t)
	if t == lastT {
		return factor, lastB, calls, nil
	}
	calls++
	found, err = md.formBeta(ctx, factor, 0, fs)
	return factor, found, calls, err
}

// AddedFor returns the deterministic axial load (N) that, added to the
// study's loads, brings the FORM reliability index to beta (negative: the
// load to take away), and the number of FORM analyses used. The search
// runs from taking away the whole mean load to adding a thousand times it.
func (md *Model) AddedFor(ctx context.Context, beta float64, fs *sim.FORMSettings) (added float64, calls int, err error) {
	nv := md.nominalValues()
	unit := math.Abs(nv[fLoads] + md.caseLoad(&nv))
	if unit == 0 {
		unit = 1e3
	}
	f := func(a float64) (float64, error) {
		calls++
		b, err := md.formBeta(ctx, 1, a*unit, fs)
		return b - beta, err
	}
	a, err := fallingRoot(f, 0, 0.25, -1, 1e3)
	var be *boundError
	if errors.As(err, &be) {
		be.bound = fmt.Sprintf("an added load of %.4g kN", be.at*unit/1e3)
	}
	if err != nil {
		return math.NaN(), calls, err
	}
	return a * unit, calls, nil
}

// fallingRoot finds the root of a decreasing function f between lo and hi,
// starting at x0 and stepping by step (doubled each time) towards the
// sign change, then closing in by the Illinois variant of regula falsi
// (Dowell and Jarratt, BIT 11 (1971) 168-174), with a bisection step when
// the bracket shrinks slowly.
func fallingRoot(f func(float64) (float64, error), x0, step, lo, hi float64) (float64, error) {
	f0, err := f(x0)
	if err != nil {
		return 0, err
	}
	if f0 == 0 {
		return x0, nil
	}
	a, fa := x0, f0
	b, fb := x0, f0
	dir := 1.0
	if f0 < 0 {
		dir = -1
	}
	for {
		b = a + dir*step
		if b > hi || b < lo {
			b = math.Max(lo, math.Min(hi, b))
		}
		if fb, err = f(b); err != nil {
			return 0, err
		}
		if fb == 0 || math.Signbit(fb) != math.Signbit(fa) {
			break
		}
		if b == lo || b == hi {
			return 0, &boundError{at: b, met: dir > 0}
		}
		a, fa = b, fb
		step *= 2
	}
	if fb == 0 {
		return b, nil
	}
	side := 0
	for range 100 {
		x := (a*fb - b*fa) / (fb - fa)
		if !(x > math.Min(a, b) && x < math.Max(a, b)) {
			x = (a + b) / 2
		}
		fx, err := f(x)
		if err != nil {
			return 0, err
		}
		if math.Abs(fx) < ReserveTol || math.Abs(b-a) < 1e-9*(1+math.Abs(x)) {
			return x, nil
		}
		if math.Signbit(fx) == math.Signbit(fb) {
			b, fb = x, fx
			if side == -1 {
				fa /= 2
			}
			side = -1
		} else {
			a, fa = x, fx
			if side == +1 {
				fb /= 2
			}
			side = +1
		}
	}
	return 0, errors.New("the search did not converge in 100 steps")
}

// boundError is the error of fallingRoot when the root lies beyond the
// bound of its search; bound, when set, names the bound for the reader
// (else the number at is printed).
type boundError struct {
	at    float64
	met   bool
	bound string
}

func (e *boundError) Error() string {
	b := e.bound
	if b == "" {
		b = fmt.Sprintf("%.4g", e.at)
	}
	if e.met {
		return fmt.Sprintf("the target is still met at the bound of the search (%s); the reliability index hardly falls with the load", b)
	}
	return fmt.Sprintf("the target is missed even at the bound of the search (%s)", b)
}
