package analysis

import (
	"context"
	"fmt"

	"strutrisk/sim"
)

// RunShard runs one shard of a split run of the study of l: the sampling
// of the main run and of every sweep and variant case, each limited to the
// shard's blocks by s.Shard, which records them; shard 0 notes the
// study's FORM result; the inventory members the shard owns are run
// whole and noted, and its blocks of the inventory's joint sample
// (inventory_shard.go). The steps that follow from the merged estimates
// (sensitivities, reserve factor, life) are left to the merge, which
// runs the whole pipeline on the recorded blocks and notes. s.Method
// must be monte-carlo, latin-hypercube or conditional-qmc.
func RunShard(ctx context.Context, l *Loaded, s *sim.Settings, obs Observer) error {
	if s.Shard == nil || s.Shard.Count <= 0 {
		return fmt.Errorf("analysis: RunShard needs a shard")
	}
	if obs == nil {
		obs = quiet{}
	}
	obs.Stage(fmt.Sprintf("shard %d of %d (%s)", s.Shard.Index, s.Shard.Count, s.Method))
	if _, err := sim.Run(ctx, l.Model.Sim, s); err != nil {
		return err
	}
	// The study's FORM: noted by shard 0 for the merge, and run by every
	// shard of an inventory, whose members' reserve factors follow it.
	var main *sim.FORMResult
	if len(l.Model.Sim.Vars) > 0 && ctx.Err() == nil && (s.Shard.Index == 0 || l.Study.Inventory != nil) {
		obs.Stage("FORM")
		main, _ = studyFORM(ctx, l, s)
	}
	if ctx.Err() == nil {
		runCases(ctx, l, s, obs)
	}
	if ctx.Err() == nil && l.Study.Inventory != nil {
		obs.Stage("inventory members (this shard's)")
		if err := shardInventory(ctx, l, s, main, obs); err != nil {
			return err
		}
	}
	return ctx.Err()
}
