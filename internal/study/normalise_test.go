package study

import (
	"math"
	"strings"
	"testing"

	"strutrisk/sim"
)

// stockyStudy is a stocky CHS 168.3 x 8 (relative slenderness about 0.12,
// so chi = 1 and the capacity is A fy) with a lognormal yield and the
// loads given, normalised to the design resistance.
func stockyStudy(loads, codeCheck string) string {
	return `[member]
length = 500
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 168.3
thickness = 8
[material]
modulus = 210000
yield = { dist = "lognormal", mean = 380, cov = 0.07 }
[loads]
` + loads + `
[capacity]
model = "curve"
curve = "a"
[target]
beta = 3.8
reference_period = "1 year"
[code_check]
` + codeCheck + "\n"
}

// TestNormaliseDesignLoad: with normalise = "design" the code check of the
// scaled loads has utilisation 1 and the variable loads make load_ratio of
// the characteristic loads, whatever the loads were written as.
func TestNormaliseDesignLoad(t *testing.T) {
	for _, ratio := range []float64{0.2, 0.5, 0.8} {
		text := stockyStudy(`dead = { dist = "normal", mean = 100000, cov = 0.1 }
imposed = { dist = "gumbel", mean = 50000, cov = 0.3, period = "1 year" }`,
			"normalise = \"design\"\nload_ratio = "+fmtG(ratio))
		md, err := Build(parse(t, text))
		if err != nil {
			t.Fatal(err)
		}
		c, err := md.CodeCheck()
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(c.Utilisation-1) > 1e-9 {
			t.Errorf("load_ratio %g: utilisation %.12g, want 1", ratio, c.Utilisation)
		}
		g, q := c.Loads[0].Characteristic, c.Loads[1].Characteristic
		// EN 1990 6.10 with the recommended factors of Table A1.2(B), the
		// imposed load leading: 1.35 G_k + 1.5 Q_k = N_b,Rd.
		if ed := 1.35*g + 1.5*q; math.Abs(ed/c.Resistance-1) > 1e-9 {
			t.Errorf("load_ratio %g: 1.35 G_k + 1.5 Q_k = %.9g N, design resistance %.9g N", ratio, ed, c.Resistance)
		}
		if math.Abs(q/(g+q)-ratio) > 1e-9 {
			t.Errorf("load_ratio %g: Q_k/(G_k+Q_k) = %.12g", ratio, q/(g+q))
		}
		// The CoV of each load stays.
		for i, want := range []float64{0.1, 0.3} {
			d := md.Sim.Vars[i+1].Dist
			if cov := d.StdDev() / d.Mean(); math.Abs(cov-want) > 1e-9 {
				t.Errorf("load_ratio %g: %s CoV %.9g, want %g", ratio, md.Sim.Vars[i+1].Name, cov, want)
			}
		}
	}
}

// stockyBeta is the exact reliability index of a stocky member, R = A fy
// with fy lognormal (mean m, CoV vr), under a lognormal load S of CoV vs
// (annual maxima, so its characteristic value is the 98 % fractile),
// normalised: gamma_Q S_k = A fy_k / gamma_M with fy_k the 5 % fractile.
// ln R - ln S is normal (closed form), so with zeta^2 = ln(1 + V^2):
//
//	beta = (ln(R_med / S_med)) / sqrt(zeta_R^2 + zeta_S^2),
//	R_med / S_med = gamma_Q gamma_M exp(1.645 zeta_R + 2.054 zeta_S).
//
// The areas and means cancel: beta depends on the factors and CoVs only.
func stockyBeta(gammaM, gammaQ, vr, vs float64) float64 {
	zr, zs := math.Sqrt(math.Log1p(vr*vr)), math.Sqrt(math.Log1p(vs*vs))
	k05, k98 := 1.6448536269514722, 2.0537489106318225 // Phi^-1(0.95), Phi^-1(0.98)
	return (math.Log(gammaQ*gammaM) + k05*zr + k98*zs) / math.Hypot(zr, zs)
}

// TestNormaliseStockyBeta: FORM on the normalised stocky member gives the
// closed-form beta of stockyBeta (g is linear in the log-space, so FORM is
// exact).
func TestNormaliseStockyBeta(t *testing.T) {
	for _, gm := range []float64{1.0, 1.1} {
		text := stockyStudy(`imposed = { dist = "lognormal", mean = 50000, cov = 0.2, period = "1 year" }`,
			"normalise = \"design\"\ngamma_m0 = "+fmtG(gm)+"\ngamma_m1 = "+fmtG(gm))
		md, err := Build(parse(t, text))
		if err != nil {
			t.Fatal(err)
		}
		f, err := sim.FORM(md.Sim, nil)
		if err != nil || !f.Converged {
			t.Fatalf("FORM: %v", err)
		}
		want := stockyBeta(gm, 1.5, 0.07, 0.2)
		if math.Abs(f.Beta-want) > 1e-4 {
			t.Errorf("gamma_M %g: FORM beta %.6f, closed form %.6f", gm, f.Beta, want)
		}
	}
}

// TestNormaliseRefused: normalising names its key when it cannot be done.
func TestNormaliseRefused(t *testing.T) {
	for _, c := range []struct{ cc, want string }{
		{"load_ratio = 0.5", "code_check.load_ratio"},
		{"normalise = \"design\"\nload_ratio = 1.5", "code_check.load_ratio"},
		{"normalise = \"design\"\nload_ratio = 0.5", "no load is permanent"},
		{"normalise = \"designs\"", "code_check.normalise"},
	} {
		_, err := Parse("t.toml", []byte(stockyStudy(`imposed = { dist = "lognormal", mean = 50000, cov = 0.2 }`, c.cc)))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q: error %v, want one with %q", c.cc, err, c.want)
		}
	}
}
