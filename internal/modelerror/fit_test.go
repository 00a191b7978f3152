package modelerror

import (
	"math"
	"math/rand/v2"
	"testing"
)

// Three tests worked by hand with the equations of EN 1990 Annex D,
// D.8.2.2: r_t = 100, 200, 300 and r_e = 110, 230, 320.
// b = (110*100 + 230*200 + 320*300) / (100^2 + 200^2 + 300^2)
//
//	= 153000 / 140000 = 1.0928571 (eq. D.8);
//
// delta_i = r_e / (b r_t) = 1.0065359, 1.0522876, 0.9760349 (eq. D.9);
// Delta_i = ln delta_i = 0.0065147, 0.0509664, -0.0242570 (D.10);
// mean 0.01107472, s^2 = sum (Delta_i - mean)^2 / 2 = 0.00143024,
// s = 0.03781846 (D.11, D.12); V_delta = sqrt(exp(s^2) - 1) = 0.03783199
// (D.13). (Worked with a separate calculator script, not this package.)
func TestEvaluateByHand(t *testing.T) {
	f, err := Evaluate([]float64{110, 230, 320}, []float64{100, 200, 300})
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"b", f.B, 153000.0 / 140000},
		{"delta_2", f.Delta[1], 230 / (200 * 153000.0 / 140000)},
		{"mean of ln delta", f.MeanLog, 0.01107472},
		{"s_Delta", f.SdLog, 0.03781846},
		{"V_delta", f.V, 0.03783199},
	} {
		if math.Abs(c.got-c.want) > 2e-7 {
			t.Errorf("%s = %.8f, want %.8f", c.name, c.got, c.want)
		}
	}
}

// A data set generated from a known model error: r_e = b r_t delta with
// delta lognormal of mean 1 and coefficient of variation V. Evaluate must
// recover b and V to within their sampling error for 4000 tests (the
// standard errors are about b V / sqrt(n) = 0.0015 and V / sqrt(2n) =
// 0.0009; the bounds are about four of them).
func TestEvaluateRecoversKnownError(t *testing.T) {
	const n, b, v = 4000, 1.12, 0.08
	s := math.Sqrt(math.Log1p(v * v))
	rng := rand.New(rand.NewPCG(1, 2))
	re, rt := make([]float64, n), make([]float64, n)
	for i := range rt {
		rt[i] = 50 + 450*rng.Float64()
		re[i] = b * rt[i] * math.Exp(s*rng.NormFloat64()-0.5*s*s)
	}
	f, err := Evaluate(re, rt)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(f.B-b) > 0.006 {
		t.Errorf("b = %.4f, generated with %.4f", f.B, b)
	}
	if math.Abs(f.V-v) > 0.004 {
		t.Errorf("V_delta = %.4f, generated with %.4f", f.V, v)
	}
	if got := f.ModelFactor(); got != `model_factor = { dist = "lognormal", mean = `+trim(f.B)+`, cov = `+trim(f.V)+` }` {
		t.Errorf("ModelFactor() = %s", got)
	}
}

func trim(x float64) string { return fmtG(x) }

// The design values of D.8.2.2 step 7 (eq. D.17a) and D.8.3 (eq. D.21)
// worked with a separate calculator script for b = 1.0928571,
// V_delta = 0.03783199 from the three tests above, but taken as n = 10
// tests so that Table D.2 applies, and V_rt = 0.10 at g_rt(X_m) = 1000:
// Q_rt = sqrt(ln(1.01)) = 0.0997513, Q_delta = sqrt(ln(1 + V_delta^2))
// = 0.0378185, V_r^2 = 1.01 (1 + V_delta^2) - 1 = 0.01144557 (D.15),
// Q = sqrt(ln(1 + V_r^2)) = 0.1066797; alpha_rt = Q_rt/Q = 0.935054,
// alpha_delta = 0.354505; k_n = 1.92, k_d,n = 4.51 (Tables D.1, D.2,
// n = 10, V_X unknown);
// r_k = 1092.8571 exp(-1.64 alpha_rt Q_rt - 1.92 alpha_delta Q_delta
// - 0.5 Q^2) = 1092.8571 exp(-0.1529676 - 0.0257411 - 0.0056903)
// = 908.8243 (D.17a);
// r_d = 1092.8571 exp(-3.04 alpha_rt Q_rt - 4.51 alpha_delta Q_delta
// - 0.5 Q^2) = 1092.8571 exp(-0.2835497 - 0.0604648 - 0.0056903)
// = 770.3508 (D.21).
func TestDesignValuesByHand(t *testing.T) {
	f, err := Evaluate([]float64{110, 230, 320}, []float64{100, 200, 300})
	if err != nil {
		t.Fatal(err)
	}
	f.N = 10
	v, err := f.DesignValues(1000, 0.10)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"Q", v.Q, 0.1066797},
		{"alpha_rt", v.AlphaRt, 0.935054},
		{"k_n", v.Kn, 1.92},
		{"k_d,n", v.Kdn, 4.51},
		{"r_k", v.Characteristic, 908.8243},
		{"r_d", v.Design, 770.3508},
	} {
		if math.Abs(c.got-c.want) > 1e-6*math.Max(1, math.Abs(c.want)) {
			t.Errorf("%s = %.6f, want %.6f", c.name, c.got, c.want)
		}
	}
	f.N = 3
	if _, err := f.DesignValues(1000, 0.10); err == nil {
		t.Error("3 tests: Table D.2 has no k_d,n with V_X unknown; want an error")
	}
}

func TestEvaluateRefuses(t *testing.T) {
	for _, c := range []struct {
		name   string
		re, rt []float64
	}{
		{"two tests", []float64{1, 2}, []float64{1, 2}},
		{"lengths differ", []float64{1, 2, 3}, []float64{1, 2}},
		{"zero theory", []float64{1, 2, 3}, []float64{1, 0, 3}},
		{"NaN", []float64{1, math.NaN(), 3}, []float64{1, 2, 3}},
	} {
		if _, err := Evaluate(c.re, c.rt); err == nil {
			t.Errorf("%s: want an error", c.name)
		}
	}
}
