package analysis

import (
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
