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
	same := &sameMembers{}
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
