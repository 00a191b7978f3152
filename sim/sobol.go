package sim

import (
	"context"
	"fmt"
	"math"
	"math/rand/v2"
	"runtime"
	"sort"
	"sync"
)

// SobolSettings control Sobol. Zero fields take their defaults.
type SobolSettings struct {
	// Samples is N, the number of rows of each of the two base matrices;
	// the model is evaluated N*(d+2) times for d variables. Default 10000.
	Samples int
	// Seed seeds the base matrices and the bootstrap.
	Seed uint64
	// Bootstrap is the number of bootstrap resamples for the intervals;
	// default 200. A negative value turns the intervals off (NaN).
	Bootstrap int
	// Confidence is the level of the percentile intervals; default 0.95.
	Confidence float64
	// Output is the index in Model.Outputs of the output analysed, or -1
	// for the indicator of failure 1{g < 0}. Note that the zero value
	// selects Outputs[0].
	Output int
	// Workers is the number of goroutines evaluating the model; default
	// runtime.NumCPU(). The result does not depend on it.
	Workers int
}

// SobolIndex holds the variance-based sensitivity indices of one variable.
type SobolIndex struct {
	// Variable is the variable's name.
	Variable string
	// First is the first-order index S_i, the share of the output variance
	// explained by the variable alone; Total is the total index ST_i, the
	// share in which it takes part, interactions included.
	First, Total float64
	// FirstCI and TotalCI are bootstrap percentile intervals at the
	// settings' Confidence.
	FirstCI, TotalCI [2]float64
}

