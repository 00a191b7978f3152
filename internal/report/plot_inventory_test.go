package report

import "testing"

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
