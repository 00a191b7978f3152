package analysis

import (
	"context"
	"encoding/json"
	"strings"
	"testing"

	"strutrisk/internal/report"
)

// TestVariantOfCarriesTrust: a variant's entry in the result document
// carries its case's trust status and reason, trusted false when the
// engine doubts the estimate.
func TestVariantOfCarriesTrust(t *testing.T) {
	t.Parallel()
	for _, tc := range []struct {
		pt      report.Point
		trusted bool
	}{
		{report.Point{Pf: 1e-3, Beta: 3.09, Status: "converged"}, true},
		{report.Point{Pf: 1e-3, Beta: 3.09, Status: "imprecise", StatusReason: "CoV of pf above 0.5", Doubtful: true}, false},
	} {
		v := variantOf("curve b", &tc.pt)
		if v.Trusted == nil || *v.Trusted != tc.trusted || v.Untrusted() == tc.trusted {
			t.Errorf("%s: trusted %v, want %v", tc.pt.Status, v.Trusted, tc.trusted)
		}
		if v.Status != tc.pt.Status || v.StatusReason != tc.pt.StatusReason || v.Pf != tc.pt.Pf || v.Name != "curve b" {
			t.Errorf("%s: entry %+v", tc.pt.Status, v)
		}
	}
}

// TestSweepPointCarriesTrust: a sweep's case carries its trust status
// into results.json (status, trusted), trusted false exactly when the
// point is doubtful, and so does a variant.
func TestSweepPointCarriesTrust(t *testing.T) {
	l := mustLoad(t, good+`[analysis]
method = "monte-carlo"
samples = 4000
target_cov = 0.2
[sweep]
parameter = "member.length"
values = [2500, 3000]
[[variant]]
name = "heavier"
set = { "loads.dead.mean" = "200 kN" }
`)
	one := l.Settings(1)
	c := runCases(context.Background(), l, &one, quiet{})
	if c == nil || len(c.sweep) != 2 || len(c.variants) != 1 {
		t.Fatalf("cases %+v", c)
	}
	for _, pt := range c.sweep {
		if pt.Trusted == nil || *pt.Trusted == pt.Doubtful || pt.Status == "" {
			t.Errorf("point %g: status %q trusted %v doubtful %v", pt.Value, pt.Status, pt.Trusted, pt.Doubtful)
		}
		js, err := json.Marshal(pt)
		if err != nil || !strings.Contains(string(js), `"trusted":`) || !strings.Contains(string(js), `"status":`) {
			t.Errorf("results.json point %s, %v", js, err)
		}
	}
	if v := c.variants[0]; v.Trusted == nil || v.Status == "" {
		t.Errorf("variant %+v carries no trust status", v)
	}
}
