package sim

import (
	"context"
	"fmt"
	"sync"
	"sync/atomic"
)

// crudeEngine runs plain Monte Carlo or Latin hypercube sampling over the
// blocks of the sample index space. It also serves the auxiliary sample
// that describes the outputs for the other methods.
type crudeEngine struct {
	m       *Model
	t       *Transform
	lhs     bool
	seed    uint64
	stream  uint64
	n       int64 // budget of samples
	keep    int
	nvar    int
	nout    int
	layouts []statsLayout // per output, then g
	kept    [][]float64
}

// crudeBlock is the outcome of one block.
type crudeBlock struct {
	b     int
	n     int64
	fails int64
	stats []*streamStats // per output, then g
}

// crudeWorker holds the buffers of one goroutine.
type crudeWorker struct {
	rng     *blockRNG
	x, z, p []float64
	out     []float64
	perm    [][]int32
}

func (e *crudeEngine) newWorker() *crudeWorker {
	// One allocation with room on both sides, so that the buffers of two
	// workers never share a cache line.
	const pad = 16
	n := e.nvar
	buf := make([]float64, pad+3*n+e.nout+pad)[pad:]
	w := &crudeWorker{rng: newBlockRNG(), x: buf[:n:n], z: buf[n : 2*n : 2*n], p: buf[2*n : 3*n : 3*n]}
	if e.nout > 0 {
		w.out = buf[3*n : 3*n+e.nout : 3*n+e.nout]
	}
	if e.lhs {
		w.perm = make([][]int32, e.nvar)
		for j := range w.perm {
			w.perm[j] = make([]int32, blockSize)
		}
	}
	return w
}

func (e *crudeEngine) newBlock() *crudeBlock {
	blk := &crudeBlock{stats: make([]*streamStats, e.nout+1)}
	for i := range blk.stats {
		blk.stats[i] = newStreamStats()
	}
	return blk
}

// runBlock evaluates block blk.b. With pilot not nil the outputs and g are
// stored there (nout+1 values per sample) instead of being accumulated.
func (e *crudeEngine) runBlock(w *crudeWorker, blk *crudeBlock, pilot []float64) {
	start, size := blockRange(blk.b, e.n)
	blk.n, blk.fails = int64(size), 0
	for _, s := range blk.stats {
		s.reset()
	}
	w.rng.seed(e.seed, e.stream, uint64(blk.b))
	r := w.rng.r
	if e.lhs {
		latinPermutations(w.perm, size, r)
	}
	gs := blk.stats[e.nout]
	gl := &e.layouts[e.nout]
	var fails int64
	for i := 0; i < size; i++ {
		if e.lhs {
			inv := 1 / float64(size)
			for j := range w.p {
				w.p[j] = (float64(w.perm[j][i]) + uniformOpen(r)) * inv
			}
			e.t.fromUniform(w.x, w.p, w.z, -1)
		} else {
			e.t.drawX(w.x, w.z, r)
		}
		g := e.m.G(w.x, w.out)
		if g < 0 {
			fails++
		}
		if pilot != nil {
			row := pilot[i*(e.nout+1):]
			copy(row, w.out)
			row[e.nout] = g
		} else {
			for k, v := range w.out {
				blk.stats[k].add(&e.layouts[k], v)
			}
			gs.add(gl, g)
		}
		if idx := start + int64(i); idx < int64(len(e.kept)) {
			row := e.kept[idx]
			copy(row, w.x)
			copy(row[e.nvar:], w.out)
			row[e.nvar+e.nout] = g
		}
	}
	blk.fails = fails
}

// crudeTotals are the merged results of the first blocks.
type crudeTotals struct {
	blocks int
	n      int64
	fails  int64
	stats  []*streamStats
}

