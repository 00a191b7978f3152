package study

import (
	"math"
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// base is a minimal valid study; tests append or replace tables.
const base = `[member]
length = 3000
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 168.3
thickness = 8
[material]
modulus = 205000
yield = 355
[imperfection]
bow = "L/1000"
[loads]
dead = 300000
`

func parse(t *testing.T, text string) *Study {
	t.Helper()
	st, err := Parse("t.toml", []byte(text))
	if err != nil {
		t.Fatalf("Parse: %v", err)
	}
	return st
}

func near(a, b, tol float64) bool { return math.Abs(a-b) <= tol*math.Max(1, math.Abs(b)) }

func find(st *Study, path string) *Quantity {
	for _, q := range st.Quantities {
		if q.Path == path {
			return q
		}
	}
	return nil
}

// TestQuantityForms: every way of writing a quantity reaches N, mm, MPa.
func TestQuantityForms(t *testing.T) {
	for _, c := range []struct {
		units, key, value string
		path              string
		want              float64 // fixed value, or the mean of a random one
		sd                float64 // 0 for a fixed value
	}{
		{"N-mm", "length", "3000", "member.length", 3000, 0},
		{"N-mm", "length", "3000.0", "member.length", 3000, 0},
		{"N-mm", "length", "3_000", "member.length", 3000, 0},
		{"N-mm", "length", `"3 m"`, "member.length", 3000, 0},
		{"N-mm", "length", `"3_000 mm"`, "member.length", 3000, 0},
		{"kN-m", "length", "3", "member.length", 3000, 0},
		{"kip-in", "length", "120", "member.length", 3048, 0},
		{"N-mm", "length", `"10 ft"`, "member.length", 3048, 0},
		{"N-mm", "length", `{ dist = "fixed", value = "3 m" }`, "member.length", 3000, 0},
		{"N-mm", "length", `{ dist = "normal", mean = "3 m", sd = "10 mm" }`, "member.length", 3000, 10},
		{"N-mm", "length", `{ dist = "normal", mean = "3 m", cov = 0.01 }`, "member.length", 3000, 30},
		{"kN-m", "length", `{ dist = "uniform", min = 2.9, max = 3.1 }`, "member.length", 3000, 200 / math.Sqrt(12)},
		{"N-mm", "length", `{ dist = "triangular", min = 2900, mode = 3000, max = 3100 }`, "member.length", 3000, math.Sqrt((2900*2900 + 3000*3000 + 3100*3100 - 2900*3000 - 2900*3100 - 3000*3100) / 18.0)},
		{"N-mm", "length", `{ dist = "lognormal", mean = "3 m", cov = 0.02 }`, "member.length", 3000, 60},
		{"N-mm", "length", `{ dist = "gamma", mean = 3000, sd = 60 }`, "member.length", 3000, 60},
		// Gamma shape k, scale theta: mean k theta, sd sqrt(k) theta.
		{"kN-m", "length", `{ dist = "gamma", shape = 2500, scale = 0.0012 }`, "member.length", 3000, 60},
		{"N-mm", "length", `{ dist = "weibull", mean = 3000, cov = 0.02 }`, "member.length", 3000, 60},
		// Lognormal mu, sigma of ln(value in the study's units): in kN-m
		// mu = ln 3 means 3 m; mean = exp(mu + sigma^2/2) (m) x 1000.
		{"kN-m", "length", `{ dist = "lognormal", mu = 1.0986122886681098, sigma = 0.02 }`, "member.length", 3000 * math.Exp(0.0002), 3000 * math.Exp(0.0002) * math.Sqrt(math.Expm1(0.0004))},
		{"N-mm", "yield", `"51.5 ksi"`, "material.yield", 51.5 * 6.894757293168, 0},
		{"kip-in", "yield", "50", "material.yield", 50 * 6.894757293168, 0},
		{"kN-m", "yield", "355000", "material.yield", 355, 0},
		{"N-mm", "yield", `{ dist = "lognormal", mean = "355 MPa", sd = "20 MPa" }`, "material.yield", 355, 20},
		{"N-mm", "dead", `"300 kN"`, "loads.dead", 3e5, 0},
		{"kip-in", "dead", "10", "loads.dead", 44482.216152605, 0},
		{"N-mm", "dead", `{ dist = "gumbel", mean = "300 kN", cov = 0.3 }`, "loads.dead", 3e5, 9e4},
		// Gumbel location u, scale b: mean u + 0.5772156649 b, sd pi b/sqrt 6.
		{"kN-m", "dead", `{ dist = "gumbel", location = 250, scale = 40 }`, "loads.dead", (250 + 0.5772156649015329*40) * 1e3, math.Pi * 40e3 / math.Sqrt(6)},
		{"N-mm", "bow", `"L/1000"`, "imperfection.bow", 3, 0},
		{"N-mm", "bow", `"L / 500"`, "imperfection.bow", 6, 0},
		{"N-mm", "bow", `"4 mm"`, "imperfection.bow", 4, 0},
		{"N-mm", "bow", `{ dist = "normal", mean = "L/1000", sd = "L/2000" }`, "imperfection.bow", 3, 1.5},
		{"N-mm", "bow", `{ dist = "normal", mean = 0, sd = "L/1000" }`, "imperfection.bow", 0, 3},
	} {
		text := base
		if c.units != "N-mm" {
			for _, r := range []struct{ old, unit string }{{"length = 3000", "mm"}, {"diameter = 168.3", "mm"}, {"thickness = 8", "mm"}, {"modulus = 205000", "MPa"}, {"yield = 355", "MPa"}, {"dead = 300000", "N"}} {
				k, v, _ := strings.Cut(r.old, " = ")
				if k != c.key {
					text = strings.Replace(text, r.old, k+` = "`+v+" "+r.unit+`"`, 1)
				}
			}
			text = `units = "` + c.units + `"` + "\n" + text
		}
		switch c.key {
		case "length":
			text = strings.Replace(text, "length = 3000", "length = "+c.value, 1)
		case "yield":
			text = strings.Replace(text, "yield = 355", "yield = "+c.value, 1)
		case "dead":
			text = strings.Replace(text, "dead = 300000", "dead = "+c.value, 1)
		case "bow":
			text = strings.Replace(text, `bow = "L/1000"`, "bow = "+c.value, 1)
		}
		st, err := Parse("t.toml", []byte(text))
		if err != nil {
			t.Errorf("%s = %s (%s): %v", c.key, c.value, c.units, err)
			continue
		}
		q := find(st, c.path)
		if q == nil {
			t.Errorf("%s: no quantity %s", c.value, c.path)
			continue
		}
		got, sd := q.Value, 0.0
		if q.Random() {
			got, sd = q.Dist.Mean(), q.Dist.StdDev()
		}
		if !near(got, c.want, 1e-9) || !near(sd, c.sd, 1e-6) {
			t.Errorf("%s = %s (%s): mean %.12g sd %.8g, want %.12g and %.8g", c.key, c.value, c.units, got, sd, c.want, c.sd)
		}
	}
}

// TestCharacteristic: a lognormal from a characteristic value has that
// value at its fractile.
func TestCharacteristic(t *testing.T) {
	st := parse(t, strings.Replace(base, "yield = 355", `yield = { dist = "lognormal", characteristic = "275 MPa", fractile = 0.05, cov = 0.07 }`, 1))
	q := find(st, "material.yield")
	if got := q.Dist.Quantile(0.05); !near(got, 275, 1e-9) {
		t.Errorf("5 %% fractile %.10g, want 275", got)
	}
	if cov := q.Dist.StdDev() / q.Dist.Mean(); !near(cov, 0.07, 1e-9) {
		t.Errorf("cov %.10g, want 0.07", cov)
	}
}

// TestRelativeRandomLength: L/n values stay fractions of a random length.
func TestRelativeRandomLength(t *testing.T) {
	text := strings.Replace(base, "length = 3000", `length = { dist = "normal", mean = 3000, sd = 30 }`, 1)
	text = strings.Replace(text, `bow = "L/1000"`, `bow = { dist = "normal", mean = "L/1000", sd = "L/2000" }`, 1)
	st := parse(t, text)
	q := find(st, "imperfection.bow")
	if !q.Relative || !near(q.Dist.Mean(), 1e-3, 1e-12) || !near(q.Dist.StdDev(), 5e-4, 1e-12) {
		t.Errorf("bow relative %v mean %g sd %g, want fractions 1e-3 and 5e-4", q.Relative, q.Dist.Mean(), q.Dist.StdDev())
	}
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	// At x = (length 3500, bow fraction 2e-3) the member's bow is 7 mm.
	v := md.base
	for i, b := range md.binds {
		x := map[string]float64{"member.length": 3500, "imperfection.bow": 2e-3}[md.Sim.Vars[i].Name]
		md.set(&v, b, x)
	}
	m, _, err := md.member(&v)
	if err != nil || !near(m.Bow, 7, 1e-12) {
		t.Errorf("bow %g (%v), want 7 mm", m.Bow, err)
	}
	// Mixing L/n and millimetres with a random length is refused.
	bad := strings.Replace(text, `sd = "L/2000"`, `sd = "1 mm"`, 1)
	if _, err := Parse("t.toml", []byte(bad)); err == nil || !strings.Contains(err.Error(), "mixes L/n and absolute lengths") {
		t.Errorf("mixed L/n: error %v", err)
	}
}

func TestEnds(t *testing.T) {
	for _, c := range []struct {
		ends string
		k    [2]float64
		how  string
	}{
		{`ends = "pinned-pinned"`, [2]float64{1, 1}, "ends"},
		{`ends = "fixed-free"`, [2]float64{2, 2}, "ends"},
		{`ends = "free-fixed"`, [2]float64{2, 2}, "ends"},
		{`ends = "fixed-fixed"`, [2]float64{0.5, 0.5}, "ends"},
		// tan u = u, u = 4.493409458: K = pi/u (Timoshenko & Gere, §2.5).
		{`ends = "pinned-fixed"`, [2]float64{0.699156, 0.699156}, "ends"},
		{`k = 0.85`, [2]float64{0.85, 0.85}, "k"},
		{`k = { major = 1.2, minor = 0.8 }`, [2]float64{1.2, 0.8}, "k"},
		{"k_major = 1.5\nk_minor = 0.9", [2]float64{1.5, 0.9}, "k"},
		{"k_major = 1.5", [2]float64{1.5, 1}, "k"}, // minor takes the default
	} {
		st := parse(t, strings.Replace(base, `ends = "pinned-pinned"`, c.ends, 1))
		md, err := Build(st)
		if err != nil {
			t.Fatal(err)
		}
		n, err := md.Nominal()
		if err != nil {
			t.Fatal(err)
		}
		// A CHS has equal axes: K decides which governs.
		for a := range 2 {
			if !near(n.Member.K[a], c.k[a], 1e-6) {
				t.Errorf("%s: K[%d] = %g, want %g", c.ends, a, n.Member.K[a], c.k[a])
			}
		}
		if st.Ends[0].How != c.how {
			t.Errorf("%s: how %q, want %q", c.ends, st.Ends[0].How, c.how)
		}
	}
	st := parse(t, strings.Replace(base, `ends = "pinned-pinned"`, "k_major = 1.5", 1))
	if len(st.Warnings) == 0 || !strings.Contains(strings.Join(st.Defaults, "\n"), "member.k_minor") {
		t.Errorf("default K not listed: %v %v", st.Defaults, st.Warnings)
	}
}

// TestSprings: end springs give K by the exact stability equation; the
// braced member with R = k L/(E I) = 4 and 0.5 at its ends has
// K = 0.789245 (a root of the spring equation, see column.SpringK).
func TestSprings(t *testing.T) {
	st := parse(t, base)
	md, _ := Build(st)
	n, _ := md.Nominal()
	ei := 205000 * n.Member.Props.I[0]
	ka, kb := 4*ei/3000, 0.5*ei/3000
	text := strings.Replace(base, `ends = "pinned-pinned"`, "spring_top = "+ftoa(ka)+"\nspring_bottom = "+ftoa(kb), 1)
	st = parse(t, text)
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	n, err = md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	for a := range 2 {
		if !near(n.Member.K[a], 0.789245, 1e-5) {
			t.Errorf("K[%d] = %.6f, want 0.789245", a, n.Member.K[a])
		}
	}
	// "rigid" and 0: fixed-pinned.
	st = parse(t, strings.Replace(base, `ends = "pinned-pinned"`, "spring_top = \"rigid\"\nspring_bottom = { major = 0, minor = \"0 kN*m/rad\" }", 1))
	md, _ = Build(st)
	n, _ = md.Nominal()
	if !near(n.Member.K[1], 0.6991556596, 1e-6) {
		t.Errorf("rigid-pinned K = %.8f, want 0.69915566", n.Member.K[1])
	}
}

func ftoa(v float64) string { return strings.TrimRight(strings.TrimRight(fmtG(v), "0"), ".") }

func fmtG(v float64) string { return strconvFormat(v) }

// TestSectionAxes: computed shapes follow the stiffness for axis labels.
func TestSectionAxes(t *testing.T) {
	text := strings.Replace(base, "shape = \"CHS\"\ndiameter = 168.3\nthickness = 8", "shape = \"rect\"\ndepth = 50\nwidth = 100", 1)
	st := parse(t, text)
	md, _ := Build(st)
	n, _ := md.Nominal()
	p := n.Member.Props
	// b h^3/12 with the larger dimension as depth: 50 x 100^3/12 major.
	if !near(p.I[column.Major], 50*1e6/12, 1e-12) || !near(p.I[column.Minor], 100*125000/12.0, 1e-12) {
		t.Errorf("I = %v", p.I)
	}
}

// TestKeyLines: the scanner finds every key's line.
func TestKeyLines(t *testing.T) {
	doc := `# comment
title = "a # not a comment"
[member]
length = 5   # trailing
k = { major = 1.0,
  minor = { dist = "uniform", min = 0.7, max = 1.0 } }
[member.section]
"shape" = 'I'
notes = """
[fake]
x = 1
"""
[[correlation]]
pair = ["a", "b"]
rho = 0.1
[[correlation]]
rho = 0.2
[output]
formats = [
  "html",
  "json",
]
`
	got := keyLines(doc)
	for k, want := range map[string]int{
		"title": 2, "member": 3, "member.length": 4, "member.k": 5, "member.k.major": 5,
		"member.k.minor": 6, "member.k.minor.max": 6, "member.section": 7,
		"member.section.shape": 8, "correlation[0]": 13, "correlation[0].pair": 14,
		"correlation[0].rho": 15, "correlation[1].rho": 17, "output.formats": 19,
		"output.formats[1]": 21,
	} {
		if got[k] != want {
			t.Errorf("line of %s = %d, want %d", k, got[k], want)
		}
	}
	if _, ok := got["fake"]; ok {
		t.Error("a table inside a multi-line string was taken for a table")
	}
}

// TestMisspeltKeyOneProblem: a misspelt required key is one problem, the
// unknown key with its suggestion, not also the missing one.
func TestMisspeltKeyOneProblem(t *testing.T) {
	_, err := Parse("t.toml", []byte(strings.Replace(base, "yield = 355", "yeild = 355", 1)))
	e, ok := err.(*Error)
	if !ok || len(e.Problems) != 1 {
		t.Fatalf("Parse: %v; want one problem", err)
	}
	want := "t.toml:10: material.yeild: unknown key in [material]; did you mean material.yield?"
	if got := e.Problems[0].String(); got != want {
		t.Errorf("problem %q, want %q", got, want)
	}
}

func TestNearest(t *testing.T) {
	for _, c := range []struct {
		s    string
		want string
		ok   bool
	}{
		{"yeild", "yield", true},
		{"modulos", "modulus", true},
		{"perry", "perry-robertson", true},
		{"lenght", "length", true},
		{"zzzzzz", "", false},
	} {
		got, ok := nearest(c.s, []string{"yield", "modulus", "perry-robertson", "length", "k_major"})
		if got != c.want || ok != c.ok {
			t.Errorf("nearest(%q) = %q, %v; want %q, %v", c.s, got, ok, c.want, c.ok)
		}
	}
}

// TestTruncateWarning: a normal that can go negative on a positive
// quantity is truncated at zero, and the warning says so.
func TestTruncateWarning(t *testing.T) {
	st := parse(t, strings.Replace(base, "modulus = 205000", `modulus = { dist = "normal", mean = 205000, cov = 0.5 }`, 1))
	q := find(st, "material.modulus")
	if q.Dist.CDF(0) != 0 {
		t.Errorf("P(E <= 0) = %g after truncation", q.Dist.CDF(0))
	}
	if !strings.Contains(strings.Join(st.Warnings, "\n"), "material.modulus: a normal distribution can go negative here") {
		t.Errorf("no truncation warning: %v", st.Warnings)
	}
	// With a small cov nothing changes and nothing is said.
	st = parse(t, strings.Replace(base, "modulus = 205000", `modulus = { dist = "normal", mean = 205000, cov = 0.05 }`, 1))
	if len(st.Warnings) != 0 {
		t.Errorf("warnings for a harmless normal: %v", st.Warnings)
	}
}

// TestNominalBowMagnitude: a zero-mean normal bow acts at the mean of its
// magnitude, sd sqrt(2/pi) (the half-normal mean).
func TestNominalBowMagnitude(t *testing.T) {
	st := parse(t, strings.Replace(base, `bow = "L/1000"`, `bow = { dist = "normal", mean = 0, sd = "L/1000" }`, 1))
	md, _ := Build(st)
	n, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	if want := 3 * math.Sqrt(2/math.Pi); !near(n.Member.Bow, want, 1e-6) {
		t.Errorf("nominal bow %.8g, want %.8g", n.Member.Bow, want)
	}
}

func TestSweepAndVariants(t *testing.T) {
	text := base + `[sweep]
parameter = "member.length"
values = ["2 m", "3 m", 4000]
[[variant]]
name = "bow L/500"
set = { "imperfection.bow" = "L/500" }
`
	st := parse(t, text)
	if st.Sweep == nil || len(st.Sweep.Values) != 3 || !near(st.Sweep.Values[2].Value, 4000, 0) || !near(st.Sweep.Values[0].Value, 2000, 0) {
		t.Errorf("sweep %+v", st.Sweep)
	}
	if len(st.Variants) != 1 || st.Variants[0].Name != "bow L/500" || st.Variants[0].Set["imperfection.bow"] == nil {
		t.Errorf("variants %+v", st.Variants)
	}
	// Each case reads as a study of its own (see sweep_test.go).
	if d, err := st.Derive(0, 1); err != nil || d.Length.Value != 3000 || d.Bow.Value != 3000.0/500 {
		t.Errorf("Derive(0, 1) = %+v, %v", d, err)
	}
	for _, c := range []struct{ text, want string }{
		{base + "[sweep]\nparameter = \"member.lenght\"\nvalues = [1]\n", `t.toml:16: sweep.parameter: "member.lenght" is not a quantity of this study; did you mean "member.length"?`},
		{base + "[sweep]\nparameter = \"member.length\"\nvalues = [\"2 kN\"]\n", `t.toml:17: sweep.values[0]: "2 kN" is a force but this key takes a length`},
		{base + "[[variant]]\nname = \"x\"\nset = { \"material.yeild\" = 300 }\n", `t.toml:17: variant[0].set.material.yeild: "material.yeild" is not a quantity of this study; did you mean "material.yield"?`},
	} {
		_, err := Parse("t.toml", []byte(c.text))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("error %v\nwant %q", err, c.want)
		}
	}
}
