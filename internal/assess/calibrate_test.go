package assess_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/internal/assess"
	"strutrisk/sim"
)

// stockyCase is a stocky member whose capacity is A fy (no buckling),
// with a lognormal yield strength of CoV vr, against one lognormal
// variable load of CoV vq; the loads are normalised so that the design
// load gamma_Q Q_k equals the design resistance A f_k / gamma (EN 1990
// 6.10 with one variable load; EN 1993-1-1 6.2.4), f_k the 5% fractile of
// fy and Q_k the 98% fractile of the load (EN 1990 1.5.3.14 and 4.1.2(7),
// from memory).
type stockyCase struct {
	name       string
	vr, vq, w  float64
	closedBeta func(gamma float64) float64
}

const (
	stockyArea = 5000.0 // mm2
	stockyFy   = 400.0  // MPa, mean
	gammaQ     = 1.5    // EN 1990 Table A1.2(B), recommended
)

// formBeta builds the case at gamma and returns its FORM beta, exact for
// this limit state: g = A fy - Q fails on the same surface as ln(A fy) -
// ln Q, linear in the standard normal space.
func (c stockyCase) formBeta(gamma float64) (float64, error) {
	fy, err := sim.NewLognormal(stockyFy, c.vr*stockyFy)
	if err != nil {
		return 0, err
	}
	qk := stockyArea * fy.Quantile(0.05) / (gamma * gammaQ)
	q, err := sim.NewLognormalChar(qk, 0.98, c.vq)
	if err != nil {
		return 0, err
	}
	m := &sim.Model{
		Vars: []sim.Variable{{Name: "fy", Dist: fy}, {Name: "Q", Dist: q}},
		G:    func(x, _ []float64) float64 { return stockyArea*x[0] - x[1] },
	}
	r, err := sim.FORM(m, nil)
	if err != nil {
		return 0, err
	}
	if !r.Converged {
		return 0, errors.New("FORM did not converge")
	}
	return r.Beta, nil
}

// TestCalibrateStockyClosedForm: with lognormal R = A fy and lognormal Q
// (sigma_R^2 = ln(1+V_R^2), likewise sigma_Q), the normalisation
// 1.5 Q_k = A f_k / gamma gives, with z05 = -1.645 and z98 = 2.054,
//
//	ln R_m' - ln Q_m' = ln gamma + ln 1.5 - z05 sigma_R + z98 sigma_Q
//	beta_i(gamma)     = (ln gamma + c_i) / s_i,  s_i = sqrt(sigma_R^2 + sigma_Q^2)
//
// (R_m', Q_m' the medians; the classical lognormal-lognormal result, e.g.
// Melchers, Structural Reliability Analysis and Prediction, from memory).
// Setting d/d(ln gamma) of sum w_i (beta_i - beta_t)^2 to zero:
//
//	ln gamma* = sum (w_i/s_i)(beta_t - c_i/s_i) / sum (w_i/s_i^2).
//
// The calibration, on FORM betas of the built cases, must find gamma*
// to 0.005.
func TestCalibrateStockyClosedForm(t *testing.T) {
	const target = 4.7 // EN 1990 Table B2, RC2, 1 year
	z05, z98 := distuv.UnitNormal.Quantile(0.05), distuv.UnitNormal.Quantile(0.98)
	cs := []stockyCase{
		{name: "steady", vr: 0.05, vq: 0.10, w: 4},
		{name: "imposed", vr: 0.07, vq: 0.20, w: 2},
		{name: "snow", vr: 0.10, vq: 0.30, w: 0.25},
		{name: "wind", vr: 0.06, vq: 0.40, w: 0.5},
	}
	var num, den float64
	cases := make([]assess.CalibrationCase, len(cs))
	for i := range cs {
		c := &cs[i]
		sr, sq := math.Sqrt(math.Log1p(c.vr*c.vr)), math.Sqrt(math.Log1p(c.vq*c.vq))
		s := math.Hypot(sr, sq)
		ci := math.Log(gammaQ) - z05*sr + z98*sq
		c.closedBeta = func(g float64) float64 { return (math.Log(g) + ci) / s }
		num += c.w / s * (target - ci/s)
		den += c.w / (s * s)
		cases[i] = assess.CalibrationCase{Name: c.name, Weight: c.w}
	}
	want := math.Exp(num / den)
	t.Logf("closed form %.5f", want)
	beta := func(v float64, i int) (float64, error) { return cs[i].formBeta(v) }
	r, err := assess.Calibrate("gamma_m0", 0.7, 2.0, target, cases, beta, 0)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.Value-want) > 0.005 {
		t.Errorf("calibrated gamma = %.4f, closed form %.4f", r.Value, want)
	}
	if r.AtBound {
		t.Errorf("the value %.4f is flagged at the bound of 0.7 to 2.0", r.Value)
	}
	lowest, highest, worst := math.Inf(1), math.Inf(-1), ""
	for i, c := range cs {
		b := c.closedBeta(r.Value)
		if got := r.Cases[i]; got.Case != c.name || math.Abs(got.Beta-b) > 1e-3 || got.Weight != c.w {
			t.Errorf("case %d = %+v, want %s beta %.4f weight %g", i, got, c.name, b, c.w)
		}
		if b < lowest {
			lowest, worst = b, c.name
		}
		highest = math.Max(highest, b)
	}
	if r.Worst != worst || math.Abs(r.Spread-(highest-lowest)) > 1e-3 {
		t.Errorf("worst %s spread %.4f, want %s %.4f", r.Worst, r.Spread, worst, highest-lowest)
	}
}

