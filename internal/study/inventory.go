package study

import (
	"fmt"
	"path/filepath"
	"sort"
	"strings"
)

// MaxMembers caps the rows of an inventory.
const MaxMembers = 100000

// Inventory is a study's [inventory]: members, one a row of a CSV file
// next to the study, each the study with the row's keys set, and how the
// members share the study's random inputs.
type Inventory struct {
	// File is the CSV file as written, Path where it was read from.
	File, Path string
	// Shared lists the random inputs the members share, by key path, in
	// the order of their names.
	Shared []SharedInput
	// Columns are the CSV's columns but name: key paths of the study,
	// and the columns that group members sharing an input.
	Columns []string
	// Units are the units the header gives the columns ("member.length
	// (m)": "m"), by column; a column without one is absent.
	Units map[string]string
	// Members are the rows, in the order of the file.
	Members []Member
	// PlotAgainst is the column the report draws beta against, ""
	// for the first numeric one (inventory_plot.go).
	PlotAgainst string
}

// SharedInput says how the members share one random input: By is "all"
// (one variable for every member) or the name of a CSV column (members
// with the same value in it share one variable).
type SharedInput struct {
	Key, By string
}

// Member is one row of an inventory.
type Member struct {
	// Name is the row's name, Line its line in the file.
	Name string
	Line int
	// Sets are the keys the row sets.
	Sets []Setting
	// Cells are the row's cells by column name, as written.
	Cells map[string]string
}

// Group returns, for each shared input in the order of Shared, the group
// of member i: "" when every member shares it, else the member's cell in
// the column that groups it.
func (inv *Inventory) Group(i int) []string {
	g := make([]string, len(inv.Shared))
	for k, s := range inv.Shared {
		if s.By != "all" {
			g[k] = inv.Members[i].Cells[s.By]
		}
	}
	return g
}

// Member returns member i of the study's inventory read as a study of
// its own: the study with the row's keys set.
func (s *Study) Member(i int) (*Study, error) {
	inv := s.Inventory
	m := inv.Members[i]
	st, err := s.With(fmt.Sprintf("member %s (%s line %d)", m.Name, inv.File, m.Line), m.Sets)
	if err != nil {
		return nil, err
	}
	return st, nil
}

func (p *parser) inventory(top *table) {
	t := p.sub(top, "inventory")
	if t == nil {
		return
	}
	inv := &Inventory{}
	if f, ok := p.str(t, "file"); ok {
		inv.File = strings.TrimSpace(f)
		if inv.File == "" {
			p.errorf(t.key("file"), "the file is empty: give the CSV of the members, e.g. file = \"members.csv\"")
		}
	} else if _, given := t.m["file"]; !given {
		p.required(t, "file", "the CSV of the members next to the study, e.g. file = \"members.csv\"")
	}
	if sh := p.sub(t, "shared"); sh != nil {
		keys := sortedKeys(sh.m)
		sort.Strings(keys)
		for _, k := range keys {
			sh.used[k] = true
			by, ok := sh.m[k].(string)
			if !ok || strings.TrimSpace(by) == "" {
				p.errorf(sh.key(k), "say how the members share %s: \"all\" (one variable for every member) or the name of a column of the CSV", k)
				continue
			}
			inv.Shared = append(inv.Shared, SharedInput{Key: k, By: strings.TrimSpace(by)})
		}
	}
	p.plotAgainst(t, inv)
	p.unknown(t)
	if _, ok := top.m["sweep"]; ok {
		p.errorf("inventory", "a study with an inventory cannot also sweep: put the sweep in a study of its own")
	}
	if _, ok := top.m["variant"]; ok {
		p.errorf("inventory", "a study with an inventory cannot also have variants: put them in a study of their own")
	}
	p.st.Inventory = inv
}

// checkShared reports a shared input that is not a random input of the
// study.
func (p *parser) checkShared() {
	inv := p.st.Inventory
	if inv == nil {
		return
	}
	for _, s := range inv.Shared {
		q := p.byPath[s.Key]
		at := "inventory.shared." + s.Key
		switch {
		case q == nil:
			if near, ok := nearest(s.Key, sortedKeys(p.byPath)); ok {
				p.errorf(at, "%q is not a quantity of this study; did you mean %q?", s.Key, near)
			} else {
				p.errorf(at, "%q is not a quantity of this study", s.Key)
			}
		case q.Dist == nil:
			p.errorf(at, "%s is fixed, not random: only a random input (written with dist) can be shared", s.Key)
		}
	}
}

// inventoryPath is where the inventory's file is: next to the study.
func inventoryPath(study, file string) string {
	if filepath.IsAbs(file) {
		return file
	}
	return filepath.Join(filepath.Dir(study), file)
}
