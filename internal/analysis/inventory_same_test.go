package analysis

import (
	"context"
	"testing"
)

// sameRows are three members of benchInventory; the first and the third
// differ only in their name and in the columns that group shared inputs.
const sameRows = `name, batch, floor, member.length (m), loads.dead.mean (kN), member.section.thickness_loss (mm)
A1, b1, 1, 4.25, 300, 0.5
A2, b2, 2, 3.50, 280, 0.2
A3, b3, 3, 4.25, 300, 0.5
`

// TestSameMembersReserve: a member equal to an earlier one takes its
// reserve factor, searched once, and it is the factor the member's own
// search finds (runMember, which remembers nothing), to the bit; a row
// that differs gets its own.
func TestSameMembersReserve(t *testing.T) {
	l := loadInventory(t, benchInventory, sameRows)
	inv := l.Study.Inventory
	if memberKey(&inv.Members[0]) != memberKey(&inv.Members[2]) || memberKey(&inv.Members[0]) == memberKey(&inv.Members[1]) {
		t.Fatalf("keys %q %q %q", memberKey(&inv.Members[0]), memberKey(&inv.Members[1]), memberKey(&inv.Members[2]))
	}
	s := l.Settings(1)
	cs := caseSettings(&s)
	fs := memberFORM(s.FORM, nil)
	same := newSameMembers(inv)
	for i := range inv.Members {
		o := memberRun(context.Background(), l.Study, i, &cs, fs, same)
		alone, _, _ := runMember(context.Background(), l.Study, i, &cs, fs)
		if o.mr.ReserveFactor == nil || alone.ReserveFactor == nil || *o.mr.ReserveFactor != *alone.ReserveFactor {
			t.Errorf("member %s: reserve factor %v, its own search %v", o.mr.Name, o.mr.ReserveFactor, alone.ReserveFactor)
		}
	}
	if same.found != 2 {
		t.Errorf("%d reserve searches for two distinct member studies", same.found)
	}
}

// TestSameMembersEstimate: equal rows share one estimate, run once, drawn
// with the seed of the first of them, so the rows show the same pf, the
// one each finds alone (runMember, which remembers nothing) and the one
// found when the rows run in the reverse order; a row that differs draws
// its own.
func TestSameMembersEstimate(t *testing.T) {
	l := loadInventory(t, benchInventory, sameRows)
	inv := l.Study.Inventory
	s := l.Settings(1)
	cs := caseSettings(&s)
	fs := memberFORM(s.FORM, nil)
	same := newSameMembers(inv)
	pf := make([]float64, len(inv.Members))
	for i := range inv.Members {
		o := memberRun(context.Background(), l.Study, i, &cs, fs, same)
		alone, _, _ := runMember(context.Background(), l.Study, i, &cs, fs)
		if o.mr.Error != "" || o.mr.Pf != alone.Pf || o.mr.Beta != alone.Beta || o.mr.PfCI != alone.PfCI {
			t.Errorf("member %s: pf %v (%s), alone %v", o.mr.Name, o.mr.Pf, o.mr.Error, alone.Pf)
		}
		pf[i] = o.mr.Pf
	}
	if same.runs != 2 {
		t.Errorf("%d estimates run for two distinct member studies", same.runs)
	}
	if pf[0] != pf[2] || pf[0] == pf[1] {
		t.Errorf("pf %v: rows 1 and 3 are the same study, row 2 another", pf)
	}
	back := newSameMembers(inv)
	for i := len(inv.Members) - 1; i >= 0; i-- {
		if o := memberRun(context.Background(), l.Study, i, &cs, fs, back); o.mr.Pf != pf[i] {
			t.Errorf("member %s run last to first: pf %v, first to last %v", o.mr.Name, o.mr.Pf, pf[i])
		}
	}
	if back.seedRow(inv, 2, memberKey(&inv.Members[2])) != 0 || same.seedRow(nil, 1, memberKey(&inv.Members[1])) != 1 {
		t.Error("seedRow: row 3 draws with row 1's seed, row 2 with its own")
	}
}
