package report

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// maxListedMembers is the most members a report lists by name in each
// group (of concern, not run); the rest are counted and found in
// inventory.csv.
const maxListedMembers = 10

// invView is an inventory as the summary, the Markdown and the HTML
// report give it: the series system, the members of concern by name and
// a count of the rest.
type invView struct {
	// Head says how many members the inventory has and where from.
	Head string
	// System are the series system's facts (pf with interval, beta,
	// expected number of failing members...).
	System []KV
	// Listing introduces Rows: which members they are.
	Listing string
	Rows    []invRow
	// HasNote is set when a listed member has a note, HasCode when one
	// has a code check.
	HasNote, HasCode bool
	// NotRun are the members without a result, with the reason.
	NotRun []invRow
	// Rest counts the members not listed and says where they are.
	Rest string
}

// invRow is one listed member, formatted.
type invRow struct {
	Name, Beta, BetaCI, Verdict, Reserve, Governs, Note string
	// Code is the member's code check: its utilisation and verdict.
	Code string
	// Class is "met", "not-met", "undecided" or "" (for the HTML).
	Class string
}

// inventoryView formats the inventory of d, the interval of the system
// pf by interval; nil when d has no inventory.
func inventoryView(d *Document, interval func(lo, hi string) string) *invView {
	inv := d.Inventory
	if inv == nil {
		return nil
	}
	v := &invView{Head: fmt.Sprintf("%d members", len(inv.Members))}
	if inv.File != "" {
		v.Head += " (" + inv.File + ")"
	}
	v.Head += ": the study with each row's keys set; the results above it are the study's own, with its keys as written"
	v.System = systemRows(inv, interval)
	var concern, fine, notRun []Member
	hasTarget := d.TargetBeta != nil
	for _, m := range inv.Members {
		switch {
		case m.Error != "":
			notRun = append(notRun, m)
		case hasTarget && shownVerdict(m) == "met":
			fine = append(fine, m)
		default:
			// Not met, undecided, or no target to judge by.
			concern = append(concern, m)
		}
	}
	nNot, nUnd := countVerdicts(concern)
	switch {
	case !hasTarget:
		v.Listing = "No target to judge by: the members with the lowest β first."
	case len(concern) == 0:
		v.Listing = fmt.Sprintf("Every member that ran meets the target β %s; the lowest:", fixed(*d.TargetBeta, 2))
		concern, fine = fine[:min(1, len(fine))], fine[min(1, len(fine)):]
	default:
		v.Listing = fmt.Sprintf("%d not met, %d undecided against the target β %s, the lowest β first:", nNot, nUnd, fixed(*d.TargetBeta, 2))
	}
	for i, m := range concern {
		if i == maxListedMembers {
			break
		}
		v.Rows = append(v.Rows, memberRow(m))
		v.HasNote = v.HasNote || v.Rows[i].Note != ""
		v.HasCode = v.HasCode || v.Rows[i].Code != ""
	}
	for i, m := range notRun {
		if i == maxListedMembers {
			break
		}
		v.NotRun = append(v.NotRun, invRow{Name: m.Name, Note: fmt.Sprintf("line %d: %s", m.Line, m.Error)})
	}
	v.Rest = restText(len(concern)-len(v.Rows), len(fine), len(notRun)-len(v.NotRun), hasTarget)
	return v
}

// countVerdicts counts the members whose verdict is "not met" and
// "undecided".
func countVerdicts(ms []Member) (notMet, undecided int) {
	for _, m := range ms {
		switch shownVerdict(m) {
		case "not met":
			notMet++
		case "undecided":
			undecided++
		}
	}
	return notMet, undecided
}

// restText counts the members not listed: more of concern, fine (met, or
// any with no target) and not run.
func restText(concern, fine, notRun int, hasTarget bool) string {
	var parts []string
	if concern > 0 {
		what := "not meeting the target or undecided"
		if !hasTarget {
			what = "with a higher β"
		}
		parts = append(parts, fmt.Sprintf("%d more %s", concern, what))
	}
	if fine > 0 {
		parts = append(parts, fmt.Sprintf("%d other %s the target", fine, plural(fine, "member meets", "members meet")))
	}
	if notRun > 0 {
		parts = append(parts, fmt.Sprintf("%d more not run", notRun))
	}
	if len(parts) == 0 {
		return ""
	}
	return strings.Join(parts, ", ") + ": every member is in inventory.csv."
}

