package report

import (
	"sort"
)

// Caution is the sentence every report carries with its numbers.
const Caution = "These results depend on the stated inputs and models; they support, and never replace, the judgement of a licensed engineer and the local codes."

// verdict says how the reliability index compares with the target.
type verdict int

const (
	noTarget  verdict = iota // no target or no beta
	met                      // beta and its whole interval at or above target
	notMet                   // beta and its whole interval below target
	undecided                // the interval straddles the target
)

// targetVerdict compares the result of d with its target. When the beta
// interval straddles the target the sample is too small to decide,
// whatever the point estimate says.
func targetVerdict(d *Document) verdict {
	if d == nil || d.TargetBeta == nil || d.Beta == nil || !finite(*d.TargetBeta) {
		return noTarget
	}
	if d.Target != nil && d.Target.Verdict == "undecided" {
		return undecided // the estimate cannot be trusted, or its interval straddles
	}
	if d.Trusted != nil && !*d.Trusted {
		return undecided
	}
	t, b := *d.TargetBeta, *d.Beta
	if len(d.BetaCI) == 2 && d.BetaCI[0] < t && t < d.BetaCI[1] {
		return undecided
	}
	if b >= t {
		return met
	}
	return notMet
}

// verdictText is the reader's wording of v for d: an undecided verdict
// gives its reason (an interval that straddles the target, or an
// estimate that cannot be trusted).
func verdictText(d *Document, v verdict) string {
	switch v {
	case met:
		return "met"
	case notMet:
		return "NOT met"
	case undecided:
		if d != nil && d.Trusted != nil && !*d.Trusted {
			if d.Target != nil && d.Target.Reason != "" {
				return "undecided (" + d.Target.Reason + ")"
			}
			return "undecided (the estimate cannot be trusted: " + d.StatusReason + ")"
		}
		return "undecided at this sample size (the interval of beta straddles the target)"
	}
	return ""
}

// influence is one input's weight in the ranking of influential inputs.
type influence struct {
	Name   string
	Weight float64
}

// topInfluences returns up to n most influential inputs and the measure
// used: FORM importance factors when present, else total Sobol indices,
// else the tornado swings (in their sorted order).
func topInfluences(d *Document, n int) (measure string, list []influence) {
	if d == nil {
		return "", nil
	}
	switch {
	case d.FORM != nil && len(d.FORM.Importance) > 0:
		measure = "FORM importance alpha^2"
		for k, v := range d.FORM.Importance {
			if finite(v) {
				list = append(list, influence{k, v})
			}
		}
	case len(d.Sobol) > 0:
		measure = "total Sobol index"
		for _, s := range d.Sobol {
			if finite(s.Total) {
				list = append(list, influence{s.Variable, s.Total})
			}
		}
	case len(d.Tornado) > 0:
		measure = "tornado swing"
		for _, t := range d.Tornado {
			if sw := t.High - t.Low; finite(sw) {
				if sw < 0 {
					sw = -sw
				}
				list = append(list, influence{t.Variable, sw})
			}
		}
	default:
		return "", nil
	}
	sort.SliceStable(list, func(i, j int) bool {
		if list[i].Weight != list[j].Weight {
			return list[i].Weight > list[j].Weight
		}
		return list[i].Name < list[j].Name
	})
	if len(list) > n {
		list = list[:n]
	}
	return measure, list
}

// sortedKeys returns the keys of m in increasing order.
func sortedKeys(m map[string]float64) []string {
	keys := make([]string, 0, len(m))
	for k := range m {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	return keys
}