// Sobol estimates the first-order and total Sobol indices of the chosen
// output of m with respect to each random variable, by the sampling scheme
// of Saltelli et al. (2010): two independent N x d matrices A and B and, for
// each variable i, the matrix A_B^i equal to A with column i taken from B.
// The first-order index uses the estimator of Saltelli et al. (2010, Table 2
// (b)),
//
//	V_i = (1/N) sum_j f(B)_j (f(A_B^i)_j - f(A)_j),
//
// with f(B) centred on the sample mean (which leaves the estimator
// unbiased, since E[f(A_B^i) - f(A)] = 0, and removes the growth of its
// variance with the output's mean; common practice), and the total index
// that of Jansen (1999),
//
//	VT_i = (1/(2N)) sum_j (f(A)_j - f(A_B^i)_j)^2,
//
// both divided by the variance of the output over the 2N rows of A and B.
// Intervals are bootstrap percentile intervals over the rows j.
// References: A. Saltelli, P. Annoni, I. Azzini, F. Campolongo, M. Ratto,
// S. Tarantola (2010), Variance based sensitivity analysis of model output,
// Computer Physics Communications 181, 259-270; M.J.W. Jansen (1999),
// Analysis of variance designs for model output, Computer Physics
// Communications 117, 35-43.
//
// Memory grows as N*(3d+2) float64 values (the matrices and the outputs
// are kept for the bootstrap): about 8 MB for N = 20000 and d = 16.
//
// The inputs are drawn independently, each through its marginal's
// Quantile: the indices assume independent inputs. Sobol ignores m.Corr;
// when it is not empty the caller must tell the reader so (see
// SobolIndependenceWarning). The result is reproducible from s.Seed and does
// not depend on s.Workers. An output with zero variance (for example a
// failure indicator that never fires) is an error.
func Sobol(ctx context.Context, m *Model, s *SobolSettings) ([]SobolIndex, error) {
	var st SobolSettings
	if s != nil {
		st = *s
	}
	if st.Samples == 0 {
		st.Samples = 10000
	}
	if st.Bootstrap == 0 {
		st.Bootstrap = 200
	}
	if st.Confidence == 0 {
		st.Confidence = 0.95
	}
	if st.Workers <= 0 {
		st.Workers = runtime.NumCPU()
	}
	if st.Samples < 2 {
		return nil, fmt.Errorf("sim: sobol samples = %d: need at least 2 (a few thousand for useful indices)", st.Samples)
	}
	if !(st.Confidence > 0 && st.Confidence < 1) {
		return nil, fmt.Errorf("sim: sobol confidence %v must be in (0, 1)", st.Confidence)
	}
	if err := checkSensitivityModel(m, st.Output); err != nil {
		return nil, fmt.Errorf("sim: sobol: %w", err)
	}
	n, d := st.Samples, len(m.Vars)

	// Base matrices, row-major: A and B are n x d; drawn from one stream so
	// the design depends only on the seed.
	rng := rand.New(rand.NewPCG(st.Seed, 0x5eb01))
	a := make([]float64, n*d)
	b := make([]float64, n*d)
	for _, mat := range [][]float64{a, b} {
		for j := 0; j < n; j++ {
			for i, v := range m.Vars {
				mat[j*d+i] = v.Dist.Quantile(openUnit(rng))
			}
		}
	}

	// fA, fB and fAB[i] hold the outputs; evaluated in parallel by rows.
	fA := make([]float64, n)
	fB := make([]float64, n)
	fAB := make([][]float64, d)
	for i := range fAB {
		fAB[i] = make([]float64, n)
	}
	if err := sobolEvaluate(ctx, m, st.Output, st.Workers, a, b, fA, fB, fAB); err != nil {
		return nil, err
	}

	idx := make([]SobolIndex, d)
	rows := make([]int, n)
	for j := range rows {
		rows[j] = j
	}
	first, total, err := sobolEstimate(fA, fB, fAB, rows, nil, nil)
	if err != nil {
		return nil, fmt.Errorf("sim: sobol: %w", err)
	}
	for i := range idx {
		idx[i] = SobolIndex{Variable: m.Vars[i].Name, First: first[i], Total: total[i]}
		idx[i].FirstCI = [2]float64{math.NaN(), math.NaN()}
		idx[i].TotalCI = [2]float64{math.NaN(), math.NaN()}
	}
	if st.Bootstrap < 0 {
		return idx, nil
	}

	// Bootstrap: resample the rows j with replacement.
	brng := rand.New(rand.NewPCG(st.Seed, 0xb0075))
	bf := make([][]float64, d)
	bt := make([][]float64, d)
	for i := range bf {
		bf[i] = make([]float64, 0, st.Bootstrap)
		bt[i] = make([]float64, 0, st.Bootstrap)
	}
	for k := 0; k < st.Bootstrap; k++ {
		if k%16 == 0 {
			if err := ctx.Err(); err != nil {
				return nil, err
			}
		}
		for j := range rows {
			rows[j] = brng.IntN(n)
		}
		first, total, err = sobolEstimate(fA, fB, fAB, rows, first, total)
		if err != nil {
			continue // a degenerate resample carries no information
		}
		for i := range bf {
			bf[i] = append(bf[i], first[i])
			bt[i] = append(bt[i], total[i])
		}
	}
	lo, hi := (1-st.Confidence)/2, (1+st.Confidence)/2
	for i := range idx {
		idx[i].FirstCI = percentileInterval(bf[i], lo, hi)
		idx[i].TotalCI = percentileInterval(bt[i], lo, hi)
	}
	return idx, nil
}

// SobolIndependenceWarning returns the caution a report should carry with
// Sobol indices of m: empty when m has no correlations, otherwise a sentence
// saying that the indices were computed as if the inputs were independent.
func SobolIndependenceWarning(m *Model) string {
	if m == nil || len(m.Corr) == 0 {
		return ""
	}
	return fmt.Sprintf("Sobol indices assume independent inputs; the %d correlation(s) of the study were ignored in computing them", len(m.Corr))
}

// openUnit returns a uniform variate in the open interval (0, 1).
func openUnit(r *rand.Rand) float64 {
	return (float64(r.Uint64()>>11) + 0.5) / (1 << 53)
}

