package study

import (
	"fmt"
	"sort"
)

// CalibrationSpec is the [calibration] table: the value of one partial
// factor of [code_check] that brings the reliability indices of the
// study's cases closest to a target (assess.Calibrate).
type CalibrationSpec struct {
	// Factor is the [code_check] key fitted ("gamma_m1"); Low and High
	// the range searched.
	Factor    string
	Low, High float64
	// Target is the target beta: calibration.target_beta, or the study's.
	Target float64
	// Weights are the cases' weights by name ("study" for the study
	// itself, a variant's name for the variant); an unlisted case has 1.
	Weights map[string]float64
	// PointWeights, with a [sweep], are the swept points' weights in the
	// order of the sweep (a grid's last axis changing fastest): a case's
	// weight is its variant's times its point's. Nil: 1 each.
	PointWeights []float64
}

// Weight is the weight of variant v (-1 the study itself) at swept point
// i (-1 none): its name's in Weights times its point's in PointWeights,
// 1 where unlisted.
func (cs *CalibrationSpec) Weight(s *Study, v, i int) float64 {
	name := CalibrationStudy
	if v >= 0 && v < len(s.Variants) {
		name = s.Variants[v].Name
	}
	w := 1.0
	if x, ok := cs.Weights[name]; ok {
		w = x
	}
	if i >= 0 && i < len(cs.PointWeights) {
		w *= cs.PointWeights[i]
	}
	return w
}

// calibrationFactors are the [code_check] keys a calibration may fit.
var calibrationFactors = []string{"gamma_m0", "gamma_m1", "gamma_g", "gamma_q"}

// CalibrationStudy names the study itself among the calibration cases.
const CalibrationStudy = "study"

// calibration reads [calibration], once the target and the variants are
// read.
func (p *parser) calibration(top *table) {
	t := p.sub(top, "calibration")
	if t == nil {
		return
	}
	cs := &CalibrationSpec{Weights: map[string]float64{}}
	if f, ok := p.str(t, "factor"); ok {
		if !contains(calibrationFactors, f) {
			p.errorf(t.key("factor"), "%q is not a partial factor of [code_check] that can be calibrated: give one of %v", f, calibrationFactors)
		}
		cs.Factor = f
		if p.st.CodeCheck.Normalise != NormaliseDesign {
			p.errorf(t.key("factor"), "calibrating %s needs code_check.normalise = \"design\": without it the loads do not follow the partial factors, so no case's beta depends on %s; add normalise = \"design\" to [code_check]", f, f)
		}
	} else if _, given := t.get("factor"); !given {
		p.required(t, "factor", "the [code_check] partial factor fitted, e.g. factor = \"gamma_m1\"")
	}
	p.calibrationRange(t, cs)
	if b, ok := p.number(t, "target_beta"); ok {
		cs.Target = b
	} else if _, given := t.get("target_beta"); !given {
		if !p.st.HasTarget {
			p.required(t, "target_beta", "the study has no target: give target_beta = 3.8 or a [target] table")
		}
		cs.Target = p.st.Target
	}
	p.calibrationWeights(t, cs)
	p.calibrationPointWeights(t, cs)
	p.unknown(t)
	p.st.Calibration = cs
}

// calibrationRange reads calibration.range, two numbers low to high.
func (p *parser) calibrationRange(t *table, cs *CalibrationSpec) {
	v, ok := t.get("range")
	if !ok {
		p.required(t, "range", "the values searched, e.g. range = [1.0, 1.3]")
		return
	}
	list, isList := v.([]any)
	var xs []float64
	for _, e := range list {
		if x, ok := tomlNumber(e); ok {
			xs = append(xs, x)
		}
	}
	if !isList || len(xs) != 2 || len(list) != 2 {
		p.errorf(t.key("range"), "must be a list of two numbers, low then high, e.g. [1.0, 1.3]")
		return
	}
	if !(xs[0] >= 1 && xs[1] > xs[0] && xs[1] <= 2) {
		p.errorf(t.key("range"), "%g to %g is not a range within 1 to 2 (the bounds of [code_check]'s partial factors) with its low end first, e.g. [1.0, 1.3]", xs[0], xs[1])
		return
	}
	cs.Low, cs.High = xs[0], xs[1]
}

