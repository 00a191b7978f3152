package study

import (
	"context"
	"errors"
	"math"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
)

// lognormalRS is fixture.Stocky with a reference period: a stocky solid
// square strut on the buckling-curve model whose relative slenderness
// stays below 0.2, so chi = 1 (EN 1993-1-1:2005 6.3.1.2(4)) and the
// capacity is R = A fy x model factor, a lognormal, against a lognormal
// load S. The reliability index is then exact in closed form (Melchers
// and Beck, Structural Reliability Analysis and Prediction, 3rd ed., 2018,
// chapter 3, lognormal R and S; from memory):
//
//	beta(lambda) = [ln(muR / (lambda muS)) + ln sqrt((1+VS^2)/(1+VR^2))] / D,
//	D = sqrt(ln[(1+VR^2)(1+VS^2)])
//
// with S multiplied by lambda, so the factor at which beta equals a target
// is lambda = exp((beta(1) - target) D). FORM is exact here: ln R - ln S
// is linear in standard normal space.
var lognormalRS = strings.Replace(fixture.Stocky, "beta = 3.8\n", "beta = 3.8\nreference_period = \"50 years\"\n", 1)

func TestReserveFactorClosedForm(t *testing.T) {
	st := parse(t, lognormalRS)
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	beta1 := fixture.StockyBeta(1)
	for _, target := range []float64{2.5, 3.1, 3.8, 4.7} {
		r, err := md.Reserve(context.Background(), target, nil)
		if err != nil {
			t.Fatalf("target %g: %v", target, err)
		}
		want := fixture.StockyFactor(target)
		if !near(r.Factor, want, 1e-4) || math.Abs(r.FactorBeta-target) > ReserveTol {
			t.Errorf("target %g: factor %.6f (FORM beta %.5f), want %.6f", target, r.Factor, r.FactorBeta, want)
		}
		if len(r.Loads) != 1 || r.Loads[0] != "loads.axial" || r.On != "variable" {
			t.Errorf("reserve on %s %v, want the variable load loads.axial", r.On, r.Loads)
		}
		// The added load brings FORM beta to the target; it is negative
		// exactly when the target is missed.
		if r.AddedErr != nil {
			t.Fatalf("target %g: %v", target, r.AddedErr)
		}
		if (r.Added < 0) != (target > beta1) {
			t.Errorf("target %g (beta %.3f): added load %g N has the wrong sign", target, beta1, r.Added)
		}
		if b, err := md.formBeta(context.Background(), 1, r.Added, nil); err != nil || math.Abs(b-target) > 10*ReserveTol {
			t.Errorf("target %g: FORM beta %.5f with the added load %g N (%v)", target, b, r.Added, err)
		}
	}
	if st.ReferencePeriod != "50 years" {
		t.Errorf("reference period %q", st.ReferencePeriod)
	}
}

// TestLoadedScales: the factor multiplies the variable loads (or all), the
// added load joins the sum, and Loaded(1, 0) is the study's model; the
// linear split of the loaded model reproduces its g.
func TestLoadedScales(t *testing.T) {
	text := strings.Replace(base, "dead = 300000\n", "dead = 300000\nimposed = { dist = \"gumbel\", mean = 80000, cov = 0.3 }\nwind = 20000\n", 1)
	for _, c := range []struct {
		target string
		want   func(imposed float64) float64 // demand at factor 2, 5 kN added
	}{
		{"[target]\nbeta = 3.8\n", func(x float64) float64 { return 300000 + 2*x + 2*20000 + 5000 }},
		{"[target]\nbeta = 3.8\nreserve_on = \"all\"\n", func(x float64) float64 { return 2*(300000+x+20000) + 5000 }},
		{"[target]\nbeta = 3.8\npermanent = [\"dead\", \"wind\"]\n", func(x float64) float64 { return 300000 + 2*x + 20000 + 5000 }},
		{"[target]\nbeta = 3.8\npermanent = []\n", func(x float64) float64 { return 2*(300000+x+20000) + 5000 }},
	} {
		st := parse(t, text+c.target)
		md, err := Build(st)
		if err != nil {
			t.Fatal(err)
		}
		x := medians(md)
		out0, out1 := make([]float64, 2), make([]float64, 2)
		same := md.Loaded(1, 0)
		if g0, g1 := md.Sim.G(x, out0), same.G(x, out1); g0 != g1 || out0 != nil && out0[1] != out1[1] {
			t.Errorf("Loaded(1, 0) gives g %g, the study %g", g1, g0)
		}
		m := md.Loaded(2, 5000)
		g := m.G(x, out1)
		if want := c.want(x[0]); !near(out1[OutDemand], want, 1e-12) {
			t.Errorf("%q: demand %g, want %g", c.target, out1[OutDemand], want)
		}
		if m.Linear == nil {
			t.Fatal("the loaded model lost the linear split")
		}
		h, cc := m.Linear.Split(x)
		if !near(h-cc*x[m.Linear.Index], g, 1e-9) {
			t.Errorf("%q: split h - c x = %g, g = %g", c.target, h-cc*x[m.Linear.Index], g)
		}
	}
}

