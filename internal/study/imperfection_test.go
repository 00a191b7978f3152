package study

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// hColumn is a study of a rolled H column (254 x 254 x 73 dimensions);
// ends, bow and the capacity table are filled in by the tests.
const hColumn = `[member]
length = %LENGTH%
%ENDS%
[member.section]
shape = "I"
depth = 254.1
width = 254.6
flange = 14.2
web = 8.6
root = 12.7
fabrication = "hot-rolled"
[material]
modulus = 210000
yield = { dist = "lognormal", mean = 275, cov = 0.07 }
[imperfection]
%IMPERFECTION%
[loads]
dead = 500000
[capacity]
%CAPACITY%
`

func hStudy(t *testing.T, length, ends, imperfection, capacity string) *Model {
	t.Helper()
	r := strings.NewReplacer("%LENGTH%", length, "%ENDS%", ends, "%IMPERFECTION%", imperfection, "%CAPACITY%", capacity)
	st := parse(t, r.Replace(hColumn))
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	return md
}

func nominalCapacity(t *testing.T, md *Model) float64 {
	t.Helper()
	n, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	return n.Capacity
}

// A bow written Lcr/n is the amplitude of the imperfection in the shape of
// the buckling mode: a fixed-free column of length L is the same buckling
// problem as a pinned one of length 2 L (Timoshenko & Gere, Theory of
// Elastic Stability, 2nd ed., ch. 2: the cantilever is half of the pinned
// member of twice its length), so with Lcr/1000 and L/1000 respectively
// the capacities agree, for every model that takes a bow.
func TestLcrFixedFreeEqualsPinned(t *testing.T) {
	for _, capacity := range []string{
		`model = "perry-robertson"`,
		`model = "beam-column"`,
		`model = "beam-column"` + "\nlimit = \"ultimate\"\nresidual_stress = \"hot-rolled\"",
		`model = "perry-robertson"` + "\nimperfection = \"equivalent\"",
	} {
		for _, l := range []float64{1500, 3000, 4500} {
			ls := func(x float64) string { return fmt.Sprintf("%g", x) }
			cant := hStudy(t, ls(l), `ends = "fixed-free"`, `bow = "Lcr/1000"`, capacity)
			pin := hStudy(t, ls(2*l), `ends = "pinned-pinned"`, `bow = "L/1000"`, capacity)
			c, p := nominalCapacity(t, cant), nominalCapacity(t, pin)
			if math.Abs(c-p) > 1e-6*p {
				t.Errorf("%s, L %g: fixed-free with Lcr/1000 %.9g N, pinned 2L with L/1000 %.9g N", capacity, l, c, p)
			}
		}
	}
}

// An Lcr/n bow follows K of each axis and of each sample, K random or from
// end springs.
func TestLcrFollowsK(t *testing.T) {
	md := hStudy(t, "4000", `k_major = { dist = "uniform", min = 0.7, max = 1.0 }`+"\nk_minor = 2.0",
		`bow = { dist = "normal", mean = "Lcr/1000", sd = "Lcr/4000" }`, `model = "perry-robertson"`)
	q := find(md.Study, "imperfection.bow")
	if !q.Lcr || q.Relative || !near(q.Dist.Mean(), 1e-3, 1e-12) {
		t.Fatalf("bow: Lcr %v, Relative %v, mean %g; want a fraction 0.001 of Lcr", q.Lcr, q.Relative, q.Dist.Mean())
	}
	x := medians(md)
	for i, v := range md.Sim.Vars {
		switch v.Name {
		case "member.k_major":
			x[i] = 0.8
		case "imperfection.bow":
			x[i] = 2e-3
		}
	}
	v := md.base
	for i, b := range md.binds {
		md.set(&v, b, x[i])
	}
	for a, k := range [2]float64{0.8, 2.0} {
		_, m, err := md.capacity(&v, column.Axis(a))
		if err != nil {
			t.Fatal(err)
		}
		if want := 2e-3 * k * 4000; !near(m.Bow, want, 1e-12) {
			t.Errorf("%s axis: bow %g mm, want %g (0.002 K L)", column.Axis(a), m.Bow, want)
		}
	}
	// Springs: K from the springs of the sample.
	md = hStudy(t, "4000", `spring_top = "5000 kN*m"`+"\n"+`spring_bottom = "rigid"`, `bow = "Lcr/500"`, `model = "perry-robertson"`)
	n, _ := md.Nominal()
	if want := n.Member.K[n.Axis] * 4000 / 500; !near(n.Member.Bow, want, 1e-12) || !(n.Member.K[n.Axis] < 1) {
		t.Errorf("springs: bow %g mm, want K L/500 = %g (K %g)", n.Member.Bow, want, n.Member.K[n.Axis])
	}
}

