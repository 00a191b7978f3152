package sim

import (
	"context"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mathext"
)

// linearSpace is g = b0 sqrt(n) - sum u_i, exact Pf = Phi(-b0) for any n
// (the linear high-dimensional case of Au and Beck 2001).
func linearSpace(n int, b0 float64) *uSpace {
	c := b0 * math.Sqrt(float64(n))
	return funcSpace(n, func(u []float64) float64 {
		s := c
		for _, v := range u {
			s -= v
		}
		return s
	})
}

// chiSquareSpace is g = c - sum u_i^2, exact Pf = Q(n/2, c/2), the
// regularised upper incomplete gamma function (the sum of n squared
// standard normals is chi-square with n degrees of freedom).
func chiSquareSpace(n int, c float64) *uSpace {
	return funcSpace(n, func(u []float64) float64 {
		s := c
		for _, v := range u {
			s -= v * v
		}
		return s
	})
}

func TestSubsetLognormal45(t *testing.T) {
	// Subset simulation is random: one run of at most 50000 evaluations
	// lands within 0.05 of the exact beta about 9 times in 10 (measured
	// over 200 seeds: rms error 0.031). Ten independent runs must all
	// stay within the budget, at least 8 within 0.05, and their rms
	// error below 0.05.
	m := lognormalRSModel(t, rs45MR, rs45VR, rs45MS, rs45VS)
	exact := lognormalRSBeta(rs45MR, rs45VR, rs45MS, rs45VS)
	tr, err := NewTransform(m)
	if err != nil {
		t.Fatal(err)
	}
	const runs = 10
	var within int
	var sq float64
	for seed := uint64(1); seed <= runs; seed++ {
		r, err := subsetSimulation(context.Background(), m, tr, &Settings{Samples: 50000, Seed: seed})
		if err != nil {
			t.Fatal(err)
		}
		if r.Evaluations > 50000 || r.Method != Subset || len(r.Warnings) != 0 {
			t.Errorf("seed %d: %d evaluations, method %s, warnings %v", seed, r.Evaluations, r.Method, r.Warnings)
		}
		if r.BetaCI[0] > r.Beta || r.BetaCI[1] < r.Beta {
			t.Errorf("seed %d: beta %v outside its interval %v", seed, r.Beta, r.BetaCI)
		}
		d := r.Beta - exact
		if math.Abs(d) <= 0.05 {
			within++
		}
		sq += d * d
		t.Logf("seed %d: beta %.4f (exact %.4f), CI %.3f..%.3f, CoV %.3f, %d evaluations", seed, r.Beta, exact, r.BetaCI[0], r.BetaCI[1], r.PfCoV, r.Evaluations)
	}
	if rms := math.Sqrt(sq / runs); within < 8 || rms > 0.05 {
		t.Errorf("%d of %d runs within 0.05, rms error %.4f", within, runs, rms)
	}
}

// subsetStats runs subset simulation with seeds 1..runs and returns the
// mean estimate, the sample CoV of the estimates and the mean of the CoVs
// the estimator predicts for itself.
func subsetStats(t *testing.T, sp *uSpace, runs int, levelSize int) (mean, cov, predicted float64) {
	t.Helper()
	var s1, s2 float64
	for seed := 1; seed <= runs; seed++ {
		r, err := subsetRun(context.Background(), sp, &Settings{Seed: uint64(seed), Workers: 2}, levelSize)
		if err != nil {
			t.Fatal(err)
		}
		if len(r.Warnings) != 0 {
			t.Fatalf("seed %d: %v", seed, r.Warnings)
		}
		s1 += r.Pf
		s2 += r.Pf * r.Pf
		predicted += r.PfCoV
	}
	n := float64(runs)
	mean = s1 / n
	sd := math.Sqrt((s2 - n*mean*mean) / (n - 1))
	return mean, sd / mean, predicted / n
}

