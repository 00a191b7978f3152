package analysis

import (
	"context"
	"fmt"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/internal/report"
)

// calibrationStudy is a stocky CHS 168.3 x 8 (relative slenderness about
// 0.12, so chi = 1 and the capacity is A fy; EN 1993-1-1 6.3.1.2(4)) with
// a lognormal yield and one lognormal imposed load (annual maxima), the
// loads normalised to the design resistance; two variants change the
// CoVs. extra is appended to [calibration].
func calibrationStudy(extra string) string {
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
imposed = { dist = "lognormal", mean = 50000, cov = 0.2, period = "1 year" }
[capacity]
model = "curve"
curve = "a"
[target]
beta = 3.8
reference_period = "1 year"
[code_check]
normalise = "design"
[analysis]
method = "form"
[sensitivity]
tornado = false
sobol = false
[[variant]]
name = "steady"
set = { "material.yield.cov" = 0.05, "loads.imposed.cov" = 0.1 }
[[variant]]
name = "snow"
set = { "material.yield.cov" = 0.10, "loads.imposed.cov" = 0.3 }
[calibration]
factor = "gamma_m1"
range = [1.0, 2.0]
` + extra
}

// TestCalibrationClosedForm reproduces the closed-form check of
// internal/assess (TestCalibrateStockyClosedForm) through a study file:
// with R = A fy lognormal and Q lognormal, the normalisation 1.5 Q_k =
// A f_k / gamma_M1 (f_k the 5% fractile, Q_k the 98% fractile) gives
//
//	beta_i(gamma) = (ln gamma + c_i) / s_i,  s_i = sqrt(zeta_R^2 + zeta_Q^2),
//	c_i = ln 1.5 + 1.645 zeta_R + 2.054 zeta_Q,
//
// (the lognormal-lognormal result, e.g. Melchers, Structural Reliability
// Analysis and Prediction, from memory) and the weighted least squares of
// EN 1990 Annex C has ln gamma* = sum (w_i/s_i)(beta_t - c_i/s_i) / sum
// (w_i/s_i^2). The calibration must find gamma* to 0.005.
func TestCalibrationClosedForm(t *testing.T) {
	const target = 5.2 // EN 1990 Table B2, RC3, 1 year (from memory)
	l := mustLoad(t, calibrationStudy("target_beta = 5.2\nweights = { study = 2, steady = 0.5 }\n"))
	cases := []struct {
		name      string
		vr, vq, w float64
	}{{"study", 0.07, 0.2, 2}, {"steady", 0.05, 0.1, 0.5}, {"snow", 0.10, 0.3, 1}}
	var sc []sweptCase
	for _, c := range cases {
		sc = append(sc, sweptCase{vr: c.vr, vq: c.vq, w: c.w})
	}
	want := closedFormGamma(target, sc)
	z05, z98 := distuv.UnitNormal.Quantile(0.05), distuv.UnitNormal.Quantile(0.98)
	r, err := Run(context.Background(), l, ptr(l.Settings(1)), nil)
	if err != nil {
		t.Fatal(err)
	}
	cal := r.Document().Calibration
	t.Logf("closed form %.5f", want)
	if cal == nil {
		t.Fatalf("no calibration; warnings %v", r.warnings)
	}
	if math.Abs(cal.Value-want) > 0.005 || cal.AtBound {
		t.Errorf("calibrated gamma_m1 = %.4f (at bound %v), closed form %.4f", cal.Value, cal.AtBound, want)
	}
	if line := report.CalibrationLine(cal); !strings.HasPrefix(line, "calibrated gamma_m1 = 1.08") || strings.Contains(line, "warning") {
		t.Errorf("summary line %q", line)
	}
	for i, c := range cases {
		if got := cal.Cases[i]; got.Case != c.name || got.Weight != c.w {
			t.Errorf("case %d = %+v, want %s weight %g", i, got, c.name, c.w)
		}
		// At the study's own gamma_m1 = 1, ln gamma = 0: beta_i = c_i/s_i.
		sr, sq := math.Sqrt(math.Log1p(c.vr*c.vr)), math.Sqrt(math.Log1p(c.vq*c.vq))
		s := math.Hypot(sr, sq)
		want := (math.Log(1.5) - z05*sr + z98*sq) / s
		if got := cal.Cases[i].BetaInitial; cal.Initial != 1 || got == nil || math.Abs(*got-want) > 0.01 {
			t.Errorf("case %s at the initial value %g: beta %v, closed form %.3f", c.name, cal.Initial, got, want)
		}
	}
}

// ptr returns a pointer to a copy of s.
func ptr[T any](s T) *T { return &s }

// TestCalibrationRefused: a bad [calibration] names its key.
func TestCalibrationRefused(t *testing.T) {
	for _, c := range []struct{ text, want string }{
		{strings.Replace(calibrationStudy(""), `factor = "gamma_m1"`, `factor = "gamma_x"`, 1), "calibration.factor"},
		{strings.Replace(calibrationStudy(""), `range = [1.0, 2.0]`, `range = [1.3, 1.1]`, 1), "calibration.range"},
		{calibrationStudy("weights = { nowhere = 1 }\n"), "calibration.weights.nowhere"},
		{calibrationStudy("weights = { snow = -1 }\n"), "calibration.weights.snow"},
		{strings.Replace(calibrationStudy(""), `normalise = "design"`, ``, 1), "calibration.factor"},
		{calibrationStudy("point_weights = [1, 2]\n"), "calibration.point_weights: weights swept points, but the study has no [sweep]"},
		{swapVariants(calibrationStudy("point_weights = [1, 2, 3]\n"), sweptYieldCoV), "calibration.point_weights: has 3 weights, but the sweep has 2 points"},
		{swapVariants(calibrationStudy("point_weights = [1, -2]\n"), sweptYieldCoV), "calibration.point_weights[1]: the weight -2 must be a positive number"},
		{swapVariants(calibrationStudy("point_weights = [1, \"2\"]\n"), sweptYieldCoV), "calibration.point_weights[1]: must be a number"},
		{swapVariants(calibrationStudy("point_weights = 2\n"), sweptYieldCoV), "calibration.point_weights: must be a list of numbers"},
	} {
		_, err := Load(writeStudy(t, c.text))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("error %v, want one naming %q", err, c.want)
		}
	}
}

// TestCalibrationAtBoundOnce: with the study's target 3.8 the three cases
// have betas of about 4.4, 6.2 and 3.8 already at gamma_M1 = 1 (closed
// form above), so the best value lies below the range 1.0 to 1.05 and the
// search ends at its low end; the summary calls it no calibration and
// tells why once, in the warnings, not a second time on its line.
func TestCalibrationAtBoundOnce(t *testing.T) {
	text := strings.Replace(calibrationStudy(""), `range = [1.0, 2.0]`, `range = [1.0, 1.05]`, 1)
	l := mustLoad(t, text)
	r, err := Run(context.Background(), l, ptr(l.Settings(1)), nil)
	if err != nil {
		t.Fatal(err)
	}
	d := r.Document()
	if d.Calibration == nil || !d.Calibration.AtBound || d.Calibration.Value-d.Calibration.Low > 1e-3 {
		t.Fatalf("calibration %+v, want one at an end of the range", d.Calibration)
	}
	sum := report.SummaryText(&report.Bundle{Doc: d})
	if n := strings.Count(sum, "widen"); n != 1 {
		t.Errorf("the summary says to widen the range %d times, want once:\n%s", n, sum)
	}
	if strings.Contains(sum, "calibrated gamma_m1") || !strings.Contains(sum, "no calibration: gamma_m1") {
		t.Errorf("the summary calls a value at the bound a calibration:\n%s", sum)
	}
}

// swapVariants replaces the variants of calibrationStudy by tail.
func swapVariants(text, tail string) string {
	return strings.Replace(text, `[[variant]]
name = "steady"
set = { "material.yield.cov" = 0.05, "loads.imposed.cov" = 0.1 }
[[variant]]
name = "snow"
set = { "material.yield.cov" = 0.10, "loads.imposed.cov" = 0.3 }`, tail, 1)
}

// sweptYieldCoV is a [sweep] of the yield CoV over two values, in place
// of calibrationStudy's variants.
const sweptYieldCoV = `[sweep]
parameter = "material.yield.cov"
values = [0.05, 0.10]`

// sweptCase is one calibration case of TestCalibrationSweptCases: its
// name's start, the CoVs of yield and load, its weight.
type sweptCase struct {
	prefix    string
	vr, vq, w float64
}

// TestCalibrationSweptCases: with a [sweep], the cases are the study and
// each variant at every swept point (a plain sweep of the yield CoV 0.05
// and 0.10 crossed with three load CoVs as variants, also with weights
// by swept point; a grid of both CoVs without variants), each weighted by
// its variant's weight times its point's; the
// calibrated factor is the closed form of TestCalibrationClosedForm over
// these cases, to 0.005.
func TestCalibrationSweptCases(t *testing.T) {
	var crossed, pointWeighted, grid []sweptCase
	for _, va := range []struct {
		name  string
		vq, w float64
	}{{"study", 0.2, 2}, {"steady", 0.1, 0.5}, {"snow", 0.3, 1}} {
		for k, vr := range []float64{0.05, 0.10} {
			crossed = append(crossed, sweptCase{va.name + ", material.yield.cov = ", vr, va.vq, va.w})
			// point_weights = [4, 0.25]: the variant's weight times the point's.
			pointWeighted = append(pointWeighted, sweptCase{va.name + ", material.yield.cov = ", vr, va.vq, va.w * []float64{4, 0.25}[k]})
		}
	}
	for _, vr := range []float64{0.05, 0.10} {
		for _, vq := range []float64{0.1, 0.3} {
			grid = append(grid, sweptCase{"material.yield.cov = ", vr, vq, 1})
		}
	}
	for _, c := range []struct {
		name, text string
		target     float64
		cases      []sweptCase
	}{
		// 5.2: EN 1990 Table B2, RC3, 1 year (from memory); 5.6 keeps
		// the grid's best value inside the range.
		{"sweep and variants", swapVariants(calibrationStudy("target_beta = 5.2\nweights = { study = 2, steady = 0.5 }\n"), `[sweep]
parameter = "material.yield.cov"
values = [0.05, 0.10]
[[variant]]
name = "steady"
set = { "loads.imposed.cov" = 0.1 }
[[variant]]
name = "snow"
set = { "loads.imposed.cov" = 0.3 }`), 5.2, crossed},
		{"sweep, variants and point weights", swapVariants(calibrationStudy("target_beta = 5.2\nweights = { study = 2, steady = 0.5 }\npoint_weights = [4, 0.25]\n"), `[sweep]
parameter = "material.yield.cov"
values = [0.05, 0.10]
[[variant]]
name = "steady"
set = { "loads.imposed.cov" = 0.1 }
[[variant]]
name = "snow"
set = { "loads.imposed.cov" = 0.3 }`), 5.2, pointWeighted},
		{"grid", swapVariants(calibrationStudy("target_beta = 5.6\n"), `[sweep]
[[sweep.axis]]
parameter = "material.yield.cov"
values = [0.05, 0.10]
[[sweep.axis]]
parameter = "loads.imposed.cov"
values = [0.1, 0.3]`), 5.6, grid},
	} {
		t.Run(c.name, func(t *testing.T) { checkSweptCalibration(t, c.text, c.target, c.cases) })
	}
}

// checkSweptCalibration runs the study text and compares its calibration
// with the closed form over cases.
func checkSweptCalibration(t *testing.T, text string, target float64, cases []sweptCase) {
	l := mustLoad(t, text)
	want := closedFormGamma(target, cases)
	r, err := Run(context.Background(), l, ptr(l.Settings(1)), nil)
	if err != nil {
		t.Fatal(err)
	}
	cal := r.Document().Calibration
	if cal == nil {
		t.Fatalf("no calibration; warnings %v", r.warnings)
	}
	t.Logf("closed form %.5f, found %.5f", want, cal.Value)
	if math.Abs(cal.Value-want) > 0.005 || cal.AtBound {
		t.Errorf("calibrated gamma_m1 = %.4f (at bound %v), closed form %.4f", cal.Value, cal.AtBound, want)
	}
	if len(cal.Cases) != len(cases) {
		t.Fatalf("%d cases, want %d", len(cal.Cases), len(cases))
	}
	for i, c := range cases {
		got := cal.Cases[i]
		if !strings.HasPrefix(got.Case, c.prefix) || got.Weight != c.w {
			t.Errorf("case %d = %+v, want %q... at yield CoV %g, load CoV %g, weight %g", i, got, c.prefix, c.vr, c.vq, c.w)
		}
	}
}

// stages records the stages a run names.
type stages struct{ names []string }

func (s *stages) Stage(name string)          { s.names = append(s.names, name) }
func (s *stages) StartCase(int, int, string) {}

// TestCalibrationProgress: the observer is told of every value tried,
// the first the low end of the range (the scan of assess.MinimiseBounded
// begins there), the count rising by one each time.
func TestCalibrationProgress(t *testing.T) {
	l := mustLoad(t, calibrationStudy("target_beta = 5.2\n"))
	obs := &stages{}
	if _, err := Run(context.Background(), l, ptr(l.Settings(1)), obs); err != nil {
		t.Fatal(err)
	}
	var tried []string
	for _, s := range obs.names {
		if strings.HasPrefix(s, "calibration of gamma_m1: value ") {
			tried = append(tried, s)
		}
	}
	if len(tried) < 10 || tried[0] != "calibration of gamma_m1: value 1 tried, 1 (3 cases each)" {
		t.Fatalf("values tried %q", tried)
	}
	for i, s := range tried {
		if !strings.HasPrefix(s, fmt.Sprintf("calibration of gamma_m1: value %d tried, ", i+1)) {
			t.Errorf("stage %d is %q", i+1, s)
		}
	}
}

// closedFormGamma is the gamma_M1 that TestCalibrationClosedForm derives:
// the weighted least squares of (beta_i - target) over cases of lognormal
// R and Q normalised as its comment says, ln gamma* = sum (w_i/s_i)
// (beta_t - c_i/s_i) / sum (w_i/s_i^2).
func closedFormGamma(target float64, cases []sweptCase) float64 {
	z05, z98 := distuv.UnitNormal.Quantile(0.05), distuv.UnitNormal.Quantile(0.98)
	var num, den float64
	for _, c := range cases {
		sr, sq := math.Sqrt(math.Log1p(c.vr*c.vr)), math.Sqrt(math.Log1p(c.vq*c.vq))
		s := math.Hypot(sr, sq)
		ci := math.Log(1.5) - z05*sr + z98*sq
		num += c.w / s * (target - ci/s)
		den += c.w / (s * s)
	}
	return math.Exp(num / den)
}
