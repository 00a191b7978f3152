package sim

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"strings"
	"testing"
)

// shardModel is caseB with its outputs: lognormal R - S, a model with two
// outputs and a pf near 1e-2 (closed form in caseBBeta), so every block
// holds failures.
func shardModel() *Model {
	m := caseB()
	m.Outputs = []string{"R", "S"}
	return m
}

// runSharded runs s split into count shards, passes each shard's records
// through JSON as a state file would, and replays their union.
func runSharded(t *testing.T, m *Model, s Settings, count int) *Result {
	t.Helper()
	var all [][]*ShardRun
	for k := range count {
		cs := s
		cs.Shard = &Shard{Index: k, Count: count}
		if _, err := Run(context.Background(), m, &cs); err != nil {
			t.Fatalf("shard %d of %d: %v", k, count, err)
		}
		data, err := json.Marshal(cs.Shard.Runs())
		if err != nil {
			t.Fatal(err)
		}
		var back []*ShardRun
		if err := json.Unmarshal(data, &back); err != nil {
			t.Fatal(err)
		}
		all = append(all, back)
	}
	rep, err := NewReplay(CombineRuns(all))
	if err != nil {
		t.Fatal(err)
	}
	s.Shard = rep
	res, err := Run(context.Background(), m, &s)
	if err != nil {
		t.Fatal(err)
	}
	return res
}

// same says how two results differ, or "" when they are equal bit for bit
// (NaN equal to NaN).
func same(a, b *Result) string {
	ka, kb := *a.Kept, *b.Kept
	ca, cb := *a, *b
	ca.Kept, cb.Kept = nil, nil
	sa, sb := fmt.Sprintf("%+v", ca), fmt.Sprintf("%+v", cb)
	if sa != sb {
		return sa + "\n!=\n" + sb
	}
	if fmt.Sprintf("%v", ka) != fmt.Sprintf("%v", kb) {
		return "kept samples differ"
	}
	return ""
}

// TestShardMergeExact checks the contract of Shard: the replay of every
// shard's blocks is the single run, bit for bit, for any shard count,
// with and without a target CoV that stops sampling early.
func TestShardMergeExact(t *testing.T) {
	for _, c := range []struct {
		method  Method
		samples int64
		cov     float64
		keep    int
	}{
		{MonteCarlo, 200_000, 0, 0},
		{LatinHypercube, 200_000, 0, 0},
		{MonteCarlo, 300_000, 0.05, 0},      // stops after a few blocks
		{MonteCarlo, 100_000, 0, 20_000},    // kept rows beyond block 0
		{LatinHypercube, 8192 * 3, 0.01, 0}, // target not reached
	} {
		s := Settings{Method: c.method, Samples: c.samples, TargetCoV: c.cov, Seed: 7, Workers: 3, Keep: c.keep}
		single, err := Run(context.Background(), shardModel(), &s)
		if err != nil {
			t.Fatal(err)
		}
		for _, n := range []int{1, 3, 7, 64} {
			got := runSharded(t, shardModel(), s, n)
			if d := same(single, got); d != "" {
				t.Errorf("%s %d samples, target CoV %v, %d shards: merged differs from the single run:\n%s", c.method, c.samples, c.cov, n, d)
			}
		}
	}
}

// TestShardRefusesAdaptive checks that methods whose plan follows their
// own results are refused in shard mode.
func TestShardRefusesAdaptive(t *testing.T) {
	for _, m := range []Method{Auto, Importance, Subset, FORMMethod} { // conditional-qmc splits: conditional_shard_test.go
		s := Settings{Method: m, Samples: 10000, Shard: &Shard{Index: 0, Count: 2}}
		if _, err := Run(context.Background(), shardModel(), &s); !errors.Is(err, ErrNotShardable) {
			t.Errorf("%s: got %v, want ErrNotShardable", m, err)
		}
	}
}

// TestShardReplayMissing checks that a replay refuses runs with missing
// or doubled blocks.
func TestShardReplayMissing(t *testing.T) {
	r := &ShardRun{Key: "k", Blocks: 4, Done: []ShardBlock{{Index: 1}, {Index: 3}, {Index: 3}}}
	if _, err := NewReplay([]*ShardRun{r}); err == nil {
		t.Error("a run missing block 2 was accepted")
	}
}

// TestCombineNotes checks that notes of the shards are joined, a note
// made alike by two shards kept once, and notes that differ refused by
// key.
func TestCombineNotes(t *testing.T) {
	a := map[string]json.RawMessage{"form/main": json.RawMessage(`1`), "m/0": json.RawMessage(`2`)}
	b := map[string]json.RawMessage{"form/main": json.RawMessage(`1`), "m/1": json.RawMessage(`3`)}
	all, err := CombineNotes([]map[string]json.RawMessage{a, b})
	if err != nil || len(all) != 3 {
		t.Fatalf("got %v, %v", all, err)
	}
	rep := &Shard{}
	rep.SetNotes(all)
	var v int
	if ok, err := rep.Recall("m/1", &v); !ok || err != nil || v != 3 {
		t.Errorf("recalled %d, %v, %v", v, ok, err)
	}
	if ok, _ := rep.Recall("m/2", &v); ok {
		t.Error("recalled a note nobody made")
	}
	b["form/main"] = json.RawMessage(`4`)
	if _, err := CombineNotes([]map[string]json.RawMessage{a, b}); err == nil || !strings.Contains(err.Error(), "form/main") {
		t.Errorf("notes that differ: %v", err)
	}
}
