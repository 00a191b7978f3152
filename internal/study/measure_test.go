package study

import (
	"errors"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// measured is base with random yield and bow, a thickness loss and
// [measurements] appended by each test.
const measured = `[member]
length = 3000
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 168.3
thickness = 8
thickness_loss = { dist = "lognormal", mean = 1.0, cov = 0.4 }
[material]
modulus = 205000
yield = { dist = "lognormal", mean = 300, cov = 0.07 }
[imperfection]
bow = { dist = "normal", mean = "L/1000", sd = "L/2000", lower = 0 }
[loads]
dead = 300000
[measurements]
`

func logStats(x []float64) (m, s float64) {
	for _, v := range x {
		m += math.Log(v)
	}
	m /= float64(len(x))
	for _, v := range x {
		s += (math.Log(v) - m) * (math.Log(v) - m)
	}
	return m, math.Sqrt(s / float64(len(x)-1))
}

// TestMeasureKnownVariancePrior: the study's lognormal yield (mean 300,
// cov 0.07) weighted as two tests, with the cov known, updated with four
// coupons. The conjugate normal update of a normal mean with known
// variance (Gelman et al., Bayesian Data Analysis, 3rd ed., 2013,
// section 2.5; from memory): m” = (n' m' + n ybar) / (n' + n), and the
// predictive of ln X is normal with variance sigma^2 (1 + 1/n”), so its 5 %
// fractile is exp(m” - 1.6449 sigma sqrt(1 + 1/n”)).
func TestMeasureKnownVariancePrior(t *testing.T) {
	st := parse(t, measured+`yield = { values = ["287 MPa", "301 MPa", "279 MPa", "0.295 GPa"], prior_tests = 2, cov = 0.07 }`+"\n")
	if len(st.Measurements) != 1 {
		t.Fatalf("%d measurements, want 1", len(st.Measurements))
	}
	ms := st.Measurements[0]
	data := []float64{287, 301, 279, 295}
	for i, v := range data {
		if !near(ms.Values[i], v, 1e-12) {
			t.Errorf("value %d = %g MPa, want %g", i, ms.Values[i], v)
		}
	}
	sigma := math.Sqrt(math.Log(1 + 0.07*0.07))
	m0 := math.Log(300) - sigma*sigma/2
	ybar := 0.0
	for _, v := range data {
		ybar += math.Log(v) / 4
	}
	m := (2*m0 + 4*ybar) / 6
	want := math.Exp(m - 1.6448536269514722*sigma*math.Sqrt(1+1.0/6))
	got := ms.UpdatedSummary().P05
	if !near(got, want, 1e-9) {
		t.Errorf("updated 5%% fractile %.6f MPa, want %.6f", got, want)
	}
	if q := find(st, "material.yield"); q.Dist != ms.After || q.Updated() != ms {
		t.Error("the yield's distribution is not the updated one")
	}
	if got := st.Quantities[0]; got == nil {
		t.Fatal("no quantities")
	}
}

// TestMeasureUnknownVariancePrior: the normal-gamma update with an
// informative prior, by the relations of the Bayesian procedure behind
// EN 1990:2002 Annex D, D.7 (Raiffa and Schlaifer, Applied Statistical
// Decision Theory, 1961; from memory): n” = n' + n, nu” = nu' + nu + 1,
// m” = (n' m' + n ybar)/n”, nu” s”^2 + n” m”^2 = nu' s'^2 + n' m'^2 +
// nu s^2 + n ybar^2, and the 5 % fractile exp(m” - t_{nu”} s”
// sqrt(1 + 1/n”)) with the Student-t quantile of gonum.
func TestMeasureUnknownVariancePrior(t *testing.T) {
	st := parse(t, measured+`yield = { values = ["287 MPa", "301 MPa", "279 MPa", "295 MPa", "290 MPa"], prior_tests = 3, prior_dof = 3 }`+"\n")
	ms := st.Measurements[0]
	data := []float64{287, 301, 279, 295, 290}
	s0 := math.Sqrt(math.Log(1 + 0.07*0.07))
	m0 := math.Log(300) - s0*s0/2
	ybar, sy := logStats(data)
	n0, nu0, n := 3.0, 3.0, 5.0
	nn, nu := n0+n, nu0+(n-1)+1
	m := (n0*m0 + n*ybar) / nn
	s2 := (nu0*s0*s0 + n0*m0*m0 + (n-1)*sy*sy + n*ybar*ybar - nn*m*m) / nu
	tq := distuv.StudentsT{Mu: 0, Sigma: 1, Nu: nu}.Quantile(0.95)
	want := math.Exp(m - tq*math.Sqrt(s2)*math.Sqrt(1+1/nn))
	if got := ms.UpdatedSummary().P05; !near(got, want, 1e-7) {
		t.Errorf("updated 5%% fractile %.6f MPa, want %.6f", got, want)
	}
	if ms.Posterior.Nu != nu || ms.Variance() != "unknown" {
		t.Errorf("nu'' = %g, variance %s; want %g, unknown", ms.Posterior.Nu, ms.Variance(), nu)
	}
	// The nominal picture uses the mean of the lognormal with the
	// predictive's log-mean and log-scale, not the log-Student-t's
	// infinite mean.
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	nom, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	if want := math.Exp(m + s2*(1+1/nn)/2); !near(nom.Member.Fy, want, 1e-9) {
		t.Errorf("nominal fy %.4f, want the mean estimate %.4f", nom.Member.Fy, want)
	}
}

// TestMeasureEveryTarget: each key updates its quantity; a fixed quantity
// with a vague prior becomes random; bows may be written as L/n; a prior
// that is not lognormal is matched by mean and cov, with a warning.
func TestMeasureEveryTarget(t *testing.T) {
	text := strings.Replace(measured, "modulus = 205000", "modulus = \"205 GPa\"", 1) +
		`modulus = { values = ["203 GPa", "209 GPa", "198 GPa"] }
bow = { values = ["L/1000", "2.4 mm", "4 mm"], prior_tests = 1, prior_dof = 2 }
thickness_loss = { values = ["0.8 mm", "1.3 mm", "1.1 mm"], cov = 0.2 }
`
	st := parse(t, text)
	if len(st.Measurements) != 3 {
		t.Fatalf("%d measurements, want 3", len(st.Measurements))
	}
	for _, ms := range st.Measurements {
		q := find(st, ms.Path)
		if q == nil || !q.Random() || q.Updated() != ms {
			t.Errorf("%s not updated", ms.Path)
		}
	}
	if v := st.Measurements[1].Values[0]; !near(v, 3, 1e-12) {
		t.Errorf("bow L/1000 of a 3000 mm member read as %g mm, want 3", v)
	}
	if w := strings.Join(st.Warnings, "\n"); !strings.Contains(w, "imperfection.bow is normal, not lognormal") {
		t.Errorf("no warning about the normal prior of the bow:\n%s", w)
	}
	if _, err := Build(st); err != nil {
		t.Fatal(err)
	}
}

// TestMeasureErrors: problems name the key and its line.
func TestMeasureErrors(t *testing.T) {
	line := strings.Count(measured, "\n") + 1
	for _, c := range []struct {
		name, text, key, msg string
	}{
		{"negative coupon", `yield = { values = ["287 MPa", "-301 MPa"] }`, "measurements.yield.values[1]", "must be positive"},
		{"wrong dimension", `yield = { values = ["287 mm", "301 MPa"] }`, "measurements.yield.values[0]", "mm"},
		{"no values", `yield = { prior_tests = 2 }`, "measurements.yield.values", "missing"},
		{"empty list", `yield = { values = [] }`, "measurements.yield.values", "non-empty list"},
		{"cov and dof", `yield = { values = ["287 MPa", "301 MPa"], cov = 0.07, prior_dof = 3 }`, "measurements.yield.prior_dof", "known cov"},
		{"bad cov", `yield = { values = ["287 MPa", "301 MPa"], cov = 0 }`, "measurements.yield.cov", "between 0 and 2"},
		{"negative weight", `yield = { values = ["287 MPa", "301 MPa"], prior_tests = -1 }`, "measurements.yield.prior_tests", "zero"},
		{"one value, vague", `yield = { values = ["287 MPa"] }`, "measurements.yield", "at least 2 results"},
		{"unknown key", `yield = { values = ["287 MPa", "301 MPa"], prior_test = 3 }`, "measurements.yield.prior_test", "did you mean"},
		{"unknown target", `yield_strength = { values = ["287 MPa"] }`, "measurements.yield_strength", "known keys: yield, strength, modulus, bow, thickness_loss"},
		{"near miss", `yeild = { values = ["287 MPa"] }`, "measurements.yeild", "did you mean measurements.yield"},
		{"not a table", `yield = ["287 MPa"]`, "measurements.yield", "values = ["},
		{"fixed prior weighed", `modulus = { values = ["203 GPa", "209 GPa"], prior_tests = 2 }`, "measurements.modulus", "fixed value"},
	} {
		t.Run(c.name, func(t *testing.T) {
			_, err := Parse("t.toml", []byte(measured+c.text+"\n"))
			var se *Error
			if !errors.As(err, &se) {
				t.Fatalf("no error for %s", c.text)
			}
			for _, p := range se.Problems {
				if p.Key == c.key && strings.Contains(p.Msg, c.msg) {
					if p.Line != line {
						t.Errorf("line %d, want %d", p.Line, line)
					}
					return
				}
			}
			t.Errorf("want key %s with %q; got\n%v", c.key, c.msg, err)
		})
	}
	// A quantity the study does not have.
	noLoss := strings.Replace(measured, "thickness_loss = { dist = \"lognormal\", mean = 1.0, cov = 0.4 }\n", "", 1)
	_, err := Parse("t.toml", []byte(noLoss+`thickness_loss = { values = ["1 mm", "2 mm"] }`+"\n"))
	if err == nil || !strings.Contains(err.Error(), "add thickness_loss to [member.section]") {
		t.Errorf("measured thickness loss without one in the study: %v", err)
	}
}

// TestMeasureHeavyTailWarning: with no prior on the spread and few
// results, check says the predictive lower tail is heavy.
func TestMeasureHeavyTailWarning(t *testing.T) {
	st := parse(t, measured+`yield = { values = ["287 MPa", "301 MPa", "279 MPa"] }`+"\n")
	w := strings.Join(st.Warnings, "\n")
	if !strings.Contains(w, "log-Student-t with 2 degrees of freedom") || !strings.Contains(w, "prior_dof") {
		t.Errorf("no heavy-tail warning:\n%s", w)
	}
	st = parse(t, measured+`yield = { values = ["287 MPa", "301 MPa", "279 MPa"], prior_tests = 2, prior_dof = 8 }`+"\n")
	if w := strings.Join(st.Warnings, "\n"); strings.Contains(w, "heavy") {
		t.Errorf("heavy-tail warning despite a prior on the spread:\n%s", w)
	}
}

// TestMeasureThicknessTail: an update whose upper tail would consume the
// web says how to narrow it.
func TestMeasureThicknessTail(t *testing.T) {
	text := strings.Replace(measured, "thickness = 8\n", "thickness = 3\n", 1)
	_, err := Parse("t.toml", []byte(text+`thickness_loss = { values = ["0.8 mm", "1.3 mm", "1.1 mm"], cov = 0.4 }`+"\n"))
	if err == nil || !strings.Contains(err.Error(), "give a smaller known cov") {
		t.Errorf("want the advice on the update's tail, got %v", err)
	}
}

// TestMeasureCorrelated: a quantity updated with an unknown spread has a
// log-Student-t predictive without finite variance: a correlation with it
// is an error; with a known cov it stays valid.
func TestMeasureCorrelated(t *testing.T) {
	corr := "[[correlation]]\npair = [\"material.yield\", \"imperfection.bow\"]\nrho = 0.3\n"
	text := strings.Replace(measured, "[measurements]\n", corr+"[measurements]\n", 1)
	_, err := Parse("t.toml", []byte(text+`yield = { values = ["287 MPa", "301 MPa", "279 MPa"] }`+"\n"))
	if err == nil || !strings.Contains(err.Error(), "correlation[0].pair: material.yield is updated by measurements.yield with an unknown spread") {
		t.Errorf("want the correlation refused, got %v", err)
	}
	st := parse(t, text+`yield = { values = ["287 MPa", "301 MPa", "279 MPa"], cov = 0.07 }`+"\n")
	if len(st.Corr) != 1 {
		t.Errorf("correlations %v, want the one given", st.Corr)
	}
}
