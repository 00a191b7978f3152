package analysis

import (
	"context"
	"encoding/json"
	"strings"
	"testing"
)

// cancelAtMember cancels the run when member k (from 1) of an inventory
// starts.
type cancelAtMember struct {
	k      int
	cancel context.CancelFunc
}

func (c *cancelAtMember) Stage(string) {}

func (c *cancelAtMember) StartCase(k, n int, what string) {
	if strings.HasPrefix(what, "member ") && k == c.k {
		c.cancel()
	}
}

// TestInventoryInterruptedDocument checks that a run interrupted among an
// inventory's members still gives a result document that encodes: a
// member stopped midway has no pf (null), not a NaN that JSON cannot
// hold (results.json was then not written at all).
func TestInventoryInterruptedDocument(t *testing.T) {
	l, err := Load("../../studies/building-inventory.toml")
	if err != nil {
		t.Fatal(err)
	}
	s := l.Settings(1)
	s.Method, s.Samples = "monte-carlo", 20000
	ctx, cancel := context.WithCancel(context.Background())
	defer cancel()
	r, err := Run(ctx, l, &s, &cancelAtMember{k: 2, cancel: cancel})
	if err != nil {
		t.Fatal(err)
	}
	d := r.Document()
	if d.Inventory == nil || len(d.Inventory.Members) == 0 {
		t.Fatal("no member in the document")
	}
	stopped := 0
	for _, m := range d.Inventory.Members {
		if m.Error != "" {
			stopped++
		}
	}
	if stopped == 0 {
		t.Fatal("no member was stopped: the test does not reach the case")
	}
	data, err := json.Marshal(d.Inventory)
	if err != nil {
		t.Fatalf("the inventory does not encode: %v", err)
	}
	if !strings.Contains(string(data), `"pf":null`) {
		t.Errorf("a stopped member's pf is not null: %.300s", data)
	}
}
