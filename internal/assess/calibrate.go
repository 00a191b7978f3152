package assess

import (
	"errors"
	"fmt"
	"math"
)

// CalibrationCase is one case of a partial-factor calibration: its name
// and its weight in the objective (positive).
type CalibrationCase struct {
	Name   string
	Weight float64
}

// CalibratedCase is one case's reliability index at the calibrated
// factor.
type CalibratedCase struct {
	Case   string  `json:"case"`
	Beta   float64 `json:"beta"`
	Weight float64 `json:"weight"`
	// BetaInitial is the case's beta at the factor's initial value
	// (Calibration.Initial), for comparison; nil when not computed.
	BetaInitial *float64 `json:"beta_initial,omitempty"`
}

// Calibration is the result of Calibrate: the factor's value that brings
// the cases' reliability indices closest to the target.
type Calibration struct {
	// Factor names the factor fitted (e.g. "gamma_m1"), Value its
	// calibrated value, Low and High the range searched.
	Factor     string  `json:"factor"`
	Value      float64 `json:"value"`
	Low        float64 `json:"low"`
	High       float64 `json:"high"`
	TargetBeta float64 `json:"target_beta"`
	// Cases holds each case's beta at Value.
	Cases []CalibratedCase `json:"cases"`
	// Spread is the largest minus the smallest beta of the cases at
	// Value; Deviation the weighted root-mean-square of beta_i - target
	// (the square root of the minimised objective over the sum of the
	// weights).
	Spread    float64 `json:"spread"`
	Deviation float64 `json:"deviation"`
	// Worst is the case with the lowest beta at Value, the least safe.
	Worst string `json:"worst"`
	// AtBound is true when the value found lies at an end of the range:
	// the best value may lie outside it, and Value is no calibration.
	AtBound bool `json:"at_bound"`
	// Initial is the factor's value before the calibration (the study's
	// own), at which each case's BetaInitial was found; 0 when none was.
	Initial float64 `json:"initial,omitempty"`
}

// Calibrate finds the value of a partial factor in [lo, hi] that
// minimises sum_i w_i (beta_i(value) - target)^2 over the cases, the
// least-squares fit of EN 1990 Annex C (C.7) used by the background
// studies of the Eurocodes. beta(value, i) returns the reliability index
// of case i with the factor at value; it must be smooth in value (FORM,
// or an estimate on common random numbers: the same seed and sample
// stream for every value), otherwise the search follows its noise. The
// value is found to within tol (default 1e-5 of the range when tol <= 0).
func Calibrate(factor string, lo, hi, target float64, cases []CalibrationCase, beta func(value float64, i int) (float64, error), tol float64) (*Calibration, error) {
	if err := checkCalibration(lo, hi, target, cases); err != nil {
		return nil, err
	}
	if tol <= 0 {
		tol = 1e-5 * (hi - lo)
	}
	betas := make([]float64, len(cases))
	eval := func(v float64) (float64, error) {
		var s float64
		for i, c := range cases {
			b, err := beta(v, i)
			if err != nil {
				return 0, fmt.Errorf("case %s at %s = %g: %w", c.Name, factor, v, err)
			}
			if math.IsNaN(b) {
				return 0, fmt.Errorf("case %s at %s = %g: beta is not a number", c.Name, factor, v)
			}
			betas[i] = b
			s += c.Weight * (b - target) * (b - target)
		}
		return s, nil
	}
	v, _, err := MinimiseBounded(eval, lo, hi, tol, 8)
	if err != nil {
		return nil, err
	}
	if err := checkActs(factor, v, lo, hi, eval, betas); err != nil {
		return nil, err
	}
	obj, err := eval(v) // betas at v
	if err != nil {
		return nil, err
	}
	return summarise(factor, v, lo, hi, target, tol, obj, cases, betas), nil
}

// checkActs refuses a value v at which the factor acts on no case: every
// beta the same a hundredth of the range away (towards the middle). On
// such a plateau the search stops anywhere, so its value is no
// calibration (a factor that sets neither the design resistance nor the
// design load that the loads are normalised to, e.g. gamma_m0 of a
// slender member whose buckling resistance governs).
func checkActs(factor string, v, lo, hi float64, eval func(float64) (float64, error), betas []float64) error {
	if _, err := eval(v); err != nil {
		return err
	}
	at := append([]float64(nil), betas...)
	d := 0.01 * (hi - lo)
	if v+d > hi {
		d = -d
	}
	if _, err := eval(v + d); err != nil {
		return err
	}
	for i, b := range betas {
		if math.Abs(b-at[i]) > 1e-12*math.Max(1, math.Abs(b)) {
			return nil
		}
	}
	return fmt.Errorf("no case's beta changes with %s between %.4g and %.4g: the factor does not act on the cases there (it sets neither their design resistance nor their design load), so no value of it can be calibrated", factor, math.Min(v, v+d), math.Max(v, v+d))
}

// summarise builds the Calibration of the value v from the cases' betas
// there and the objective obj.
func summarise(factor string, v, lo, hi, target, tol, obj float64, cases []CalibrationCase, betas []float64) *Calibration {
	r := &Calibration{Factor: factor, Value: v, Low: lo, High: hi, TargetBeta: target,
		AtBound: v-lo <= 2*tol || hi-v <= 2*tol}
	var wsum float64
	lowest, highest := math.Inf(1), math.Inf(-1)
	for i, c := range cases {
		b := betas[i]
		r.Cases = append(r.Cases, CalibratedCase{Case: c.Name, Beta: b, Weight: c.Weight})
		wsum += c.Weight
		if b < lowest {
			lowest, r.Worst = b, c.Name
		}
		highest = math.Max(highest, b)
	}
	r.Spread = highest - lowest
	r.Deviation = math.Sqrt(obj / wsum)
	return r
}

// checkCalibration says what is wrong with a calibration's range, target
// or cases.
func checkCalibration(lo, hi, target float64, cases []CalibrationCase) error {
	switch {
	case !(lo > 0 && hi > lo) || math.IsInf(hi, 0):
		return fmt.Errorf("the range %g to %g is not a positive interval with its low end first (e.g. 0.9 to 1.5)", lo, hi)
	case math.IsNaN(target) || math.IsInf(target, 0):
		return fmt.Errorf("the target beta %g is not a number", target)
	case len(cases) == 0:
		return errors.New("there are no cases to calibrate on")
	}
	for _, c := range cases {
		if !(c.Weight > 0) || math.IsInf(c.Weight, 0) {
			return fmt.Errorf("case %s has the weight %g: weights must be positive", c.Name, c.Weight)
		}
	}
	return nil
}
