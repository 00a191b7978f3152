package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// kNm is a valid study in units = "kN-m": a 150 mm square bar, 3.2 m long,
// pinned (K L / r = 3200 / (150 / sqrt 12) = 73.9, the radius of gyration
// of a rectangle b / sqrt 12, Timoshenko & Gere, Theory of Elastic
// Stability, 2nd ed., 2.1), utilisation about 0.3.
const kNm = `title = "kN-m strut"
units = "kN-m"
[member]
length = 3.2
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = 0.15
width = 0.15
[material]
modulus = "205 GPa"
yield = { dist = "lognormal", mean = 275000, cov = 0.07 }
[imperfection]
bow = 0.003
[loads]
dead = { dist = "normal", mean = 1200, cov = 0.1 }
`

// kNmEdit replaces line n (1-based) of kNm by repl.
func kNmEdit(n int, repl string) string {
	lines := strings.Split(kNm, "\n")
	lines[n-1] = repl
	return strings.Join(lines, "\n")
}

// TestPlausibilityGuards: each guard warns, naming the key and its line,
// for a study that trips it, and stays silent for one just inside. The
// bounds (K L / r 300, utilisation 0.05 to 3, steel yield 100 to 1,500
// MPa, bow L/50) are common practice, not limits of a code.
func TestPlausibilityGuards(t *testing.T) {
	for _, c := range []struct {
		name, study string
		// want: fragments of the warning; absent: a fragment that must
		// not appear (the guard's own words).
		want   []string
		absent string
	}{
		// K L / r of the 100 x 50 bar of good about its minor axis is
		// L / (50 / sqrt 12): 4400 mm gives 304.8, 4300 mm gives 297.9.
		{"slender", edit(3, "length = 4400"), []string{"member.length (line 3): K L / r = 304.8 about the minor axis is above 300"}, ""},
		{"not slender", edit(3, "length = 4300"), nil, "K L / r ="},
		// good's loads written in N by mistake: 180 N on a bar that
		// carries some 400 kN.
		{"utilisation low", strings.NewReplacer(`"100 kN"`, "100", `"80 kN"`, "80").Replace(good),
			[]string{"loads (line 15): the utilisation at nominal values is", "below 0.05", `loads without a unit are read in N (units = "N-mm"): did you mean them in kN`}, ""},
		{"utilisation high", strings.NewReplacer(`"100 kN"`, `"1000 kN"`, `"80 kN"`, `"800 kN"`).Replace(good),
			[]string{"loads (line 15): the utilisation at nominal values is", "above 3"}, ""},
		{"utilisation fine", good, nil, "utilisation at nominal values is"},
		{"yield low", edit(11, `yield = { dist = "lognormal", mean = 50, cov = 0.1 }`),
			[]string{"material.yield (line 11): the mean is 50 MPa, outside 100 MPa to 1500 MPa, the plausible range of the yield strength of structural steel"}, ""},
		{"yield high", edit(11, `yield = "1600 MPa"`), []string{"material.yield (line 11): the value is 1600 MPa"}, ""},
		{"yield fine", edit(11, `yield = "1400 MPa"`), nil, "material.yield (line"},
		// L/50 of the 2000 mm bar is 40 mm.
		{"bow large", edit(13, `bow = 45`), []string{"imperfection.bow (line 13): the value is 45 mm, larger than L/50 = 40 mm", "was L/500 meant"}, ""},
		{"bow L/n large", edit(13, `bow = "L/40"`), []string{"imperfection.bow (line 13): the value is 50 mm, larger than L/50 = 40 mm"}, ""},
		{"bow fine", edit(13, `bow = 35`), nil, "imperfection.bow (line"},
		// Bare numbers read in the study's units, plausible in another
		// unit of the same (metric) family.
		{"length in mm", kNmEdit(4, "length = 3200"), []string{`member.length (line 4): 3200 has no unit and is read in m (units = "kN-m"): 3.2 km`, `did you mean "3200 mm"?`}, ""},
		{"length in m", edit(3, "length = 2"), []string{`member.length (line 3): 2 has no unit and is read in mm (units = "N-mm"): 2 mm`, `did you mean "2 m"?`}, ""},
		{"length fine", kNmEdit(4, `length = "3200 mm"`), nil, "member.length (line"},
		{"yield in MPa", kNmEdit(12, "yield = 275"), []string{`material.yield (line 12): 275 has no unit and is read in kPa (units = "kN-m"): 0.275 MPa`, `did you mean "275 MPa"?`}, ""},
		{"yield distribution in MPa", kNmEdit(12, `yield = { dist = "lognormal", mean = 275, cov = 0.07 }`),
			[]string{`material.yield (line 12): the numbers of this distribution have no unit and are read in kPa`, `did you mean them in MPa (e.g. mean = "275 MPa")?`}, ""},
		{"yield fine in kPa", kNm, nil, "material.yield (line"},
		{"bow in mm", kNmEdit(14, "bow = 5"), []string{`imperfection.bow (line 14): 5 has no unit and is read in m (units = "kN-m"): 5 m, larger than L/50 = 64 mm; did you mean "5 mm"?`}, ""},
		// The three slips of the issue together: the bow of 1000 mm is
		// below L/50 of the 3.2 km member the length reads as.
		{"three slips", strings.NewReplacer("length = 3.2", "length = 3200", "mean = 275000", "mean = 275", "bow = 0.003", "bow = 1000").Replace(kNm), []string{
			`member.length (line 4): 3200 has no unit and is read in m (units = "kN-m"): 3.2 km`, `did you mean "3200 mm"?`,
			`material.yield (line 12): the numbers of this distribution have no unit and are read in kPa`,
			`imperfection.bow (line 14): 1000 has no unit and is read in m (units = "kN-m"): 1 km, larger than L/50 = 64 m; did you mean "1000 mm"?`,
			"member.length (line 4): K L / r = 73900 about the major axis is above 300",
		}, ""},
		{"section in mm", kNmEdit(8, "depth = 150"), []string{`member.section.depth (line 8): 150 has no unit and is read in m`, `did you mean "150 mm"?`}, ""},
		{"modulus in MPa", kNmEdit(11, "modulus = 205000"), []string{`material.modulus (line 11): 205000 has no unit and is read in kPa`, `did you mean "205000 MPa"?`}, ""},
		{"modulus fine", kNmEdit(11, "modulus = 205e6"), nil, "material.modulus (line"},
	} {
		t.Run(c.name, func(t *testing.T) {
			code, out, errs := invoke(t, "check", writeStudy(t, c.study))
			if code != 0 {
				t.Fatalf("check exit %d (a guard warns, never stops), stderr:\n%s", code, errs)
			}
			for _, w := range c.want {
				if !strings.Contains(out, w) {
					t.Errorf("check output lacks %q:\n%s", w, out)
				}
			}
			if c.absent != "" && strings.Contains(out, c.absent) {
				t.Errorf("check output has %q, want no such warning:\n%s", c.absent, out)
			}
			if len(c.want) == 0 && strings.Contains(out, "(line ") {
				t.Errorf("a plausible study drew a guard's warning:\n%s", out)
			}
		})
	}
}

