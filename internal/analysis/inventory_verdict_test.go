package analysis

import (
	"testing"

	"strutrisk/internal/study"
	"strutrisk/sim"
)

// A member's verdict follows the main result's rule (report.TargetVerdict):
// an interval of beta that straddles the target, or an estimate that cannot
// be trusted, is "undecided", never left blank as if there were no target.
func TestMemberVerdict(t *testing.T) {
	st := &study.Study{Target: 3.8}
	for _, c := range []struct {
		name   string
		beta   float64
		ci     [2]float64
		status sim.Status
		want   string
	}{
		{"met", 4.2, [2]float64{4.1, 4.3}, sim.Converged, "met"},
		{"not met", 3.2, [2]float64{3.1, 3.3}, sim.Converged, "not met"},
		{"interval straddles", 3.79, [2]float64{3.7, 3.9}, sim.Converged, "undecided"},
		{"untrusted", 4.2, [2]float64{4.1, 4.3}, sim.Interrupted, "undecided"},
	} {
		res := &sim.Result{Beta: c.beta, BetaCI: c.ci, Status: c.status}
		if got := memberVerdict(st, res); got != c.want {
			t.Errorf("%s: verdict %q, want %q", c.name, got, c.want)
		}
	}
}
