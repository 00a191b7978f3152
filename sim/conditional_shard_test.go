package sim

import (
	"context"
	"encoding/json"
	"fmt"
	"testing"
)

// runShardedNotes runs s split into count shards, passes each shard's
// notes through JSON as a state file would, and replays their union.
func runShardedNotes(t *testing.T, m *Model, s Settings, count int) *Result {
	t.Helper()
	var all []map[string]json.RawMessage
	for k := range count {
		cs := s
		cs.Shard = &Shard{Index: k, Count: count}
		if _, err := Run(context.Background(), m, &cs); err != nil {
			t.Fatalf("shard %d of %d: %v", k, count, err)
		}
		data, err := json.Marshal(cs.Shard.Notes())
		if err != nil {
			t.Fatal(err)
		}
		var back map[string]json.RawMessage
		if err := json.Unmarshal(data, &back); err != nil {
			t.Fatal(err)
		}
		all = append(all, back)
	}
	notes, err := CombineNotes(all)
	if err != nil {
		t.Fatal(err)
	}
	rep, err := NewReplay(nil)
	if err != nil {
		t.Fatal(err)
	}
	rep.SetNotes(notes)
	s.Shard = rep
	res, err := Run(context.Background(), m, &s)
	if err != nil {
		t.Fatal(err)
	}
	return res
}

// TestConditionalQMCShardExact checks that conditional QMC split into
// shards by its work units (replicate and chunk) and replayed is the
// single run bit for bit, with a fixed budget and with a target CoV that
// stops it early, for shard counts below and above the number of units;
// and that a replay missing a shard's record is refused.
func TestConditionalQMCShardExact(t *testing.T) {
	m, _ := lnProduct()
	for _, c := range []struct {
		samples int64
		cov     float64
		reps    int
	}{
		{1 << 17, 0, 0},     // 8 replicates (the default) of 2^14 points
		{1 << 18, 0.02, 0},  // stops before the budget
		{5 << 12, 0, 5},     // 5 replicates of 4096 points
		{1 << 11, 0, 0},     // fewer points than a chunk per replicate
		{1 << 16, 0.05, 12}, // more replicates than shards below
	} {
		s := Settings{Method: ConditionalQMC, Samples: c.samples, TargetCoV: c.cov, Seed: 7, Replicates: c.reps, Workers: 2, AuxSamples: -1}
		single, err := Run(context.Background(), m, &s)
		if err != nil {
			t.Fatal(err)
		}
		for _, n := range []int{1, 3, 7, 200} {
			got := runShardedNotes(t, m, s, n)
			if d := sameCQMC(single, got); d != "" {
				t.Errorf("samples %d, cov %g, replicates %d, %d shards: %s", c.samples, c.cov, c.reps, n, d)
			}
		}
	}
	// A shard's record missing: refused, not evaluated in silence.
	s := Settings{Method: ConditionalQMC, Samples: 1 << 16, Seed: 7, AuxSamples: -1}
	var all []map[string]json.RawMessage
	for k := range 3 {
		cs := s
		cs.Shard = &Shard{Index: k, Count: 3}
		if _, err := Run(context.Background(), m, &cs); err != nil {
			t.Fatal(err)
		}
		if k != 1 {
			all = append(all, cs.Shard.Notes())
		}
	}
	notes, _ := CombineNotes(all)
	rep, _ := NewReplay(nil)
	rep.SetNotes(notes)
	s.Shard = rep
	if _, err := Run(context.Background(), m, &s); err == nil {
		t.Error("a replay without shard 1's record was accepted")
	}
}

// sameCQMC says how two results differ, or "" when they print alike
// (%v prints a float64 by the shortest digits that read back to it).
func sameCQMC(a, b *Result) string {
	ca, cb := *a, *b
	ca.Kept, cb.Kept = nil, nil
	if sa, sb := fmt.Sprintf("%+v", ca), fmt.Sprintf("%+v", cb); sa != sb {
		return sa + "\n!=\n" + sb
	}
	return ""
}