// calibrationWeights reads calibration.weights: case names ("study" or a
// variant's name) and positive weights.
func (p *parser) calibrationWeights(t *table, cs *CalibrationSpec) {
	v, ok := t.get("weights")
	if !ok {
		return
	}
	m, isMap := v.(map[string]any)
	if !isMap {
		p.errorf(t.key("weights"), "must be a table of case names and weights, e.g. { study = 2, stocky = 1 }")
		return
	}
	names := []string{CalibrationStudy}
	for _, va := range p.st.Variants {
		names = append(names, va.Name)
	}
	keys := make([]string, 0, len(m))
	for k := range m {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	for _, k := range keys {
		w, ok := tomlNumber(m[k])
		if !ok {
			p.errorf(t.key("weights")+"."+k, "must be a number, not %s", tomlType(m[k]))
			continue
		}
		switch {
		case p.edit == nil && !contains(names, k): // a case read again has no variants
			p.errorf(t.key("weights")+"."+k, "%q is not a case: give %q for the study itself or a variant's name (%v)", k, CalibrationStudy, names)
		case !(w > 0) || w > 1e6:
			p.errorf(t.key("weights")+"."+k, "the weight %g must be a positive number", w)
		default:
			cs.Weights[k] = w
		}
	}
}

// calibrationPointWeights reads calibration.point_weights: with a
// [sweep], one positive weight per swept point.
func (p *parser) calibrationPointWeights(t *table, cs *CalibrationSpec) {
	v, ok := t.get("point_weights")
	if !ok {
		return
	}
	list, isList := v.([]any)
	if !isList {
		p.errorf(t.key("point_weights"), "must be a list of numbers, one weight per swept point in the order of the sweep, e.g. [1, 2, 2, 1]")
		return
	}
	n := p.st.SweptPoints()
	switch {
	case p.edit != nil: // a case read again has no sweep: the study checked them
	case n == 0:
		p.errorf(t.key("point_weights"), "weights swept points, but the study has no [sweep]: weight its cases by name in calibration.weights")
		return
	case len(list) != n:
		p.errorf(t.key("point_weights"), "has %d weights, but the sweep has %d points: give one per swept point, in the order of the sweep (a grid's last axis changing fastest)", len(list), n)
		return
	}
	ws := make([]float64, len(list))
	for i, e := range list {
		key := fmt.Sprintf("%s[%d]", t.key("point_weights"), i)
		x, ok := tomlNumber(e)
		if !ok {
			p.errorf(key, "must be a number, not %s", tomlType(e))
			continue
		}
		ws[i] = x
		if !(ws[i] > 0) || ws[i] > 1e6 {
			p.errorf(key, "the weight %g must be a positive number", ws[i])
		}
	}
	cs.PointWeights = ws
}

// CalibrationCase returns the case of the calibration (v an index of
// Variants, -1 for the study itself; i a swept point, -1 for none) with
// the factor's key of [code_check] set to value: the study file read
// again, as Derive does.
func (s *Study) CalibrationCase(v, i int, value float64) (*Study, error) {
	if s.Calibration == nil || v < -1 || v >= len(s.Variants) || i < -1 || i >= s.SweptPoints() {
		return nil, fmt.Errorf("study: no calibration case variant %d, swept point %d", v, i)
	}
	ovs := s.overrides(v, i)
	ovs = append(ovs, override{key: "code_check." + s.Calibration.Factor, value: value,
		at: "calibration", label: fmt.Sprintf("calibration at %s = %g", s.Calibration.Factor, value)})
	st, probs := derive(s.File, s.src, ovs)
	if len(probs) > 0 {
		return nil, &Error{Problems: probs}
	}
	st.File, st.SHA256, st.Data = s.File, s.SHA256, s.Data
	return st, nil
}

// Factor returns the value of the [code_check] partial factor named key
// (one a calibration may fit), and false for any other key.
func (cs CodeCheckSpec) Factor(key string) (float64, bool) {
	switch key {
	case "gamma_m0":
		return cs.GammaM0, true
	case "gamma_m1":
		return cs.GammaM1, true
	case "gamma_g":
		return cs.GammaG, true
	case "gamma_q":
		return cs.GammaQ, true
	}
	return 0, false
}
