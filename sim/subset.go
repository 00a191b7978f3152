package sim

import (
	"context"
	"fmt"
	"math"
	"sort"

	"gonum.org/v1/gonum/stat/distuv"
)

// Subset simulation constants.
const (
	// subsetP0 is the conditional probability of each intermediate level
	// (Au and Beck 2001 used 0.1).
	subsetP0 = 0.1
	// subsetMaxLevels bounds the levels: 0.1^30 is far below any useful Pf.
	subsetMaxLevels = 30
	// subsetAccept is the acceptance rate the conditional sampler aims
	// at (Papaioannou et al. 2015: 0.44).
	subsetAccept = 0.44
	// subsetBlockSize is the block size of the direct Monte Carlo level.
	subsetBlockSize = 1000
)

// subsetLevelSize returns the samples per level for a budget of n
// evaluations: n/6 (enough for six levels, Pf near 1e-6), between 500 and
// 10000, rounded to a multiple of 1/p0 = 10.
func subsetLevelSize(n int64) int {
	v := min(max(n/6, 500), 10000)
	return int(v/10) * 10
}

// subsetSimulation estimates Pf by subset simulation (S.-K. Au and J. L.
// Beck, "Estimation of small failure probabilities in high dimensions by
// subset simulation", Probabilistic Engineering Mechanics 16(4), 2001,
// 263-277).
//
// The levels are F_1 ⊃ F_2 ⊃ ... ⊃ F, F_i = {g <= b_i}: level 0 is direct
// Monte Carlo with N samples; each threshold b_i is chosen so that a
// fraction p0 = 0.1 of the level's samples lies below it, and those
// samples seed N p0 Markov chains of length 1/p0 that populate the next
// level conditionally on F_i. The chains use the conditional sampling
// kernel of Papaioannou, Betz, Zwirglmaier and Straub ("MCMC algorithms
// for subset simulation", Probabilistic Engineering Mechanics 41, 2015,
// 89-103): in standard normal space the candidate is
// v_j = rho u_j + sqrt(1 - rho^2) z_j, z_j standard normal, which leaves
// the standard normal invariant, and is accepted when g(v) <= b_i. The
// spread sigma = sqrt(1 - rho^2) = min(1, lambda) starts at lambda = 0.6
// and, unlike their within-level adaptation, is adapted once per level:
// lambda <- lambda exp(a - 0.44) from the acceptance rate a of the level
// just run (0.44 is their target). Their scaling of the spread by the
// seeds' standard deviation is left out: with it, and their
// within-level adaptation, the chi-square benchmark (n = 10, Pf 1.7e-5)
// came out biased by -9 % at N = 1000 and still -5 % at N = 10000
// (3 standard errors of the mean of the runs). The component-wise modified Metropolis sampler of
// Au and Beck was unbiased there but scattered about 1.4 times more on
// the two-variable lognormal case. The run stops at the first level where
// at least N p0 samples fail: Pf = p0^L n_F/N.
//
// The CoV is Au and Beck's delta^2 = sum_i (1 - p_i)/(p_i N) (1 + gamma_i),
// with gamma_i from the correlation of the indicator along the chains
// (gamma = 0 at level 0); it neglects the correlation between levels, so
// it is somewhat optimistic (the tests' runs scatter 1.1-1.4 times more).
// The interval is lognormal: Pf exp(±z s), s^2 = ln(1 + delta^2), with the
// estimate as median; a run that stops at level 0 is crude Monte Carlo
// and takes its binomial interval (binomialInterval). N is s.Samples/6 clamped to [500, 10000] (a budget
// of 50000 then reaches about 1e-6 with full levels); levels stop when the
// next would exceed s.Samples evaluations (a warning then says Pf is only
// bounded). When the CoV of one run stays above s.TargetCoV, further
// independent runs follow while the budget allows (subsetRepeat). Every
// chain and every block of level 0 draws from its own generator seeded
// from (seed, level, index), so the result does not depend on the number
// of workers.
func subsetSimulation(ctx context.Context, m *Model, t *Transform, s *Settings) (*Result, error) {
	sp := modelSpace(m, t)
	first, err := subsetRun(ctx, sp, s, 0)
	if err != nil {
		return nil, err
	}
	return subsetRepeat(ctx, sp, s, first)
}

// ssWorker is the scratch memory of one goroutine.
type ssWorker struct {
	g   func(u []float64) float64
	v   []float64
	rng *blockRNG
}

