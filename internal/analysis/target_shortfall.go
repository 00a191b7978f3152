package analysis

import (
	"fmt"

	"strutrisk/internal/report"
)

// TargetShortfall says why the target reliability index is not shown to
// be met by the run whose result document is doc, or "" when it is met.
// Undecided counts as not met: the target must be shown to be met; so
// does a study without a target. With an inventory every member must be
// shown to meet it too (a member not run counts as not met): the study
// itself is a typical member, not the building.
func (r *Result) TargetShortfall(doc *report.Document) string {
	if why := r.studyShortfall(doc); why != "" {
		return why
	}
	if inv := doc.Inventory; inv != nil {
		if t := report.TallyMembers(inv); t.Short() {
			return fmt.Sprintf("the target reliability index %.2f is not shown to be met by every member of the inventory: %s", *doc.TargetBeta, t)
		}
	}
	return ""
}

// studyShortfall is TargetShortfall of the study itself.
func (r *Result) studyShortfall(doc *report.Document) string {
	switch {
	case doc.TargetBeta == nil:
		return "the study has no [target] beta to meet"
	case doc.MeetsTarget == nil:
		why := "undecided at this sample size (give more samples or a smaller target_cov)"
		if t := doc.Target; t != nil && t.Reason != "" && !r.Estimate.Status.Trusted() {
			why = "undecided: " + t.Reason
		}
		return fmt.Sprintf("the target reliability index %.2f is not shown to be met: %s", *doc.TargetBeta, why)
	case !*doc.MeetsTarget:
		return fmt.Sprintf("the target reliability index %.2f is not met", *doc.TargetBeta)
	}
	return ""
}
