package study

import (
	"math"
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// he200b is an HE 200 B as a custom section: A = 78.1 cm2, Iy = 5696 cm4,
// Iz = 2003 cm4, h = b = 200 mm (catalogue values of the hot-rolled
// section, from memory); curves b (y-y) and c (z-z) of EN 1993-1-1 Table
// 6.2 for a rolled I with h/b <= 1.2 and tf <= 100 mm.
const he200b = `[member]
length = 4000
ends = "pinned-pinned"
[member.section]
shape = "custom"
area = 7810
i_major = 56.96e6
i_minor = 20.03e6
c_major = 100
c_minor = 100
[material]
modulus = 210000
`

// curveBC is the capacity table of he200b: its Table 6.2 curves.
const curveBC = `[capacity]
model = "curve"
curve = { major = "b", minor = "c" }
`

// TestCodeCheckFlexuralBuckling: an EN 1993-1-1 6.3.1 flexural buckling
// check of a pinned HE 200 B, 4 m long, S235 (a textbook case, the
// formulas computed here by hand):
//
//	i_z = sqrt(20.03e6 / 7810) = 50.64 mm, L_cr / i_z = 78.99
//	lambda_1 = pi sqrt(210000 / 235) = 93.91, lambda_z = 0.8411   (6.50)
//	Phi = 0.5 [1 + 0.49 (0.8411 - 0.2) + 0.8411^2] = 1.0108       (6.49)
//	chi = 1 / (Phi + sqrt(Phi^2 - lambda^2)) = 0.6364
//	N_b,Rd = chi A fy / gamma_M1 = 0.6364 * 7810 * 235 / 1.0 = 1168 kN
//
// Loads: dead 400 kN (permanent, fixed), imposed 300 kN (fixed):
// N_Ed = 1.35 * 400 + 1.5 * 300 = 990 kN (EN 1990 6.10), utilisation
// 990 / 1168 = 0.848. With gamma_M1 = 1.1 the resistance is 1168 / 1.1.
func TestCodeCheckFlexuralBuckling(t *testing.T) {
	for _, c := range []struct {
		extra   string
		gammaM1 float64
	}{
		{"", 1.0},
		{"[code_check]\ngamma_m1 = 1.1\n", 1.1},
	} {
		text := he200b + "yield = 235\n" + curveBC + "[loads]\ndead = 400000\nimposed = 300000\n" + c.extra
		md, err := Build(parse(t, text))
		if err != nil {
			t.Fatal(err)
		}
		cc, err := md.CodeCheck()
		if err != nil {
			t.Fatal(err)
		}
		iz := math.Sqrt(20.03e6 / 7810)
		lam := 4000 / iz / (math.Pi * math.Sqrt(210000.0/235))
		phi := 0.5 * (1 + 0.49*(lam-0.2) + lam*lam)
		chi := 1 / (phi + math.Sqrt(phi*phi-lam*lam))
		nb := chi * 7810 * 235 / c.gammaM1
		if math.Abs(lam-0.8411) > 1e-4 || math.Abs(chi-0.6364) > 1e-4 {
			t.Fatalf("hand values lambda %.4f chi %.4f", lam, chi)
		}
		ned := 1.35*400e3 + 1.5*300e3
		checks := []struct {
			name      string
			got, want float64
		}{
			{"relative slenderness", cc.RelSlenderness, lam},
			{"chi", cc.Chi, chi},
			{"N_b,Rd", cc.Buckling, nb},
			{"resistance", cc.Resistance, nb},
			{"N_c,Rd", cc.CrossSection, 7810 * 235},
			{"design load", cc.DesignLoad, ned},
			{"utilisation", cc.Utilisation, ned / nb},
			{"critical load", cc.Critical, math.Pi * math.Pi * 210000 * 20.03e6 / 4000 / 4000},
		}
		for _, k := range checks {
			if math.Abs(k.got/k.want-1) > 1e-9 {
				t.Errorf("gamma_M1 %g, %s: %.6g, want %.6g", c.gammaM1, k.name, k.got, k.want)
			}
		}
		if cc.Axis != column.Minor || cc.Curve != "c" || cc.Alpha != 0.49 || cc.GammaM1 != c.gammaM1 {
			t.Errorf("axis %s curve %q alpha %g gamma_M1 %g, want minor c 0.49 %g", cc.Axis, cc.Curve, cc.Alpha, cc.GammaM1, c.gammaM1)
		}
	}
}

// TestCodeCheckCharacteristic: the code check takes the characteristic
// values of EN 1990 4.1.2 (the 5 % fractile of the yield, the mean of a
// permanent load, the 98 % fractile of the annual maxima of a variable
// load), or those the study sets in code_check.characteristic.
func TestCodeCheckCharacteristic(t *testing.T) {
	base := he200b + `yield = { dist = "lognormal", mean = 270, cov = 0.07 }
` + curveBC + `[loads]
dead = { dist = "normal", mean = 400000, cov = 0.1 }
imposed = { dist = "gumbel", location = 200000, scale = 30000 }
`
	// 5 % fractile of the lognormal: exp(lambda - 1.6449 zeta); 98 %
	// fractile of the Gumbel (1-year maxima): u - b ln(-ln 0.98).
	zeta := math.Sqrt(math.Log1p(0.07 * 0.07))
	fyk := math.Exp(math.Log(270) - zeta*zeta/2 - 1.6448536269514722*zeta)
	qk := 200000 - 30000*math.Log(-math.Log(0.98))
	for _, c := range []struct {
		extra    string
		fyk, qk  float64
		gG, psi0 float64
	}{
		{"", fyk, qk, 1.35, 0.7},
		{"[code_check]\ngamma_g = 1.2\ncharacteristic = { \"material.yield\" = \"235 MPa\", \"loads.imposed\" = 250000 }\n", 235, 250000, 1.2, 0.7},
	} {
		md, err := Build(parse(t, base+c.extra))
		if err != nil {
			t.Fatal(err)
		}
		cc, err := md.CodeCheck()
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(cc.Fy/c.fyk-1) > 1e-9 {
			t.Errorf("fy_k %.6g, want %.6g", cc.Fy, c.fyk)
		}
		if want := c.gG*400000 + 1.5*c.qk; math.Abs(cc.DesignLoad/want-1) > 1e-9 || cc.Combination.Leading != "loads.imposed" {
			t.Errorf("design load %.6g leading %q, want %.6g loads.imposed", cc.DesignLoad, cc.Combination.Leading, want)
		}
		if len(cc.Inputs) != 3 {
			t.Errorf("inputs %+v, want yield and two loads", cc.Inputs)
		}
	}
}

// TestCodeCheckKeys: bad [code_check] keys are errors naming the key and
// its line.
func TestCodeCheckKeys(t *testing.T) {
	base := he200b + "yield = { dist = \"lognormal\", mean = 270, cov = 0.07 }\n" + curveBC + "[loads]\ndead = 400000\n[code_check]\n"
	for _, c := range []struct{ body, want string }{
		{"gamma_m1 = 0.9\n", "code_check.gamma_m1"},
		{"psi_0 = 1.5\n", "code_check.psi_0"},
		{"gamma_q = \"1.5\"\n", "code_check.gamma_q"},
		{"gama_g = 1.35\n", "did you mean code_check.gamma_g"},
		{"characteristic = { \"loads.dead\" = 1 }\n", "loads.dead is fixed"},
		{"characteristic = { \"loads.snow\" = 1 }\n", "not an input of the study"},
		{"characteristic = 3\n", "code_check.characteristic"},
	} {
		_, err := Parse("s.toml", []byte(base+c.body))
		if err == nil || !strings.Contains(err.Error(), c.want) || !strings.Contains(err.Error(), "s.toml:20") {
			t.Errorf("%q: %v, want an error with %q and its line", c.body, err, c.want)
		}
	}
}

// TestCodeCheckRefusals: the code check gives no verdict for a member that
// also bends (its 6.3.3 interaction is not made) and is not made for a
// class 4 CHS (d/t = 500 / 4 = 125 beyond 90 eps^2 = 90 * 235 / 355 = 59.6,
// EN 1993-1-1 Table 5.2: shell buckling, EN 1993-1-6).
func TestCodeCheckRefusals(t *testing.T) {
	bent := he200b + "yield = 235\n[imperfection]\neccentricity = 10\n" + curveBC + "[loads]\ndead = 400000\n"
	straight := strings.Replace(bent, "[imperfection]\neccentricity = 10\n", "", 1)
	for _, c := range []struct {
		text string
		want bool
	}{{bent, true}, {straight, false}} {
		md, err := Build(parse(t, c.text))
		if err != nil {
			t.Fatal(err)
		}
		cc, err := md.CodeCheck()
		if err != nil {
			t.Fatal(err)
		}
		if cc.AxialOnly != c.want {
			t.Errorf("axial only %v, want %v (notes %q)", cc.AxialOnly, c.want, cc.Notes)
		}
	}
	chs := `[member]
length = 3000
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 500
thickness = 4
[material]
modulus = 210000
yield = 355
[imperfection]
bow = "L/1000"
[capacity]
model_factor = 0.8
[loads]
dead = 400000
`
	md, err := Build(parse(t, chs))
	if err != nil {
		t.Fatal(err)
	}
	if _, err := md.CodeCheck(); err == nil || !strings.Contains(err.Error(), "class 4") {
		t.Errorf("class 4 CHS: %v, want a refusal", err)
	}
}

// TestCodeCheckClass4: a welded I 600 x 300 x 20 flanges x 6 web, S355,
// 5 m pinned, whose web is class 4 in compression: c/t = 560 / 6 = 93.3
// beyond 42 eps = 34.2 (EN 1993-1-1 Table 5.2, eps = sqrt(235 / 355)). By
// EN 1993-1-5 4.4 (internal element, psi = 1, k_sigma = 4), computed here
// by hand:
//
//	lambda_p = (c/t) / (28.4 eps sqrt(4)) = 2.020
//	rho = (lambda_p - 0.055 (3 + psi)) / lambda_p^2 = 0.441          (4.2)
//	A_eff = 2 * 300 * 20 + rho * 560 * 6 = 13 482 mm2
//
// and EN 1993-1-1 6.3.1 with A_eff: lambda = sqrt(A_eff fy / N_cr)
// (6.51), N_cr of the gross section about z, curve c (welded I, tf <= 40
// mm, Table 6.2), N_b,Rd = chi A_eff fy.
func TestCodeCheckClass4(t *testing.T) {
	text := `[member]
length = 5000
ends = "pinned-pinned"
[member.section]
shape = "I"
fabrication = "welded"
depth = 600
width = 300
flange = 20
web = 6
[material]
modulus = 210000
yield = 355
[capacity]
model = "curve"
[loads]
dead = 1000000
`
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	cc, err := md.CodeCheck()
	if err != nil {
		t.Fatal(err)
	}
	eps := math.Sqrt(235.0 / 355)
	lp := 560.0 / 6 / (28.4 * eps * 2)
	rho := (lp - 0.22) / lp / lp
	aeff := 12000 + rho*560*6
	iz := 2*20*300.0*300*300/12 + 560*6.0*6*6/12
	ncr := math.Pi * math.Pi * 210000 * iz / 5000 / 5000
	lam := math.Sqrt(aeff * 355 / ncr)
	phi := 0.5 * (1 + 0.49*(lam-0.2) + lam*lam)
	chi := 1 / (phi + math.Sqrt(phi*phi-lam*lam))
	if cc.Class != 4 || math.Abs(cc.EffectiveArea/aeff-1) > 1e-6 {
		t.Errorf("class %d A_eff %.6g, want 4 and %.6g", cc.Class, cc.EffectiveArea, aeff)
	}
	if math.Abs(cc.RelSlenderness/lam-1) > 1e-6 || math.Abs(cc.Resistance/(chi*aeff*355)-1) > 1e-6 || cc.Curve != "c" {
		t.Errorf("lambda %.6g N_Rd %.6g curve %q, want %.6g %.6g c", cc.RelSlenderness, cc.Resistance, cc.Curve, lam, chi*aeff*355)
	}
}