// subsetRun is subset simulation in standard normal space with levelSize
// samples per level (a multiple of 10; 0 for s.subsetLevel()).
func subsetRun(ctx context.Context, sp *uSpace, s *Settings, levelSize int) (*Result, error) {
	cfg := rareDefaults(s)
	n := sp.dim
	N := cfg.subsetLevel()
	if levelSize > 0 {
		N = levelSize / 10 * 10
	}
	nc := int(float64(N) * subsetP0) // chains (seeds) per level
	ns := N / nc                     // chain length, seed included
	z := distuv.UnitNormal.Quantile(0.5 + cfg.Confidence/2)

	// Samples of the current level, in chain order (chain j holds
	// j*ns .. j*ns+ns-1); at level 0 simply in sample order.
	U := make([]float64, N*n)
	G := make([]float64, N)
	nextU := make([]float64, N*n)
	nextG := make([]float64, N)

	nw := max(1, cfg.Workers)
	workers := make([]*ssWorker, nw)
	getWorker := func(w int) *ssWorker {
		if workers[w] == nil {
			workers[w] = &ssWorker{g: sp.newG(), v: make([]float64, n), rng: newBlockRNG()}
		}
		return workers[w]
	}

	res := &Result{Method: Subset, Confidence: cfg.Confidence, Trace: TraceLevels}
	tr := newTracer(&cfg, res)
	// Level 0: direct Monte Carlo in blocks.
	nb := (N + subsetBlockSize - 1) / subsetBlockSize
	nanCount := make([]int, nb)
	_, cancelled := rareParallel(ctx, cfg.Workers, nb, func(w, b int) {
		ws := getWorker(w)
		ws.rng.seed(cfg.Seed, streamSubset, uint64(b))
		r := ws.rng.r
		for i := b * subsetBlockSize; i < min(N, (b+1)*subsetBlockSize); i++ {
			u := U[i*n : (i+1)*n]
			for j := range u {
				u[j] = r.NormFloat64()
			}
			if G[i] = ws.g(u); G[i] != G[i] {
				G[i] = math.Inf(1) // NaN counts as safe
				nanCount[b]++
			}
		}
	}, func(int) bool { return true })
	var nans int
	for _, c := range nanCount {
		nans += c
	}
	if nans > 0 {
		res.Warnings = append(res.Warnings, fmt.Sprintf("the limit state was NaN for %d of the %d direct samples of subset simulation; they were counted as safe", nans, N))
	}
	evals := int64(N)
	if cancelled {
		res.Incomplete = true
		res.Evaluations = evals
		return res, nil
	}

	idx := make([]int, N)
	pf := 1.0
	var delta2 float64
	prevB := math.Inf(1)
	upper := 0.0 // upper end of the interval when no sample fails
	direct := -1 // failures of level 0 when the run stops there, else -1
	accepted := make([]int, nc)
	lambda := 0.6 // initial spread, Papaioannou et al. (2015)
	for level := 0; ; level++ {
		nf := 0
		for _, g := range G {
			if g <= 0 {
				nf++
			}
		}
		budgetLeft := cfg.Samples-evals >= int64(N-nc)
		if nf >= nc || level+1 >= subsetMaxLevels || !budgetLeft {
			pl := float64(nf) / float64(N)
			above := pf // probability of the last intermediate level
			if level == 0 {
				direct = nf
			}
			pf *= pl
			if level > 0 && nf > 0 {
				delta2 += (1 - pl) / (pl * float64(N)) * (1 + subsetGamma(G, nc, ns, 0, pl))
			} else if nf > 0 {
				delta2 += (1 - pl) / (pl * float64(N))
			}
			if nf < nc {
				why := "the evaluation budget (Samples) ran out"
				if budgetLeft {
					why = fmt.Sprintf("the level limit %d was reached", subsetMaxLevels)
				}
				res.Warnings = append(res.Warnings, fmt.Sprintf("subset simulation: %s at level %d with %d failed samples of %d; Pf is poorly estimated (below %.3g)", why, level, nf, N, above*subsetP0))
			}
			if nf == 0 {
				// Rule of three: 3/N bounds a conditional probability
				// with no success in N trials at 95 %.
				upper = above * 3 / float64(N)
			}
			break
		}
		// Threshold: between the (nc)th and (nc+1)th smallest g.
		for i := range idx {
			idx[i] = i
		}
		sort.SliceStable(idx, func(a, b int) bool { return G[idx[a]] < G[idx[b]] })
		b := 0.5 * (G[idx[nc-1]] + G[idx[nc]])
		if !(b < prevB) {
			return nil, fmt.Errorf("sim: subset simulation stalled: the threshold stopped decreasing at level %d (g = %.6g); g may be flat or undefined there", level, b)
		}
		prevB = b
		pf *= subsetP0
		if level == 0 {
			delta2 += (1 - subsetP0) / (subsetP0 * float64(N))
		} else {
			delta2 += (1 - subsetP0) / (subsetP0 * float64(N)) * (1 + subsetGamma(G, nc, ns, b, subsetP0))
		}
		tr.point(subsetPoint(evals, pf, delta2, z))
		tr.report(Progress{Done: evals, Total: cfg.Samples, Pf: pf, CoV: math.Sqrt(delta2)})

		seeds := idx[:nc] // the nc smallest
		lam := lambda
		_, cancelled = rareParallel(ctx, cfg.Workers, nc, func(w, ch int) {
			ws := getWorker(w)
			ws.rng.seed(cfg.Seed, streamSubset, uint64(level+1)<<40|uint64(ch+1))
			seed := seeds[ch]
			accepted[ch] = subsetChain(ws, U[seed*n:(seed+1)*n], G[seed], b, lam,
				nextU[ch*ns*n:(ch+1)*ns*n], nextG[ch*ns:(ch+1)*ns])
		}, func(int) bool { return true })
		if cancelled {
			res.Incomplete = true
		}
		evals += int64(N - nc)
		var a int
		for _, v := range accepted {
			a += v
		}
		lambda *= math.Exp(float64(a)/float64(N-nc) - subsetAccept)
		if res.Incomplete {
			break
		}
		U, nextU = nextU, U
		G, nextG = nextG, G
	}
	res.Evaluations = evals
	res.Pf = pf
	res.PfCoV = math.Sqrt(delta2)
	if pf > 0 {
		sl := math.Sqrt(math.Log(1 + delta2))
		res.PfCI = [2]float64{pf * math.Exp(-z*sl), math.Min(1, pf*math.Exp(z*sl))}
	} else {
		res.PfCoV = math.Inf(1)
		res.PfCI = [2]float64{0, upper}
	}
	if direct >= 0 {
		// Stopped at level 0, direct Monte Carlo: its interval is the
		// binomial one of crude sampling. The lognormal one has no width
		// when every sample fails (delta = 0), which would claim pf = 1
		// exactly from N samples.
		res.PfCI = binomialInterval(int64(direct), int64(N), cfg.Confidence)
	}
	res.Beta = BetaFromPf(pf)
	res.BetaCI = [2]float64{BetaFromPf(res.PfCI[1]), BetaFromPf(res.PfCI[0])}
	tr.point(ConvergencePoint{Evaluations: evals, Pf: pf, PfCI: res.PfCI, PfCoV: res.PfCoV})
	return res, nil
}

