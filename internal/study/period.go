package study

import (
	"fmt"
	"strings"

	"strutrisk/internal/assess"
	"strutrisk/sim"
)

// PointInTime is the period of a load whose distribution describes its
// value at an arbitrary point in time, not a maximum.
const PointInTime = "point-in-time"

// loadPeriod reads the period key of a load's distribution table:
//
//	imposed = { dist = "gumbel", mean = "300 kN", cov = 0.3, period = "1 year" }
//
// a duration (the distribution is of the maxima over it) or
// "point-in-time". It returns the period as shown and in years (0 for
// point-in-time).
func (p *parser) loadPeriod(key string, v any, o qopt) (string, float64, bool) {
	if !o.period {
		p.errorf(key, "period applies only to a load in [loads] (the period its maxima are taken over, or \"point-in-time\"): remove it here")
		return "", 0, false
	}
	s, ok := v.(string)
	if !ok {
		p.errorf(key, "period must be text: a duration such as \"1 year\" or \"50 years\", or \"point-in-time\"")
		return "", 0, false
	}
	s = strings.TrimSpace(s)
	if s == PointInTime {
		return PointInTime, 0, true
	}
	y, err := assess.ParseYears(s)
	if err != nil {
		msg := fmt.Sprintf("%v, or \"point-in-time\"", err)
		if near, ok := nearest(s, []string{PointInTime}); ok {
			msg = fmt.Sprintf("%q is not a period; did you mean %q?", s, near)
		}
		p.errorf(key, "%s", msg)
		return "", 0, false
	}
	return assess.YearsText(y), y, true
}

// loadPeriods converts each variable load whose distribution describes
// maxima over its own period to maxima over the reference period of the
// target (n = reference period / load period, independent periods): a
// Gumbel exactly (the same scale, the location moved by scale ln n), any
// other distribution by F^n (sim.MaximumOf). It warns where a
// point-in-time load meets a reference-period target, and refuses a
// period on a permanent load and maxima of a period longer than the
// reference period unless the distribution is a Gumbel.
func (p *parser) loadPeriods() {
	st := p.st
	for _, q := range st.Loads {
		if q.Repetitions > 0 {
			p.convertPulses(q) // combination.go
			continue
		}
		if q.Period == "" {
			continue
		}
		key := q.Path + ".period"
		if isPermanentPath(st, q.Path) {
			p.errorf(key, "%s is a permanent load: a permanent load has no period; remove the key (or leave the load out of target.permanent)", q.Path)
			continue
		}
		if !q.Random() {
			continue
		}
		if q.Period == PointInTime {
			if st.HasTarget && st.ReferenceYears > 0 {
				p.warnf("%s (line %d): period = point-in-time: one point-in-time value is not the maximum over the reference period of %s, so the failure probability is that of an arbitrary point in time, not of the reference period (give repetitions = n, its number of independent values in the reference period, to take its maximum)",
					key, p.line(key), assess.YearsText(st.ReferenceYears))
			}
			continue
		}
		p.convertMaxima(q, key)
	}
}

// convertMaxima turns the maxima distribution of q over its period into
// the maxima over the reference period.
func (p *parser) convertMaxima(q *Quantity, key string) {
	st := p.st
	ref := st.ReferenceYears
	if !(ref > 0) {
		p.warnf("%s (line %d): period = %s but target.reference_period is not given as a duration: the distribution is used as written, maxima over %s",
			key, p.line(key), q.Period, q.Period)
		return
	}
	n := ref / q.PeriodYears
	if n == 1 {
		return
	}
	d, err := sim.MaximumOf(q.Dist, n)
	if err != nil {
		p.errorf(key, "period = %s is longer than the reference period of %s: only a gumbel distribution converts to a shorter period; give the distribution of maxima over %s, or use a gumbel",
			q.Period, assess.YearsText(ref), assess.YearsText(ref))
		return
	}
	if n < 1 {
		p.warnf("%s (line %d): period = %s is longer than the reference period of %s: the gumbel is converted by F^n with n = %.4g < 1 (its location moves down by scale ln(1/n)), assuming independent periods",
			key, p.line(key), q.Period, assess.YearsText(ref), n)
	}
	q.Written, q.Dist, q.MaximaN = q.Dist, d, n
}

// isPermanentPath reports whether the load at path is permanent.
func isPermanentPath(st *Study, path string) bool {
	for _, p := range st.PermanentLoads {
		if p == path {
			return true
		}
	}
	return false
}

// MaximaYears returns the number of years whose maxima the distribution
// of a variable load describes: the reference period ref when the load
// was converted to it or says no period, its own period when not
// converted; 1 when ref is not known either, 0 for a point-in-time load.
func (q *Quantity) MaximaYears(ref float64) float64 {
	switch {
	case q.Repetitions > 0 && ref > 0:
		return ref // maxima of its pulses over the reference period
	case q.Repetitions > 0:
		return 1
	case q.Period == PointInTime:
		return 0
	case q.PeriodYears > 0 && q.MaximaN == 0:
		return q.PeriodYears
	case ref > 0:
		return ref
	}
	return 1
}
