package shardstate

import "testing"

// TestSpec checks where the shard index and count come from: --shard
// K/N, a Slurm array (less its minimum task id), a Kubernetes Indexed Job
// with the count given or in STRUTRISK_SHARD_COUNT; K outside 0..N-1 or
// nothing to go by is refused.
func TestSpec(t *testing.T) {
	for _, c := range []struct {
		shard string
		count int
		env   map[string]string
		k, n  int
		bad   bool
	}{
		{shard: "3/64", k: 3, n: 64},
		{shard: "64/64", bad: true},
		{shard: "3", bad: true},
		{shard: "env", env: map[string]string{"SLURM_ARRAY_TASK_ID": "5", "SLURM_ARRAY_TASK_COUNT": "8", "SLURM_ARRAY_TASK_MIN": "0"}, k: 5, n: 8},
		{shard: "env", env: map[string]string{"SLURM_ARRAY_TASK_ID": "8", "SLURM_ARRAY_TASK_COUNT": "8", "SLURM_ARRAY_TASK_MIN": "1"}, k: 7, n: 8},
		{count: 16, env: map[string]string{"JOB_COMPLETION_INDEX": "15"}, k: 15, n: 16},
		{shard: "env", env: map[string]string{"JOB_COMPLETION_INDEX": "2", "STRUTRISK_SHARD_COUNT": "4"}, k: 2, n: 4},
		{shard: "env", env: map[string]string{"JOB_COMPLETION_INDEX": "2"}, bad: true},
		{shard: "env", bad: true},
	} {
		k, n, err := Spec(c.shard, c.count, c.count != 0, func(s string) string { return c.env[s] })
		if (err != nil) != c.bad || (!c.bad && (k != c.k || n != c.n)) {
			t.Errorf("--shard %q --shard-count %d %v: got %d/%d, %v", c.shard, c.count, c.env, k, n, err)
		}
	}
}
