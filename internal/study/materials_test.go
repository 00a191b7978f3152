package study

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// buildText parses and builds a study.
func buildText(t *testing.T, text string) *Model {
	t.Helper()
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	return md
}

// gAt evaluates the limit state of a study with no random input.
func gAt(t *testing.T, md *Model) (g, capacity, demand float64) {
	t.Helper()
	if n := len(md.Sim.Vars); n != 0 {
		t.Fatalf("%d random inputs, want none", n)
	}
	out := make([]float64, 2)
	g = md.Sim.G(nil, out)
	return g, out[OutCapacity], out[OutDemand]
}

// kcEN1995 is k_c of EN 1995-1-1:2004 eqs. (6.25) to (6.29), written out
// here apart from the package's curve code.
func kcEN1995(lamRel, betaC float64) float64 {
	if lamRel <= 0.3 {
		return 1
	}
	k := 0.5 * (1 + betaC*(lamRel-0.3) + lamRel*lamRel)
	return 1 / (k + math.Sqrt(k*k-lamRel*lamRel))
}

const timberPost = `title = "post"
[member]
length = 3000
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = 150
width = 150
[material]
kind = "timber"
modulus = 11000
strength = 21
service_class = 1
[capacity]
model = "curve"
[loads]
dead = { dist = "fixed", value = 100000, duration = "permanent" }
imposed = { dist = "fixed", value = 60000, duration = "medium" }
`

// TestTimberCurveCombinations checks the timber limit state of the curve
// model: k_c (EN 1995-1-1 eq. 6.25) at lambda_rel = (L/r)/pi sqrt(f/E)
// (eq. 6.21), times k_mod of Table 3.1 (service class 1: permanent 0.6,
// medium 0.8) on the strength, for the permanent load alone and for both
// loads (3.1.3(2): the shortest load decides k_mod); the least margin is
// the limit state.
func TestTimberCurveCombinations(t *testing.T) {
	md := buildText(t, timberPost)
	a := 150.0 * 150
	r := 150 / math.Sqrt(12)
	lamRel := 3000 / r / math.Pi * math.Sqrt(21/11000.0) // 0.9636
	kc := kcEN1995(lamRel, 0.2)
	perm := 0.6*a*21*kc - 100000 // governs: 203 kN against 100 kN
	both := 0.8*a*21*kc - 160000 // 271 kN against 160 kN
	g, c, d := gAt(t, md)
	if want := math.Min(perm, both); math.Abs(g-want) > 1e-6*want {
		t.Errorf("g = %.2f, want min(%.2f, %.2f)", g, perm, both)
	}
	if math.Abs(c-0.6*a*21*kc) > 1e-6*c || d != 100000 {
		t.Errorf("capacity %.1f demand %.1f, want the permanent combination %.1f against 100000", c, d, 0.6*a*21*kc)
	}
	if md.Sim.Linear != nil {
		t.Error("the least margin over two combinations is not linear in a load")
	}
	// glulam: beta_c 0.1 (eq. 6.29)
	md = buildText(t, strings.Replace(timberPost, `model = "curve"`, `model = "curve"`+"\ncurve = \"glulam\"", 1))
	g, _, _ = gAt(t, md)
	kc = kcEN1995(lamRel, 0.1)
	if want := math.Min(0.6*a*21*kc-100000, 0.8*a*21*kc-160000); math.Abs(g-want) > 1e-6*want {
		t.Errorf("glulam: g = %.2f, want %.2f", g, want)
	}
}

// TestTimberPerryCreep checks the first-yield timber member: the Perry
// condition N/A + N e M... in the closed form of the Ayrton-Perry
// quadratic (Timoshenko & Gere 1961, sec. 1.12), (f - s)(sE - s) =
// eta s sE with eta = e c / r^2, at the strength k_mod f and the Euler
// stress of the creep modulus E / (1 + k_def psi) (EN 1995-1-1 eq. 2.15,
// k_def 0.6 in service class 1; psi the permanent share of the load).
func TestTimberPerryCreep(t *testing.T) {
	text := strings.Replace(timberPost, `model = "curve"`, `model = "perry-robertson"`, 1)
	text = strings.Replace(text, "[capacity]", "[imperfection]\nbow = 10\n[capacity]", 1)
	md := buildText(t, text)
	a := 150.0 * 150
	r := 150 / math.Sqrt(12)
	eta := 10 * 75 / (r * r)
	perry := func(f, e float64) float64 {
		se := math.Pi * math.Pi * e / math.Pow(3000/r, 2)
		b := f + (1+eta)*se
		return a * (b - math.Sqrt(b*b-4*f*se)) / 2
	}
	perm := perry(0.6*21, 11000/(1+0.6*1)) - 100000
	both := perry(0.8*21, 11000/(1+0.6*100.0/160)) - 160000
	g, _, _ := gAt(t, md)
	if want := math.Min(perm, both); math.Abs(g-want) > 1e-6*math.Abs(want) {
		t.Errorf("g = %.2f, want min(%.2f, %.2f)", g, perm, both)
	}
}

