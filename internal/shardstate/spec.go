package shardstate

import (
	"fmt"
	"strconv"
	"strings"
)

// Spec returns the shard index k (from 0) and count n of a split run:
// from flag "K/N" (the run command's --shard), or, when flag is "env" or
// "", from the scheduler's environment read by getenv: a Slurm job array
// (SLURM_ARRAY_TASK_ID, SLURM_ARRAY_TASK_COUNT, less
// SLURM_ARRAY_TASK_MIN) unless count is given, else a Kubernetes Indexed
// Job (JOB_COMPLETION_INDEX) with count, when given (--shard-count),
// else STRUTRISK_SHARD_COUNT. The errors name the flag or variable to fix.
func Spec(flag string, count int, countGiven bool, getenv func(string) string) (k, n int, err error) {
	if flag != "" && flag != "env" {
		if countGiven {
			return 0, 0, fmt.Errorf("--shard-count goes with --shard env (or no --shard), not with --shard %s", flag)
		}
		a, b, ok := strings.Cut(flag, "/")
		k, err1 := strconv.Atoi(a)
		n, err2 := strconv.Atoi(b)
		if !ok || err1 != nil || err2 != nil {
			return 0, 0, fmt.Errorf("--shard %q: give K/N, e.g. 3/64 (K from 0 to N-1), or env", flag)
		}
		return k, n, checkSpec(k, n, "--shard")
	}
	if id := getenv("SLURM_ARRAY_TASK_ID"); id != "" && !countGiven {
		return slurmSpec(id, getenv)
	}
	if id := getenv("JOB_COMPLETION_INDEX"); id != "" {
		k, err := strconv.Atoi(id)
		if err != nil {
			return 0, 0, fmt.Errorf("JOB_COMPLETION_INDEX %q must be a whole number", id)
		}
		n := count
		if !countGiven {
			c := getenv("STRUTRISK_SHARD_COUNT")
			if n, err = strconv.Atoi(c); err != nil {
				return 0, 0, fmt.Errorf("JOB_COMPLETION_INDEX is set but not the number of shards: give --shard-count N or STRUTRISK_SHARD_COUNT (the Job's completions)")
			}
		}
		return k, n, checkSpec(k, n, "JOB_COMPLETION_INDEX and the shard count")
	}
	return 0, 0, fmt.Errorf("--shard env (or --shard-count): neither SLURM_ARRAY_TASK_ID nor JOB_COMPLETION_INDEX is set; give --shard K/N")
}

// slurmSpec is the shard of a Slurm array task id.
func slurmSpec(id string, getenv func(string) string) (k, n int, err error) {
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
	return k, n, checkSpec(k, n, "SLURM_ARRAY_TASK_ID (less SLURM_ARRAY_TASK_MIN) and SLURM_ARRAY_TASK_COUNT (submit the array as --array=0-(N-1), without a step)")
}

// checkSpec refuses a shard k of n that is not one of 0..n-1; from names
// where k and n came from.
func checkSpec(k, n int, from string) error {
	if n < 1 || k < 0 || k >= n {
		return fmt.Errorf("%s: shard %d of %d: need N >= 1 and 0 <= K < N", from, k, n)
	}
	return nil
}
