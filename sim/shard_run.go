package sim

import (
	"context"
	"fmt"
)

// sharding reports whether s runs one shard of a split run.
func sharding(s *Settings) bool { return s.Shard != nil && s.Shard.Count > 0 }

// rest evaluates, records or replays the blocks after block 0 and merges
// them in block order.
func (e *crudeEngine) rest(ctx context.Context, s *Settings, method Method, blk0 *crudeBlock, nb int, merge func(*crudeBlock), done *bool) error {
	if *done || nb <= 1 || ctx.Err() != nil {
		if sharding(s) && ctx.Err() == nil {
			s.Shard.record(&ShardRun{Key: e.shardKey(method, blk0), Blocks: nb, Done: []ShardBlock{}})
		}
		return nil
	}
	sh := s.Shard
	if sh == nil {
		e.parallel(ctx, s.Workers, blocksFrom(1, nb, nil), merge, done)
		return nil
	}
	key := e.shardKey(method, blk0)
	if sh.Count > 0 {
		run := &ShardRun{Key: key, Blocks: nb, Done: []ShardBlock{}}
		record := func(blk *crudeBlock) {
			run.Done = append(run.Done, e.toShard(blk))
			merge(blk)
		}
		e.parallel(ctx, s.Workers, blocksFrom(1, nb, sh), record, done)
		if ctx.Err() == nil {
			sh.record(run)
		}
		return nil
	}
	run := sh.lookup(key)
	if run == nil {
		// Not recorded by the shards (a run whose plan followed the
		// merged result): evaluate it here.
		e.parallel(ctx, s.Workers, blocksFrom(1, nb, nil), merge, done)
		return nil
	}
	if run.Blocks != nb {
		return fmt.Errorf("sim: the recorded run %s has %d blocks, this run %d", key, run.Blocks, nb)
	}
	blk := e.newBlock()
	for i := range run.Done {
		if *done || ctx.Err() != nil {
			break
		}
		if err := e.fromShard(&run.Done[i], blk); err != nil {
			return err
		}
		merge(blk)
	}
	return nil
}

// blocksFrom lists the blocks first..nb-1, only those of sh when sh
// splits the run.
func blocksFrom(first, nb int, sh *Shard) []int {
	todo := make([]int, 0, nb-first)
	for b := first; b < nb; b++ {
		if sh == nil || sh.owns(b) {
			todo = append(todo, b)
		}
	}
	return todo
}
