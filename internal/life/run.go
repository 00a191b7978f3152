package life

import (
	"context"
	"math"
	"math/rand/v2"
	"runtime"
	"sync"
	"sync/atomic"

	"strutrisk/sim"
)

// blockSize is the number of paths drawn from one random stream. Blocks
// are summed in their order, so the numbers do not depend on the number
// of workers.
const blockSize = 256

// Run follows the paths of p through the years and returns the
// reliability at each of p.Ends. It stops early, with ctx's error, when
// ctx is done.
func Run(ctx context.Context, p Problem) (Result, error) {
	if err := p.check(); err != nil {
		return Result{}, err
	}
	var tr *sim.Transform
	if len(p.Vars) > 0 {
		var err error
		if tr, err = sim.NewTransform(&sim.Model{Vars: p.Vars, Corr: p.Corr}); err != nil {
			return Result{}, err
		}
	}
	n := len(p.Ends)
	nb := (p.Paths + blockSize - 1) / blockSize
	acc := make([]float64, nb*n*4)
	workers := p.Workers
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	workers = min(workers, nb)
	var next atomic.Int64
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			w := newWalker(&p, tr)
			for {
				b := int(next.Add(1) - 1)
				if b >= nb || ctx.Err() != nil {
					return
				}
				w.block(b, acc[b*n*4:(b+1)*n*4])
			}
		}()
	}
	wg.Wait()
	if err := ctx.Err(); err != nil {
		return Result{}, err
	}
	return summarise(&p, acc), nil
}

// summarise adds the blocks' sums in block order and turns them into
// points.
func summarise(p *Problem, acc []float64) Result {
	n := len(p.Ends)
	tot := make([]float64, n*4)
	for b := 0; b < len(acc); b += n * 4 {
		for i := range tot {
			tot[i] += acc[b+i]
		}
	}
	r := Result{Paths: p.Paths}
	if e := exactIndex(p.Annual); e >= 0 {
		r.Exact = p.Annual[e].Name
		for i, a := range p.Annual {
			if i != e {
				r.Sampled = append(r.Sampled, a.Name)
			}
		}
	}
	N := float64(p.Paths)
	for k, end := range p.Ends {
		s := tot[4*k : 4*k+4]
		pf, cov := meanCoV(s[0], s[1], N)
		cpf, ccov := meanCoV(s[2], s[3], N)
		r.Points = append(r.Points, Point{
			Year: end, Pf: pf, Beta: sim.BetaFromPf(pf), CoV: cov,
			PfCumulative: cpf, BetaCumulative: sim.BetaFromPf(cpf), CoVCumulative: ccov,
		})
	}
	return r
}

// meanCoV returns the mean of N values from their sum and sum of squares,
// and the coefficient of variation of that mean (+Inf when it is 0).
func meanCoV(sum, sum2, N float64) (mean, cov float64) {
	mean = sum / N
	v := (sum2/N - mean*mean) * N / (N - 1)
	if mean <= 0 {
		return mean, math.Inf(1)
	}
	return mean, math.Sqrt(max(v, 0)/N) / mean
}

// walker follows paths; each worker has its own.
type walker struct {
	p      *Problem
	tr     *sim.Transform
	exact  int
	u, x   []float64
	pcg    rand.PCG
	rng    *rand.Rand
	yearly bool // some annual maxima are sampled each year
}

func newWalker(p *Problem, tr *sim.Transform) *walker {
	w := &walker{p: p, tr: tr, exact: exactIndex(p.Annual)}
	w.u = make([]float64, len(p.Vars))
	w.x = make([]float64, len(p.Vars))
	w.rng = rand.New(&w.pcg)
	w.yearly = len(p.Annual) > 1
	return w
}

// seedWords derives the PCG seed of block b from the problem's seed.
func seedWords(seed uint64, b int) (uint64, uint64) {
	s := splitmix64(seed ^ splitmix64(uint64(b)+0x6c69666500000000))
	return s, splitmix64(s ^ 0x5851f42d4c957f2d)
}

// splitmix64 is the output function of Steele, Lea and Flood (2014),
// "Fast splittable pseudorandom number generators", OOPSLA.
func splitmix64(x uint64) uint64 {
	x += 0x9e3779b97f4a7c15
	x = (x ^ (x >> 30)) * 0xbf58476d1ce4e5b9
	x = (x ^ (x >> 27)) * 0x94d049bb133111eb
	return x ^ (x >> 31)
}

// block follows the paths of block b, adding to out, for each end k,
// the sums of the annual pf, its square, the cumulative pf and its
// square.
func (w *walker) block(b int, out []float64) {
	p := w.p
	w.pcg.Seed(seedWords(p.Seed, b))
	start := b * blockSize
	size := min(blockSize, p.Paths-start)
	for range size {
		for j := range w.u {
			w.u[j] = w.rng.NormFloat64()
		}
		if w.tr != nil {
			w.tr.ToX(w.x, w.u)
		}
		logS, prev := 0.0, 0
		for k, end := range p.Ends {
			h, c := p.Split(w.x, float64(end))
			var f float64
			if w.yearly {
				for y := prev + 1; y <= end; y++ {
					f = w.yearPf(h, c)
					logS += math.Log1p(-f)
				}
			} else {
				f = w.yearPf(h, c)
				logS += float64(end-prev) * math.Log1p(-f)
			}
			prev = end
			cum := -math.Expm1(logS)
			out[4*k] += f
			out[4*k+1] += f * f
			out[4*k+2] += cum
			out[4*k+3] += cum * cum
		}
	}
}

// yearPf is the probability that the path with limit state g = h - c S
// fails in one year, S the sum of that year's annual maxima: exact over
// the maxima of the load w.exact, the others drawn.
func (w *walker) yearPf(h, c float64) float64 {
	if math.IsNaN(h) || math.IsNaN(c) {
		return 1 // a member the mechanics could not evaluate has no capacity
	}
	if w.exact < 0 || !(c > 0) {
		if h >= 0 {
			return 0
		}
		return 1
	}
	thr := h / c
	for i, a := range w.p.Annual {
		if i != w.exact {
			thr -= a.Dist.FromStdNormal(w.rng.NormFloat64())
		}
	}
	return w.p.Annual[w.exact].Dist.Survival(thr)
}
