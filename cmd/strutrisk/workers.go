package main

import "runtime"

// maxWorkers is the largest --workers: 16 goroutines per core, and at
// least 64. More only costs memory (each worker keeps its own buffers):
// results do not depend on the number of workers.
func maxWorkers() int {
	return max(64, 16*runtime.NumCPU())
}
