package study

import (
	"strconv"
	"strings"
	"unicode"

	"strutrisk/internal/assess"
)

// targetBeta reads the target reliability index of [target]:
//
//	beta             = 3.8          # given directly; or
//	consequence      = "medium"     # EN 1990 Annex B Table B2 (RC1..RC3); or with
//	cost_of_safety   = "normal"     # ISO 2394 / JCSS annual targets
//	reference_period = "50 years"   # the period the target applies to
//
// A target from a table applies to the reference period (default: 50
// years for EN 1990, 1 year for ISO 2394). Free text in reference_period
// is kept as a note, with a warning.
func (p *parser) targetBeta(t *table) {
	st := p.st
	years, given := p.referencePeriod(t)
	cons, hasCons := p.choice(t, "consequence", choicesOf("target", "consequence"))
	cost, hasCost := p.choice(t, "cost_of_safety", choicesOf("target", "cost_of_safety"))
	_, consGiven := t.m["consequence"]
	_, costGiven := t.m["cost_of_safety"]
	b, hasBeta := p.number(t, "beta")
	_, betaGiven := t.m["beta"]
	switch {
	case betaGiven && (consGiven || costGiven):
		p.errorf(t.key("beta"), "give the target either as beta or by consequence (and cost_of_safety), not both")
		return
	case costGiven && !consGiven:
		p.errorf(t.key("cost_of_safety"), "cost_of_safety needs a consequence too: add consequence = \"low\", \"medium\" or \"high\"")
		return
	case !betaGiven && !consGiven:
		p.required(t, "beta", "the target reliability index, e.g. beta = 3.8, or consequence = \"medium\" (EN 1990 Annex B)")
		return
	case hasBeta:
		if b < 0 || b > 10 {
			p.errorf(t.key("beta"), "beta = %g is outside 0..10: a target reliability index is usually 2 to 5.5", b)
			return
		}
		st.Target, st.HasTarget, st.ReferenceYears = b, true, years
		st.TargetSource = "target.beta as given"
		return
	case !hasCons || costGiven && !hasCost:
		return // reported by choice
	}
	var tg assess.Target
	var err error
	why := "not given"
	if _, written := t.m["reference_period"]; written {
		why = "not a duration"
	}
	if hasCost {
		if !given {
			years = 1
			p.defaultf("target.reference_period: %s; the ISO 2394 target applies to 1 year", why)
		}
		tg, err = assess.ISO2394Target(cost, cons, years)
	} else {
		if !given {
			years = 50
			p.defaultf("target.reference_period: %s; the EN 1990 target applies to 50 years", why)
		}
		tg, err = assess.EN1990Target(cons, years)
	}
	if err != nil {
		p.errorf(t.key("reference_period"), "%v", err)
		return
	}
	st.Target, st.HasTarget, st.ReferenceYears, st.TargetSource = tg.Beta, true, tg.Years, tg.Source
	if !given {
		st.ReferencePeriod = assess.YearsText(years)
	}
}

// referencePeriod reads target.reference_period: a duration in years
// (given reports that one was read). Free text without a number is kept
// as a note; text that starts with a number but is not a positive
// duration ("-50 years", "0 years", "NaN years", "50 kN", "50") is an
// error, as no reader can tell what period such a target applies to.
func (p *parser) referencePeriod(t *table) (years float64, given bool) {
	if v, ok := t.get("reference_period"); ok {
		switch v.(type) {
		case int64, float64:
			p.errorf(t.key("reference_period"), "must be text in quotes with a unit, e.g. \"50 years\", not the bare number %v", v)
			return 0, false
		}
	}
	s, ok := p.str(t, "reference_period")
	if !ok {
		return 0, false
	}
	s = strings.TrimSpace(s)
	p.st.ReferencePeriod = s
	y, err := assess.ParseYears(s)
	if err != nil && startsWithNumber(s) {
		p.errorf(t.key("reference_period"), "%v; give a positive duration such as \"50 years\" or \"1 year\"", err)
		return 0, false
	}
	if err != nil {
		p.warnf("target.reference_period (line %d): %v; the text is read as a note only", p.line(t.key("reference_period")), err)
		return 0, false
	}
	p.st.ReferencePeriod = assess.YearsText(y)
	return y, true
}

// startsWithNumber reports whether the first word of s, or its part
// before the first letter ("-50years"), reads as a number (NaN and Inf
// too): such text means a quantity, not a note.
func startsWithNumber(s string) bool {
	f := strings.Fields(s)
	if len(f) == 0 {
		return false
	}
	w := strings.ReplaceAll(f[0], "_", "")
	if _, err := strconv.ParseFloat(w, 64); err == nil {
		return true
	}
	i := strings.IndexFunc(w, unicode.IsLetter)
	if i <= 0 {
		return false
	}
	_, err := strconv.ParseFloat(w[:i], 64)
	return err == nil
}
