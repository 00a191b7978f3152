package main

import (
	"encoding/json"
	"strings"
	"testing"
)

// TestInventoryCheckCommand checks that check on the inventory demo
// prints a row a member and that check --json carries inventory_check,
// every member in the order of the file, and that a study without an
// inventory has neither.
func TestInventoryCheckCommand(t *testing.T) {
	const demo = "../../studies/building-inventory.toml"
	code, out, errs := invoke(t, "check", demo)
	if code != exitOK {
		t.Fatalf("check: exit %d\n%s", code, errs)
	}
	for _, s := range []string{"Inventory building-inventory.csv: 8 members", "N_Ed (kN)", "F1-C3", "code check: satisfied"} {
		if !strings.Contains(out, s) {
			t.Errorf("check lacks %q:\n%s", s, out)
		}
	}
	code, out, errs = invoke(t, "check", demo, "--json")
	if code != exitOK {
		t.Fatalf("check --json: exit %d\n%s", code, errs)
	}
	var d struct {
		InventoryCheck *struct {
			File    string `json:"file"`
			Members []struct {
				Name      string          `json:"name"`
				Line      int             `json:"line"`
				CodeCheck json.RawMessage `json:"code_check"`
				Verdict   string          `json:"code_check_verdict"`
			} `json:"members"`
		} `json:"inventory_check"`
	}
	if err := json.Unmarshal([]byte(out), &d); err != nil || d.InventoryCheck == nil {
		t.Fatalf("check --json: %v, inventory_check %v", err, d.InventoryCheck)
	}
	ms := d.InventoryCheck.Members
	if len(ms) != 8 || ms[0].Name != "G-B2" || ms[0].Line != 4 || ms[7].Name != "F1-C3" {
		t.Errorf("members %+v, want the 8 rows of the file in its order", ms)
	}
	for _, m := range ms {
		if len(m.CodeCheck) == 0 || m.Verdict == "" {
			t.Errorf("member %s: no code check or verdict", m.Name)
		}
	}
	code, out, _ = invoke(t, "check", "../../studies/eccentric-strut.toml", "--json")
	if code != exitOK || strings.Contains(out, "inventory_check") {
		t.Errorf("a study without an inventory: exit %d, inventory_check present: %v", code, strings.Contains(out, "inventory_check"))
	}
}