// TestCalibrateAtBound: a target the range cannot reach is flagged.
func TestCalibrateAtBound(t *testing.T) {
	beta := func(v float64, _ int) (float64, error) { return 2 + v, nil }
	r, err := assess.Calibrate("gamma_m1", 1, 1.5, 5, []assess.CalibrationCase{{Name: "a", Weight: 1}}, beta, 0)
	if err != nil {
		t.Fatal(err)
	}
	if !r.AtBound || math.Abs(r.Value-1.5) > 1e-4 {
		t.Errorf("value %g at_bound %v, want 1.5 at the bound", r.Value, r.AtBound)
	}
}

// TestCalibrateRefuses: bad ranges, weights and failing cases are named.
func TestCalibrateRefuses(t *testing.T) {
	one := []assess.CalibrationCase{{Name: "a", Weight: 1}}
	ok := func(v float64, _ int) (float64, error) { return v, nil }
	for _, tc := range []struct {
		name          string
		lo, hi        float64
		cases         []assess.CalibrationCase
		beta          func(float64, int) (float64, error)
		wantSubstring string
	}{
		{"reversed", 1.5, 1, one, ok, "range"},
		{"zero low end", 0, 1, one, ok, "range"},
		{"no cases", 1, 2, nil, ok, "no cases"},
		{"negative weight", 1, 2, []assess.CalibrationCase{{Name: "b", Weight: -1}}, ok, "case b has the weight -1"},
		{"failing case", 1, 2, one, func(float64, int) (float64, error) { return 0, errors.New("boom") }, "case a at gamma_m1"},
		{"NaN beta", 1, 2, one, func(float64, int) (float64, error) { return math.NaN(), nil }, "not a number"},
		{"factor acts on nothing", 1, 2, one, func(float64, int) (float64, error) { return 3, nil }, "no case's beta changes with gamma_m1"},
		{"plateau at the best value", 1, 2, one, func(v float64, _ int) (float64, error) { return 3.8 + math.Max(0, v-1.5), nil }, "between 1 and 1.01"},
	} {
		_, err := assess.Calibrate("gamma_m1", tc.lo, tc.hi, 3.8, tc.cases, tc.beta, 0)
		if err == nil || !strings.Contains(err.Error(), tc.wantSubstring) {
			t.Errorf("%s: error %v, want one containing %q", tc.name, err, tc.wantSubstring)
		}
	}
}

// TestMinimiseBounded: minima of textbook functions inside and at the
// edge of the range, and one with two dips where the deeper is found.
func TestMinimiseBounded(t *testing.T) {
	for _, tc := range []struct {
		name   string
		f      func(float64) float64
		lo, hi float64
		want   float64
	}{
		{"parabola", func(x float64) float64 { return (x-2)*(x-2) + 1 }, 0, 5, 2},
		{"edge", func(x float64) float64 { return x }, 1, 3, 1},
		// x^4 - 3x^2 + x: minima near -1.300 (deeper) and 1.131, roots of
		// 4x^3 - 6x + 1 = 0.
		{"two dips", func(x float64) float64 { return x*x*x*x - 3*x*x + x }, -2, 2, -1.3008},
	} {
		x, _, err := assess.MinimiseBounded(func(x float64) (float64, error) { return tc.f(x), nil }, tc.lo, tc.hi, 1e-7, 8)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(x-tc.want) > 1e-3 {
			t.Errorf("%s: x = %.5f, want %.4f", tc.name, x, tc.want)
		}
	}
}