// The equivalent imperfection makes Perry-Robertson give the EN 1993-1-1
// buckling curve (EN 1993-1-1:2005 6.3.1.2, eq. (6.49); 5.3.2(11) for the
// amplitude), and without a curve it takes Table 6.2's: rolled H with
// h/b <= 1.2, tf <= 100 mm: curve b about y-y, c about z-z.
func TestEquivalentMatchesCurve(t *testing.T) {
	for _, l := range []string{"1500", "3000", "5000", "8000", "12000"} {
		for _, ends := range []string{`ends = "pinned-pinned"`, `ends = "fixed-free"`} {
			eq := hStudy(t, l, ends, "", "imperfection = \"equivalent\"")
			cv := hStudy(t, l, ends, "", "model = \"curve\"\ncurve = { major = \"b\", minor = \"c\" }")
			if e, c := nominalCapacity(t, eq), nominalCapacity(t, cv); math.Abs(e-c) > 1e-9*c {
				t.Errorf("L %s, %s: equivalent imperfection %.10g N, curve %.10g N", l, ends, e, c)
			}
		}
	}
	eq := hStudy(t, "3000", `ends = "pinned-pinned"`, "", "imperfection = \"equivalent\"")
	if !strings.Contains(strings.Join(eq.Study.Defaults, "\n"), `Table 6.2 gives curve "b" (major axis) and "c" (minor axis)`) {
		t.Errorf("defaults do not state the Table 6.2 choice: %q", eq.Study.Defaults)
	}
	// With the study's own bow of Lcr/1000 (the bow of the curves'
	// calibration), the curve comes back where alpha (lam - 0.2) W/A >=
	// Lcr/1000.
	withBow := hStudy(t, "5000", `ends = "pinned-pinned"`, `bow = "Lcr/1000"`, "imperfection = \"equivalent\"\ncurve = \"c\"")
	cv := hStudy(t, "5000", `ends = "pinned-pinned"`, "", "model = \"curve\"\ncurve = \"c\"")
	if e, c := nominalCapacity(t, withBow), nominalCapacity(t, cv); math.Abs(e-c) > 1e-9*c {
		t.Errorf("equivalent with a bow of Lcr/1000: %.10g N, curve c %.10g N", e, c)
	}
}

// A sway acts only about an axis whose ends sway; the braced axis is said.
func TestSwayAxes(t *testing.T) {
	md := hStudy(t, "4000", "k_major = 2.0\nk_minor = 0.7", `sway = "1/200"`, `model = "perry-robertson"`)
	if md.Study.SwayAxes != [2]bool{true, false} {
		t.Fatalf("sway axes %v, want major only", md.Study.SwayAxes)
	}
	if w := strings.Join(md.Study.Warnings, "\n"); !strings.Contains(w, "braced: minor (K = 0.7)") {
		t.Errorf("no warning of the braced axis: %q", w)
	}
	v := md.nominalValues()
	for a, want := range [2]float64{0.005, 0} {
		_, m, err := md.capacity(&v, column.Axis(a))
		if err != nil {
			t.Fatal(err)
		}
		if m.Sway != want {
			t.Errorf("%s axis: sway %g, want %g", column.Axis(a), m.Sway, want)
		}
	}
	// EN 1993-1-1 5.3.2(3): phi0 alpha_h for h = 4 m is 1/200 (alpha_h =
	// 2/sqrt(4) = 1); 1/400 is below it and is warned of.
	md = hStudy(t, "4000", `ends = "fixed-free"`, `sway = "1/400"`, `model = "perry-robertson"`)
	if w := strings.Join(md.Study.Warnings, "\n"); !strings.Contains(w, "phi = 1/400 is below the EN 1993-1-1 5.3.2(3) value") || !strings.Contains(w, "1/200") {
		t.Errorf("no EN 1993-1-1 sway warning: %q", w)
	}
	// alpha_h = 2/sqrt(9) = 2/3 for h = 9 m: phi0 alpha_h = 1/300, so 1/300
	// is not warned of.
	md = hStudy(t, "9000", `ends = "fixed-free"`, `sway = "1/300"`, `model = "perry-robertson"`)
	if w := strings.Join(md.Study.Warnings, "\n"); strings.Contains(w, "5.3.2(3)") {
		t.Errorf("1/300 at 9 m warned of: %q", w)
	}
}