// TestRunInfiniteBeta: a run whose every sample fails says what beta =
// -inf means beside it and in the warnings; one with no failure says what
// +inf means; a study in between has neither statement.
func TestRunInfiniteBeta(t *testing.T) {
	t.Parallel()                                                                   // sets no hook: runs beside the other slow tests
	crushed := edit(15, `dead = { dist = "normal", mean = "5000 kN", cov = 0.1 }`) // 12 times what the bar carries
	for _, c := range []struct {
		name, study string
		want        []string
		absent      []string
	}{
		{"every sample fails", crushed, []string{
			"reliability beta   -inf",
			"(-inf: every one of the 2000 evaluations failed; not a result to read before the inputs are checked: see the warnings)",
			"warning            beta is -inf: every one of the 2000 evaluations failed, so pf is only known to be above",
			"loads (line 15): the utilisation at nominal values is",
		}, nil},
		{"no sample fails", edit(15, `dead = { dist = "normal", mean = "10 kN", cov = 0.1 }`) + "", []string{
			"reliability beta   inf",
			"(inf: none of the 2000 evaluations failed; beta is only known to be above",
			"warning            no failure in 2000 samples",
		}, []string{"beta is -inf"}},
		{"some fail", edit(15, `dead = { dist = "normal", mean = "250 kN", cov = 0.1 }`), nil, []string{"-inf:", "inf: none", "beta is -inf", "beta is +inf", "(beta inf:"}},
		// A sweep case whose every sample fails: its table says what -inf means.
		{"sweep case fails", edit(15, `dead = { dist = "normal", mean = "250 kN", cov = 0.1 }`) + "[sweep]\nparameter = \"loads.dead.mean\"\nvalues = [\"250 kN\", \"5000 kN\"]\n",
			[]string{"5000000 -inf (unbounded)", "(beta inf: no sample of the case failed, beta is only bounded below; -inf: every sample failed, not a result to read before the inputs are checked)"}, []string{"beta is -inf"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			p := writeStudy(t, c.study)
			dir := t.TempDir()
			code, out, errs := invoke(t, "run", p, "--method", "monte-carlo", "--samples", "2000", "--out", dir)
			if code != 0 {
				t.Fatalf("run exit %d, stderr:\n%s", code, errs)
			}
			for _, w := range c.want {
				if !strings.Contains(out, w) {
					t.Errorf("run output lacks %q:\n%s", w, out)
				}
			}
			for _, w := range c.absent {
				if strings.Contains(out, w) {
					t.Errorf("run output has %q:\n%s", w, out)
				}
			}
			// The reports never write the largest float that stands for an
			// infinite beta in results.json as a number.
			for _, f := range []string{"report.html", "summary.md", "summary.txt"} {
				b, err := os.ReadFile(filepath.Join(dir, f))
				if err != nil {
					t.Fatal(err)
				}
				if strings.Contains(string(b), "17976931348623") {
					t.Errorf("%s prints an infinite beta as a number", f)
				}
				if strings.Contains(c.name, "sweep") && f != "summary.txt" && !strings.Contains(string(b), "-inf (unbounded)") {
					t.Errorf("%s does not say what the -inf of the failing sweep case means", f)
				}
			}
		})
	}
}
