package analysis

import (
	"context"
	"math/rand/v2"
	"testing"

	"strutrisk/internal/report"
)

// gridStudy is the Good strut swept over a grid of length and bow, with a
// variant, sampled by Monte Carlo.
const gridStudy = good + `[analysis]
method = "monte-carlo"
samples = 20000
target_cov = 0.1
[sweep]
[[sweep.axis]]
parameter = "member.length"
values = [2500, 3000]
[[sweep.axis]]
parameter = "imperfection.bow"
values = [1, 4]
[[variant]]
name = "heavier"
set = { "loads.dead.mean" = "200 kN" }
`

// TestCasesAnyOrder: each case's numbers depend on the study, the case
// and the seed only. The cases run in a shuffled order on two workers
// give, bit for bit, the results of the run in order on one.
func TestCasesAnyOrder(t *testing.T) {
	l := mustLoad(t, gridStudy)
	ctx := context.Background()
	one := l.Settings(1)
	c := runCases(ctx, l, &one, quiet{})
	list := l.Study.CaseList()
	if len(list) != 2*(4+1)-1 {
		t.Fatalf("%d cases, want 9", len(list))
	}
	two := l.Settings(2)
	settings := caseSettings(&two)
	rng := rand.New(rand.NewPCG(7, 11))
	for _, k := range rng.Perm(len(list)) {
		cs := list[k]
		got, _, err := runCase(ctx, l.Study, cs.Variant, cs.Point, &settings)
		if err != nil {
			t.Fatalf("%s: %v", cs.Name, err)
		}
		var want report.Point
		if cs.Point < 0 {
			v := c.variants[cs.Variant]
			want = report.Point{Pf: v.Pf, Beta: v.Beta, PfCI: v.PfCI}
		} else {
			want = *c.grid[cs.Variant+1][cs.Point]
			got.Values, want.Values = nil, nil
			if got.Value != want.Value {
				t.Errorf("%s: value %v, in order %v", cs.Name, got.Value, want.Value)
			}
		}
		if !(got.Pf > 0) {
			t.Errorf("%s: pf %g: the case shows nothing", cs.Name, got.Pf)
		}
		if got.Pf != want.Pf || got.Beta != want.Beta || got.PfCI != want.PfCI {
			t.Errorf("%s: shuffled on 2 workers pf %v beta %v ci %v; in order on 1: pf %v beta %v ci %v",
				cs.Name, got.Pf, got.Beta, got.PfCI, want.Pf, want.Beta, want.PfCI)
		}
	}
}
