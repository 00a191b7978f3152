package study

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// randomBase is base with a random yield and a random dead load.
var randomBase = strings.NewReplacer(
	"yield = 355", `yield = { dist = "lognormal", mean = 400, cov = 0.07 }`,
	"dead = 300000", `dead = { dist = "normal", mean = 300000, cov = 0.1 }`,
).Replace(base)

// parseInventory writes the study and its members.csv into a fresh
// folder and reads the study.
func parseInventory(t *testing.T, text, members string) (*Study, error) {
	t.Helper()
	dir := t.TempDir()
	if members != "" {
		if err := os.WriteFile(filepath.Join(dir, "members.csv"), []byte(members), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	p := filepath.Join(dir, "s.toml")
	if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return Load(p)
}

// TestInventoryRead reads members with units in the header and in the
// cell, a grouping column, and the members as studies of their own.
func TestInventoryRead(t *testing.T) {
	text := randomBase + "[inventory]\nfile = \"members.csv\"\nshared = { \"material.yield\" = \"batch\", \"loads.dead\" = \"all\" }\n"
	csv := "# the ground floor\nname, batch, member.length (m), member.section.thickness\nC1, b1, 3, 8\nC2, b2, 3.5, 6 mm\n"
	st, err := parseInventory(t, text, csv)
	if err != nil {
		t.Fatal(err)
	}
	inv := st.Inventory
	if len(inv.Members) != 2 || inv.Members[1].Name != "C2" || inv.Members[1].Line != 4 {
		t.Fatalf("members %+v", inv.Members)
	}
	if len(inv.Units) != 1 || inv.Units["member.length"] != "m" {
		t.Errorf("header units %v, want member.length in m only", inv.Units)
	}
	if g := inv.Group(1); len(g) != 2 || g[0] != "" || g[1] != "b2" {
		t.Errorf("groups of C2 %q, want [\"\" \"b2\"] (loads.dead, material.yield)", g)
	}
	ms, err := st.Member(1)
	if err != nil {
		t.Fatal(err)
	}
	if l := find(ms, "member.length"); l == nil || l.Value != 3500 {
		t.Errorf("C2's length %+v, want 3500 mm", l)
	}
	if th := find(ms, "member.section.thickness"); th == nil || th.Value != 6 {
		t.Errorf("C2's thickness %+v, want 6 mm", th)
	}
	if ms.Inventory != nil {
		t.Error("a member has an inventory of its own")
	}
}

// TestInventoryErrors checks that problems of the inventory name the key
// of the study, or the CSV's line and column.
func TestInventoryErrors(t *testing.T) {
	inv := "[inventory]\nfile = \"members.csv\"\n"
	cases := []struct {
		name, extra, csv, want string
	}{
		{"no file key", "[inventory]\n", "name\nA\n", "inventory.file: missing"},
		{"no file", inv, "", "cannot read the members"},
		{"no name column", inv, "member.length\n3000\n", "members.csv:1: no \"name\" column"},
		{"bad cell", inv, "name, member.length (m)\nA, 3\nB, -2\n", "members.csv:3: column member.length"},
		{"empty cell", inv, "name, member.length\nA, \n", "members.csv:2: column member.length: empty cell"},
		// The header and the cell disagree: one of them is a slip (a
		// modulus in MPa read as 1/1000 of the intended GPa).
		{"cell unit against the header", inv, "name, material.modulus (GPa)\nA, 210\nB, 210 MPa\n", "members.csv:3: column material.modulus: \"210 MPa\" gives the unit MPa but the column's header gives GPa"},
		{"unknown key", inv, "name, member.lenght\nA, 3000\n", "members.csv:2: column member.lenght"},
		{"two names", inv, "name\nA\nA\n", "members.csv:3: column name"},
		{"no rows", inv, "name\n", "no members"},
		{"shared fixed", inv + "shared = { \"member.length\" = \"all\" }\n", "name\nA\n", "member.length is fixed"},
		{"shared unknown", inv + "shared = { \"material.yeild\" = \"all\" }\n", "name\nA\n", "did you mean \"material.yield\""},
		{"shared by a missing column", inv + "shared = { \"material.yield\" = \"bacth\" }\n", "name, batch\nA, 1\n", "no column \"bacth\"; did you mean \"batch\""},
		{"shared all but set", inv + "shared = { \"material.yield\" = \"all\" }\n", "name, material.yield.mean\nA, 400\nB, 420\n", "share material.yield but column material.yield.mean gives them 400 and 420"},
		// A row whose section cannot be built names the member and its line.
		{"wall consumed", inv, "name, member.section.thickness_loss (mm)\nA, 1\nB, 9\n", "member B (members.csv line 3)"},
		{"with variants", inv + "[[variant]]\nname = \"v\"\nset = { \"member.length\" = 2000 }\n", "name\nA\n", "cannot also have variants"},
	}
	for _, c := range cases {
		_, err := parseInventory(t, randomBase+c.extra, c.csv)
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: error %v, want one saying %q", c.name, err, c.want)
		}
	}
}
