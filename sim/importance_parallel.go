package sim

import (
	"context"
	"runtime"
	"sync"
	"sync/atomic"
)

// Random streams of the rare-event estimators (apart from those of rng.go).
const (
	streamImportance uint64 = 0x49
	streamSubset     uint64 = 0x53
)

// rareParallel computes the units 0..n-1 with work(w, i) on up to workers
// goroutines (w identifies the goroutine, for its scratch memory) and hands
// them to merge in index order, in the calling goroutine. merge returns
// false to stop: the units after it are not merged (some may have been
// computed). Because every unit draws from its own generator and merging
// follows the index order, the merged result does not depend on the number
// of workers. rareParallel returns the number of merged units and whether
// ctx ended the run early.
func rareParallel(ctx context.Context, workers, n int, work func(w, i int), merge func(i int) bool) (merged int, cancelled bool) {
	if n <= 0 {
		return 0, false
	}
	workers = max(1, min(workers, n))
	var (
		next atomic.Int64
		stop atomic.Bool
		wg   sync.WaitGroup
	)
	done := make(chan int, n)
	for w := 0; w < workers; w++ {
		wg.Add(1)
		go func(w int) {
			defer wg.Done()
			for !stop.Load() && ctx.Err() == nil {
				i := int(next.Add(1) - 1)
				if i >= n {
					return
				}
				work(w, i)
				done <- i
			}
		}(w)
	}
	ready := make([]bool, n)
	stopped := false
	for merged < n && !stopped && !cancelled {
		select {
		case i := <-done:
			ready[i] = true
		case <-ctx.Done():
			cancelled = true
			continue
		}
		for merged < n && ready[merged] {
			ok := merge(merged)
			merged++
			if !ok {
				stopped = true
				break
			}
		}
	}
	stop.Store(true)
	wg.Wait()
	return merged, cancelled
}

// rareDefaults returns the settings of the rare-event estimators with zero
// fields set to their defaults (the same as Run's).
func rareDefaults(s *Settings) Settings {
	var c Settings
	if s != nil {
		c = *s
	}
	if c.Samples <= 0 {
		c.Samples = DefaultSamples
	}
	if c.Workers <= 0 {
		c.Workers = runtime.NumCPU()
	}
	if c.Confidence <= 0 || c.Confidence >= 1 {
		c.Confidence = DefaultConfidence
	}
	return c
}
