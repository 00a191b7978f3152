package study

import (
	"fmt"
	"math"
	"testing"

	"strutrisk/internal/column"
)

// Each sample checks the modes that twist the section, as the nominal
// check does: a channel with a random thickness and a random shear
// modulus, evaluated by the limit state at the means, gives the nominal
// capacity, without allocating; the shear modulus enters N_cr,T
// (EN 1993-1-3:2006 eq. 6.33a) so a stiffer G raises the capacity.
func TestSampleTwisting(t *testing.T) {
	text := `[member]
length = 700
ends = "pinned-pinned"
[member.section]
shape = "channel"
depth = 200
width = 75
flange = { dist = "normal", mean = 11.5, cov = 0.03 }
web = 8.5
[material]
modulus = 210000
shear_modulus = { dist = "lognormal", mean = 81000, cov = 0.05 }
yield = { dist = "lognormal", mean = 355, cov = 0.07 }
[capacity]
model = "curve"
curve = "c"
[loads]
dead = "300 kN"
`
	st := parse(t, text)
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	n, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	if n.Mode != column.ModeFlexuralTorsional || n.CapacityMode != column.ModeFlexuralTorsional {
		t.Fatalf("nominal mode %v, capacity mode %v: not the flexural-torsional case", n.Mode, n.CapacityMode)
	}
	x := make([]float64, len(md.Sim.Vars))
	gi := -1
	for i, v := range md.Sim.Vars {
		x[i] = v.Dist.Mean()
		if v.Name == "material.shear_modulus" {
			gi = i
		}
	}
	out := make([]float64, 2)
	md.Sim.G(x, out)
	if math.Abs(out[OutCapacity]-n.Capacity) > 1e-9*n.Capacity {
		t.Errorf("sampled capacity at the means %.8g, nominal %.8g", out[OutCapacity], n.Capacity)
	}
	if allocs := testing.AllocsPerRun(50, func() { md.Sim.G(x, out) }); allocs != 0 {
		t.Errorf("one sample allocates %v times", allocs)
	}
	low := out[OutCapacity]
	x[gi] *= 1.2
	md.Sim.G(x, out)
	if !(out[OutCapacity] > low) {
		t.Errorf("a stiffer shear modulus did not raise the capacity: %.6g, %.6g", out[OutCapacity], low)
	}
}

// A custom section given the properties of an unequal angle (area,
// second moments, fibre distances, it, iw and the shear centre as y0 and
// z0, in cm units) buckles at the same critical load in the same mode as
// the angle shape itself: the custom keys reach the mechanics with their
// axes and units right.
func TestCustomTorsionKeys(t *testing.T) {
	sec := column.Section{Shape: column.ShapeAngle, Depth: 150, Width: 90, Thickness: 15} // class 3 at fy 235: no effective area
	p, err := sec.Properties()
	if err != nil {
		t.Fatal(err)
	}
	study := func(section string) *Nominal {
		text := "[member]\nlength = 1200\nends = \"pinned-pinned\"\n[member.section]\n" + section +
			"[material]\nmodulus = 210000\nyield = 235\n[capacity]\nmodel = \"curve\"\ncurve = \"b\"\n[loads]\ndead = 100000\n"
		md, err := Build(parse(t, text))
		if err != nil {
			t.Fatal(err)
		}
		n, err := md.Nominal()
		if err != nil {
			t.Fatal(err)
		}
		return n
	}
	angle := study("shape = \"angle\"\ndepth = 150\nwidth = 90\nthickness = 15\n")
	custom := study(fmt.Sprintf("shape = \"custom\"\narea = \"%.10g cm2\"\ni_major = \"%.10g cm4\"\ni_minor = \"%.10g cm4\"\n"+
		"c_major = %.10g\nc_minor = %.10g\nit = \"%.10g cm4\"\niw = \"%.10g cm6\"\ny0 = \"%.10g cm\"\nz0 = \"%.10g cm\"\n",
		p.A/1e2, p.I[0]/1e4, p.I[1]/1e4, p.C[0], p.C[1], p.It/1e4, p.Iw/1e6, p.S[0]/10, p.S[1]/10))
	if custom.Mode != column.ModeFlexuralTorsional || math.Abs(custom.Critical-angle.Critical) > 1e-8*angle.Critical {
		t.Errorf("custom: N_cr %.10g (%v), angle %.10g (%v)", custom.Critical, custom.Mode, angle.Critical, angle.Mode)
	}
	if math.Abs(custom.Capacity-angle.Capacity) > 1e-8*angle.Capacity {
		t.Errorf("custom capacity %.10g, angle %.10g", custom.Capacity, angle.Capacity)
	}
}

// TestStockyBarTieIsFlexural: a solid square bar 100 x 100 mm, 200 mm
// long, sits on the plateau of its buckling curve (relative slenderness
// 0.08, at most 0.2: chi = 1, EN 1993-1-1 6.3.1.2(4)) in every mode, so the
// nominal capacity, the sampled limit state and the code check all resist
// A fy; the mode they report is that of the lowest elastic critical load,
// flexure (pi^2 E I / L^2 = 4.2e8 N, Timoshenko & Gere ch. 2) and not
// torsion (G It / i0^2 = 6.7e8 N with It = 0.1406 b^4).
func TestStockyBarTieIsFlexural(t *testing.T) {
	text := `[member]
length = 200
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = 100
width = 100
[material]
modulus = 205000
yield = { dist = "normal", mean = 300, cov = 0.1 }
[capacity]
model = "curve"
curve = "a0"
[loads]
dead = { dist = "normal", mean = 1800000, cov = 0.1 }
`
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	n, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	if n.CapacityMode.Twists() || n.Mode.Twists() {
		t.Errorf("nominal capacity mode %v, critical mode %v: a stocky bar does not twist", n.CapacityMode, n.Mode)
	}
	if math.Abs(n.Capacity-3e6) > 1e-6*3e6 {
		t.Errorf("nominal capacity %.8g N, want A fy = 3e6 N", n.Capacity)
	}
	cc, err := md.CodeCheck()
	if err != nil {
		t.Fatal(err)
	}
	if cc.Mode.Twists() {
		t.Errorf("code check mode %v: a stocky bar does not twist", cc.Mode)
	}
}