// The adequacy warning: first yield with a geometric bow alone on a rolled
// H gives more than EN 1993-1-1 curve c and the ultimate beam-column with
// hot-rolled residual stresses; the equivalent imperfection and the curve
// are not warned of.
func TestAdequacyWarning(t *testing.T) {
	for _, c := range []struct {
		capacity string
		warn     bool
	}{
		{`model = "perry-robertson"`, true},
		{`model = "beam-column"`, true},
		{"model = \"perry-robertson\"\nimperfection = \"equivalent\"", false},
		{"model = \"curve\"\ncurve = { major = \"b\", minor = \"c\" }", false},
		{"model = \"beam-column\"\nlimit = \"ultimate\"\nresidual_stress = \"hot-rolled\"", false},
	} {
		imp := `bow = "Lcr/1000"`
		if strings.Contains(c.capacity, "equivalent") {
			imp = ""
		}
		md := hStudy(t, "4000", `ends = "pinned-pinned"`, imp, c.capacity)
		n, err := md.Nominal()
		if err != nil {
			t.Fatal(err)
		}
		w := strings.Join(md.Adequacy(n), "\n")
		if got := strings.Contains(w, "leaves out the residual stresses"); got != c.warn {
			t.Errorf("%s: warned %v, want %v: %q", c.capacity, got, c.warn, w)
		}
		if c.warn && !strings.Contains(w, `buckling curve "b" (major), "c" (minor)`) {
			t.Errorf("%s: the warning does not name the Table 6.2 curves: %q", c.capacity, w)
		}
	}
	// L/n on a cantilever: said, with what Lcr/n would do.
	md := hStudy(t, "3000", `ends = "fixed-free"`, `bow = "L/1000"`, `model = "curve"`+"\ncurve = \"c\"")
	n, _ := md.Nominal()
	if w := strings.Join(md.Adequacy(n), "\n"); strings.Contains(w, "written as L/n") {
		t.Errorf("curve model warned of L/n: %q", w)
	}
	md = hStudy(t, "3000", `ends = "fixed-free"`, `bow = "L/1000"`, `model = "perry-robertson"`)
	n, _ = md.Nominal()
	if w := strings.Join(md.Adequacy(n), "\n"); !strings.Contains(w, "imperfection.bow (line 16): written as L/n on a member whose K is 2 (both axes)") || !strings.Contains(w, "here 2 times") {
		t.Errorf("no L/n warning on a cantilever: %q", w)
	}
}

// A short equal angle, where flexural-torsional buckling governs: the
// equivalent imperfection gives the curve model's resistance there too
// (EN 1993-1-1:2005 6.3.1.4: eq. (6.49) with lam_T and the minor axis's
// curve).
func TestEquivalentTwistingMatchesCurve(t *testing.T) {
	angle := func(length, capacity string) *Model {
		text := "[member]\nlength = " + length + "\nends = \"pinned-pinned\"\n[member.section]\nshape = \"angle\"\ndepth = 100\nwidth = 100\nthickness = 10\n" +
			"[material]\nmodulus = 210000\nyield = 355\n[loads]\ndead = 100000\n[capacity]\n" + capacity + "\n"
		md, err := Build(parse(t, text))
		if err != nil {
			t.Fatal(err)
		}
		return md
	}
	for _, l := range []string{"400", "600", "800"} {
		eq := angle(l, "imperfection = \"equivalent\"\ncurve = \"b\"")
		cv := angle(l, "model = \"curve\"\ncurve = \"b\"")
		ne, err := eq.Nominal()
		if err != nil {
			t.Fatal(err)
		}
		nc, _ := cv.Nominal()
		if !nc.CapacityMode.Twists() {
			t.Fatalf("L %s: the curve model's governing mode %v does not twist", l, nc.CapacityMode)
		}
		if math.Abs(ne.Capacity-nc.Capacity) > 1e-9*nc.Capacity || ne.CapacityMode != nc.CapacityMode {
			t.Errorf("L %s: equivalent %.10g N (%v), curve %.10g N (%v)", l, ne.Capacity, ne.CapacityMode, nc.Capacity, nc.CapacityMode)
		}
		// The sampled limit state agrees with the nominal picture.
		out := make([]float64, 2)
		eq.Sim.G(medians(eq), out)
		if math.Abs(out[OutCapacity]-ne.Capacity) > 1e-9*ne.Capacity {
			t.Errorf("L %s: g's capacity %.10g N, nominal %.10g N", l, out[OutCapacity], ne.Capacity)
		}
	}
}

