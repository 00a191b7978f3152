package sim

import (
	"context"
	"errors"
	"sync/atomic"
	"testing"
)

// TestFORMStopsWhenCancelled: a FORM analysis whose context is cancelled
// during the search evaluates the limit state no more and returns an
// error wrapping context.Canceled; one cancelled before it starts
// evaluates nothing but the check at the median.
func TestFORMStopsWhenCancelled(t *testing.T) {
	m, _ := sumExpModel(t, 20, 40) // many iterations and restarts
	ref, err := FORM(m, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, after := range []int64{0, 50} {
		ctx, cancel := context.WithCancel(context.Background())
		var calls atomic.Int64
		g := m.G
		mc := *m
		mc.G = func(x, out []float64) float64 {
			if calls.Add(1) == after {
				cancel()
			}
			return g(x, out)
		}
		if after == 0 {
			cancel()
		}
		f, err := FORMContext(ctx, &mc, nil)
		cancel()
		if !errors.Is(err, context.Canceled) {
			t.Errorf("cancelled after %d calls: error %v", after, err)
		}
		if f == nil || f.Converged {
			t.Errorf("cancelled after %d calls: result %+v", after, f)
		}
		if n := calls.Load(); n > after+1 || n >= int64(ref.Evaluations) {
			t.Errorf("cancelled after %d calls: g called %d times (a full analysis %d)", after, n, ref.Evaluations)
		}
	}
}

// TestRunFORMCancelledIsIncomplete: Run with FORM, importance sampling
// or auto and a cancelled context returns an incomplete result, not an
// estimate, and no verdict can be drawn from it.
func TestRunFORMCancelledIsIncomplete(t *testing.T) {
	m, _ := sumExpModel(t, 20, 40)
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	for _, method := range []Method{FORMMethod, Importance, Auto} {
		r, err := Run(ctx, m, &Settings{Method: method, AuxSamples: -1})
		if err != nil {
			t.Fatalf("%s: %v", method, err)
		}
		if !r.Incomplete || r.Status != Interrupted || r.Status.Trusted() {
			t.Errorf("%s: incomplete %v, status %s", method, r.Incomplete, r.Status)
		}
	}
}
