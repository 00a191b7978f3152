package analysis

import (
	"context"
	"fmt"

	"strutrisk/sim"
)

// RunShard runs one shard of a split run of the study of l: the sampling
// of the main run and of every sweep and variant case, each limited to the
// shard's blocks by s.Shard, which records them. The steps that follow
// from the merged estimates (FORM, sensitivities, reserve factor, life)
// are left to the merge, which runs the whole pipeline on the recorded
// blocks. s.Method must be monte-carlo or latin-hypercube.
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
	if ctx.Err() == nil {
		runCases(ctx, l, s, obs)
	}
	return ctx.Err()
}