// run samples until the budget is spent, the target CoV is reached at a
// block boundary, or ctx is cancelled.
func (e *crudeEngine) run(ctx context.Context, s *Settings, method Method) (*Result, error) {
	e.nvar = e.t.Dim()
	e.nout = len(e.m.Outputs)
	keep := min(int64(max(s.Keep, 0)), e.n)
	e.kept = make([][]float64, keep)
	width := e.nvar + e.nout + 1
	for i := range e.kept {
		e.kept[i] = make([]float64, width)
	}
	nb := numBlocks(e.n)
	res := &Result{Method: method, Confidence: s.Confidence}
	tr := newTracer(s, res)

	// Block 0 is the pilot: it is evaluated first, alone, and fixes the
	// histogram ranges for every output.
	w0 := e.newWorker()
	blk0 := e.newBlock()
	blk0.b = 0
	_, size0 := blockRange(0, e.n)
	pilot := make([]float64, size0*(e.nout+1))
	e.layouts = make([]statsLayout, e.nout+1)
	e.runBlock(w0, blk0, pilot)
	col := make([]float64, size0)
	for k := 0; k <= e.nout; k++ {
		for i := range col {
			col[i] = pilot[i*(e.nout+1)+k]
		}
		e.layouts[k] = newLayout(col)
	}
	for i := 0; i < size0; i++ {
		for k := 0; k <= e.nout; k++ {
			blk0.stats[k].add(&e.layouts[k], pilot[i*(e.nout+1)+k])
		}
	}

	tot := &crudeTotals{stats: make([]*streamStats, e.nout+1)}
	for k := range tot.stats {
		tot.stats[k] = newStreamStats()
		tot.stats[k].reset()
	}
	progressEvery := max(1, nb/200)
	nextConv := 1
	done := false
	merge := func(blk *crudeBlock) {
		tot.blocks++
		tot.n += blk.n
		tot.fails += blk.fails
		for k, st := range blk.stats {
			tot.stats[k].merge(st)
		}
		pf := float64(tot.fails) / float64(tot.n)
		cov := binomialCoV(pf, tot.n)
		if tot.blocks == nextConv || tot.blocks == nb {
			ci := binomialInterval(tot.fails, tot.n, s.Confidence)
			tr.point(ConvergencePoint{Evaluations: tot.n, Pf: pf, PfCI: ci, PfCoV: cov})
			nextConv *= 2
		}
		if s.TargetCoV > 0 && tot.fails > 0 && cov <= s.TargetCoV && !sharding(s) {
			done = true
		}
		if tr.watching() && (tot.blocks%progressEvery == 0 || done || tot.blocks == nb) {
			tr.report(Progress{Done: tot.n, Total: e.n, Pf: pf, CoV: cov})
		}
	}
	merge(blk0)

	if err := e.rest(ctx, s, method, blk0, nb, merge, &done); err != nil {
		return nil, err
	}
	if tot.blocks < nb && !done && !sharding(s) {
		res.Incomplete = true
	}

	res.Evaluations = tot.n
	res.Failures = tot.fails
	res.Pf = float64(tot.fails) / float64(tot.n)
	res.PfCoV = binomialCoV(res.Pf, tot.n)
	res.PfCI = binomialInterval(tot.fails, tot.n, s.Confidence)
	res.Beta = BetaFromPf(res.Pf)
	res.BetaCI = BetaInterval(res.PfCI)
	if last := res.Convergence; len(last) == 0 || last[len(last)-1].Evaluations != tot.n {
		tr.point(ConvergencePoint{Evaluations: tot.n, Pf: res.Pf, PfCI: res.PfCI, PfCoV: res.PfCoV})
	}
	res.Outputs = e.outputs(tot.stats)
	if tot.fails == 0 && !res.Incomplete {
		// A point estimate of zero says little: state what the samples do show.
		res.boundStated = true
		res.Warnings = append(res.Warnings, fmt.Sprintf("no failure in %d samples: pf is only known to be below %.3g and beta above %.3g (the ends of their intervals); beta itself is unbounded; give more samples, or use importance or subset simulation", tot.n, res.PfCI[1], res.BetaCI[0]))
	}
	if nan := tot.stats[e.nout].nan; nan > 0 {
		res.Warnings = append(res.Warnings, fmt.Sprintf("the limit state was NaN for %d of %d samples; they were counted as safe", nan, tot.n))
	}
	if keep > tot.n {
		e.kept = e.kept[:tot.n]
	}
	res.Kept = &Samples{Names: e.names(), Rows: e.kept}
	if e.lhs && nb > 1 {
		res.Warnings = append(res.Warnings, "Latin hypercube: each block of samples is stratified on its own; the interval is the binomial one, which is conservative")
	}
	return res, nil
}