// TestTimberDefaults checks the defaults a timber study lists: the load
// durations, the service class, and the correlation of strength and
// modulus (JCSS Probabilistic Model Code Part 3.5).
func TestTimberDefaults(t *testing.T) {
	text := strings.Replace(timberPost, `dead = { dist = "fixed", value = 100000, duration = "permanent" }`, `dead = 100000`, 1)
	text = strings.Replace(text, "service_class = 1\n", "", 1)
	text = strings.Replace(text, "modulus = 11000\nstrength = 21", `modulus = { dist = "lognormal", mean = 11000, cov = 0.13 }
strength = { dist = "lognormal", mean = 26, cov = 0.2 }`, 1)
	st := parse(t, text)
	all := strings.Join(st.Defaults, "\n")
	for _, w := range []string{"dead permanent", "service class 2", "rho = 0.6"} {
		if !strings.Contains(all, w) {
			t.Errorf("defaults lack %q:\n%s", w, all)
		}
	}
	if len(st.Corr) != 1 || st.Corr[0].Rho != TimberCorrelation || st.Corr[0].A != "material.strength" {
		t.Errorf("correlations %+v, want strength-modulus %g", st.Corr, TimberCorrelation)
	}
	if st.StrengthPath() != "material.strength" {
		t.Errorf("strength path %q", st.StrengthPath())
	}
}

// TestStainlessCurve checks the curve model of a stainless CHS: the hollow
// family of EN 1993-1-4 Table 5.2 (alpha 0.49, lambda_0 0.40) and the
// default modulus of 200 GPa (EN 1993-1-4 2.1).
func TestStainlessCurve(t *testing.T) {
	text := `[member]
length = 3500
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 114.3
thickness = 4
[material]
kind = "stainless"
yield = 220
[capacity]
model = "curve"
[loads]
dead = { dist = "fixed", value = 100000 }
`
	md := buildText(t, text)
	all := strings.Join(md.Study.Defaults, "\n")
	if !strings.Contains(all, "200 GPa") || !strings.Contains(all, "hollow sections alpha 0.49, lambda_0 0.40") {
		t.Errorf("defaults:\n%s", all)
	}
	do, di := 114.3, 114.3-8
	a := math.Pi / 4 * (do*do - di*di)
	r := math.Sqrt(do*do+di*di) / 4
	lam := 3500 / r / math.Pi * math.Sqrt(220/200000.0)
	phi := 0.5 * (1 + 0.49*(lam-0.4) + lam*lam) // EN 1993-1-4 eq. 5.3
	chi := 1 / (phi + math.Sqrt(phi*phi-lam*lam))
	_, c, _ := gAt(t, md)
	if want := chi * a * 220; math.Abs(c-want) > 1e-6*want {
		t.Errorf("capacity %.1f, want chi A fy = %.1f (lam %.3f, chi %.4f)", c, want, lam, chi)
	}
	// The code check is that of carbon steel: not made.
	if _, err := md.CodeCheck(); err == nil {
		t.Error("a steel code check was made for stainless")
	}
}

// TestAluminiumWelded checks a welded aluminium I of buckling class A
// under the curve model: chi of EN 1999-1-1 eq. 6.49 (alpha 0.20,
// lambda_0 0.10), kappa of Table 6.5 eq. 6.68 with A1 = A - A_haz (1 -
// rho_haz), bounded by A1 f_o, about the weaker axis.
func TestAluminiumWelded(t *testing.T) {
	text := `[member]
length = 2500
ends = "pinned-pinned"
[member.section]
shape = "I"
depth = 200
width = 200
flange = 10
web = 8
fabrication = "welded"
[material]
kind = "aluminium"
yield = 240
haz_factor = 0.5
haz_width = 30
[capacity]
model = "curve"
axis = "minor"
curve = "A"
[loads]
dead = { dist = "fixed", value = 100000 }
`
	md := buildText(t, text)
	a := 2*200*10 + 180*8.0
	iz := 2*10*math.Pow(200, 3)/12 + 180*math.Pow(8, 3)/12
	r := math.Sqrt(iz / a)
	lam := 2500 / r / math.Pi * math.Sqrt(240/70000.0)
	phi := 0.5 * (1 + 0.2*(lam-0.1) + lam*lam)
	chi := 1 / (phi + math.Sqrt(phi*phi-lam*lam))
	ahaz := 2*(8+60)*10 + 60*8.0 // flanges: web and 30 mm each side; web: 30 mm below each flange
	a1 := 1 - ahaz/a*0.5
	kappa := 1 - (1-a1)*math.Pow(10, -lam) - (0.05+0.1*a1)*math.Pow(lam, 1.3*(1-lam))
	want := math.Min(kappa*chi*a*240, a1*a*240)
	_, c, _ := gAt(t, md)
	if math.Abs(c-want) > 1e-6*want {
		t.Errorf("capacity %.1f, want %.1f (lam %.3f chi %.4f kappa %.4f A1/A %.4f)", c, want, lam, chi, kappa, a1)
	}
}

