package analysis

import (
	"context"
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestReserveConfirmationCut: a surrogate confirmation run whose learning
// is cut at its cap (Surrogate.MaxLearning) before it settles leaves the
// reserve factor unconfirmed, says so in a warning that names the cut and
// what the factor then is (FORM's, no verdict), makes no further
// confirmation run, and costs no more model evaluations than FORM's and
// the cap. With the cap lifted the same run settles and confirms.
func TestReserveConfirmationCut(t *testing.T) {
	l := mustLoad(t, good)
	for _, c := range []struct {
		learn int
		cut   bool
	}{{2, true}, {0, false}} {
		s, _, err := l.RunSettings(Overrides{Method: sim.Surrogate, Workers: 1})
		if err != nil {
			t.Fatal(err)
		}
		s.Surrogate = &sim.SurrogateSettings{MaxLearning: c.learn}
		var stages []string
		tr := runTarget(context.Background(), l, &s, stageList{&stages})
		if tr == nil || tr.confirm == nil {
			t.Fatalf("learn %d: no confirmation run: %+v", c.learn, tr)
		}
		res := tr.confirm
		t.Logf("learn %d: factor %.3f, %s after %d evaluations (%s), stages %q, cut %q, notes %q", c.learn, tr.factor, res.Status, res.Evaluations, res.StatusReason, stages, tr.cut, tr.notes)
		if !c.cut {
			if tr.cut != "" || !tr.confirmed {
				t.Errorf("no cap: cut %q, confirmed %v; want a settled confirmation", tr.cut, tr.confirmed)
			}
			continue
		}
		if tr.confirmed || res.Status != sim.Unsettled {
			t.Errorf("cap %d: confirmed %v, status %s; want an unconfirmed, unsettled run", c.learn, tr.confirmed, res.Status)
		}
		if n := res.FORM.Evaluations + c.learn; res.Evaluations > int64(n) {
			t.Errorf("cap %d: %d evaluations, want at most FORM's and the cap, %d", c.learn, res.Evaluations, n)
		}
		for _, want := range []string{"reserve confirmation cut", "cap of 2", "FORM's alone", "unconfirmed", "not that the member meets the target"} {
			if !strings.Contains(tr.cut, want) {
				t.Errorf("cap %d: warning %q lacks %q", c.learn, tr.cut, want)
			}
		}
		if len(stages) != 2 || !strings.Contains(stages[1], "reserve confirmation") {
			t.Errorf("cap %d: stages %q, want FORM then one confirmation run", c.learn, stages)
		}
	}
}

// stageList is an Observer that records the stages.
type stageList struct{ names *[]string }

func (o stageList) Stage(name string) { *o.names = append(*o.names, name) }

func (stageList) StartCase(int, int, string) {}
