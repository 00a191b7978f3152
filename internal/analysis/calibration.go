package analysis

import (
	"context"
	"errors"
	"fmt"
	"math"

	"strutrisk/internal/assess"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// runCalibration fits the [calibration] factor on the study and each of
// its variants: at every trial value each case is read again with the
// factor set (so its loads are normalised again) and its beta found by
// FORM, smooth in the factor. A failure is a warning, not a result.
func (r *Result) runCalibration(ctx context.Context, fs *sim.FORMSettings) {
	st := r.l.Study
	cal, err := calibrate(ctx, st, fs)
	switch {
	case ctx.Err() != nil:
		r.Incomplete = "interrupted during the calibration ([calibration]): it is left out"
	case err != nil:
		r.warnings = append(r.warnings, "calibration: "+err.Error())
	default:
		r.calibration = cal
		if cal.AtBound {
			r.warnings = append(r.warnings, fmt.Sprintf("calibration: %s = %.4g lies at an end of calibration.range (%g to %g): the best value may lie outside it, so it is no calibration; widen the range",
				cal.Factor, cal.Value, cal.Low, cal.High))
		}
	}
}

// calibrate runs assess.Calibrate on the cases of st's calibration: the
// study itself and each variant (index -1 and 0...).
func calibrate(ctx context.Context, st *study.Study, fs *sim.FORMSettings) (*assess.Calibration, error) {
	cs := st.Calibration
	cases := []assess.CalibrationCase{{Name: study.CalibrationStudy, Weight: weightOf(cs, study.CalibrationStudy)}}
	for _, va := range st.Variants {
		cases = append(cases, assess.CalibrationCase{Name: va.Name, Weight: weightOf(cs, va.Name)})
	}
	beta := func(x float64, i int) (float64, error) {
		if err := ctx.Err(); err != nil {
			return 0, err
		}
		return calibrationBeta(ctx, st, i-1, x, fs)
	}
	cal, err := assess.Calibrate(cs.Factor, cs.Low, cs.High, cs.Target, cases, beta, 0)
	if err != nil {
		return nil, err
	}
	if x, ok := st.CodeCheck.Factor(cs.Factor); ok {
		addInitial(cal, x, beta)
	}
	return cal, nil
}

// addInitial sets each case's beta at the factor's initial value x, for
// the comparison the report draws; when one case's fails, none is set.
func addInitial(cal *assess.Calibration, x float64, beta func(float64, int) (float64, error)) {
	bs := make([]float64, len(cal.Cases))
	for i := range cal.Cases {
		b, err := beta(x, i)
		if err != nil || math.IsNaN(b) {
			return
		}
		bs[i] = b
	}
	cal.Initial = x
	for i := range cal.Cases {
		cal.Cases[i].BetaInitial = &bs[i]
	}
}

// weightOf is the weight of the case name: calibration.weights or 1.
func weightOf(cs *study.CalibrationSpec, name string) float64 {
	if w, ok := cs.Weights[name]; ok {
		return w
	}
	return 1
}

// calibrationBeta is the FORM beta of case v (-1 the study) with the
// calibrated factor at x.
func calibrationBeta(ctx context.Context, st *study.Study, v int, x float64, fs *sim.FORMSettings) (float64, error) {
	cs, err := st.CalibrationCase(v, x)
	if err != nil {
		return 0, err
	}
	md, err := study.Build(cs)
	if err != nil {
		return 0, err
	}
	if len(md.Sim.Vars) == 0 {
		return 0, errors.New("nothing in it is uncertain")
	}
	f, err := sim.FORMContext(ctx, md.Sim, fs)
	if err != nil {
		return 0, fmt.Errorf("FORM: %w", err)
	}
	if !f.Converged {
		return 0, fmt.Errorf("the FORM search did not converge (%s)", f.Status)
	}
	return f.Beta, nil
}
