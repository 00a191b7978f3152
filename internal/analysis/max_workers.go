package analysis

import "runtime"

// MaxWorkers is the largest number of worker goroutines a run takes: 16
// per core, and at least 64. More only costs memory (each worker keeps
// its own buffers): results do not depend on the number of workers.
func MaxWorkers() int {
	return max(64, 16*runtime.NumCPU())
}
