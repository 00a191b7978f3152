package analysis

import (
	"context"
	"strings"
	"testing"
)

// TestInventoryMemberPlausibility: a member whose cell is valid but
// probably not what was meant (a modulus of 205 MPa, a thousandth of
// steel's 205 GPa: EN 1993-1-1 3.2.6, from memory) is warned of by run as
// check warns of it, naming the member, and the members that are plausible
// are not.
func TestInventoryMemberPlausibility(t *testing.T) {
	text := strings.Replace(stocky, "seed = 7", "seed = 7\nmethod = \"form\"", 1) + "[inventory]\nfile = \"members.csv\"\n"
	l := loadInventory(t, text, "name, material.modulus\nA, 205000\nB, 205\n")
	l.Study.Sensitivity.Tornado, l.Study.Sensitivity.Sobol = false, false
	s := l.Settings(1)
	r, err := Run(context.Background(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	var forB, forA int
	for _, w := range r.Document().Warnings {
		if strings.HasPrefix(w, `member "B": material.modulus`) && strings.Contains(w, "elastic modulus") {
			forB++
		}
		if strings.HasPrefix(w, `member "A": material.modulus`) {
			forA++
		}
	}
	if forB != 1 || forA != 0 {
		t.Errorf("%d warnings of member B's modulus (want 1), %d of A's (want 0): %q", forB, forA, r.Document().Warnings)
	}
}