func TestSubsetStatistics(t *testing.T) {
	// Several independent runs: the mean must lie within 3 standard
	// errors of the exact value, and the spread of the runs must be of
	// the size of Au and Beck's delta (which neglects the correlation
	// between levels, so the observed CoV may be somewhat larger).
	cases := []struct {
		name      string
		sp        *uSpace
		exact     float64
		runs      int
		levelSize int
	}{
		// Linear case, n = 10, b0 = 4.7: Pf = Phi(-4.7) = 1.30081e-6.
		{"linear n=10 b0=4.7", linearSpace(10, 4.7), formTail(4.7), 60, 1000},
		// Chi-square, n = 10, c = 40: Pf = Q(5, 20) = 1.69447e-5.
		{"chi-square n=10 c=40", chiSquareSpace(10, 40), mathext.GammaIncRegComp(5, 20), 30, 1000},
		// Sum of 20 unit exponentials above 40: Pf = Q(20, 40) = 1.76303e-4.
		{"sum of exponentials n=20 C=40", sumExpSpace(20, 40), sumExpPf(20, 40), 30, 1000},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			mean, cov, pred := subsetStats(t, c.sp, c.runs, c.levelSize)
			se := mean * cov / math.Sqrt(float64(c.runs))
			if math.Abs(mean-c.exact) > 3*se {
				t.Errorf("mean of %d runs %.5g ± %.2g, exact %.5g", c.runs, mean, se, c.exact)
			}
			if ratio := cov / pred; ratio < 0.6 || ratio > 2 {
				t.Errorf("sample CoV %.3f, predicted %.3f (ratio %.2f)", cov, pred, ratio)
			}
			t.Logf("mean %.5g ± %.2g (exact %.5g), sample CoV %.3f, predicted %.3f", mean, se, c.exact, cov, pred)
		})
	}
}

func TestSubsetChiSquareReference(t *testing.T) {
	// Published values of the chi-square benchmark, Q(n/2, c/2).
	for _, c := range []struct{ n, c, want float64 }{{10, 30, 8.56641e-4}, {10, 40, 1.69447e-5}, {2, 10, 6.73795e-3}} {
		if got := mathext.GammaIncRegComp(c.n/2, c.c/2); math.Abs(got-c.want) > 1e-5*c.want {
			t.Errorf("Q(%v, %v) = %.6g, want %.6g", c.n/2, c.c/2, got, c.want)
		}
	}
}

func TestSubsetVerySmall(t *testing.T) {
	// Pf = Phi(-5) = 2.86652e-7 (linear case, n = 10), without FORM.
	r, err := subsetRun(context.Background(), linearSpace(10, 5), &Settings{Samples: 100000, Seed: 2}, 0)
	if err != nil {
		t.Fatal(err)
	}
	// About 3 standard deviations of this run (CoV about 0.2).
	if math.Abs(r.Beta-5) > 0.15 {
		t.Errorf("beta %.4f, want 5 (pf %.4g, CoV %.3f)", r.Beta, r.Pf, r.PfCoV)
	}
	// Six intermediate levels and the final estimate, which ends the trace.
	if r.Pf < r.PfCI[0] || r.Pf > r.PfCI[1] || len(r.Convergence) != 7 || len(r.Warnings) > 0 {
		t.Errorf("pf %.4g outside its interval %v, or %d convergence points, warnings %v", r.Pf, r.PfCI, len(r.Convergence), r.Warnings)
	}
	if last := r.Convergence[len(r.Convergence)-1]; last.Pf != r.Pf || last.PfCI != r.PfCI || last.Evaluations != r.Evaluations {
		t.Errorf("last convergence point %+v, want the final estimate %.4g %v after %d evaluations", last, r.Pf, r.PfCI, r.Evaluations)
	}
	for _, c := range r.Convergence {
		if !(c.PfCI[0] <= c.Pf && c.Pf <= c.PfCI[1]) {
			t.Errorf("convergence point %+v outside its own interval", c)
		}
	}
	t.Logf("beta %.4f, pf %.4g, CoV %.3f, %d evaluations, %d levels", r.Beta, r.Pf, r.PfCoV, r.Evaluations, len(r.Convergence))
}

