package study

import (
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