// TestMaterialPicture checks that the slenderness picture draws the
// material's curves: k_c of EN 1995-1-1 eq. 6.25 for a timber post (on
// k_mod f), and the EN 1993-1-4 hollow-section curve (alpha 0.49,
// lambda_0 0.40) beside a stainless CHS's Perry-Robertson model.
func TestMaterialPicture(t *testing.T) {
	md := buildText(t, timberPost)
	curves := md.ReferenceCurves(20, 2)
	if len(curves) == 0 || curves[0].Name != "study: EN 1995-1-1 k_c, solid, both axes" {
		t.Fatalf("timber curves %+v", curves)
	}
	for i, x := range curves[0].X {
		if want := kcEN1995(x, 0.2); math.Abs(curves[0].Y[i]-want) > 1e-9 {
			t.Errorf("timber at lam %.3f: %g, want k_c %g", x, curves[0].Y[i], want)
		}
	}
	text := `[member]
length = 3500
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 114.3
thickness = 4
[material]
kind = "stainless"
yield = 220
[imperfection]
bow = "L/1000"
[loads]
dead = { dist = "fixed", value = 100000 }
`
	md = buildText(t, text)
	found := false
	for _, c := range md.ReferenceCurves(20, 2) {
		if c.Name != "EN 1993-1-4 hollow, both axes" {
			continue
		}
		found = true
		for i, x := range c.X {
			lam := x
			want := 1.0
			if lam > 0.4 {
				phi := 0.5 * (1 + 0.49*(lam-0.4) + lam*lam)
				want = 1 / (phi + math.Sqrt(phi*phi-lam*lam))
			}
			if math.Abs(c.Y[i]-want) > 1e-9 {
				t.Errorf("stainless at lam %.3f: %g, want %g", x, c.Y[i], want)
			}
		}
	}
	if !found {
		t.Errorf("no EN 1993-1-4 curve among %v", md.ReferenceCurves(20, 2))
	}
}

// TestTimberLoaded checks that the reserve search's model of a timber
// study multiplies a fixed variable load within its duration class and
// counts an added load in every combination: the margins are those of
// TestTimberCurveCombinations with the imposed load doubled and 10 kN
// added.
func TestTimberLoaded(t *testing.T) {
	md := buildText(t, strings.Replace(timberPost, "[loads]", "[target]\nbeta = 3.8\n[loads]", 1))
	a := 150.0 * 150
	r := 150 / math.Sqrt(12)
	kc := kcEN1995(3000/r/math.Pi*math.Sqrt(21/11000.0), 0.2)
	perm := 0.6*a*21*kc - 110000
	both := 0.8*a*21*kc - 230000
	g := md.Loaded(2, 10000).G(nil, nil)
	if want := math.Min(perm, both); math.Abs(g-want) > 1e-6*math.Abs(want) {
		t.Errorf("g = %.2f, want min(%.2f, %.2f)", g, perm, both)
	}
}

// TestMaterialBendingRefused checks that [bending] is refused for a
// material other than steel, naming the key.
func TestMaterialBendingRefused(t *testing.T) {
	text := strings.Replace(timberPost, "[loads]", "[bending]\ntop = \"1 kN*m\"\n[loads]", 1)
	_, err := Parse("t.toml", []byte(text))
	if err == nil || !strings.Contains(err.Error(), "bending") || !strings.Contains(err.Error(), "steel member") {
		t.Errorf("err = %v, want [bending] refused for timber", err)
	}
}

// chsBeamColumn is a pinned CHS 114.3 x thickness strut, 2.5 m long, with
// a bow of L/1000, on the ultimate beam-column model about the major axis
// under 100 kN; material is the body of its [material] table, which
// starts on line 9.
func chsBeamColumn(thickness int, material string) string {
	return fmt.Sprintf(`[member]
length = 2500
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 114.3
thickness = %d
[material]
%s[imperfection]
bow = "L/1000"
[capacity]
model = "beam-column"
limit = "ultimate"
axis = "major"
[loads]
dead = 100000
`, thickness, material)
}