func TestSubsetDeterminism(t *testing.T) {
	sp := linearSpace(4, 4)
	var first *Result
	for _, w := range []int{1, 2, 4} {
		r, err := subsetRun(context.Background(), sp, &Settings{Samples: 8000, Seed: 9, Workers: w}, 0)
		if err != nil {
			t.Fatal(err)
		}
		if first == nil {
			first = r
			continue
		}
		if r.Pf != first.Pf || r.PfCoV != first.PfCoV || r.Evaluations != first.Evaluations {
			t.Errorf("workers %d: pf %v cov %v n %d; workers 1: %v %v %d", w, r.Pf, r.PfCoV, r.Evaluations, first.Pf, first.PfCoV, first.Evaluations)
		}
	}
	r, _ := subsetRun(context.Background(), sp, &Settings{Samples: 8000, Seed: 10}, 0)
	if r.Pf == first.Pf {
		t.Errorf("seeds 9 and 10 gave the same pf %v", r.Pf)
	}
}

func TestSubsetBudget(t *testing.T) {
	// 5000 evaluations (N = 830 per level) cannot reach Phi(-7) = 1.3e-12:
	// the run stops within the budget and says so.
	r, err := subsetRun(context.Background(), linearSpace(2, 7), &Settings{Samples: 5000, Seed: 1}, 0)
	if err != nil {
		t.Fatal(err)
	}
	if r.Evaluations > 5000 || len(r.Warnings) != 1 || !strings.Contains(r.Warnings[0], "budget") {
		t.Errorf("%d evaluations, warnings %v", r.Evaluations, r.Warnings)
	}
	if r.PfCI[1] < formTail(7) {
		t.Errorf("upper end %.3g below the exact %.3g", r.PfCI[1], formTail(7))
	}
}

func TestSubsetStalls(t *testing.T) {
	// A flat limit state never lets the threshold fall.
	_, err := subsetRun(context.Background(), funcSpace(2, func(u []float64) float64 { return 1 }), &Settings{Samples: 10000}, 0)
	if err == nil || !strings.Contains(err.Error(), "stalled") {
		t.Errorf("error %v", err)
	}
}

// TestSubsetStopsAtLevelZero: a run that stops at level 0 is crude Monte
// Carlo of N samples, so its interval is the binomial one. When every
// sample fails, pf = 1 is only bounded below, by the Clopper-Pearson bound
// (alpha/2)^(1/N) (Clopper and Pearson 1934, closed form for k = n); the
// lognormal interval of the levels had no width there and claimed pf = 1
// and beta = -inf exactly.
func TestSubsetStopsAtLevelZero(t *testing.T) {
	for _, c := range []struct {
		name string
		b0   float64 // exact pf = Phi(-b0)
	}{
		{"every sample fails", -20},
		{"half fail", 0},
	} {
		sp, s := linearSpace(2, c.b0), &Settings{Samples: 60000, Seed: 4}
		first, err := subsetRun(context.Background(), sp, s, 0)
		if err != nil {
			t.Fatal(err)
		}
		r, err := subsetRepeat(context.Background(), sp, s, first)
		if err != nil {
			t.Fatal(err)
		}
		n := int64(r.Evaluations)
		k := int64(math.Round(r.Pf * float64(n)))
		want := binomialInterval(k, n, 0.95)
		if r.PfCI != want {
			t.Errorf("%s: interval %v from %d of %d failing, want the binomial %v", c.name, r.PfCI, k, n, want)
		}
		if !(r.PfCI[0] < 1) || math.IsInf(r.BetaCI[1], -1) {
			t.Errorf("%s: interval of pf %v, of beta %v: pf = 1 claimed exactly", c.name, r.PfCI, r.BetaCI)
		}
	}
}
