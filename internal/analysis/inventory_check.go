package analysis

import (
	"fmt"
	"strings"

	"strutrisk/internal/report"
	"strutrisk/internal/study"
)

// InventoryCheck is the deterministic check of every member of the
// study's inventory, in the order of the file: each member built as a
// study of its own, its nominal picture and its code check; a member that
// cannot be built carries the reason. Nil without an inventory.
func (l *Loaded) InventoryCheck() *report.InventoryCheck {
	inv := l.Study.Inventory
	if inv == nil {
		return nil
	}
	ic := &report.InventoryCheck{File: inv.File, Members: make([]report.MemberCheck, len(inv.Members))}
	for i := range inv.Members {
		ic.Members[i] = checkMember(l.Study, i)
	}
	return ic
}

// checkMember checks member i of st's inventory at nominal values.
func checkMember(st *study.Study, i int) report.MemberCheck {
	m := st.Inventory.Members[i]
	mc := report.MemberCheck{Name: m.Name, Line: m.Line}
	ms, err := st.Member(i)
	if err != nil {
		mc.Error = err.Error()
		return mc
	}
	md, err := study.Build(ms)
	if err != nil {
		mc.Error = fmt.Sprintf("member.section: %v", err)
		return mc
	}
	n, err := md.Nominal()
	if err != nil {
		mc.Error = err.Error()
		return mc
	}
	mc.Warnings = append(append(append(mc.Warnings, ms.Warnings...), md.Plausibility(n)...), md.Adequacy(n)...)
	a := n.Axis
	mc.Slenderness, mc.RelativeSlenderness = n.Slenderness[a], n.RelSlenderness[a]
	mc.GoverningAxis, mc.Mode = a.String(), n.CapacityMode.String()
	mc.Capacity, mc.Demand, mc.Utilisation, mc.LoadFactor = n.Capacity, n.Demand, n.Utilisation, n.LoadFactor
	cc, why := codeCheck(md)
	if cc == nil {
		mc.CodeCheckVerdict, mc.CodeCheckNotMade = "not made", strings.TrimPrefix(why, "code_check: not made: ")
		return mc
	}
	mc.CodeCheck, mc.CodeCheckVerdict = cc, report.CodeCheckVerdictOf(cc)
	mc.GoverningAxis, mc.Mode, mc.RelativeSlenderness = cc.Axis, cc.Mode, cc.RelativeSlenderness
	if cc.Axis == "major" || cc.Axis == "minor" {
		mc.Slenderness = n.Slenderness[axisIndex(cc.Axis)]
	}
	return mc
}

// axisIndex is the index of the axis named "major" (0) or "minor" (1).
func axisIndex(name string) int {
	if name == "minor" {
		return 1
	}
	return 0
}

// CheckDocument is the document strutrisk check --json prints: the
// result document without sampling fields, with the check of every
// member of the inventory.
func (l *Loaded) CheckDocument() *report.Document {
	d := l.BaseDocument()
	d.InventoryCheck = l.InventoryCheck()
	return d
}

// addCodeChecks gives each member run its code check (the same as check
// gives it), members[i] being the row of outs[i]. When no member's check
// can be made (a material other than steel, say) no member carries one,
// nor the reason: the study's own warning gives it.
func addCodeChecks(members []report.Member, outs []memberOutcome) {
	made := false
	for i, o := range outs {
		if o.md == nil || i >= len(members) {
			continue
		}
		cc, why := codeCheck(o.md)
		members[i].CodeCheck = report.ShortCodeCheck(cc)
		members[i].CodeCheckNotMade = strings.TrimPrefix(why, "code_check: not made: ")
		made = made || cc != nil
	}
	if !made {
		for i := range members {
			members[i].CodeCheckNotMade = ""
		}
	}
}
