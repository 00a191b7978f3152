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
func (r *Result) runCalibration(ctx context.Context, fs *sim.FORMSettings, obs Observer) {
	st := r.l.Study
	cal, err := calibrate(ctx, st, fs, obs)
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

// calCase is one case of a calibration: variant v (-1 the study) at swept
// point i (-1 the study's own values).
type calCase struct {
	v, i int
	name string
}

// calibrationCases are the cases a calibration fits: with a sweep, the
// study and each variant at every swept point (the cases of the factorial
// study; the runs at the study's own values are not among them); without
// one, the study and each variant.
func calibrationCases(st *study.Study) []calCase {
	if st.SweptPoints() == 0 {
		out := []calCase{{-1, -1, study.CalibrationStudy}}
		for v, va := range st.Variants {
			out = append(out, calCase{v, -1, va.Name})
		}
		return out
	}
	var out []calCase
	var lams []string
	for _, c := range st.CaseList() {
		if c.Point < 0 {
			continue // a variant at the study's own values
		}
		out = append(out, calCase{c.Variant, c.Point, calibrationCaseName(st, c.Variant, c.Point)})
		lams = append(lams, slendernessText(caseSlenderness(st, c.Variant, c.Point)))
	}
	// The slenderness names the cases when it tells them apart.
	for k := range out {
		if lams[k] != "" && lams[k] != lams[0] {
			for k := range out {
				out[k].name += lams[k]
			}
			break
		}
	}
	return out
}

// calibrationCaseName names variant v at swept point i briefly, for the
// table and the picture: "HEB 200, member.length = 3 m", the variant's
// name (or "study") left out when the study has no variants.
func calibrationCaseName(st *study.Study, v, i int) string {
	name := pointText(st, i)
	switch {
	case v >= 0:
		return st.Variants[v].Name + ", " + name
	case len(st.Variants) > 0:
		return study.CalibrationStudy + ", " + name
	}
	return name
}

// slendernessText is " (λ 0.85)", the relative slenderness as the
// report's pictures write it, "" for NaN.
func slendernessText(lam float64) string {
	if math.IsNaN(lam) || math.IsInf(lam, 0) {
		return ""
	}
	return fmt.Sprintf(" (λ %.2f)", lam)
}

// caseSlenderness is the nominal relative slenderness of variant v at
// swept point i about its governing axis, NaN when it cannot be found.
func caseSlenderness(st *study.Study, v, i int) float64 {
	cs, err := st.Derive(v, i)
	if err != nil {
		return math.NaN()
	}
	md, err := study.Build(cs)
	if err != nil {
		return math.NaN()
	}
	n, err := md.Nominal()
	if err != nil {
		return math.NaN()
	}
	return n.ModeSlenderness
}

// calibrate runs assess.Calibrate on the cases of st's calibration
// (calibrationCases), each weighted by its variant's name ("study" for the
// study itself) and its swept point (CalibrationSpec.Weight). obs is told
// of each value tried.
func calibrate(ctx context.Context, st *study.Study, fs *sim.FORMSettings, obs Observer) (*assess.Calibration, error) {
	cs := st.Calibration
	list := calibrationCases(st)
	cases := make([]assess.CalibrationCase, len(list))
	for k, c := range list {
		cases[k] = assess.CalibrationCase{Name: c.name, Weight: cs.Weight(st, c.v, c.i)}
	}
	trial := 0
	beta := func(x float64, k int) (float64, error) {
		if err := ctx.Err(); err != nil {
			return 0, err
		}
		if k == 0 {
			trial++
			obs.Stage(fmt.Sprintf("calibration of %s: value %d tried, %.5g (%d cases each)", cs.Factor, trial, x, len(list)))
		}
		return calibrationBeta(ctx, st, list[k].v, list[k].i, x, fs)
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

// calibrationBeta is the FORM beta of variant v (-1 the study) at swept
// point i (-1 none) with the calibrated factor at x.
func calibrationBeta(ctx context.Context, st *study.Study, v, i int, x float64, fs *sim.FORMSettings) (float64, error) {
	cs, err := st.CalibrationCase(v, i, x)
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
