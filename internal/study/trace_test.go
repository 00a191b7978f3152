package study

import (
	"strings"
	"testing"
)

// TestTraceAt checks that the trace of the nominal member ends at the
// nominal capacity and is refused for a closed-form model.
func TestTraceAt(t *testing.T) {
	st := parse(t, base+"[capacity]\nmodel = \"beam-column\"\nlimit = \"first-yield\"\n")
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	nom, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	tr, err := md.TraceAt(nil)
	if err != nil {
		t.Fatal(err)
	}
	if !near(tr.Result.N, nom.Capacity, 1e-9) || len(tr.Load) < 2 || len(tr.X) != len(tr.Shape) {
		t.Errorf("trace capacity %v (nominal %v), %d path points, %d/%d shape points", tr.Result.N, nom.Capacity, len(tr.Load), len(tr.X), len(tr.Shape))
	}
	// The path rises to the capacity.
	if last := tr.Load[len(tr.Load)-1]; !near(last, tr.Result.N, 1e-6) {
		t.Errorf("path ends at %v, capacity %v", last, tr.Result.N)
	}
	md2, err := Build(parse(t, base))
	if err != nil {
		t.Fatal(err)
	}
	if _, err := md2.TraceAt(nil); err == nil || !strings.Contains(err.Error(), "beam-column") {
		t.Errorf("perry-robertson trace: %v", err)
	}
}
