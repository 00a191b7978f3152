package study

import (
	"fmt"
	"strconv"
	"strings"
)

// plotAgainst reads [inventory] plot_against: the column the report draws
// each member's beta against.
func (p *parser) plotAgainst(t *table, inv *Inventory) {
	c, ok := p.str(t, "plot_against")
	if !ok {
		return
	}
	inv.PlotAgainst = strings.TrimSpace(c)
	if inv.PlotAgainst == "" {
		p.errorf(t.key("plot_against"), "the column is empty: name a numeric column of the CSV, e.g. plot_against = \"member.length\", or leave the key out")
	}
}

// checkPlotAgainst reports a plot_against that is not a column of the
// file, or a column with a cell that is not a number.
func (inv *Inventory) checkPlotAgainst(s *Study) *Problem {
	c := inv.PlotAgainst
	if c == "" {
		return nil
	}
	key := "inventory.plot_against"
	pr := &Problem{File: s.File, Line: lineIn(s.src.lines, key), Key: key}
	if !contains(inv.Columns, c) {
		if near, ok := nearest(c, inv.Columns); ok {
			pr.Msg = fmt.Sprintf("%s has no column %q; did you mean %q?", inv.File, c, near)
		} else {
			pr.Msg = fmt.Sprintf("%s has no column %q: name a numeric column of the file (%s)", inv.File, c, strings.Join(inv.Columns, ", "))
		}
		return pr
	}
	for _, m := range inv.Members {
		f := strings.Fields(m.Cells[c])
		if len(f) == 0 || len(f) > 2 {
			pr.Msg = fmt.Sprintf("%s:%d: column %s: %q is not a number, so beta cannot be drawn against it: name a numeric column", inv.File, m.Line, c, m.Cells[c])
			return pr
		}
		if _, err := strconv.ParseFloat(f[0], 64); err != nil {
			pr.Msg = fmt.Sprintf("%s:%d: column %s: %q is not a number, so beta cannot be drawn against it: name a numeric column", inv.File, m.Line, c, m.Cells[c])
			return pr
		}
	}
	return nil
}
