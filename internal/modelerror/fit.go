package modelerror

import (
	"errors"
	"fmt"
	"math"
)

// Fit is the statistical evaluation of a resistance model against n tests
// (EN 1990 Annex D, D.8.2.2 steps 2 to 5).
type Fit struct {
	// N is the number of tests.
	N int
	// B is the mean-value correction, the least-squares slope of r_e on
	// r_t through the origin, sum(r_e r_t) / sum(r_t^2) (D.8.2.2, eq. D.8).
	B float64
	// Delta holds each test's error term delta_i = r_e,i / (b r_t,i)
	// (eq. D.9).
	Delta []float64
	// MeanLog and SdLog are the mean and the standard deviation (n - 1 in
	// the denominator) of Delta_i = ln delta_i (eqs. D.10 to D.12).
	MeanLog, SdLog float64
	// V is V_delta = sqrt(exp(s_Delta^2) - 1), the coefficient of
	// variation of the error term (eq. D.13).
	V float64
}

// Evaluate fits the model to the measured resistances re against the
// theoretical resistances rt, pairwise. It needs at least three tests, all
// resistances positive and finite.
func Evaluate(re, rt []float64) (*Fit, error) {
	n := len(re)
	if n != len(rt) {
		return nil, fmt.Errorf("modelerror: %d measured and %d theoretical resistances", n, len(rt))
	}
	if n < 3 {
		return nil, fmt.Errorf("modelerror: %d tests; D.8 needs at least 3 to estimate a scatter (more than 10 are advisable)", n)
	}
	var sxy, sxx float64
	for i := range re {
		if !(re[i] > 0) || !(rt[i] > 0) || math.IsInf(re[i], 0) || math.IsInf(rt[i], 0) {
			return nil, fmt.Errorf("modelerror: test %d: resistances must be positive and finite (r_e %g, r_t %g)", i+1, re[i], rt[i])
		}
		sxy += re[i] * rt[i]
		sxx += rt[i] * rt[i]
	}
	f := &Fit{N: n, B: sxy / sxx, Delta: make([]float64, n)}
	var sum float64
	for i := range re {
		f.Delta[i] = re[i] / (f.B * rt[i])
		sum += math.Log(f.Delta[i])
	}
	f.MeanLog = sum / float64(n)
	var ss float64
	for _, d := range f.Delta {
		e := math.Log(d) - f.MeanLog
		ss += e * e
	}
	f.SdLog = math.Sqrt(ss / float64(n-1))
	f.V = math.Sqrt(math.Expm1(f.SdLog * f.SdLog))
	return f, nil
}

// ErrNoScatter is returned by DesignValues when neither the error term nor
// the basic variables scatter.
var ErrNoScatter = errors.New("modelerror: V_delta and V_rt are both 0: nothing to take a fractile of")

// Values are the characteristic and design resistances of D.8.2.2 step 7
// (eq. D.17) and D.8.3 (eq. D.21) for n tests with V_delta estimated from
// them (V_x unknown for the error term) and V_rt of the basic variables
// known, in the units of Mean.
type Values struct {
	// Mean is b g_rt(X_m), the corrected resistance at the means.
	Mean float64 `json:"mean"`
	// Q, QRt and QDelta are the lognormal standard deviations of the
	// total, the basic variables' and the error term's scatter, and
	// AlphaRt, AlphaDelta the weights QRt/Q and QDelta/Q.
	Q          float64 `json:"q"`
	QRt        float64 `json:"q_rt"`
	QDelta     float64 `json:"q_delta"`
	AlphaRt    float64 `json:"alpha_rt"`
	AlphaDelta float64 `json:"alpha_delta"`
	// Kn and Kdn are the factors of Tables D.1 and D.2 for n tests, V_x
	// unknown (the error term's scatter is estimated from the tests).
	Kn  float64 `json:"k_n"`
	Kdn float64 `json:"k_dn"`
	// Characteristic and Design are r_k and r_d.
	Characteristic float64 `json:"r_k"`
	Design         float64 `json:"r_d"`
	// Ratio is r_k / r_d, the partial factor of the resistance that
	// follows (D.8.2.2 step 7 and D.8.3 note).
	Ratio float64 `json:"ratio"`
}

// DesignValues returns the characteristic and design values of the
// resistance whose theoretical value at the means of the basic variables
// is grtMean, with V_rt their coefficient of variation (D.8.2.2 step 7,
// eq. D.18) and the fit's b and V_delta. It needs at least 4 tests.
func (f *Fit) DesignValues(grtMean, vrt float64) (*Values, error) {
	if !(grtMean > 0) || !(vrt >= 0) || math.IsInf(vrt, 0) {
		return nil, fmt.Errorf("modelerror: need a positive resistance at the means and V_rt >= 0 (got %g, %g)", grtMean, vrt)
	}
	v := &Values{Mean: f.B * grtMean}
	v.QRt = math.Sqrt(math.Log1p(vrt * vrt))
	v.QDelta = math.Sqrt(math.Log1p(f.V * f.V))
	vr2 := vrt*vrt + f.V*f.V + vrt*vrt*f.V*f.V // eq. D.14 with V_r^2 = (V_delta^2+1)(V_rt^2+1) - 1
	v.Q = math.Sqrt(math.Log1p(vr2))
	if v.Q == 0 {
		return nil, ErrNoScatter
	}
	v.AlphaRt, v.AlphaDelta = v.QRt/v.Q, v.QDelta/v.Q
	v.Kn, v.Kdn = Kn(f.N, false), Kdn(f.N, false)
	if math.IsNaN(v.Kdn) {
		return nil, fmt.Errorf("modelerror: %d tests; Table D.2 of EN 1990 gives k_d,n with V_delta estimated from at least 4", f.N)
	}
	half := 0.5 * v.Q * v.Q
	v.Characteristic = v.Mean * math.Exp(-KInf*v.AlphaRt*v.QRt-v.Kn*v.AlphaDelta*v.QDelta-half)
	v.Design = v.Mean * math.Exp(-KdInf*v.AlphaRt*v.QRt-v.Kdn*v.AlphaDelta*v.QDelta-half)
	v.Ratio = v.Characteristic / v.Design
	return v, nil
}

// noScatter is the V_delta below which the tests are taken not to
// scatter about b r_t at all (a study refuses a distribution without
// spread).
const noScatter = 1e-6

// NoScatter reports whether every test lies on b r_t (V_delta about 0):
// real tests scatter, so the database is more likely wrong (repeated
// rows) than the model exact.
func (f *Fit) NoScatter() bool { return f.V < noScatter }

// ModelFactor writes the fitted model factor as a study line: a lognormal
// variable with mean b and coefficient of variation V_delta, or b alone
// when the tests do not scatter (NoScatter).
func (f *Fit) ModelFactor() string {
	if f.NoScatter() {
		return "model_factor = " + fmtG(f.B)
	}
	return "model_factor = { dist = \"lognormal\", mean = " + fmtG(f.B) + ", cov = " + fmtG(f.V) + " }"
}