// sobolEvaluate fills fA, fB and fAB from the matrices a and b (n x d,
// row-major), rows shared among workers in fixed chunks.
func sobolEvaluate(ctx context.Context, m *Model, output, workers int, a, b, fA, fB []float64, fAB [][]float64) error {
	n, d := len(fA), len(m.Vars)
	const chunk = 256
	next := make(chan int)
	var wg sync.WaitGroup
	for w := 0; w < workers; w++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			x := make([]float64, d)
			var out []float64
			if len(m.Outputs) > 0 {
				out = make([]float64, len(m.Outputs))
			}
			f := func(x []float64) float64 {
				g := m.G(x, out)
				if output < 0 {
					if g < 0 {
						return 1
					}
					return 0
				}
				return out[output]
			}
			for start := range next {
				end := min(start+chunk, n)
				for j := start; j < end; j++ {
					ra := a[j*d : (j+1)*d]
					rb := b[j*d : (j+1)*d]
					fA[j] = f(ra)
					fB[j] = f(rb)
					for i := 0; i < d; i++ {
						copy(x, ra)
						x[i] = rb[i]
						fAB[i][j] = f(x)
					}
				}
			}
		}()
	}
	var err error
feed:
	for start := 0; start < n; start += chunk {
		select {
		case next <- start:
		case <-ctx.Done():
			err = ctx.Err()
			break feed
		}
	}
	close(next)
	wg.Wait()
	if err != nil {
		return err
	}
	for j := 0; j < n; j++ {
		if math.IsNaN(fA[j]) || math.IsInf(fA[j], 0) || math.IsNaN(fB[j]) || math.IsInf(fB[j], 0) {
			return fmt.Errorf("sim: sobol: the model output is not finite at sample %d", j)
		}
		for i := range fAB {
			if math.IsNaN(fAB[i][j]) || math.IsInf(fAB[i][j], 0) {
				return fmt.Errorf("sim: sobol: the model output is not finite at sample %d", j)
			}
		}
	}
	return nil
}

// sobolEstimate returns the first-order (Saltelli et al. 2010) and total
// (Jansen 1999) indices over the given rows, reusing first and total when
// they have room.
func sobolEstimate(fA, fB []float64, fAB [][]float64, rows []int, first, total []float64) ([]float64, []float64, error) {
	d := len(fAB)
	first = append(first[:0], make([]float64, d)...)
	total = append(total[:0], make([]float64, d)...)
	// Variance over the 2N outputs of A and B (two-pass for accuracy).
	var mean float64
	for _, j := range rows {
		mean += fA[j] + fB[j]
	}
	n := float64(len(rows))
	mean /= 2 * n
	var v float64
	for _, j := range rows {
		da, db := fA[j]-mean, fB[j]-mean
		v += da*da + db*db
	}
	v /= 2 * n
	if !(v > 0) {
		return first, total, fmt.Errorf("the output has zero variance over the samples (for the failure indicator: no or only failures; use more samples or another output)")
	}
	for i, fi := range fAB {
		var s1, st float64
		for _, j := range rows {
			s1 += (fB[j] - mean) * (fi[j] - fA[j])
			dt := fA[j] - fi[j]
			st += dt * dt
		}
		first[i] = s1 / n / v
		total[i] = st / (2 * n) / v
	}
	return first, total, nil
}

// percentileInterval returns the lo and hi empirical quantiles of x (which
// it sorts), or NaNs when x is empty.
func percentileInterval(x []float64, lo, hi float64) [2]float64 {
	if len(x) == 0 {
		return [2]float64{math.NaN(), math.NaN()}
	}
	sort.Float64s(x)
	q := func(p float64) float64 {
		k := int(math.Ceil(p*float64(len(x)))) - 1
		return x[max(0, min(len(x)-1, k))]
	}
	return [2]float64{q(lo), q(hi)}
}
