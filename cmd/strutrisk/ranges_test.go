package main

import (
	"strings"
	"testing"
)

// TestHugeAndTinyValuesRefusedAtCheck: values check used to accept and run
// then failed on with exit 3 after all the work (issue 10, item 7) are
// refused by check, with key and line and exit 2.
func TestHugeAndTinyValuesRefusedAtCheck(t *testing.T) {
	for _, c := range []struct {
		name, study, want string
	}{
		{"load mean 1e308", edit(15, `dead = { dist = "normal", mean = 1e308, cov = 0.1 }`), "study.toml:15: loads.dead: mean: 1e+308 N is outside the range a study may use for a force (1e-06 to 1e+12 N, or 0)"},
		{"load sd 1e300", edit(15, `dead = { dist = "normal", mean = 100, sd = 1e300 }`), "study.toml:15: loads.dead: sd: 1e+300 N is outside the range"},
		{"length 1e-300", edit(3, "length = 1e-300"), "study.toml:3: member.length: 1e-300 mm is outside the range a study may use for a length (1e-06 to 1e+08 mm, or 0)"},
		{"length 1e9 mm", edit(3, "length = 1e9"), "study.toml:3: member.length: 1e+09 mm is outside the range"},
		{"model factor 1e300", good + "[capacity]\nmodel_factor = 1e300\n", "study.toml:20: capacity.model_factor: 1e+300 is outside the range a study may use for a plain number (1e-09 to 1e+06, or 0)"},
		{"modulus 1e300", edit(10, "modulus = 1e300"), "study.toml:10: material.modulus: 1e+300 MPa is outside the range"},
		{"bow L/1e-300", edit(13, `bow = "L/1e-300"`), "study.toml:13: imperfection.bow: L/1e-300 is more than the member length"},
		{"lognormal mu 600", edit(11, `yield = { dist = "lognormal", mu = 600, sigma = 0.1 }`), "study.toml:11: material.yield: the median of the distribution, 3.77e+260 MPa, is outside the range"},
		{"weibull shape 0.02", edit(16, `imposed = { dist = "weibull", shape = 0.02, scale = 1000 }`), "study.toml:16: loads.imposed: the distribution reaches 4.99e+81 N at its 1e-16 fractile"},
		{"swept value", good + "[sweep]\nparameter = \"loads.dead.mean\"\nvalues = [100000, 1e300]\n", "study.toml:21: sweep.values[1]: 1e+300 N is outside the range"},
		{"variant value", good + "[[variant]]\nname = \"huge\"\nset = { \"material.yield.mean\" = 1e100 }\n", `study.toml:21: material.yield: with the values of variant "huge": mean: 1e+100 MPa is outside the range`},
	} {
		code, _, errs := invoke(t, "check", writeStudy(t, c.study))
		if code != exitInput || !strings.Contains(errs, c.want) {
			t.Errorf("%s: exit %d, stderr %q; want exit 2 and %q", c.name, code, errs, c.want)
		}
	}
}

// TestExtremeButAllowedValuesRun: at the edges of the ranges the run
// computes finite numbers and writes its results (exit 0), so what check
// accepts run can compute.
func TestExtremeButAllowedValuesRun(t *testing.T) {
	lines := strings.Split(good, "\n")
	lines[2] = "length = 1e-6"
	lines[9] = "modulus = 1e7"
	lines[15] = `imposed = { dist = "gumbel", mean = 1e12, cov = 1 }`
	study := strings.Join(lines, "\n") + "[capacity]\nmodel_factor = 1e3\n"
	code, _, errs := invoke(t, "run", writeStudy(t, study), "--samples", "2000", "--out", t.TempDir(), "--method", "monte-carlo")
	if code != exitOK {
		t.Errorf("extreme study: exit %d, stderr %.400s", code, errs)
	}
}
