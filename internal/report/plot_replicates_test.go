package report

import (
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestConvergenceDrawsWhatTheMethodHas is issue 10's item 14: a trace of
// two points (a conditional quasi-Monte Carlo run of two rounds) is a
// straight line that shows nothing, so the picture draws the replicate
// estimates with their mean and band instead; subset simulation's levels
// are labelled as levels, not as estimates of pf.
func TestConvergenceDrawsWhatTheMethodHas(t *testing.T) {
	t.Parallel()
	reps := []float64{1.2e-4, 1.5e-4, 1.4e-4, 1.3e-4}
	two := []sim.ConvergencePoint{
		{Evaluations: 16000, Pf: 1.37e-4, PfCI: [2]float64{1.2e-4, 1.55e-4}},
		{Evaluations: 32000, Pf: 1.35e-4, PfCI: [2]float64{1.25e-4, 1.45e-4}},
	}
	b := &Bundle{Doc: &Document{Method: "conditional-qmc", Pf: ptr(1.35e-4), PfCI: []float64{1.25e-4, 1.45e-4}},
		Convergence: two, Replicates: reps, ReplicateName: "randomisation"}
	f := convergenceFigure(b)
	if f == nil {
		t.Fatal("no picture")
	}
	if title := f.Plots[0].Title.Text; !strings.Contains(title, "Independent estimates") {
		t.Errorf("two-point trace drawn as %q, want the replicate estimates", title)
	}
	if !strings.Contains(f.Caption, "not drawn") || !strings.Contains(f.Caption, "randomisation") {
		t.Errorf("caption %q does not say why the trace is left out", f.Caption)
	}

	// With a longer trace the trace itself is drawn.
	var long []sim.ConvergencePoint
	for i := 0; i < 5; i++ {
		long = append(long, sim.ConvergencePoint{Evaluations: int64(1000 << i), Pf: 1.35e-4, PfCI: [2]float64{1.2e-4, 1.5e-4}})
	}
	b.Convergence = long
	if f = convergenceFigure(b); f == nil || !strings.Contains(f.Plots[0].Title.Text, "Convergence") {
		t.Errorf("a five-point trace is not drawn as a trace")
	}

	// Subset simulation: the levels are not estimates of pf.
	b = &Bundle{Doc: &Document{Method: "subset", Pf: ptr(4e-4), PfCI: []float64{3e-4, 5e-4}, Evaluations: ptr(int64(40000))},
		TraceKind: sim.TraceLevels,
		Convergence: []sim.ConvergencePoint{
			{Evaluations: 10000, Pf: 0.1}, {Evaluations: 19000, Pf: 0.01}, {Evaluations: 28000, Pf: 1e-3}},
	}
	if f = convergenceFigure(b); f == nil {
		t.Fatal("no subset picture")
	}
	if !strings.Contains(f.Plots[0].Title.Text, "Levels") || !strings.Contains(f.Caption, "Only the last point") {
		t.Errorf("subset levels drawn as %q: %s", f.Plots[0].Title.Text, f.Caption)
	}
	if !strings.Contains(f.Plots[0].Y.Label.Text, "level") {
		t.Errorf("pf axis of levels labelled %q", f.Plots[0].Y.Label.Text)
	}
}