// TestStainlessBeamColumnLaw checks that the ultimate beam-column of a
// stainless study follows the Ramberg-Osgood law with the study's
// ultimate strength and exponent (column.BeamColumn with Law, the law
// itself tested against EN 1993-1-4 Annex C in internal/column), and that
// without material.ultimate the study is refused.
func TestStainlessBeamColumnLaw(t *testing.T) {
	text := chsBeamColumn(4, "kind = \"stainless\"\nyield = 300\nultimate = 650\nexponent = 6\n")
	md := buildText(t, text)
	_, c, _ := gAt(t, md)
	p, err := column.Section{Shape: column.ShapeCHS, Diameter: 114.3, Thickness: 4}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	m := column.Member{Props: p, E: 200000, Fy: 300, Length: 2500, K: [2]float64{1, 1}, Bow: 2.5, Kind: column.Stainless, Lambda0: 0.4}
	o := column.BeamOptions{Limit: column.UltimateLimit, Residual: column.ResidualNone, Law: column.RambergOsgood{Fu: 650, N: 6}}
	want, err := column.BeamColumn(&m, column.Section{Shape: column.ShapeCHS, Diameter: 114.3, Thickness: 4}, column.Major, &o)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(c-want.N) > 1e-9*want.N {
		t.Errorf("capacity %.1f, want the Ramberg-Osgood beam-column's %.1f", c, want.N)
	}
	o.Law = column.RambergOsgood{}
	epp, _ := column.BeamColumn(&m, column.Section{Shape: column.ShapeCHS, Diameter: 114.3, Thickness: 4}, column.Major, &o)
	if !(c < epp.N) {
		t.Errorf("capacity %.1f not below the elastic-plastic %.1f: the law is not applied", c, epp.N)
	}
	if _, err := Parse("t.toml", []byte(strings.Replace(text, "ultimate = 650\n", "", 1))); err == nil || !strings.Contains(err.Error(), "material.ultimate") {
		t.Errorf("err = %v, want material.ultimate missing", err)
	}
}

// TestTimberMeasurements checks that timber's tests update
// material.strength, and that measurements.yield on timber says so.
func TestTimberMeasurements(t *testing.T) {
	text := strings.Replace(timberPost, "strength = 21", `strength = { dist = "lognormal", mean = 26, cov = 0.2 }`, 1)
	st := parse(t, text+"[measurements]\nstrength = { values = [\"27 MPa\", \"31 MPa\", \"24 MPa\"], cov = 0.2 }\n")
	if len(st.Measurements) != 1 || st.Measurements[0].Path != "material.strength" {
		t.Errorf("measurements %+v, want one of material.strength", st.Measurements)
	}
	_, err := Parse("t.toml", []byte(text+"[measurements]\nyield = { values = [\"27 MPa\"], cov = 0.2 }\n"))
	if err == nil || !strings.Contains(err.Error(), "write measurements.strength") {
		t.Errorf("err = %v, want a pointer to measurements.strength", err)
	}
}

// TestAluminiumBeamColumnWarns checks that the ultimate beam-column of an
// aluminium member says that its fibres are elastic-perfectly-plastic.
func TestAluminiumBeamColumnWarns(t *testing.T) {
	st := parse(t, chsBeamColumn(5, "kind = \"aluminium\"\nyield = 240\n"))
	if w := strings.Join(st.Warnings, "\n"); !strings.Contains(w, "material.kind (line 9): the ultimate beam-column of aluminium takes elastic-perfectly-plastic fibres") {
		t.Errorf("warnings lack the aluminium law:\n%s", w)
	}
}

// TestTimberPoint checks that a sampled timber member lands on the
// slenderness picture's k_c curve: At gives the relative slenderness of
// EN 1995-1-1 eq. 6.21 and a member whose N / (A Fy) is k_c.
func TestTimberPoint(t *testing.T) {
	md := buildText(t, timberPost)
	res, m, lam, err := md.At(nil)
	if err != nil {
		t.Fatal(err)
	}
	r := 150 / math.Sqrt(12)
	want := 3000 / r / math.Pi * math.Sqrt(21/11000.0)
	if math.Abs(lam-want) > 1e-9 {
		t.Errorf("lam %g, want %g", lam, want)
	}
	if got := res.N / (m.Props.EffectiveArea() * m.Fy); math.Abs(got-kcEN1995(want, 0.2)) > 1e-9 {
		t.Errorf("ratio %g, want k_c %g", got, kcEN1995(want, 0.2))
	}
}
