package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strconv"
	"strings"

	"strutrisk/internal/analysis"
	"strutrisk/internal/outdir"
	"strutrisk/internal/progress"
	"strutrisk/internal/shardstate"
	"strutrisk/sim"
)

// shardSpec returns the shard index and count of o: from --shard K/N, or
// with --shard env or --shard-count from the scheduler's environment.
func shardSpec(o *runOptions, getenv func(string) string) (k, n int, err error) {
	if o.shard != "" && o.shard != "env" {
		if o.set["shard-count"] {
			return 0, 0, fmt.Errorf("--shard-count goes with --shard env (or no --shard), not with --shard %s", o.shard)
		}
		a, b, ok := strings.Cut(o.shard, "/")
		k, err1 := strconv.Atoi(a)
		n, err2 := strconv.Atoi(b)
		if !ok || err1 != nil || err2 != nil {
			return 0, 0, fmt.Errorf("--shard %q: give K/N, e.g. 3/64 (K from 0 to N-1), or env", o.shard)
		}
		return k, n, checkShard(k, n, "--shard")
	}
	if id := getenv("SLURM_ARRAY_TASK_ID"); id != "" && !o.set["shard-count"] {
		k, err1 := strconv.Atoi(id)
		n, err2 := strconv.Atoi(getenv("SLURM_ARRAY_TASK_COUNT"))
		if err1 != nil || err2 != nil {
			return 0, 0, fmt.Errorf("SLURM_ARRAY_TASK_ID %q and SLURM_ARRAY_TASK_COUNT %q must be whole numbers", id, getenv("SLURM_ARRAY_TASK_COUNT"))
		}
		if m := getenv("SLURM_ARRAY_TASK_MIN"); m != "" {
			lo, err := strconv.Atoi(m)
			if err != nil {
				return 0, 0, fmt.Errorf("SLURM_ARRAY_TASK_MIN %q must be a whole number", m)
			}
			k -= lo // --array=1-64 counts from 1
		}
		return k, n, checkShard(k, n, "SLURM_ARRAY_TASK_ID (less SLURM_ARRAY_TASK_MIN) and SLURM_ARRAY_TASK_COUNT (submit the array as --array=0-(N-1), without a step)")
	}
	if id := getenv("JOB_COMPLETION_INDEX"); id != "" {
		k, err := strconv.Atoi(id)
		if err != nil {
			return 0, 0, fmt.Errorf("JOB_COMPLETION_INDEX %q must be a whole number", id)
		}
		n := o.shardCount
		if !o.set["shard-count"] {
			c := getenv("STRUTRISK_SHARD_COUNT")
			if n, err = strconv.Atoi(c); err != nil {
				return 0, 0, fmt.Errorf("JOB_COMPLETION_INDEX is set but not the number of shards: give --shard-count N or STRUTRISK_SHARD_COUNT (the Job's completions)")
			}
		}
		return k, n, checkShard(k, n, "JOB_COMPLETION_INDEX and the shard count")
	}
	return 0, 0, fmt.Errorf("--shard env (or --shard-count): neither SLURM_ARRAY_TASK_ID nor JOB_COMPLETION_INDEX is set; give --shard K/N")
}

func checkShard(k, n int, from string) error {
	if n < 1 || k < 0 || k >= n {
		return fmt.Errorf("%s: shard %d of %d: need N >= 1 and 0 <= K < N", from, k, n)
	}
	return nil
}

// runShardCmd runs one shard of the study and writes its state file.
func runShardCmd(o *runOptions, path string, l *analysis.Loaded, settings sim.Settings, stderr io.Writer) int {
	st := l.Study
	k, n, err := shardSpec(o, os.Getenv)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk run: %v\n", err)
		return exitInput
	}
	if settings.Method != sim.MonteCarlo && settings.Method != sim.LatinHypercube && settings.Method != sim.ConditionalQMC {
		fmt.Fprintf(stderr, "strutrisk: %s: method %s cannot be split into shards: its plan depends on its earlier results; give --method monte-carlo, latin-hypercube or conditional-qmc (their budget, samples, and conditional-qmc's replicates are fixed)\n", st.File, settings.Method)
		return exitInput
	}
	if o.json || o.requireTarget {
		fmt.Fprintf(stderr, "strutrisk run: --json and --require-target belong to strutrisk merge, not to a shard\n")
		return exitInput
	}
	abs, err := filepath.Abs(path)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInput
	}
	hash, err := shardstate.HashFile(abs)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInput
	}
	folder, code := prepareOutput(path, st, o.out, stderr)
	if code != exitOK {
		return code
	}
	defer folder.Close()
	bar := progress.New(stderr, drawsProgress(stderr, true))
	bar.OnStage = stageHook
	ctx, sigs, stop := withSignals(baseContext(), stderr, bar.Phase)
	defer stop()
	settings.Progress = bar.Update
	settings.Shard = &sim.Shard{Index: k, Count: n}
	err = analysis.RunShard(ctx, l, &settings, bar)
	bar.Done()
	if ctx.Err() != nil {
		fmt.Fprintf(stderr, "strutrisk: interrupted by %s: no shard state written\n", sigs.name())
		return sigs.code()
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %s: %v\n", st.File, err)
		return exitInternal
	}
	state := &shardstate.State{ToolVersion: version, Study: path, StudyAbs: abs, StudySHA256: hash, Shard: k, Shards: n,
		Settings: stateSettings(&settings), Runs: settings.Shard.Runs(), Notes: settings.Shard.Notes()}
	data, err := shardstate.Encode(state)
	if err == nil {
		_, err = folder.Commit([]outdir.File{{Name: shardstate.FileName, Data: data}})
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: the shard state was not written to %s: %v\n", folder.Path, err)
		return exitInternal
	}
	fmt.Fprintf(stderr, "strutrisk: shard %d of %d: %d sampling run%s and %d other result%s recorded in %s\n", k, n, len(state.Runs), plural(len(state.Runs)), len(state.Notes), plural(len(state.Notes)), filepath.Join(folder.Path, shardstate.FileName))
	return exitOK
}

// stateSettings are the sampling settings a shard records.
func stateSettings(s *sim.Settings) shardstate.Settings {
	return shardstate.Settings{Method: string(s.Method), Samples: s.Samples, Seed: s.Seed, TargetCoV: s.TargetCoV}
}