// TestLoadedNoAllocation: the loaded model's limit state does not
// allocate, as the study's.
func TestLoadedNoAllocation(t *testing.T) {
	md := loadDemo(t, "retrofit-column.toml")
	m := md.Loaded(1.3, 2000)
	x := medians(md)
	out := make([]float64, 2)
	if a := testing.AllocsPerRun(100, func() { m.G(x, out) }); a != 0 {
		t.Errorf("%g allocations per evaluation", a)
	}
}

// TestTargetKeys: defaults are listed; problems name the key and line.
func TestTargetKeys(t *testing.T) {
	text := strings.Replace(base, "dead = 300000\n", "dead = 300000\nimposed = 50000\n", 1)
	st := parse(t, text+"[target]\nbeta = 3.8\n")
	d := strings.Join(st.Defaults, "\n")
	if !strings.Contains(d, "target.permanent: not given; loads.dead taken as permanent") || !strings.Contains(d, "target.reserve_on: not given") {
		t.Errorf("defaults do not list the reserve rule:\n%s", d)
	}
	if l := st.ReserveLoads(); len(l) != 1 || l[0].Path != "loads.imposed" {
		t.Errorf("reserve loads %v, want loads.imposed", l)
	}
	line := strings.Count(text, "\n") + 3
	for _, c := range []struct{ extra, key, msg string }{
		{"reserve_on = \"imposed\"", "target.reserve_on", "not a choice"},
		{"permanent = [\"deed\"]", "target.permanent[0]", "did you mean \"dead\""},
		{"permanent = \"dead\"", "target.permanent", "list of load names"},
		{"permanent = [\"dead\", \"imposed\"]", "target.reserve_on", "every load is permanent"},
		{"reference_period = 50", "target.reference_period", "text in quotes"},
	} {
		_, err := Parse("t.toml", []byte(text+"[target]\nbeta = 3.8\n"+c.extra+"\n"))
		var se *Error
		if !errors.As(err, &se) {
			t.Errorf("%s: no error", c.extra)
			continue
		}
		found := false
		for _, p := range se.Problems {
			if p.Key == c.key && strings.Contains(p.Msg, c.msg) {
				found = true
				if p.Line != line && c.key != "target.reserve_on" {
					t.Errorf("%s: line %d, want %d", c.extra, p.Line, line)
				}
			}
		}
		if !found {
			t.Errorf("%s: want %s with %q, got\n%v", c.extra, c.key, c.msg, err)
		}
	}
}

// BenchmarkLoaded is one evaluation of the loaded model's limit state: it
// must not allocate (compare BenchmarkG of the study's own model).
func BenchmarkLoaded(b *testing.B) {
	md := loadDemo(b, "retrofit-column.toml")
	m := md.Loaded(1.3, 2000)
	x := medians(md)
	out := make([]float64, 2)
	b.ReportAllocs()
	for b.Loop() {
		m.G(x, out)
	}
}

// TestReserveStopsWhenCancelled: the reserve search with a cancelled
// context stops at its first FORM analysis with an error wrapping
// context.Canceled (Ctrl-C during a beam-column search once took 21 s).
func TestReserveStopsWhenCancelled(t *testing.T) {
	md, err := Build(parse(t, lognormalRS))
	if err != nil {
		t.Fatal(err)
	}
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	r, err := md.Reserve(ctx, 3.8, nil)
	if !errors.Is(err, context.Canceled) || r != nil {
		t.Errorf("reserve %+v, error %v; want context.Canceled", r, err)
	}
	if _, _, calls, err := md.FactorFor(ctx, 3.8, nil); calls != 1 || !errors.Is(err, context.Canceled) {
		t.Errorf("factor search: %d FORM calls, error %v", calls, err)
	}
}
