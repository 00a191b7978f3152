package sim

import (
	"context"
	"testing"
)

// TestSurrogateUnsettledIsNotTrusted: a budget that ends while the
// Kriging model still doubts the sign of some candidates (least U below
// 2) leaves a result no verdict may be drawn from, however narrow its
// interval looks; a budget the learning settles within stays trusted.
// The four-branch system (Echard, Gayton and Lemaire 2011; pf 4.416e-3)
// settles after some 120 evaluations with this seed.
func TestSurrogateUnsettledIsNotTrusted(t *testing.T) {
	for _, c := range []struct {
		budget int64
		want   Status
	}{{100, Unsettled}, {120, Unsettled}, {200, Converged}} {
		r, err := Run(context.Background(), fourBranch(6), &Settings{Method: Surrogate, Samples: c.budget, Seed: 2, Workers: 1, AuxSamples: -1,
			TargetCoV: 0.1, Confidence: 0.99})
		if err != nil {
			t.Fatal(err)
		}
		t.Logf("budget %d: pf %.4g in %.4g (CoV %.3g), %d evaluations, %s: %s", c.budget, r.Pf, r.PfCI, r.PfCoV, r.Evaluations, r.Status, r.StatusReason)
		if r.Status != c.want || r.Status.Trusted() != (c.want == Converged) {
			t.Errorf("budget %d: status %s (%s), want %s", c.budget, r.Status, r.StatusReason, c.want)
		}
	}
}
