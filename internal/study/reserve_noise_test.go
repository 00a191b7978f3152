package study

import (
	"context"
	"math"
	"strings"
	"testing"

	"strutrisk/sim"
)

// beamUltimate is a pinned H column on the numerical beam-column model at
// its ultimate load (hot-rolled residual stresses, bow L/1000), whose
// capacity carries about 1e-5 relative noise from the path of the
// nonlinear solution. Only the yield strength is random, and the load is
// fixed, so the exact failure probability is P(fy < fy*) with fy* the
// yield strength at which the capacity equals the load: the capacity
// rises with fy. Other inputs as studies/imperfection-comparison.toml at
// relative slenderness 1.
const beamUltimate = `[member]
length = "6.149 m"
ends = "pinned-pinned"
[member.section]
shape  = "I"
depth  = "200 mm"
width  = "200 mm"
flange = "15 mm"
web    = "9 mm"
root   = "18 mm"
[material]
modulus = "210 GPa"
yield   = { dist = "lognormal", mean = "400 MPa", cov = 0.07 }
[imperfection]
bow = "L/1000"
[capacity]
model = "beam-column"
limit = "ultimate"
residual_stress = "hot-rolled"
axis = "major"
[loads]
axial = "1750 kN"
`

// TestFORMBeamColumnUltimate checks that FORM converges on the noisy
// ultimate capacity of the beam-column and finds the exact index: with one
// lognormal input (ln fy normal, mean m, sd s) and a capacity rising with
// it, beta = (m - ln fy*)/s exactly (the failure event is fy < fy*; FORM
// is exact for a monotone limit state in one variable), s^2 = ln(1 + cov^2)
// and m = ln(mean) - s^2/2 (the lognormal distribution). fy* is found by
// bisection on the capacity itself, to within its noise.
func TestFORMBeamColumnUltimate(t *testing.T) {
	md, err := Build(parse(t, beamUltimate))
	if err != nil {
		t.Fatal(err)
	}
	if len(md.Sim.Vars) != 1 || md.Sim.Vars[0].Name != "material.yield" {
		t.Fatalf("random inputs %v, want material.yield alone", md.Sim.Vars)
	}
	g := func(fy float64) float64 { return md.Sim.G([]float64{fy}, nil) }
	lo, hi := 200.0, 400.0
	if !(g(lo) < 0 && g(hi) > 0) {
		t.Fatalf("g(%g) = %g, g(%g) = %g: the load does not lie between the capacities", lo, g(lo), hi, g(hi))
	}
	for hi-lo > 1e-6 {
		mid := (lo + hi) / 2
		if g(mid) < 0 {
			lo = mid
		} else {
			hi = mid
		}
	}
	s := math.Sqrt(math.Log(1 + 0.07*0.07))
	m := math.Log(400) - s*s/2
	want := (m - math.Log((lo+hi)/2)) / s

	for _, fs := range []*sim.FORMSettings{nil, md.FORMSettings()} {
		f, err := sim.FORM(md.Sim, fs)
		if err != nil {
			t.Fatal(err)
		}
		t.Logf("settings %+v: beta %.6f (exact %.6f), %d evaluations: %s", fs, f.Beta, want, f.Evaluations, f.Status)
		if !f.Converged || math.Abs(f.Beta-want) > 1e-3 {
			t.Errorf("settings %+v: beta %.6f (converged %v: %s), exact %.6f", fs, f.Beta, f.Converged, f.Status, want)
		}
	}
}

// TestReserveBeamColumnUltimate finds the reserve factor of the noisy
// ultimate beam-column with several random inputs, which the FORM searches
// of the root finding used to abandon ("line search failed"). The checks
// are those of the definition: FORM converges at the study's loads with
// its design point on the limit state (g within the noise, 1e-4 of the
// capacity) and u = -beta alpha (Hasofer and Lind 1974), and the index at
// the factor found is the target.
func TestReserveBeamColumnUltimate(t *testing.T) {
	text := strings.Replace(beamUltimate, `modulus = "210 GPa"`, `modulus = { dist = "lognormal", mean = "210 GPa", cov = 0.03 }`, 1)
	text = strings.Replace(text, `bow = "L/1000"`, `bow = { dist = "normal", mean = "L/1000", sd = "L/4000", lower = 0 }`, 1)
	text = strings.Replace(text, `axial = "1750 kN"`, "dead = { dist = \"normal\", mean = \"900 kN\", cov = 0.10 }\nimposed = { dist = \"gumbel\", mean = \"450 kN\", cov = 0.30 }\n[target]\nbeta = 3.8\nreference_period = \"50 years\"", 1)
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	f, err := sim.FORM(md.Sim, nil)
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("beta %.5f, %d evaluations: %s", f.Beta, f.Evaluations, f.Status)
	if !f.Converged {
		t.Fatalf("FORM: %s", f.Status)
	}
	p := f.Points[0]
	out := make([]float64, len(md.Sim.Outputs))
	if g := md.Sim.G(p.X, out); math.Abs(g) > 1e-4*out[OutCapacity] {
		t.Errorf("g at the design point = %g, capacity %g", g, out[OutCapacity])
	}
	for i := range p.U {
		if math.Abs(p.U[i]+p.Beta*p.Alpha[i]) > 1e-2 {
			t.Errorf("u[%d] = %.5f, -beta alpha = %.5f", i, p.U[i], -p.Beta*p.Alpha[i])
		}
	}
	if raceOn {
		t.Log("the reserve search (a dozen FORM analyses) is checked without the race detector")
		return
	}
	r, err := md.Reserve(context.Background(), 3.8, md.FORMSettings())
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("reserve factor %.4f (beta %.5f), added load %.4g N, %d FORM analyses", r.Factor, r.FactorBeta, r.Added, r.FORMCalls)
	if math.Abs(r.FactorBeta-3.8) > ReserveTol || r.AddedErr != nil {
		t.Errorf("reserve factor %.5f with beta %.6f, added load %v (%v)", r.Factor, r.FactorBeta, r.Added, r.AddedErr)
	}
}
