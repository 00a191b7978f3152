package report

import (
	"math"
	"strings"
	"testing"

	"strutrisk/sim"
)

// The pf axis of the convergence picture spans the estimate and its band,
// not from zero; it is logarithmic when they span more than a decade, and
// a final estimate missing from the trace is drawn after it.
func TestConvergenceAxis(t *testing.T) {
	t.Parallel()
	trace := func(pf ...float64) []sim.ConvergencePoint {
		var c []sim.ConvergencePoint
		for i, p := range pf {
			c = append(c, sim.ConvergencePoint{Evaluations: int64(1000 << i), Pf: p, PfCI: [2]float64{0.9 * p, 1.1 * p}})
		}
		return c
	}

	// A settled Monte Carlo estimate near 1.25e-4.
	b := &Bundle{Doc: &Document{Method: "monte-carlo"}, Convergence: trace(1.2e-4, 1.3e-4, 1.25e-4)}
	f := convergenceFigure(b)
	if f == nil {
		t.Fatal("no picture")
	}
	y := f.Plots[0].Y
	if _, ok := y.Tick.Marker.(niceTicks); !ok {
		t.Errorf("linear case: tick marker %T, want niceTicks", y.Tick.Marker)
	}
	lo, hi := 0.9*1.2e-4, 1.1*1.3e-4 // the band
	if !(y.Min > 0.5*lo && y.Min <= lo) {
		t.Errorf("linear case: axis starts at %g, want a little below the band's low %g", y.Min, lo)
	}
	if !(y.Max >= hi && y.Max < 2*hi) {
		t.Errorf("linear case: axis ends at %g, want a little above the band's high %g", y.Max, hi)
	}
	if !strings.Contains(f.Caption, "not from zero") {
		t.Errorf("linear case: caption %q does not say the axis is not from zero", f.Caption)
	}

	// Subset-like: intermediate levels 0.1, 0.01, 1e-3 without intervals,
	// then a final estimate after them from the document.
	b = &Bundle{
		Doc: &Document{Method: "subset", Pf: ptr(4e-4), PfCI: []float64{3e-4, 5e-4}, Evaluations: ptr(int64(40000))},
		Convergence: []sim.ConvergencePoint{
			{Evaluations: 10000, Pf: 0.1}, {Evaluations: 19000, Pf: 0.01}, {Evaluations: 28000, Pf: 1e-3}},
	}
	f = convergenceFigure(b)
	if f == nil {
		t.Fatal("no picture")
	}
	p := f.Plots[0]
	if _, ok := p.Y.Tick.Marker.(exponentTicks); !ok {
		t.Errorf("log case: tick marker %T, want exponentTicks", p.Y.Tick.Marker)
	}
	if want := math.Log10(3e-4); !(p.Y.Min <= want && p.Y.Min >= want-1) {
		t.Errorf("log case: axis starts at 10^%g, want at most a decade below the final interval's low 3e-4", p.Y.Min)
	}
	if p.Y.Max > 0 || p.Y.Max < -1 {
		t.Errorf("log case: axis ends at 10^%g, want between 0.1 and 1", p.Y.Max)
	}
	if !(p.X.Max >= 40000) {
		t.Errorf("log case: evaluations axis ends at %g, before the final estimate at 40 000", p.X.Max)
	}
	svg, err := f.render("svg")
	if err != nil {
		t.Fatal(err)
	}
	if g := string(svg); !strings.Contains(g, "final 4e-4") || !strings.Contains(g, "3e-4 to 5e-4") {
		t.Error("log case: the legend does not give the final estimate and its interval")
	}
}

func TestAxisProb(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		lo, hi float64
		v      []float64
		want   string
	}{
		{0, 0.5, []float64{0, 0.1, 0.25}, "0 0.1 0.25"},
		{1.1e-4, 1.5e-4, []float64{1.1e-4, 1.25e-4}, "1.1e-4 1.25e-4"},
		// A narrow band: neighbouring labels must differ.
		{1.2340e-4, 1.2350e-4, []float64{1.2342e-4, 1.2344e-4}, "1.2342e-4 1.2344e-4"},
	} {
		f := axisProb(c.lo, c.hi)
		var got []string
		for _, v := range c.v {
			got = append(got, f(v))
		}
		if g := strings.Join(got, " "); g != c.want {
			t.Errorf("axisProb(%g, %g) labels %q, want %q", c.lo, c.hi, g, c.want)
		}
	}
}
