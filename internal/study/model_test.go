package study

import (
	"math"
	"strings"
	"testing"
)

func loadDemo(t testing.TB, name string) *Model {
	t.Helper()
	st, err := Load("../../studies/" + name)
	if err != nil {
		t.Fatal(err)
	}
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	return md
}

func medians(md *Model) []float64 {
	x := make([]float64, len(md.Sim.Vars))
	for i, v := range md.Sim.Vars {
		x[i] = v.Dist.Quantile(0.5)
	}
	return x
}

// TestLimitState: g = model factor x capacity - effect factor x sum of
// loads, checked by recomputing the parts at one point.
func TestLimitState(t *testing.T) {
	text := base + "effect_factor = 1.1\nlive = \"50 kN\"\n[capacity]\nmodel_factor = 0.9\n"
	st := parse(t, text)
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	out := make([]float64, 2)
	g := md.Sim.G(nil, out)
	n, _ := md.Nominal()
	if want := 1.1 * (300000 + 50000); !near(out[OutDemand], want, 1e-12) {
		t.Errorf("demand %g, want %g", out[OutDemand], want)
	}
	if !near(out[OutCapacity], n.Capacity, 1e-12) || !near(g, out[0]-out[1], 1e-12) {
		t.Errorf("g %g, capacity %g, nominal %g", g, out[0], n.Capacity)
	}
	if md.Sim.Linear != nil {
		t.Error("Linear set although no load is random")
	}
}

// TestLinear: the split h - c x_j reproduces g.
func TestLinear(t *testing.T) {
	md := loadDemo(t, "retrofit-column.toml")
	lin := md.Sim.Linear
	if lin == nil || md.Sim.Vars[lin.Index].Name != "loads.imposed" {
		t.Fatalf("Linear = %+v, want the imposed load", lin)
	}
	x := medians(md)
	for _, xi := range []float64{1e5, 4e5, 9e5} {
		x[lin.Index] = xi
		h, c := lin.Split(x)
		if g := md.Sim.G(x, nil); !near(h-c*xi, g, 1e-9) {
			t.Errorf("h - c x = %g, g = %g", h-c*xi, g)
		}
	}
	// A correlated load is not used.
	ecc := loadDemo(t, "eccentric-strut.toml")
	if ecc.Sim.Linear != nil {
		t.Errorf("Linear set on a correlated load: %s", ecc.Sim.Vars[ecc.Sim.Linear.Index].Name)
	}
}

func TestVariableNames(t *testing.T) {
	md := loadDemo(t, "retrofit-column.toml")
	var names []string
	for _, v := range md.Sim.Vars {
		names = append(names, v.Name)
	}
	want := "member.k_major member.k_minor member.section.thickness_loss material.modulus material.yield imperfection.bow capacity.model_factor loads.dead loads.imposed loads.effect_factor"
	if got := strings.Join(names, " "); got != want {
		t.Errorf("variables\n%s\nwant\n%s", got, want)
	}
}

// TestNonPhysicalSample: a sample the mechanics cannot evaluate has no
// capacity (it fails) instead of a NaN.
func TestNonPhysicalSample(t *testing.T) {
	md := loadDemo(t, "retrofit-column.toml")
	x := medians(md)
	x[3] = -1 // material.modulus
	out := make([]float64, 2)
	g := md.Sim.G(x, out)
	if out[0] != 0 || math.IsNaN(g) || g >= 0 {
		t.Errorf("g %g capacity %g for a negative modulus", g, out[0])
	}
}

func BenchmarkG(b *testing.B) {
	for _, name := range []string{"retrofit-column.toml", "eccentric-strut.toml", "rare-event.toml"} {
		b.Run(strings.TrimSuffix(name, ".toml"), func(b *testing.B) {
			md := loadDemo(b, name)
			x := medians(md)
			out := make([]float64, 2)
			b.ReportAllocs()
			for b.Loop() {
				md.Sim.G(x, out)
			}
		})
	}
}

// TestGDoesNotAllocate: one evaluation allocates nothing.
func TestGDoesNotAllocate(t *testing.T) {
	// Random end springs (K solved per sample) on a secant-model RHS.
	springs := strings.Replace(base, `ends = "pinned-pinned"`, "spring_top = { dist = \"lognormal\", mean = \"2000 kN*m\", cov = 0.3 }\nspring_bottom = { major = \"rigid\", minor = 0 }", 1)
	springs = strings.Replace(springs, "shape = \"CHS\"\ndiameter = 168.3\nthickness = 8", "shape = \"RHS\"\ndepth = 200\nwidth = 100\nthickness = { dist = \"normal\", mean = 8, sd = 0.3 }", 1)
	springs = strings.Replace(springs, `bow = "L/1000"`, `bow = "L/1000"`+"\neccentricity = \"5 mm\"", 1) + "[capacity]\nmodel = \"secant\"\n"
	md, err := Build(parse(t, springs))
	if err != nil {
		t.Fatal(err)
	}
	x := medians(md)
	out := make([]float64, 2)
	if n := testing.AllocsPerRun(100, func() { md.Sim.G(x, out) }); n != 0 {
		t.Errorf("springs: %v allocations per evaluation", n)
	}
	for _, name := range []string{"retrofit-column.toml", "eccentric-strut.toml", "rare-event.toml", "imperfection-comparison.toml", "bench/reference-strut.toml"} {
		md := loadDemo(t, name)
		x := medians(md)
		out := make([]float64, 2)
		if n := testing.AllocsPerRun(100, func() { md.Sim.G(x, out) }); n != 0 {
			t.Errorf("%s: %v allocations per evaluation", name, n)
		}
	}
}

// TestCurveChart: on the buckling-curve model the chart is chi of
// EN 1993-1-1:2005 eq. (6.49): curve b at relative slenderness 1, 2, 3
// gives 0.597023, 0.209461, 0.099432 (computed from the formula).
func TestCurveChart(t *testing.T) {
	text := strings.Replace(base, `bow = "L/1000"`, "", 1) + "[capacity]\nmodel = \"curve\"\ncurve = \"b\"\n"
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	lam, ratio := md.CurveChart(3, 3)
	want := []float64{0.597023, 0.209461, 0.099432}
	if len(lam) != 3 {
		t.Fatalf("%d points, want 3", len(lam))
	}
	for i := range want {
		if !near(lam[i], float64(i+1), 1e-9) || math.Abs(ratio[i]-want[i]) > 5e-7 {
			t.Errorf("point %d: (%.6f, %.6f), want (%d, %.6f)", i, lam[i], ratio[i], i+1, want[i])
		}
	}
}