// parallel evaluates the blocks todo (ascending) on workers and merges
// them in that order, stopping when *done is set by merge or ctx is
// cancelled.
func (e *crudeEngine) parallel(ctx context.Context, workers int, todo []int, merge func(*crudeBlock), done *bool) {
	nb := len(todo)
	window := 4 * workers
	tokens := make(chan struct{}, window)
	for i := 0; i < window; i++ {
		tokens <- struct{}{}
	}
	free := make(chan *crudeBlock, window+workers)
	results := make(chan *crudeBlock, window+workers)
	var next atomic.Int64
	var stop atomic.Bool
	var wg sync.WaitGroup
	for k := 0; k < workers; k++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			w := e.newWorker()
			for {
				<-tokens
				i := int(next.Add(1) - 1)
				if i >= nb || stop.Load() || ctx.Err() != nil {
					return
				}
				b := todo[i]
				var blk *crudeBlock
				select {
				case blk = <-free:
				default:
					blk = e.newBlock()
				}
				blk.b = b
				e.runBlock(w, blk, nil)
				results <- blk
			}
		}()
	}
	go func() { wg.Wait(); close(results) }()
	pending := make(map[int]*crudeBlock)
	want := 0
	for blk := range results {
		pending[blk.b] = blk
		for !*done && !stop.Load() && want < nb {
			p, ok := pending[todo[want]]
			if !ok {
				break
			}
			delete(pending, todo[want])
			merge(p)
			want++
			select {
			case free <- p:
			default:
			}
			if *done || ctx.Err() != nil {
				stop.Store(true)
			}
			tokens <- struct{}{}
		}
		if stop.Load() {
			// Release any worker waiting for a token so it sees stop.
			for i := 0; i < workers; i++ {
				select {
				case tokens <- struct{}{}:
				default:
				}
			}
		}
	}
}

func (e *crudeEngine) names() []string {
	names := make([]string, 0, e.nvar+e.nout+1)
	for _, v := range e.m.Vars {
		names = append(names, v.Name)
	}
	names = append(names, e.m.Outputs...)
	return append(names, "g")
}

func (e *crudeEngine) outputs(st []*streamStats) []OutputStats {
	out := make([]OutputStats, 0, e.nout+1)
	for k, name := range e.m.Outputs {
		out = append(out, st[k].result(name, &e.layouts[k]))
	}
	return append(out, st[e.nout].result("g", &e.layouts[e.nout]))
}

// Describe runs a crude Monte Carlo sample of n points of m with the given
// seed on all cores and returns the statistics of its outputs and of g,
// with the first keep points (none when keep <= 0). Run uses it for methods whose own samples do
// not represent the input distribution (FORM, importance sampling, subset
// simulation, conditional quasi-Monte Carlo).
func Describe(ctx context.Context, m *Model, n int64, keep int, seed uint64) ([]OutputStats, *Samples, error) {
	t, err := NewTransform(m)
	if err != nil {
		return nil, nil, err
	}
	if m.G == nil {
		return nil, nil, fmt.Errorf("sim: the model has no limit-state function G")
	}
	if n <= 0 {
		return nil, nil, fmt.Errorf("sim: Describe needs n > 0, got %d", n)
	}
	s := (&Settings{Seed: seed}).withDefaults()
	s.Keep = keep // zero or negative: none
	e := &crudeEngine{m: m, t: t, seed: seed, stream: streamAux, n: n}
	r, err := e.run(ctx, &s, MonteCarlo)
	if err != nil {
		return nil, nil, err
	}
	return r.Outputs, r.Kept, nil
}
