package analysis

import (
	"context"
	"fmt"
	"math"
	"sync"

	"strutrisk/sim"
)

// systemBlock is the number of joint samples drawn from one random
// stream; systemBatch is the largest number of blocks drawn between two
// looks at the counts (system_stop.go), so where sampling stops does not
// depend on the number of workers.
const (
	systemBlock = 1000
	systemBatch = 16
)

// systemMember is one member as the joint sampler sees it: its model, its
// transformation to standard normals and, for each of its variables, the
// index of the shared normal it takes (-1: its own); form is the FORM
// result of the member's estimate at its own loads (nil when its method
// ran none), for a first-order system that need not run it again.
type systemMember struct {
	m      *sim.Model
	t      *sim.Transform
	shared []int
	form   *sim.FORMResult
}

// systemCounts are the counts of a joint sample of the members.
type systemCounts struct {
	n, failures int64   // samples, samples in which a member failed
	members     []int64 // samples in which each member failed
	failing     int64   // failing members, summed over the samples
}

// add adds c to s.
func (s *systemCounts) add(c *systemCounts) {
	s.n += c.n
	s.failures += c.failures
	s.failing += c.failing
	for i, k := range c.members {
		s.members[i] += k
	}
}

// cov is the coefficient of variation of the estimate of the system's pf.
func (s *systemCounts) cov() float64 {
	if s.failures == 0 {
		return math.Inf(1)
	}
	p := float64(s.failures) / float64(s.n)
	return math.Sqrt((1 - p) / (p * float64(s.n)))
}

// sampleSystem draws the members jointly, each sample one normal per
// shared variable (nShared of them) and one per member variable that is
// not shared, until the counts are resolved (system_stop.go: the
// system's pf to a coefficient of variation of targetCoV, and the
// largest member's share) or maxN samples are drawn. Block b draws from
// a stream of (seed, b) only and the counts are looked at after blocks
// that depend on nothing else, so they are the same for any worker count.
func sampleSystem(ctx context.Context, ms []systemMember, nShared int, maxN int64, targetCoV float64, seed uint64, workers int) *systemCounts {
	total := &systemCounts{members: make([]int64, len(ms))}
	blocks := int((maxN + systemBlock - 1) / systemBlock)
	p := newSystemPlan(ms, nShared)
	for b0 := 0; b0 < blocks && ctx.Err() == nil; b0 = nextLook(b0) {
		b1 := min(nextLook(b0), blocks)
		res := drawBlocks(ctx, p, blockRange(b0, b1), maxN, seed, workers)
		if ctx.Err() != nil {
			break
		}
		for _, c := range res {
			total.add(c)
		}
		if resolved(total, targetCoV, b1) {
			break
		}
	}
	return total
}

// blockRange returns the blocks b0 to b1 - 1.
func blockRange(b0, b1 int) []int {
	bs := make([]int, 0, b1-b0)
	for b := b0; b < b1; b++ {
		bs = append(bs, b)
	}
	return bs
}

// drawBlocks draws the blocks bs of a joint sample of maxN samples on
// workers goroutines and returns their counts in the order of bs; when
// ctx ends some are left nil.
func drawBlocks(ctx context.Context, p *systemPlan, bs []int, maxN int64, seed uint64, workers int) []*systemCounts {
	res := make([]*systemCounts, len(bs))
	var wg sync.WaitGroup
	next := make(chan int)
	for range max(1, min(workers, len(bs))) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			w := p.worker()
			for j := range next {
				b := bs[j]
				res[j] = w.block(seed, uint64(b), min(int64(systemBlock), maxN-int64(b)*systemBlock))
			}
		}()
	}
	for j := range bs {
		if ctx.Err() != nil {
			break
		}
		next <- j
	}
	close(next)
	wg.Wait()
	return res
}

// sharedIndex maps each (shared input, group) to the index of its shared
// normal.
type sharedIndex map[[2]string]int

// of returns the index of the normal of key in group g, adding one.
func (si sharedIndex) of(key, g string) int {
	k := [2]string{key, g}
	if i, ok := si[k]; ok {
		return i
	}
	si[k] = len(si)
	return si[k]
}

// checkSharedCorrelation refuses a shared input correlated with an input
// not shared alike: one draw could not then be the same variable in every
// member.
func checkSharedCorrelation(t *sim.Transform, by map[string]string) error {
	vs := t.Vars()
	for i := range vs {
		for j := range vs {
			if i == j || t.NormalCorrelation(i, j) == 0 {
				continue
			}
			bi, si := by[vs[i].Name]
			bj, sj := by[vs[j].Name]
			if (si || sj) && (!si || !sj || bi != bj) {
				return fmt.Errorf("%s is shared and correlated with %s, which is not shared alike: share both by the same column or \"all\"", pick(si, vs[i].Name, vs[j].Name), pick(si, vs[j].Name, vs[i].Name))
			}
		}
	}
	return nil
}

func pick(c bool, a, b string) string {
	if c {
		return a
	}
	return b
}
