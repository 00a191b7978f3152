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

// Verdict says how the reliability index of a run compares with its
// target: the one rule that results.json (target.verdict, meets_target),
// the summary and the reports follow.
type Verdict int

// The verdicts.
const (
	NoTarget  Verdict = iota // no target or no beta
	Met                      // beta and its whole interval at or above target
	NotMet                   // beta and its whole interval below target
	Undecided                // the interval straddles the target, or the estimate is not trusted
)

// String is the verdict as results.json writes it: "met", "not met",
// "undecided", or "" without a target.
func (v Verdict) String() string {
	switch v {
	case Met:
		return "met"
	case NotMet:
		return "not met"
	case Undecided:
		return "undecided"
	}
	return ""
}

// TargetVerdict compares the result of d with its target. An estimate
// that is not trusted (d.Trusted false) decides nothing; when the beta
// interval straddles the target the sample is too small to decide,
// whatever the point estimate says.
func TargetVerdict(d *Document) Verdict {
	if d == nil || d.TargetBeta == nil || d.Beta == nil || !finite(*d.TargetBeta) {
		return NoTarget
	}
	if d.Target != nil && d.Target.Verdict == "undecided" {
		return Undecided // the estimate cannot be trusted, or its interval straddles
	}
	if d.Trusted != nil && !*d.Trusted {
		return Undecided
	}
	t, b := *d.TargetBeta, float64(*d.Beta)
	if len(d.BetaCI) == 2 && float64(d.BetaCI[0]) < t && t < float64(d.BetaCI[1]) {
		return Undecided
	}
	if b >= t {
		return Met
	}
	return NotMet
}

// verdictText is the reader's wording of v for d: an undecided verdict
// gives its reason (an interval that straddles the target, or an
// estimate that cannot be trusted).
func verdictText(d *Document, v Verdict) string {
	switch v {
	case Met:
		return "met"
	case NotMet:
		return "NOT met"
	case Undecided:
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
