package analysis

import (
	"fmt"
	"strings"
)

// namesShown is how many member names a grouped warning lists.
const namesShown = 3

// groupMemberWarnings gives the inventory members' warnings (warns[i]
// those of member names[i], of total members in the file) once per text: a warning of one member is
// prefixed by its name, one that several members share by their number
// and the first few names, so the study's own warnings (a missing
// companion, a model outside its ground) are not repeated for each of
// thousands of members. Warnings come in the order they first appear.
func groupMemberWarnings(names []string, warns [][]string, total int) []string {
	var order []string
	who := map[string][]string{}
	for i, ws := range warns {
		for _, w := range ws {
			ns, seen := who[w]
			if !seen {
				order = append(order, w)
			}
			if len(ns) == 0 || ns[len(ns)-1] != names[i] { // a member saying it twice counts once
				who[w] = append(ns, names[i])
			}
		}
	}
	out := make([]string, 0, len(order))
	for _, w := range order {
		out = append(out, membersPrefix(who[w], total)+": "+w)
	}
	return out
}

// membersPrefix names the members a warning applies to, out of total.
func membersPrefix(ns []string, total int) string {
	if len(ns) == 1 {
		return fmt.Sprintf("member %q", ns[0])
	}
	q := make([]string, 0, namesShown+1)
	for _, n := range ns[:min(len(ns), namesShown)] {
		q = append(q, fmt.Sprintf("%q", n))
	}
	if len(ns) > namesShown {
		q = append(q, "...")
	}
	all := ""
	if len(ns) == total {
		all = "all "
	}
	return fmt.Sprintf("%s%d members (%s)", all, len(ns), strings.Join(q, ", "))
}