// A sweep over Lcr/n values keeps them fractions of the buckling length:
// labelled so, and each derived case reads its value as Lcr/n (a range
// written back as "Lcr/..."), so the case's capacity is that of the study
// written with the value.
func TestSweepLcr(t *testing.T) {
	for _, sweep := range []string{
		"[sweep]\nparameter = \"imperfection.bow\"\nvalues = [\"Lcr/1000\", \"Lcr/500\"]\n",
		"[sweep]\nparameter = \"imperfection.bow\"\nfrom = \"Lcr/1000\"\nto = \"Lcr/500\"\nsteps = 2\n",
	} {
		r := strings.NewReplacer("%LENGTH%", "3000", "%ENDS%", `ends = "fixed-free"`, "%IMPERFECTION%", `bow = "Lcr/700"`, "%CAPACITY%", `model = "perry-robertson"`)
		st := parse(t, r.Replace(hColumn)+sweep)
		if got := st.Sweep.Label(); got != "imperfection.bow (fraction of Lcr)" {
			t.Errorf("label %q", got)
		}
		for i, n := range []string{"1000", "500"} {
			d, err := st.Derive(-1, i)
			if err != nil {
				t.Fatal(err)
			}
			md, err := Build(d)
			if err != nil {
				t.Fatal(err)
			}
			want := hStudy(t, "3000", `ends = "fixed-free"`, `bow = "Lcr/`+n+`"`, `model = "perry-robertson"`)
			if c, w := nominalCapacity(t, md), nominalCapacity(t, want); math.Abs(c-w) > 1e-9*w {
				t.Errorf("%s: case %d capacity %.9g, study with Lcr/%s %.9g", strings.SplitN(sweep, "\n", 3)[2], i, c, n, w)
			}
		}
	}
	r := strings.NewReplacer("%LENGTH%", "3000", "%ENDS%", `ends = "fixed-free"`, "%IMPERFECTION%", `bow = "Lcr/700"`, "%CAPACITY%", `model = "perry-robertson"`)
	_, err := Parse("t.toml", []byte(r.Replace(hColumn)+"[sweep]\nparameter = \"imperfection.bow\"\nvalues = [\"Lcr/1000\", \"L/500\"]\n"))
	if err == nil || !strings.Contains(err.Error(), "mix Lcr/n with L/n") {
		t.Errorf("mixed sweep: %v", err)
	}
}

// One evaluation with per-axis imperfections (Lcr/n, sway, the equivalent
// imperfection, the twisting modes) does not allocate.
func TestImperfectionsNoAlloc(t *testing.T) {
	for _, c := range []struct{ imp, capacity string }{
		{"bow = { dist = \"normal\", mean = \"Lcr/1000\", sd = \"Lcr/3000\" }\nsway = \"1/200\"", `model = "perry-robertson"`},
		{"bow = { dist = \"normal\", mean = \"Lcr/1000\", sd = \"Lcr/3000\" }", "imperfection = \"equivalent\""},
		{"", "imperfection = \"equivalent\""},
	} {
		md := hStudy(t, "3000", `ends = "fixed-free"`, c.imp, c.capacity)
		x := medians(md)
		out := make([]float64, 2)
		if n := testing.AllocsPerRun(100, func() { md.Sim.G(x, out) }); n != 0 {
			t.Errorf("%s / %s: %g allocations per evaluation", c.imp, c.capacity, n)
		}
	}
}
