package shardstate

import (
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"os"
	"path/filepath"
	"testing"

	"strutrisk/sim"
)

// TestIdentifyInventory: the identity of a study with an inventory holds
// the SHA-256 (FIPS 180-4) of the inventory file's bytes, which the state
// records; an inventory that cannot be read is an error.
func TestIdentifyInventory(t *testing.T) {
	dir := t.TempDir()
	study, inv := filepath.Join(dir, "s.toml"), filepath.Join(dir, "m.csv")
	os.WriteFile(study, []byte("title = \"x\"\n"), 0o644)
	csv := []byte("name,member.length\nC1,3000\n")
	os.WriteFile(inv, csv, 0o644)
	sum := sha256.Sum256(csv)
	id, err := Identify(study, inv)
	if err != nil || id.Inventory != hex.EncodeToString(sum[:]) {
		t.Fatalf("Identify: %+v, %v; want the inventory's hash %x", id, err, sum)
	}
	if st := Record("x", id, &sim.Settings{Shard: &sim.Shard{Count: 1}}); st.InventorySHA256 != id.Inventory {
		t.Errorf("Record: inventory %q, want %q", st.InventorySHA256, id.Inventory)
	}
	if id, err := Identify(study, ""); err != nil || id.Inventory != "" {
		t.Errorf("Identify without an inventory: %+v, %v", id, err)
	}
	if _, err := Identify(study, filepath.Join(dir, "gone.csv")); err == nil {
		t.Error("Identify with an inventory that is not there: no error")
	}
}

// TestRecorded: the line run --shard ends with counts what the state
// holds, in the singular for one.
func TestRecorded(t *testing.T) {
	st := &State{Shard: 2, Shards: 5, Runs: []*sim.ShardRun{{}}, Notes: map[string]json.RawMessage{"a": nil, "b": nil}}
	want := "shard 2 of 5: 1 sampling run and 2 other results recorded in " + filepath.Join("out", FileName)
	if got := st.Recorded("out"); got != want {
		t.Errorf("Recorded:\n%q\nwant\n%q", got, want)
	}
}
