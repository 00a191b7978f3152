package report

import (
	"strings"
	"testing"
)

// lambdaBundle is the demo bundle with the relative slenderness of its
// swept lengths: proportional to the length for a pinned member of fixed
// section (EN 1993-1-1:2005 eq. 6.50), 0.972 at 5200 mm as in the demo.
func lambdaBundle() *Bundle {
	b := demoBundle()
	b.SweepLambda = map[float64]float64{}
	for _, p := range b.Doc.Sweep {
		b.SweepLambda[p.Value] = 0.972 * p.Value / 5200
	}
	b.SweepLambdaAxis = "minor"
	return b
}

func TestLambdaTicks(t *testing.T) {
	t.Parallel()
	b := lambdaBundle()
	lt := newLambdaTicks(b, niceTicks{})
	if lt == nil {
		t.Fatal("no λ ticks")
	}
	// Linear between the swept values: 3500 mm lies halfway from 3000 to 4000.
	if l, ok := lt.at(3500); !ok || !near(l, 0.972*3500/5200, 1e-12) {
		t.Errorf("λ at 3500 = %v, %v", l, ok)
	}
	if _, ok := lt.at(2000); ok {
		t.Error("λ given outside the swept range")
	}
	labelled := 0
	for _, tk := range lt.Ticks(3000, 6000) {
		if strings.Contains(tk.Label, "\nλ ") {
			labelled++
		}
	}
	if labelled < 2 {
		t.Errorf("%d ticks carry λ, want every labelled tick in range", labelled)
	}
	if f := sweepFigure(b); f == nil || !strings.Contains(f.Caption, "relative slenderness λ") || !strings.Contains(f.Caption, "minor axis") {
		t.Errorf("sweep caption does not explain the λ scale")
	}
	if newLambdaTicks(demoBundle(), niceTicks{}) != nil {
		t.Error("λ ticks without λ values")
	}
}

func near(a, b, tol float64) bool { d := a - b; return d <= tol && -d <= tol }

func TestSweepTablesEveryCurve(t *testing.T) {
	t.Parallel()
	b := lambdaBundle()
	out, err := seriesCSV(b)
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(strings.TrimSpace(string(out)), "\n")
	if !strings.HasSuffix(lines[0], `"relative_slenderness (nominal, minor axis)"`) {
		t.Errorf("CSV head %q", lines[0])
	}
	// 6000 mm: 0.972 x 6000 / 5200 = 1.1215.
	if !strings.HasSuffix(lines[4], ",1.1215") {
		t.Errorf("CSV row %q, want relative slenderness 1.1215", lines[4])
	}
	tb := sweepCurvesTable(b)
	if tb == nil || len(tb.Rows) != 4 || len(tb.Head) != 2+len(b.Series) {
		t.Fatalf("table of every curve: %+v", tb)
	}
	for _, s := range b.Series {
		if !strings.Contains(strings.Join(tb.Head, "|"), s.Name+": β (–)") {
			t.Errorf("no column for %s in %q", s.Name, tb.Head)
		}
	}
	if tb.Rows[3][1] != "1.122" {
		t.Errorf("λ at 6000 mm: %q", tb.Rows[3][1])
	}
}
