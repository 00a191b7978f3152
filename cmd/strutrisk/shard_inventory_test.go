package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/internal/shardstate"
)

// TestShardInventoryMembers checks that a split inventory study shares
// its members out, each run whole by one shard, and the blocks of the
// joint sample of the system, each evaluated by one shard, and that the
// merge, which runs neither again, writes the files of a single run byte
// for byte; with more shards than members too.
func TestShardInventoryMembers(t *testing.T) {
	t.Parallel() // sets no hook: runs beside the other slow tests
	dir := t.TempDir()
	// The inventory demo with a budget of 30000 samples, which the joint
	// sample of the system takes too (30 blocks of 1000).
	inv := cheapInventory(t, "30_000", nil)
	var flags []string
	single := filepath.Join(dir, "single")
	if code, _, errs := invoke(t, append([]string{"run", inv, "--out", single}, flags...)...); code != exitOK {
		t.Fatalf("single run: exit %d: %s", code, errs)
	}
	for _, n := range []int{3, 11} {
		merged := shardAndMerge(t, inv, filepath.Join(dir, itoa(n)), n, flags...)
		if d := sameFolders(t, single, merged); d != "" {
			t.Errorf("inventory, %d shards: %s", n, d)
		}
		owner := map[string]int{}
		for k := range n {
			d := filepath.Join(dir, itoa(n), "shard", itoa(n)+"-"+itoa(k)+"of"+itoa(n))
			st, err := shardstate.Read(d)
			if err != nil {
				t.Fatal(err)
			}
			for key := range st.Notes {
				if !strings.HasPrefix(key, "inventory/") {
					continue
				}
				if j, ok := owner[key]; ok {
					t.Errorf("%d shards: %s noted by shards %d and %d", n, key, j, k)
				}
				owner[key] = k
			}
		}
		// The demo's 8 members; 30 blocks of the joint sample.
		members, blocks := 0, 0
		for key := range owner {
			switch {
			case strings.HasPrefix(key, "inventory/member/"):
				members++
			case strings.HasPrefix(key, "inventory/system/block/"):
				blocks++
			}
		}
		if members != 8 || blocks != 30 {
			t.Errorf("%d shards: %d members and %d blocks of the joint sample noted, want 8 and 30", n, members, blocks)
		}
		// A shard run again writes the same state, byte for byte.
		d1 := filepath.Join(dir, itoa(n), "shard", itoa(n)+"-1of"+itoa(n))
		again := filepath.Join(dir, itoa(n), "again")
		if code, _, errs := invoke(t, append([]string{"run", inv, "--shard", "1/" + itoa(n), "--out", again, "--workers", "1"}, flags...)...); code != exitOK {
			t.Fatalf("shard 1 again: exit %d: %s", code, errs)
		}
		a, _ := os.ReadFile(filepath.Join(d1, shardstate.FileName))
		b, _ := os.ReadFile(filepath.Join(again, shardstate.FileName))
		if len(a) == 0 || !bytes.Equal(a, b) {
			t.Errorf("%d shards: shard 1 run again on one worker wrote another state", n)
		}
		os.RemoveAll(filepath.Join(dir, itoa(n), "shard"))
	}
}

// TestShardInventoryFileChanged checks that the shards of an inventory
// study refuse to merge when its CSV file changed between the shards, or
// after them, exit 2: each shard runs its own members from the file it
// read, so a merge would mix two buildings. (The study file's own hash
// did not cover the CSV before.)
func TestShardInventoryFileChanged(t *testing.T) {
	dir := t.TempDir()
	inv := cheapInventory(t, "4_000", nil)
	csv, err := os.ReadFile("../../studies/building-inventory.csv")
	if err != nil {
		t.Fatal(err)
	}
	file := filepath.Join(filepath.Dir(inv), "building-inventory.csv")
	write := func(data []byte) {
		if err := os.WriteFile(file, data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	shard := func(k int) string {
		d := filepath.Join(dir, "s"+itoa(k))
		if code, _, errs := invoke(t, "run", inv, "--shard", itoa(k)+"/2", "--out", d); code != exitOK {
			t.Fatalf("shard %d: exit %d: %s", k, code, errs)
		}
		return d
	}
	// An edited member: one more line of comment changes no member but
	// the bytes; a changed value is what matters to the user.
	edited := []byte(strings.Replace(string(csv), "\n", "\n", 1) + "\n")
	write(csv)
	d0 := shard(0)
	write(edited)
	d1 := shard(1)
	code, _, errs := invoke(t, "merge", d0, d1, "--out", filepath.Join(dir, "m1"))
	if code != exitInput || !strings.Contains(errs, "another inventory file") {
		t.Errorf("shards of two inventory files: exit %d, %q", code, errs)
	}
	// Both shards of the edited file, the file changed back before the merge.
	d0 = shard(0)
	write(csv)
	code, _, errs = invoke(t, "merge", d0, d1, "--out", filepath.Join(dir, "m2"))
	if code != exitInput || !strings.Contains(errs, "is not the one the shards ran") {
		t.Errorf("inventory file changed after the shards: exit %d, %q", code, errs)
	}
	// Unchanged: merged.
	write(edited)
	if code, _, errs := invoke(t, "merge", d0, d1, "--out", filepath.Join(dir, "m3")); code != exitOK {
		t.Errorf("unchanged inventory file: exit %d: %s", code, errs)
	}
}
