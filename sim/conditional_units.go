package sim

import (
	"context"
	"math/bits"
	"sync"
	"sync/atomic"
)

// cqmcPlan is what every work unit of a conditional run shares.
type cqmcPlan struct {
	m               *Model
	t               *Transform
	seed            uint64
	idx, nvar, nsob int
	dj              Dist
	rest            []int // the inputs other than the Linear one
	dirs            [][32]uint32
	seeds           [][]uint32 // scrambling seeds per replicate and dimension
	R               int        // replicates
	maxN            int64      // points per replicate at most
}

// cqmcUnit is one work unit: points start..start+size-1 of replicate r;
// its sum goes to slot of the replicate's chunk sums.
type cqmcUnit struct {
	r     int
	start int64
	size  int
	slot  int
}

// global is the index of unit u among every unit of the run, in the
// order chunk by chunk, replicate by replicate.
func (pl *cqmcPlan) global(u cqmcUnit) int64 {
	return u.start/qmcChunk*int64(pl.R) + int64(u.r)
}

// cqmcWorker holds one worker's buffers.
type cqmcWorker struct {
	x, p, z []float64
	cur     []uint32
	rng     *blockRNG
}

func (pl *cqmcPlan) newWorker() *cqmcWorker {
	return &cqmcWorker{x: make([]float64, pl.nvar), p: make([]float64, pl.nvar), z: make([]float64, pl.nvar),
		cur: make([]uint32, pl.nsob), rng: newBlockRNG()}
}

// sum is the sum over the points of unit u of the conditional failure
// probability.
func (pl *cqmcPlan) sum(w *cqmcWorker, u cqmcUnit) float64 {
	x, p, z, cur := w.x, w.p, w.z, w.cur
	idx, dirs, dj := pl.idx, pl.dirs, pl.dj
	w.rng.seed(pl.seed, streamQMC, uint64(u.r)<<32|uint64(u.start/qmcChunk))
	sum := 0.0
	p[idx], x[idx] = 0.5, dj.Quantile(0.5) // ignored by Split
	for j := range cur {
		cur[j] = sobolAt(&dirs[j], uint32(u.start))
	}
	for i := 0; i < u.size; i++ {
		if i > 0 {
			// Gray-code order: point i differs from point i-1 by the
			// direction number of its lowest set bit.
			c := bits.TrailingZeros32(uint32(u.start) + uint32(i))
			for j := range cur {
				cur[j] ^= dirs[j][c]
			}
		}
		for j, dim := range pl.rest {
			if j < pl.nsob {
				p[dim] = toUnit(owenScramble(cur[j], pl.seeds[u.r][j]))
			} else {
				p[dim] = uniformOpen(w.rng.r)
			}
		}
		pl.t.fromUniform(x, p, z, idx)
		h, c := pl.m.Linear.Split(x)
		sum += conditionalProb(dj, h, c)
	}
	return sum
}

// evaluate fills sums with the sum of each of units: taken from sh when
// it holds it (a replay, and unit 0 of a split or replayed run), left 0
// for a unit of another shard, else evaluated on workers.
func (pl *cqmcPlan) evaluate(ctx context.Context, workers int, units []cqmcUnit, sums [][]float64, sh *cqmcShard) error {
	todo := units[:0:0]
	for _, u := range units {
		v, take, err := sh.take(pl.global(u))
		if err != nil {
			return err
		}
		if take {
			sums[u.r][u.slot] = v
			continue
		}
		todo = append(todo, u)
	}
	var next atomic.Int64
	var wg sync.WaitGroup
	for range min(workers, len(todo)) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			w := pl.newWorker()
			for {
				k := int(next.Add(1) - 1)
				if k >= len(todo) || ctx.Err() != nil {
					return
				}
				u := todo[k]
				sums[u.r][u.slot] = pl.sum(w, u)
			}
		}()
	}
	wg.Wait()
	if ctx.Err() == nil {
		sh.keep(pl, todo, sums)
	}
	return nil
}
