package study

import (
	"math"
	"math/rand/v2"
	"path/filepath"
	"testing"
)

// TestFastGMatchesG: the limit state Build chooses for the common study
// (fastG) gives g's numbers bit for bit, capacity and demand included, at
// the medians, in the tails, at random points and at inputs outside the
// physical range (a non-positive or non-finite input has no capacity).
// The reference is g itself, the general evaluation every study takes.
func TestFastGMatchesG(t *testing.T) {
	files, err := filepath.Glob("../../studies/*.toml")
	if err != nil {
		t.Fatal(err)
	}
	files = append(files, "../../studies/bench/reference-strut.toml")
	fast := 0
	for _, f := range files {
		rel, _ := filepath.Rel("../../studies", f)
		md := loadDemo(t, rel)
		if !md.fastOK() {
			continue
		}
		fast++
		for _, x := range fastPoints(md) {
			want, got := make([]float64, 2), make([]float64, 2)
			gw, gg := md.g(x, want), md.fastG(x, got)
			if !sameBits(gw, gg) || !sameBits(want[0], got[0]) || !sameBits(want[1], got[1]) {
				t.Errorf("%s at %v: fastG %v (capacity %v, demand %v), g %v (%v, %v)",
					rel, x, gg, got[0], got[1], gw, want[0], want[1])
			}
		}
	}
	if md := loadDemo(t, "bench/reference-strut.toml"); !md.fastOK() {
		t.Error("the reference strut does not take fastG")
	}
	t.Logf("%d of %d studies take fastG", fast, len(files))
}

func sameBits(a, b float64) bool { return math.Float64bits(a) == math.Float64bits(b) }

// fastPoints are the medians, each input in turn at its 1e-9 and 1 - 1e-9
// quantiles and at 0, -1 x its median, NaN and +Inf, and random points.
func fastPoints(md *Model) [][]float64 {
	med := medians(md)
	pts := [][]float64{med}
	for i, v := range md.Sim.Vars {
		for _, xi := range []float64{v.Dist.Quantile(1e-9), v.Dist.Quantile(1 - 1e-9), 0, -med[i], math.NaN(), math.Inf(1)} {
			x := append([]float64(nil), med...)
			x[i] = xi
			pts = append(pts, x)
		}
	}
	rng := rand.New(rand.NewPCG(1, 2))
	for range 200 {
		x := make([]float64, len(med))
		for i, v := range md.Sim.Vars {
			x[i] = v.Dist.Quantile(rng.Float64())
		}
		pts = append(pts, x)
	}
	return pts
}

// TestFastGVariants: fastG against g on studies that vary what the demos
// leave fixed: a random length and K, a bow in mm, an eccentricity as a
// fraction of the length, fixed loads beside random ones (the loads' sum
// in their order), an effect factor, both axes.
func TestFastGVariants(t *testing.T) {
	const custom = `[member.section]
shape = "custom"
area = 11400
i_major = 1.0e8
i_minor = 48_165_000
c_major = 150
c_minor = 127.595
[material]
modulus = { dist = "lognormal", mean = 205000, cov = 0.03 }
yield = { dist = "lognormal", mean = 300, cov = 0.07 }
`
	tests := []struct{ name, text string }{
		{"random length and K, eccentricity", `[member]
length = { dist = "normal", mean = 5000, sd = 50 }
k = { major = { dist = "uniform", min = 0.7, max = 1.0 }, minor = 1.0 }
` + custom + `[imperfection]
bow = { dist = "normal", mean = 5, sd = 2.5 }
eccentricity = { dist = "normal", mean = "L/500", sd = "L/1500" }
[capacity]
model = "secant"
axis = "major"
[loads]
dead = { dist = "normal", mean = 4e5, cov = 0.10 }
finishes = 50000
imposed = { dist = "gumbel", mean = 0.6e6, cov = 0.25 }
effect_factor = { dist = "lognormal", mean = 1.0, cov = 0.08 }
`},
		{"both axes", `[member]
length = 5000
` + custom + `[imperfection]
bow = "L/1000"
[capacity]
model = "perry-robertson"
axis = "both"
model_factor = { dist = "lognormal", mean = 1.0, cov = 0.05 }
[loads]
dead = { dist = "normal", mean = 1.2e6, cov = 0.10 }
`},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			md, err := Build(parse(t, tc.text))
			if err != nil {
				t.Fatal(err)
			}
			if !md.fastOK() {
				t.Fatal("the study does not take fastG")
			}
			for _, x := range fastPoints(md) {
				want, got := make([]float64, 2), make([]float64, 2)
				gw, gg := md.g(x, want), md.fastG(x, got)
				if !sameBits(gw, gg) || !sameBits(want[0], got[0]) || !sameBits(want[1], got[1]) {
					t.Errorf("at %v: fastG %v (capacity %v, demand %v), g %v (%v, %v)", x, gg, got[0], got[1], gw, want[0], want[1])
				}
			}
		})
	}
}