// subsetPoint is a convergence point of subset simulation: the product of
// the level probabilities so far, with the lognormal interval of its CoV
// estimate, as for the final estimate.
func subsetPoint(evals int64, pf, delta2, z float64) ConvergencePoint {
	sl := math.Sqrt(math.Log(1 + delta2))
	return ConvergencePoint{Evaluations: evals, Pf: pf, PfCoV: math.Sqrt(delta2),
		PfCI: [2]float64{pf * math.Exp(-z*sl), math.Min(1, pf*math.Exp(z*sl))}}
}

// subsetChain runs one chain of conditional sampling with spread
// min(1, lambda) from the seed u0 (with g(u0) = g0 <= b) and stores its ns
// states, the seed first, in us and gs. It returns the number of accepted
// candidates. It does not allocate.
func subsetChain(ws *ssWorker, u0 []float64, g0, b, lambda float64, us, gs []float64) int {
	n := len(u0)
	ns := len(gs)
	r := ws.rng.r
	copy(us[:n], u0)
	gs[0] = g0
	sd := math.Min(1, lambda)
	rho := math.Sqrt(1 - sd*sd)
	acc := 0
	v := ws.v
	for k := 1; k < ns; k++ {
		cur := us[(k-1)*n : k*n]
		for j, c := range cur {
			v[j] = rho*c + sd*r.NormFloat64()
		}
		next := us[k*n : (k+1)*n]
		if gv := ws.g(v); gv <= b {
			copy(next, v)
			gs[k] = gv
			acc++
			continue
		}
		copy(next, cur)
		gs[k] = gs[k-1]
	}
	return acc
}

// subsetGamma is the correlation factor gamma of Au and Beck (2001) for
// the indicator I(g <= b) over nc chains of length ns stored one after the
// other in G, whose mean is p:
//
//	gamma = 2 sum_{k=1}^{ns-1} (1 - k nc/N) rho(k),  rho(k) = R(k)/R(0),
//	R(k) = 1/(N - k nc) sum_j sum_{l<ns-k} I_jl I_j,l+k - p^2.
func subsetGamma(G []float64, nc, ns int, b, p float64) float64 {
	N := nc * ns
	r0 := p * (1 - p)
	if r0 <= 0 {
		return 0
	}
	var gamma float64
	for k := 1; k < ns; k++ {
		var sum float64
		for j := 0; j < nc; j++ {
			c := G[j*ns : (j+1)*ns]
			for l := 0; l+k < ns; l++ {
				if c[l] <= b && c[l+k] <= b {
					sum++
				}
			}
		}
		rk := sum/float64(N-k*nc) - p*p
		gamma += (1 - float64(k*nc)/float64(N)) * rk / r0
	}
	return 2 * gamma
}
