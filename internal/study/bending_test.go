package study

import (
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// bendingStudy is a façade post: an RHS with a moment at the top tied to
// the dead load and a lateral load of its own.
const bendingStudy = `title = "post"
units = "kN-m"
[member]
length = "4.2 m"
ends = "pinned-pinned"
[member.section]
shape = "RHS"
depth = "100 mm"
width = "50 mm"
thickness = "4 mm"
[material]
modulus = "210 GPa"
yield = { dist = "lognormal", mean = "390 MPa", cov = 0.06 }
[imperfection]
bow = "4 mm"
[loads]
dead = { dist = "normal", mean = "6.5 kN", cov = 0.08 }
[bending]
top = { load = "dead", ratio = "60 mm" }
bottom = "-0.2 kN*m"
lateral = { dist = "gumbel", mean = "1300 N/m", cov = 0.3 }
[capacity]
model = "perry-robertson"
[target]
beta = 3.8
reserve_on = "all"
`

// TestBendingNominalFactor checks the wiring of [bending]: the nominal load
// factor is the column's first-yield load factor of the nominal member
// under the actions written in the file (the tied moment 60 mm x 6.5 kN,
// 1300 N/m = 1.3 N/mm), and the limit state at nominal values is that
// factor minus one.
func TestBendingNominalFactor(t *testing.T) {
	st := parse(t, bendingStudy)
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	n, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	b := column.Bending{Axis: column.Major, Top: 60 * 6500, Bottom: -0.2e6, Lateral: 1.3}
	if *n.Bending != b {
		t.Errorf("nominal bending %+v, want %+v", *n.Bending, b)
	}
	m := n.Member
	want, err := column.FirstYieldFactor(&m, column.Both, 6500, &b)
	if err != nil {
		t.Fatal(err)
	}
	if !near(n.LoadFactor, want.Factor, 1e-12) {
		t.Errorf("nominal load factor %.12g, column %.12g", n.LoadFactor, want.Factor)
	}
	if !near(n.Capacity, want.Factor*6500, 1e-12) || !near(n.Utilisation, 1/want.Factor, 1e-12) {
		t.Errorf("capacity %g, utilisation %g: want the factor times the demand and its inverse", n.Capacity, n.Utilisation)
	}
	x := make([]float64, len(md.Sim.Vars))
	for i, v := range md.Sim.Vars {
		x[i] = v.Dist.Mean()
	}
	if g := md.Sim.G(x, nil); !near(g, want.Factor-1, 1e-12) {
		t.Errorf("g at the means %g, want the factor minus one %g", g, want.Factor-1)
	}
	// Every action doubled halves the load factor: the reserve factor
	// multiplies the loads, the moment tied to them, and the bending's own
	// moment and lateral load (reserve_on = "all").
	if g := md.Loaded(2, 0).G(x, nil); !near(g+1, want.Factor/2, 1e-9) {
		t.Errorf("all actions doubled: factor %g, want %g", g+1, want.Factor/2)
	}
}

// TestBendingInteractionModel checks that model "curve" with [bending] is
// the EN 1993-1-1 6.3.3 interaction of column.InteractionFactor, class and
// plastic moduli from the section.
func TestBendingInteractionModel(t *testing.T) {
	st := parse(t, strings.Replace(bendingStudy, `model = "perry-robertson"`, `model = "curve"`, 1))
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	n, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	m := n.Member
	wpl, err := n.Section.PlasticModulus()
	if err != nil {
		t.Fatal(err)
	}
	_, cl, _ := n.Section.Classify(m.Fy)
	in := column.Interaction{Class: cl.Class, Plastic: wpl, AlphaLT: 0.76}
	want, err := column.InteractionFactor(&m, 6500, n.Bending, &in)
	if err != nil {
		t.Fatal(err)
	}
	if !near(n.LoadFactor, want.Factor, 1e-12) || n.Governs != column.GovernsInteraction {
		t.Errorf("nominal load factor %.12g (%s), column %.12g", n.LoadFactor, n.Governs, want.Factor)
	}
}

// TestLineLoadUnits checks the units of a lateral load against N/mm
// (1 kN/m = 1 N/mm; 1 lbf/ft = 4.4482216152605/304.8 N/mm, NIST SP 811).
func TestLineLoadUnits(t *testing.T) {
	for _, c := range []struct {
		s    string
		want float64
	}{
		{"1.5 kN/m", 1.5}, {"1500 N/m", 1.5}, {"2 N/mm", 2}, {"100 lbf/ft", 100 * 4.4482216152605 / 304.8},
	} {
		got, err := convert(c.s, LineLoad, systems["N-mm"])
		if err != nil || !near(got, c.want, 1e-14) {
			t.Errorf("%s: %g N/mm (%v), want %g", c.s, got, err, c.want)
		}
	}
	if got, _ := convert("2", LineLoad, systems["kN-m"]); got != 2 {
		t.Errorf("a bare 2 in kN-m: %g N/mm, want 2 (kN/m)", got)
	}
}

// TestBendingEvaluationAllocs checks that one evaluation of a study with
// [bending] does not allocate (first yield and the interaction).
func TestBendingEvaluationAllocs(t *testing.T) {
	for _, model := range []string{"perry-robertson", "curve"} {
		st := parse(t, strings.Replace(bendingStudy, `model = "perry-robertson"`, `model = "`+model+`"`, 1))
		md, err := Build(st)
		if err != nil {
			t.Fatal(err)
		}
		x := make([]float64, len(md.Sim.Vars))
		for i, v := range md.Sim.Vars {
			x[i] = v.Dist.Mean()
		}
		if a := testing.AllocsPerRun(20, func() { md.Sim.G(x, nil) }); a != 0 {
			t.Errorf("%s: an evaluation allocates %v times", model, a)
		}
	}
}

// TestInteractionCurve checks the ends of the limit curve: pure
// compression is the axial capacity at nominal values (the study without
// bending), and every point has load factor 1 by construction (the point
// times 1.0 on the ray reproduces itself: checked at the nominal ray).
func TestInteractionCurve(t *testing.T) {
	st := parse(t, bendingStudy)
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	n, m, err := md.InteractionCurve(8)
	if err != nil {
		t.Fatal(err)
	}
	if len(n) != 9 || m[0] != 0 || n[8] != 0 {
		t.Fatalf("curve %v %v: want 9 points from pure compression (M = 0) to pure bending (N = 0)", n, m)
	}
	axial := parse(t, strings.Replace(bendingStudy, "[bending]\ntop = { load = \"dead\", ratio = \"60 mm\" }\nbottom = \"-0.2 kN*m\"\nlateral = { dist = \"gumbel\", mean = \"1300 N/m\", cov = 0.3 }\n", "", 1))
	ma, err := Build(axial)
	if err != nil {
		t.Fatal(err)
	}
	na, err := ma.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	if !near(n[0], na.Capacity, 1e-9) {
		t.Errorf("pure compression end %g N, the axial study's nominal capacity %g N", n[0], na.Capacity)
	}
	for i := 1; i < len(n); i++ {
		if !(m[i] > m[i-1]) {
			t.Errorf("the moment should grow along the curve: %v", m)
			break
		}
	}
}

// TestBendingBeamColumnModel checks that model "beam-column" with
// [bending] hands the moments and lateral load to the numerical
// beam-column with the axial load they go with: its first-yield load
// factor agrees with the closed form to 1e-4 (Timoshenko & Gere, ch. 1;
// column.TestBeamColumnBendingFirstYield checks the mechanics).
func TestBendingBeamColumnModel(t *testing.T) {
	text := strings.Replace(bendingStudy, `model = "perry-robertson"`, "model = \"beam-column\"\naxis = \"major\"", 1)
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	n, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	m := n.Member
	want, err := column.FirstYieldFactor(&m, column.Major, n.Demand, n.Bending)
	if err != nil {
		t.Fatal(err)
	}
	if !near(n.LoadFactor, want.Factor, 1e-4) {
		t.Errorf("beam-column load factor %.7g, closed form %.7g", n.LoadFactor, want.Factor)
	}
}

// TestBendingCharacteristic checks that the lateral load of [bending], a
// variable action, takes the characteristic value of a variable load:
// the 98 % fractile of its annual maxima (EN 1990 4.1.2(7)), not its mean.
func TestBendingCharacteristic(t *testing.T) {
	md, err := Build(parse(t, bendingStudy))
	if err != nil {
		t.Fatal(err)
	}
	for i, v := range md.Sim.Vars {
		if v.Name != "bending.lateral" {
			continue
		}
		c := md.Characteristic(i)
		if want := v.Dist.Quantile(0.98); !near(c.Value, want, 1e-12) || !strings.Contains(c.Basis, "98 %") {
			t.Errorf("characteristic lateral load %g (%s), want the 98 %% fractile %g", c.Value, c.Basis, want)
		}
		return
	}
	t.Fatal("bending.lateral is not a random variable of the study")
}