// plural is one when n is 1, else many.
func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// memberRow formats member m. An estimate the engine does not trust
// keeps the verdict the run gave it (undecided) and says why.
func memberRow(m Member) invRow {
	r := invRow{Name: m.Name, Verdict: shownVerdict(m), Reserve: "–", Governs: governsText(m)}
	r.Beta = shortBeta(float64(m.Beta))
	r.BetaCI = "[" + shortBeta(float64(m.BetaCI[0])) + ", " + shortBeta(float64(m.BetaCI[1])) + "]"
	if m.ReserveFactor != nil {
		r.Reserve = factorText(*m.ReserveFactor)
	}
	r.Code = memberCodeText(m)
	r.Class = map[string]string{"met": "met", "not met": "not-met", "undecided": "undecided"}[r.Verdict]
	if r.Verdict == "" {
		r.Verdict = "–"
	}
	switch {
	case !trustedStatus(m.Status):
		r.Note = "estimate not trusted (" + m.Status + ")"
	case r.Verdict == "undecided":
		r.Note = "the interval of β straddles the target"
	}
	return r
}

// shownVerdict is the member's verdict as the reports give it: the
// run's, but never "met" or "not met" on an estimate the engine does not
// trust (undecided instead).
func shownVerdict(m Member) string {
	if m.Verdict != "" && !trustedStatus(m.Status) {
		return "undecided"
	}
	return m.Verdict
}

// trustedStatus reports whether a member's status is one whose estimate
// may be read (as the main result's trusted).
func trustedStatus(s string) bool {
	switch s {
	case "converged", "budget-spent", "few-failures":
		return true
	}
	return false
}

// shortBeta is a reliability index in a table cell: two decimals, "inf"
// or "-inf" when unbounded.
func shortBeta(x float64) string {
	switch {
	case x > 1e300:
		return "inf"
	case x < -1e300:
		return "-inf"
	}
	return fixed(x, 2)
}

// governsText is the member's governing mode, with its axis when the
// mode does not name it.
func governsText(m Member) string {
	switch {
	case m.Mode == "":
		return m.GoverningAxis
	case m.GoverningAxis == "" || strings.Contains(m.Mode, m.GoverningAxis):
		return m.Mode
	}
	return m.Mode + " (" + m.GoverningAxis + " axis)"
}

// systemRows are the series system's facts, the interval of its pf
// written by interval.
func systemRows(inv *Inventory, interval func(lo, hi string) string) []KV {
	s := inv.System
	if s == nil {
		return []KV{{"system pf (at least one member fails)", "not estimated: see the warnings"}}
	}
	var rows []KV
	switch {
	case s.Status == "no samples" || math.IsNaN(s.Pf):
		rows = append(rows, KV{"system pf (at least one member fails)", "not estimated: see the warnings"})
	case s.Pf == 0:
		rows = append(rows, KV{"system pf (at least one member fails)", "below " + prob(s.PfCI[1]) + " (95% bound): no joint sample failed"},
			KV{"system β", "above " + shortBeta(-normQuantile(s.PfCI[1]))})
	default:
		rows = append(rows, KV{"system pf (at least one member fails)", prob(s.Pf) + interval(prob(s.PfCI[0]), prob(s.PfCI[1]))},
			KV{"system β", shortBeta(float64(s.Beta))})
	}
	if s.FormPf != nil && s.FormBeta != nil {
		rows = append(rows, KV{"system pf by FORM (first order)", formSystemValue(s)})
	}
	rows = append(rows,
		KV{"system pf were the members independent", prob(s.PfIfIndependent)},
		KV{"expected number of failing members", prob(s.ExpectedFailures) + " (the sum of the members' pf)"},
		KV{"system estimate", systemStatus(s)})
	return rows
}

// formSystemValue is the first-order system pf with its index, and what
// it is: the headline when no joint sample failed, and then an
// approximation, not a verdict; else a check on the joint sample.
func formSystemValue(s *System) string {
	t := prob(*s.FormPf) + ", β " + shortBeta(float64(*s.FormBeta))
	if s.Headline == "form" {
		return t + "; the estimate to read, as no joint sample failed: an approximation that no failing sample checks, not a verdict"
	}
	return t + "; a check on the joint sample"
}

// systemStatus is how the system pf was estimated and how far it got.
func systemStatus(s *System) string {
	t := s.Method + "; " + s.Status
	if s.PfCoV != nil {
		t += ", cov of pf " + strconv.FormatFloat(*s.PfCoV, 'f', 3, 64)
	}
	return t
}

// normQuantile is the standard normal quantile of p, by the inverse
// complementary error function.
func normQuantile(p float64) float64 {
	return -math.Sqrt2 * math.Erfcinv(2*p)
}

// memberCodeText is member m's code check in a listing: "0.837
// satisfied", "1.12 NOT satisfied", "0.9 no verdict", "not made"; "" when
// the inventory has none.
func memberCodeText(m Member) string {
	c := m.CodeCheck
	switch {
	case c == nil && m.CodeCheckNotMade != "":
		return "not made"
	case c == nil:
		return ""
	}
	v := c.Verdict
	if v == "not satisfied" {
		v = "NOT satisfied"
	}
	return fixed(c.Utilisation, 3) + " " + v
}
