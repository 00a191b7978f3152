package report

import (
	"fmt"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg/draw"
)

// TestAgainstColumn checks the choice of the column the members are drawn
// against: the first numeric, varying column that no shared input uses.
func TestAgainstColumn(t *testing.T) {
	row := func(cells ...string) Member {
		m := Member{Cells: map[string]string{}}
		for i := 0; i < len(cells); i += 2 {
			m.Cells[cells[i]] = cells[i+1]
		}
		return m
	}
	members := []Member{
		row("batch", "1", "loads.dead.mean", "500", "member.length", "3.6", "t", "0.4 mm", "same", "2"),
		row("batch", "2", "loads.dead.mean", "520", "member.length", "3.9", "t", "1.2 mm", "same", "2"),
	}
	cases := []struct {
		columns, shared []string
		named           string
		col, unit       string
	}{
		{[]string{"batch", "member.length"}, []string{"material.yield", "batch"}, "", "member.length", ""},
		{[]string{"loads.dead.mean", "member.length"}, []string{"loads.dead"}, "", "member.length", ""},
		{[]string{"loads.dead.mean", "member.length"}, nil, "", "loads.dead.mean", ""},
		{[]string{"same", "t"}, nil, "", "t", "mm"},
		{[]string{"same"}, nil, "", "", ""},
		// A named column is drawn even when shared or the same for all.
		{[]string{"batch", "member.length"}, []string{"batch"}, "batch", "batch", ""},
		{[]string{"same", "t"}, nil, "same", "same", ""},
	}
	for _, c := range cases {
		col, unit := againstColumn(c.columns, c.shared, c.named, members)
		if col != c.col || unit != c.unit {
			t.Errorf("againstColumn(%v, %v, %q) = %q, %q, want %q, %q", c.columns, c.shared, c.named, col, unit, c.col, c.unit)
		}
	}
}

// manyMembers is an inventory of n members, beta rising from 2.9 by
// 0.01 a member, those below the target 3.8 not met, their lengths
// cycling through 3.0 to 4.0 (bare numbers: the unit is in the header).
func manyMembers(n int) *Bundle {
	d := &Document{TargetBeta: ptr(3.8), Inventory: &Inventory{File: "m.csv"}}
	for i := range n {
		beta := 2.9 + 0.01*float64(i)
		v := "met"
		if beta < 3.8 {
			v = "not met"
		}
		m := invMember(fmt.Sprintf("C%03d", i), beta, beta-0.02, beta+0.02, v, "converged")
		m.Cells = map[string]string{"member.length": strconv.FormatFloat(3+float64(i%11)/10, 'f', 1, 64)}
		d.Inventory.Members = append(d.Inventory.Members, m)
	}
	return &Bundle{Doc: d, InventoryColumns: []string{"member.length"}, InventoryUnits: map[string]string{"member.length": "m"}}
}

// TestInventoryPictureLabels checks the unit the header gives the column
// drawn against, and that the names of many members are chosen: the
// lowest members of concern, no two names over each other.
func TestInventoryPictureLabels(t *testing.T) {
	for _, n := range []int{8, 200} {
		b := manyMembers(n)
		f, labels := againstFigure(b)
		if f == nil {
			t.Fatalf("%d members: no against picture", n)
		}
		p := f.Plots[0]
		if p.X.Label.Text != "member.length (m)" {
			t.Errorf("%d members: x label %q, want the header's unit", n, p.X.Label.Text)
		}
		if labels == nil {
			t.Fatalf("%d members: no names", n)
		}
		want := n
		if n > 30 {
			want = maxAgainstLabels
		}
		if len(labels.Labels) > want || len(labels.Labels) < want/2 {
			t.Errorf("%d members: %d names, want at most %d and not far fewer", n, len(labels.Labels), want)
		}
		if n > 30 && labels.Labels[0] != "C000" {
			t.Errorf("%d members: first name %q, want the lowest member C000", n, labels.Labels[0])
		}
		// No two names overlap, by their extent in data units (8-point
		// text, a character about 0.55 em wide: common practice).
		xcm, ycm := (p.X.Max-p.X.Min)/againstAreaW, (p.Y.Max-p.Y.Min)/againstAreaH
		var boxes []box
		for i, s := range labels.Labels {
			w, h := 0.155*float64(len(s))*xcm, 0.34*ycm
			x0 := labels.XYs[i].X
			if labels.TextStyle[i].XAlign == draw.XRight {
				x0 -= w
			}
			bx := box{x0, x0 + w, labels.XYs[i].Y - h/2, labels.XYs[i].Y + h/2}
			if overlapsAny(bx, boxes, -1, false) {
				t.Errorf("%d members: name %q over another", n, s)
			}
			boxes = append(boxes, bx)
		}
	}
	// The ranked picture draws the lowest rankedMaxRows members and says
	// where the others lie.
	f := inventoryRankedFigure(manyMembers(200))
	if !strings.Contains(f.Caption, "The other 150 members have β from 3.40 to 4.89") {
		t.Errorf("ranked caption: %s", f.Caption)
	}
	if f := inventoryRankedFigure(manyMembers(8)); strings.Contains(f.Caption, "other") {
		t.Errorf("ranked picture of 8 members leaves some out: %s", f.Caption)
	}
}
