package analysis

import (
	"context"
	"encoding/json"
	"reflect"
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestSystemShardStop checks the joint sample split into shards: the
// merge's counts equal a single run's, and each shard notes only the
// blocks a merge can need. The generated members (pf of the system near
// 0.95) are resolved after one block; with analysis.target_cov 0 (never
// resolved) every block of the budget is noted, once.
func TestSystemShardStop(t *testing.T) {
	sys, nShared := planSystem(t, benchInventory, generatedMembers(30))
	const maxN, seed = 40_000, 9 // 40 blocks
	cases := []struct {
		name   string
		cov    float64
		blocks int // noted over all shards
	}{
		{"resolved after a block", 0.05, 1},
		{"never resolved", 0, 40},
	}
	for _, c := range cases {
		single := sampleSystem(context.Background(), sys, nShared, maxN, c.cov, seed, 2)
		for _, n := range []int{1, 3, 7, 64} {
			var notes []map[string]json.RawMessage
			for k := range n {
				s := &sim.Settings{Workers: 2, Shard: &sim.Shard{Index: k, Count: n}}
				if _, err := jointSample(context.Background(), sys, nShared, maxN, c.cov, seed, s); err != nil {
					t.Fatal(err)
				}
				notes = append(notes, s.Shard.Notes())
			}
			all, err := sim.CombineNotes(notes)
			if err != nil {
				t.Fatal(err)
			}
			noted := 0
			for key := range all {
				if strings.HasPrefix(key, "inventory/system/block/") {
					noted++
				}
			}
			replay, err := sim.NewReplay(nil)
			if err != nil {
				t.Fatal(err)
			}
			replay.SetNotes(all)
			merged, err := jointSample(context.Background(), sys, nShared, maxN, c.cov, seed, &sim.Settings{Workers: 2, Shard: replay})
			if err != nil {
				t.Fatal(err)
			}
			if !reflect.DeepEqual(merged, single) || noted != c.blocks {
				t.Errorf("%s, %d shards: merged %d samples, %d failures (%d blocks noted); single %d, %d (want %d blocks)",
					c.name, n, merged.n, merged.failures, noted, single.n, single.failures, c.blocks)
			}
		}
	}
}
