package study

import (
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"os"
	"strconv"
	"strings"
)

// maxMemberProblems caps the rows whose problems are reported at once.
const maxMemberProblems = 20

// readInventory reads the inventory's CSV next to the study and checks
// every member as a study of its own.
func (s *Study) readInventory() *Error {
	inv := s.Inventory
	if inv == nil {
		return nil
	}
	at := Problem{File: s.File, Line: lineIn(s.src.lines, "inventory.file"), Key: "inventory.file"}
	inv.Path = inventoryPath(s.File, inv.File)
	f, err := os.Open(inv.Path)
	if err != nil {
		at.Msg = fmt.Sprintf("cannot read the members: %v (give a CSV next to the study)", err)
		return &Error{Problems: []Problem{at}}
	}
	defer f.Close()
	if err := inv.read(inv.File, f, s.Units); err != nil {
		at.Msg = err.Error()
		return &Error{Problems: []Problem{at}}
	}
	if pr := inv.checkShared(s, at); len(pr) > 0 {
		return &Error{Problems: pr}
	}
	if pr := inv.checkPlotAgainst(s); pr != nil {
		return &Error{Problems: []Problem{*pr}}
	}
	var probs []Problem
	for i := range inv.Members {
		if _, err := s.Member(i); err != nil {
			var e *Error
			if errors.As(err, &e) {
				probs = append(probs, e.Problems...)
			} else {
				probs = append(probs, Problem{File: s.File, Msg: err.Error()})
			}
			if len(probs) >= maxMemberProblems {
				break
			}
		}
	}
	if len(probs) > 0 {
		return &Error{Problems: probs}
	}
	return nil
}

// invColumn is one header cell: its key path and the unit it gives.
type invColumn struct{ key, unit string }

// read reads the members from r, a CSV whose header names the columns:
// "name" and key paths of the study, each with an optional unit in
// brackets ("member.length (m)"); a cell may carry its own unit. Lines
// starting with # are comments. file names the file in messages.
func (inv *Inventory) read(file string, r io.Reader, sys System) error {
	cr := csv.NewReader(r)
	cr.TrimLeadingSpace = true
	cr.Comment = '#'
	header, err := cr.Read()
	if err != nil {
		return fmt.Errorf("%s: no header row: %v (the first row names the columns: name and key paths of the study)", file, err)
	}
	cols := make([]invColumn, len(header))
	seen := map[string]bool{}
	hasName := false
	for i, h := range header {
		cols[i] = headerColumn(h)
		k := cols[i].key
		switch {
		case k == "":
			return fmt.Errorf("%s:1: column %d has no name", file, i+1)
		case seen[k]:
			return fmt.Errorf("%s:1: two columns are named %s", file, k)
		case k == "name":
			hasName = true
		default:
			inv.Columns = append(inv.Columns, k)
			if u := cols[i].unit; u != "" && u != "-" {
				if inv.Units == nil {
					inv.Units = map[string]string{}
				}
				inv.Units[k] = u
			}
		}
		seen[k] = true
	}
	if !hasName {
		return fmt.Errorf("%s:1: no \"name\" column: name each member, e.g. \"C3-2\"", file)
	}
	names := map[string]int{}
	for {
		rec, err := cr.Read()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			return fmt.Errorf("%s: %v", file, err)
		}
		line, _ := cr.FieldPos(0)
		if len(inv.Members) == MaxMembers {
			return fmt.Errorf("%s:%d: more than %d members; split the inventory", file, line, MaxMembers)
		}
		m, err := readMember(file, line, cols, rec, inv.groups())
		if err != nil {
			return err
		}
		if prev, ok := names[m.Name]; ok {
			return fmt.Errorf("%s:%d: column name: %q is the name of the member on line %d too: give each member its own name", file, line, m.Name, prev)
		}
		names[m.Name] = line
		inv.Members = append(inv.Members, m)
	}
	if len(inv.Members) == 0 {
		return fmt.Errorf("%s: no members: write one row a member under the header", file)
	}
	return nil
}

// groups are the columns that group members sharing an input: they set
// no key of the study.
func (inv *Inventory) groups() map[string]bool {
	g := map[string]bool{}
	for _, s := range inv.Shared {
		if s.By != "all" {
			g[s.By] = true
		}
	}
	return g
}

// headerColumn splits "member.length (m)" into its key and unit.
func headerColumn(h string) invColumn {
	h = strings.TrimSpace(h)
	if i := strings.IndexByte(h, '('); i >= 0 && strings.HasSuffix(h, ")") {
		return invColumn{key: strings.TrimSpace(h[:i]), unit: strings.TrimSpace(h[i+1 : len(h)-1])}
	}
	return invColumn{key: h}
}

// readMember reads one row.
func readMember(file string, line int, cols []invColumn, rec []string, groups map[string]bool) (Member, error) {
	m := Member{Line: line, Cells: make(map[string]string, len(cols))}
	for i, c := range cols {
		cell := strings.TrimSpace(rec[i])
		at := fmt.Sprintf("%s:%d: column %s", file, line, c.key)
		if cell == "" {
			return m, fmt.Errorf("%s: empty cell; every member needs every column", at)
		}
		m.Cells[c.key] = cell
		if c.key == "name" {
			m.Name = cell
			continue
		}
		if groups[c.key] {
			continue // it groups members, sets nothing
		}
		text, err := CellText(cell, c.unit)
		if err != nil {
			return m, fmt.Errorf("%s: %v", at, err)
		}
		var val any = text
		if x, err := strconv.ParseFloat(text, 64); err == nil {
			val = x
		}
		m.Sets = append(m.Sets, Setting{Key: c.key, Value: val, At: at})
	}
	return m, nil
}

// checkShared reports a shared input grouped by a column the file does
// not have, and a shared input a column changes across members that
// share it.
func (inv *Inventory) checkShared(s *Study, at Problem) []Problem {
	var probs []Problem
	for _, sh := range inv.Shared {
		key := "inventory.shared." + sh.Key
		pr := Problem{File: s.File, Line: lineIn(s.src.lines, key), Key: key}
		if sh.By != "all" && !contains(inv.Columns, sh.By) {
			if near, ok := nearest(sh.By, inv.Columns); ok {
				pr.Msg = fmt.Sprintf("%s has no column %q; did you mean %q?", inv.File, sh.By, near)
			} else {
				pr.Msg = fmt.Sprintf("%s has no column %q: give \"all\" or the name of a column that groups the members", inv.File, sh.By)
			}
			probs = append(probs, pr)
			continue
		}
		for _, c := range inv.Columns {
			if c != sh.Key && !strings.HasPrefix(c, sh.Key+".") {
				continue
			}
			if msg := inv.sameInGroups(sh, c); msg != "" {
				pr.Msg = msg
				probs = append(probs, pr)
			}
		}
	}
	return probs
}

// sameInGroups says which members share input sh while column c gives
// them different values of it, "" when none do.
func (inv *Inventory) sameInGroups(sh SharedInput, c string) string {
	first := map[string]*Member{}
	for i := range inv.Members {
		m := &inv.Members[i]
		g := ""
		if sh.By != "all" {
			g = m.Cells[sh.By]
		}
		f, ok := first[g]
		if !ok {
			first[g] = m
			continue
		}
		if f.Cells[c] != m.Cells[c] {
			return fmt.Sprintf("members %q (line %d) and %q (line %d) share %s but column %s gives them %s and %s: one variable cannot have two distributions; share it by a column that tells them apart, or do not share it",
				f.Name, f.Line, m.Name, m.Line, sh.Key, c, f.Cells[c], m.Cells[c])
		}
	}
	return ""
}

func contains(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}
