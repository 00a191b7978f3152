package report

import (
	"fmt"
	"strings"
)

// inventoryText is the inventory's part of the summary: the series
// system, the members that do not meet the target and the undecided ones
// (at most maxListedMembers, lowest beta first), the members not run with
// their reason, and a count of the rest.
func inventoryText(d *Document) string {
	v := inventoryView(d, func(lo, hi string) string { return "   95 % interval [" + lo + ", " + hi + "]" })
	if v == nil {
		return ""
	}
	var w strings.Builder
	summaryWrapped(&w, "inventory", v.Head)
	for _, kv := range v.System {
		label, ok := systemLabels[kv.Key]
		if !ok {
			label = kv.Key
		}
		if t := plainGreek.Replace(kv.Value); len(t) <= summaryWrap {
			summaryLine(&w, label, t) // keeps the spacing of the interval
		} else {
			summaryWrapped(&w, label, t)
		}
	}
	summaryWrapped(&w, "members", plainGreek.Replace(v.Listing))
	if len(v.Rows) > 0 {
		w.WriteString(memberTable(v.Rows, v.HasCode))
	}
	for _, r := range v.NotRun {
		for i, l := range WrapText(r.Name+": not run, "+r.Note, summaryWrap) {
			if i > 0 {
				l = "  " + l
			}
			fmt.Fprintf(&w, "    %s\n", l)
		}
	}
	for _, l := range WrapText(plainGreek.Replace(v.Rest), summaryWrap) {
		fmt.Fprintf(&w, "    %s\n", l)
	}
	return w.String()
}

// systemLabels are the summary's short labels of the system's facts.
var systemLabels = map[string]string{
	"system pf (at least one member fails)":  "system pf",
	"system β":                               "system beta",
	"system pf by FORM (first order)":        "FORM system pf",
	"system pf were the members independent": "if independent",
	"expected number of failing members":     "expected failures",
	"system estimate":                        "system estimate",
}

// memberTable lays out the listed members in columns, the name as wide
// as the longest (at most 24 characters, clipped beyond), with their code
// check when code is set.
func memberTable(rows []invRow, code bool) string {
	nw := len("member")
	for _, r := range rows {
		nw = max(nw, min(len(r.Name), 24))
	}
	var w strings.Builder
	line := func(name, beta, ci, verdict, reserve, cc, governs, note string) {
		if code {
			reserve = fmt.Sprintf("%7s  %-19s", reserve, cc)
		}
		s := fmt.Sprintf("    %-*s %6s  %-16s %-10s %7s  %s", nw, name, beta, ci, verdict, reserve, governs)
		if note != "" {
			s += "  " + note
		}
		w.WriteString(strings.TrimRight(s, " ") + "\n")
	}
	line("member", "beta", "95 % interval", "verdict", "reserve", "code check", "governs", "")
	for _, r := range rows {
		line(clipName(r.Name, 24), r.Beta, r.BetaCI, strings.ReplaceAll(r.Verdict, "–", "-"), strings.ReplaceAll(r.Reserve, "–", "-"), r.Code, r.Governs, plainGreek.Replace(r.Note))
	}
	return w.String()
}

// clipName shortens a name to n bytes, ending it with "~" when clipped.
func clipName(s string, n int) string {
	if len(s) <= n {
		return s
	}
	return s[:n-1] + "~"
}

// mdInventory writes the inventory's section of the Markdown report:
// the system, the members of concern, those not run and a count of the
// rest; nothing without an inventory.
func mdInventory(w *strings.Builder, v *invView) {
	if v == nil {
		return
	}
	fmt.Fprintf(w, "## Inventory\n\n%s.\n\n", mdText(v.Head))
	mdKV(w, v.System)
	fmt.Fprintf(w, "%s\n\n", mdText(v.Listing))
	head := []string{"member", "β (–)", "95% interval of β (–)", "verdict", "reserve factor (–)"}
	if v.HasCode {
		head = append(head, "code check N_Ed/N_Rd")
	}
	head = append(head, "governs")
	if v.HasNote {
		head = append(head, "note")
	}
	rows := make([][]string, len(v.Rows))
	for i, r := range v.Rows {
		rows[i] = []string{r.Name, r.Beta, r.BetaCI, r.Verdict, r.Reserve}
		if v.HasCode {
			rows[i] = append(rows[i], r.Code)
		}
		rows[i] = append(rows[i], r.Governs)
		if v.HasNote {
			rows[i] = append(rows[i], r.Note)
		}
	}
	mdTable(w, head, rows)
	if len(v.NotRun) > 0 {
		w.WriteString("Members not run:\n\n")
		for _, r := range v.NotRun {
			fmt.Fprintf(w, "- %s: %s\n", mdText(r.Name), mdText(r.Note))
		}
		w.WriteString("\n")
	}
	if v.Rest != "" {
		fmt.Fprintf(w, "%s\n\n", mdText(v.Rest))
	}
}
