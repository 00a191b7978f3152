package sim

import (
	"context"
	"strings"
	"sync/atomic"
	"testing"
)

// TestSurrogateLearningCap: the learning adds at most
// Surrogate.MaxLearning model evaluations to FORM's, however large the
// budget; a run cut there is Unsettled, not trusted, and its reason names
// the cap (more samples do not lift it). The four-branch system (Echard,
// Gayton and Lemaire 2011) needs some 120 evaluations to settle with
// this seed (TestSurrogateUnsettledIsNotTrusted), so caps of 10 and 40
// cut it and one of 300 does not. The model's calls are counted; past
// 5000 the model cancels the run, so a learning that ran away would fail
// the test instead of hanging it.
func TestSurrogateLearningCap(t *testing.T) {
	for _, c := range []struct {
		learn int
		want  Status
	}{{10, Unsettled}, {40, Unsettled}, {300, Converged}} {
		var calls atomic.Int64
		ctx, cancel := context.WithCancel(context.Background())
		m := fourBranch(6)
		g := m.G
		m.G = func(x, out []float64) float64 {
			if calls.Add(1) > 5000 {
				cancel()
			}
			return g(x, out)
		}
		r, err := Run(ctx, m, &Settings{Method: Surrogate, Samples: 1_000_000, Seed: 2, Workers: 1, AuxSamples: -1,
			TargetCoV: 0.1, Confidence: 0.99, Surrogate: &SurrogateSettings{MaxLearning: c.learn}})
		cancel()
		if err != nil {
			t.Fatal(err)
		}
		form := int64(r.FORM.Evaluations)
		t.Logf("cap %d: %d calls (%d FORM's), %s: %s", c.learn, calls.Load(), form, r.Status, r.StatusReason)
		if r.Incomplete || r.Status != c.want || r.Status.Trusted() != (c.want == Converged) {
			t.Errorf("cap %d: status %s (%s), incomplete %v; want %s", c.learn, r.Status, r.StatusReason, r.Incomplete, c.want)
		}
		if got := calls.Load(); got > form+int64(c.learn) || r.Evaluations != got {
			t.Errorf("cap %d: %d model calls, %d counted, want at most FORM's %d and the cap", c.learn, got, r.Evaluations, form)
		}
		if c.want == Unsettled && !strings.Contains(r.StatusReason, "cap of") {
			t.Errorf("cap %d: reason %q does not name the cap", c.learn, r.StatusReason)
		}
	}
}

// TestSurrogateMaxLearningSetting: the cap defaults to
// DefaultSurrogateMaxLearning and may not be negative.
func TestSurrogateMaxLearningSetting(t *testing.T) {
	if got := (&Settings{}).surrogate().MaxLearning; got != DefaultSurrogateMaxLearning {
		t.Errorf("default MaxLearning %d, want %d", got, DefaultSurrogateMaxLearning)
	}
	if got := (&Settings{Surrogate: &SurrogateSettings{MaxLearning: 7}}).surrogate().MaxLearning; got != 7 {
		t.Errorf("MaxLearning 7 read as %d", got)
	}
	s := &Settings{Surrogate: &SurrogateSettings{MaxLearning: -1}}
	if err := s.checkMethods(); err == nil || !strings.Contains(err.Error(), "MaxLearning") {
		t.Errorf("MaxLearning -1: error %v, want one naming MaxLearning", err)
	}
}
