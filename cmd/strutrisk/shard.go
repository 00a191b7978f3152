package main

import (
	"fmt"
	"io"
	"os"

	"strutrisk/internal/analysis"
	"strutrisk/internal/outdir"
	"strutrisk/internal/shardstate"
	"strutrisk/sim"
)

// runShardCmd runs one shard of the study and writes its state file.
func runShardCmd(o *runOptions, path string, l *analysis.Loaded, settings sim.Settings, stderr io.Writer) int {
	st := l.Study
	k, n, err := shardstate.Spec(o.shard, o.shardCount, o.set["shard-count"], os.Getenv)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk run: %v\n", err)
		return exitInput
	}
	if !sim.Shardable(settings.Method) {
		fmt.Fprintf(stderr, "strutrisk: %s: method %s cannot be split into shards: its plan depends on its earlier results; give --method monte-carlo, latin-hypercube or conditional-qmc (their budget, samples, and conditional-qmc's replicates are fixed)\n", st.File, settings.Method)
		return exitInput
	}
	if o.json || o.requireTarget {
		fmt.Fprintf(stderr, "strutrisk run: --json and --require-target belong to strutrisk merge, not to a shard\n")
		return exitInput
	}
	id, err := shardstate.Identify(path, st.InventoryPath())
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInput
	}
	folder, err := l.PrepareOutput(path, o.out)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInput
	}
	defer folder.Close()
	bar, ctx, sigs, stop := startRun(stderr, true)
	defer stop()
	settings.Progress = bar.Update
	settings.Shard = &sim.Shard{Index: k, Count: n}
	err = analysis.RunShard(ctx, l, &settings, bar)
	bar.Done()
	if ctx.Err() != nil {
		fmt.Fprintf(stderr, "strutrisk: interrupted by %s: no shard state written\n", sigs.Name())
		return interruptedStatus(sigs)
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %s: %v\n", st.File, err)
		return exitInternal
	}
	state := shardstate.Record(version, id, &settings)
	data, err := shardstate.Encode(state)
	if err == nil {
		_, err = folder.Commit([]outdir.File{{Name: shardstate.FileName, Data: data}})
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: the shard state was not written to %s: %v\n", folder.Path, err)
		return exitInternal
	}
	fmt.Fprintf(stderr, "strutrisk: %s\n", state.Recorded(folder.Path))
	return exitOK
}
