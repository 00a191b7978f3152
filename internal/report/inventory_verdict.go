package report

import (
	"fmt"
	"strings"
)

// MemberTally sorts an inventory's members by their verdict against the
// target as the reports show it (shownVerdict: an estimate the engine does
// not trust is undecided): the names of those not meeting it, undecided
// and not run, each in the order of the document (lowest beta first).
type MemberTally struct {
	Members                   int
	NotMet, Undecided, NotRun []string
}

// TallyMembers tallies the members of inv; a member without a verdict
// (the study has no target) counts in none of the lists.
func TallyMembers(inv *Inventory) MemberTally {
	t := MemberTally{Members: len(inv.Members)}
	for _, m := range inv.Members {
		switch {
		case m.Error != "":
			t.NotRun = append(t.NotRun, m.Name)
		case shownVerdict(m) == "not met":
			t.NotMet = append(t.NotMet, m.Name)
		case shownVerdict(m) == "undecided":
			t.Undecided = append(t.Undecided, m.Name)
		}
	}
	return t
}

// Short reports whether any member does not meet the target, is
// undecided or was not run.
func (t MemberTally) Short() bool {
	return len(t.NotMet)+len(t.Undecided)+len(t.NotRun) > 0
}

// String says how the members stand against the target: "met by all 8
// members", or "NOT met by 2 of 8 members (F1-C3, G-B3); undecided for 1
// (G-C3)", at most three names a group.
func (t MemberTally) String() string {
	if !t.Short() {
		return fmt.Sprintf("met by all %d %s", t.Members, plural(t.Members, "member", "members"))
	}
	var parts []string
	if n := len(t.NotMet); n > 0 {
		parts = append(parts, fmt.Sprintf("NOT met by %d of %d %s (%s)", n, t.Members, plural(t.Members, "member", "members"), someNames(t.NotMet)))
	}
	if n := len(t.Undecided); n > 0 {
		parts = append(parts, fmt.Sprintf("undecided for %d (%s)", n, someNames(t.Undecided)))
	}
	if n := len(t.NotRun); n > 0 {
		parts = append(parts, fmt.Sprintf("%d not run (%s)", n, someNames(t.NotRun)))
	}
	return strings.Join(parts, "; ")
}

// someNames are the first three names, then "..." when there are more.
func someNames(names []string) string {
	if len(names) > 3 {
		return strings.Join(names[:3], ", ") + ", ..."
	}
	return strings.Join(names, ", ")
}

// inventoryVerdict is the inventory's verdict beside the study's, and its
// class for the HTML ("met", "not-met", "undecided"): the members against
// the target, whose verdict the study's, a typical member's, is not. ""
// without an inventory or a target.
func inventoryVerdict(d *Document) (text, class string) {
	if d.Inventory == nil || d.TargetBeta == nil {
		return "", ""
	}
	t := TallyMembers(d.Inventory)
	class = "met"
	switch {
	case len(t.NotMet)+len(t.NotRun) > 0:
		class = "not-met"
	case len(t.Undecided) > 0:
		class = "undecided"
	}
	return "Inventory: target " + t.String() + ".", class
}

// inventoryTargetText is the summary's line of the members against the
// target, under the study's own verdict; "" without an inventory or a
// target.
func inventoryTargetText(d *Document) string {
	if d.Inventory == nil || d.TargetBeta == nil {
		return ""
	}
	var w strings.Builder
	summaryWrapped(&w, "members' target", TallyMembers(d.Inventory).String()+"; the target beta line is the study's as written, a typical member.")
	return w.String()
}
