package sim

import (
	"context"
	"crypto/sha256"
	"encoding/binary"
	"encoding/hex"
	"fmt"
	"math"
	"strconv"
)

// A conditional (quasi-)Monte Carlo run split into shards: its work units
// (chunks of qmcChunk points of one replicate, deterministic by seed,
// replicate and chunk) are shared out by their global index; a shard
// evaluates its units of the whole budget (target_cov does not stop it)
// and notes their sums; a replay takes the sums from the notes and
// stops where a single run stops. Unit 0 is evaluated by every shard and
// by the replay: its sum, with the seed, replicates and budget, keys the
// run, as block 0 keys a crude run.

// cqmcNote is what one shard notes of a conditional run: the global
// indices of its units and their sums.
type cqmcNote struct {
	Shards int     `json:"shards"`
	Units  []int64 `json:"units"`
	Sums   []Bits  `json:"sums"`
}

// cqmcShard is a conditional run's part in a split run or its replay; nil
// when the run is not split.
type cqmcShard struct {
	sh    *Shard
	key   string
	unit0 float64
	have  map[int64]float64 // replay: the noted sums by global index
	note  cqmcNote          // split: this shard's units
}

// shardOf evaluates unit 0 and returns the run's part in s.Shard, nil
// when s splits and replays nothing.
func (pl *cqmcPlan) shardOf(ctx context.Context, s *Settings, qmc bool, n0 int64) (*cqmcShard, error) {
	if s.Shard == nil || ctx.Err() != nil {
		return nil, nil
	}
	u0 := pl.sum(pl.newWorker(), cqmcUnit{size: int(min(qmcChunk, n0))})
	h := sha256.New()
	put := func(u uint64) { h.Write(binary.LittleEndian.AppendUint64(nil, u)) }
	h.Write([]byte(ConditionalQMC))
	if qmc {
		put(1)
	}
	for _, u := range []uint64{pl.seed, uint64(pl.R), uint64(pl.maxN), uint64(pl.nvar), uint64(pl.nsob), uint64(pl.idx), math.Float64bits(u0)} {
		put(u)
	}
	cs := &cqmcShard{sh: s.Shard, key: "conditional-qmc/" + hex.EncodeToString(h.Sum(nil)[:16]), unit0: u0}
	if !s.Shard.Replays() {
		cs.note.Shards = s.Shard.Count
		return cs, nil
	}
	var first cqmcNote
	if ok, err := s.Shard.Recall(cs.key+"/0", &first); !ok || err != nil {
		return cs, err // not split: evaluated here
	}
	cs.have = map[int64]float64{}
	for k := range first.Shards {
		var n cqmcNote
		ok, err := s.Shard.Recall(cs.key+"/"+strconv.Itoa(k), &n)
		if !ok || err != nil || len(n.Units) != len(n.Sums) {
			return nil, fmt.Errorf("sim: conditional-qmc run %s: shard %d of %d left no record of it (%v)", cs.key, k, first.Shards, err)
		}
		for i, g := range n.Units {
			cs.have[g] = float64(n.Sums[i])
		}
	}
	return cs, nil
}

// take returns the sum of unit g when cs holds it (take true); a unit of
// another shard is taken as 0.
func (cs *cqmcShard) take(g int64) (sum float64, take bool, err error) {
	switch {
	case cs == nil:
		return 0, false, nil
	case g == 0:
		return cs.unit0, true, nil
	case cs.sh.Splits():
		return 0, !cs.sh.Owns(int(g)), nil
	case cs.have != nil:
		v, ok := cs.have[g]
		if !ok {
			return 0, false, fmt.Errorf("sim: conditional-qmc run %s: unit %d is in no shard's record", cs.key, g)
		}
		return v, true, nil
	}
	return 0, false, nil
}

// keep adds the evaluated units, when cs splits, to its note; shard 0
// adds unit 0 too.
func (cs *cqmcShard) keep(pl *cqmcPlan, done []cqmcUnit, sums [][]float64) {
	if cs == nil || !cs.sh.Splits() {
		return
	}
	if cs.sh.Index == 0 && len(cs.note.Units) == 0 {
		cs.note.Units, cs.note.Sums = append(cs.note.Units, 0), append(cs.note.Sums, Bits(cs.unit0))
	}
	for _, u := range done {
		cs.note.Units = append(cs.note.Units, pl.global(u))
		cs.note.Sums = append(cs.note.Sums, Bits(sums[u.r][u.slot]))
	}
}

// finish notes the shard's units of the run.
func (cs *cqmcShard) finish(ctx context.Context) error {
	if cs == nil || !cs.sh.Splits() || ctx.Err() != nil {
		return nil
	}
	if cs.note.Units == nil {
		cs.note.Units, cs.note.Sums = []int64{}, []Bits{}
	}
	return cs.sh.Note(cs.key+"/"+strconv.Itoa(cs.sh.Index), cs.note)
}
