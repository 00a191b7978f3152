package report

import (
	"sort"
	"strings"
)

// Caution is the text every report, summary and help carries with the
// numbers, the one caution of strutrisk.
const Caution = "Caution: results depend entirely on the inputs and models stated in the study. strutrisk supports, and never replaces, the judgement of a licensed engineer and the codes that apply where the structure stands."

// CautionText is Caution wrapped for a terminal and plain text.
var CautionText = strings.Join(WrapText(Caution, 74), "\n")

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
	t, b := *d.TargetBeta, float64(*d.Beta)
	if len(d.BetaCI) == 2 && float64(d.BetaCI[0]) < t && t < float64(d.BetaCI[1]) {
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

// sortedKeys returns the keys of m in increasing order.
func sortedKeys(m map[string]float64) []string {
	keys := make([]string, 0, len(m))
	for k := range m {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	return keys
}
