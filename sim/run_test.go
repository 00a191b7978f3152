package sim

import (
	"context"
	"math"
	"reflect"
	"testing"
)

// caseA is R - S with R ~ N(200, 20), S ~ N(100, 30): Cornell's
// beta = (muR - muS)/sqrt(sR^2 + sS^2) = 100/sqrt(1300) = 2.773501,
// pf = Phi(-beta) = 2.77283e-3 (Cornell 1969, "A probability-based
// structural code", ACI Journal 66(12)).
func caseA() *Model {
	return &Model{
		Vars: []Variable{
			{Name: "R", Dist: mustDist(NewNormal(200, 20))},
			{Name: "S", Dist: mustDist(NewNormal(100, 30))},
		},
		G:       func(x, out []float64) float64 { return x[0] - x[1] },
		Linear:  &Linear{Index: 1, Split: func(x []float64) (float64, float64) { return x[0], 1 }},
		Outputs: nil,
	}
}

// caseB is R - S with lognormal R (mean 150, V 0.10) and S (mean 100,
// V 0.20); ln R - ln S is normal, so
// beta = ln[(muR/muS) sqrt((1+VS^2)/(1+VR^2))]/sqrt(ln[(1+VR^2)(1+VS^2)])
// exactly (the standard lognormal-format result, e.g. Rosenblueth and
// Esteva 1972; here evaluated in closed form by caseBBeta).
func caseB() *Model {
	return &Model{
		Vars: []Variable{
			{Name: "R", Dist: mustDist(NewLognormal(150, 15))},
			{Name: "S", Dist: mustDist(NewLognormal(100, 20))},
		},
		G: func(x, out []float64) float64 {
			if out != nil {
				out[0], out[1] = x[0], x[1]
			}
			return x[0] - x[1]
		},
		Outputs: []string{"capacity", "demand"},
		Linear:  &Linear{Index: 1, Split: func(x []float64) (float64, float64) { return x[0], 1 }},
	}
}

func caseBBeta() float64 {
	vr, vs := 0.10, 0.20
	return math.Log(150.0/100*math.Sqrt((1+vs*vs)/(1+vr*vr))) / math.Sqrt(math.Log((1+vr*vr)*(1+vs*vs)))
}

func TestMonteCarloCaseA(t *testing.T) {
	t.Parallel()
	want := PfFromBeta(100 / math.Sqrt(1300))
	res, err := Run(context.Background(), caseA(), &Settings{Method: MonteCarlo, Samples: 2_000_000, Seed: 7, Confidence: 0.99})
	if err != nil {
		t.Fatal(err)
	}
	if want < res.PfCI[0] || want > res.PfCI[1] {
		t.Errorf("exact pf %v outside the 99%% interval %v (pf %v)", want, res.PfCI, res.Pf)
	}
	t.Logf("pf %v ci %v cov %v evals %d", res.Pf, res.PfCI, res.PfCoV, res.Evaluations)
}

// columnModel is the reference model of the benchmarks (see
// bench_test.go and the numpy baseline it mirrors): Perry-Robertson
// first-yield capacity of an imperfect strut against dead plus imposed
// load. The bow acts by its magnitude, |e0|. The imposed load Q, the input
// with the largest spread, is the linear input integrated exactly.
func columnModel(deadMean float64) *Model {
	m := &Model{
		Vars: []Variable{
			{Name: "E", Dist: mustDist(NewLognormal(205000, 0.03*205000))},
			{Name: "fy", Dist: mustDist(NewLognormal(300, 0.07*300))},
			{Name: "e0", Dist: mustDist(NewNormal(colLength/1000, colLength/2000))},
			{Name: "K", Dist: mustDist(NewUniform(0.7, 1.0))},
			{Name: "D", Dist: mustDist(NewNormal(deadMean, 0.10*deadMean))},
			{Name: "Q", Dist: mustDist(NewGumbel(0.6e6, 0.25*0.6e6))},
			{Name: "theta", Dist: mustDist(NewLognormal(1, 0.05))},
		},
		Outputs: []string{"capacity", "demand"},
	}
	m.G = func(x, out []float64) float64 {
		c, d := columnCapacity(x), x[4]+x[5]
		if out != nil {
			out[0], out[1] = c, d
		}
		return c - d
	}
	m.Linear = &Linear{Index: 5, Split: func(x []float64) (float64, float64) { return columnCapacity(x) - x[4], 1 }}
	return m
}

const (
	colArea, colR, colCOverR2, colLength = 11400.0, 65.0, 0.0302, 5000.0
)

// columnCapacity is the Perry-Robertson first-yield load
// theta A [a - sqrt(a^2 - fy sigmaE)], a = (fy + (1 + eta) sigmaE)/2,
// eta = |e0| c/r^2, sigmaE = pi^2 E/(K L/r)^2 (Perry and Robertson 1886;
// e.g. BS 5950-1:2000 Annex C).
func columnCapacity(x []float64) float64 {
	slender := x[3] * colLength / colR
	sigmaE := math.Pi * math.Pi * x[0] / (slender * slender)
	a := 0.5 * (x[1] + (1+math.Abs(x[2])*colCOverR2)*sigmaE)
	return x[6] * colArea * (a - math.Sqrt(a*a-x[1]*sigmaE))
}

func TestDeterministicAcrossWorkers(t *testing.T) {
	t.Parallel()
	m := columnModel(1.2e6)
	m.Corr = []Correlation{{A: "E", B: "fy", Rho: 0.3}}
	for _, method := range []Method{MonteCarlo, LatinHypercube, ConditionalQMC} {
		var first *Result
		for _, w := range []int{1, 2, 4, 4} {
			res, err := Run(context.Background(), m, &Settings{Method: method, Samples: 100_000, Seed: 11, Workers: w, Keep: 300, AuxSamples: 9000})
			if err != nil {
				t.Fatal(err)
			}
			if first == nil {
				first = res
				continue
			}
			if !reflect.DeepEqual(res, first) {
				t.Errorf("%s: %d workers give pf %v (%d evaluations), 1 worker %v (%d)", method, w, res.Pf, res.Evaluations, first.Pf, first.Evaluations)
			}
		}
		if first.Pf <= 0 || len(first.Kept.Rows) != 300 || len(first.Outputs) != 3 {
			t.Errorf("%s: pf %v, %d kept rows, %d outputs", method, first.Pf, len(first.Kept.Rows), len(first.Outputs))
		}
	}
}

func TestEarlyStopDeterministic(t *testing.T) {
	t.Parallel()
	var evals []int64
	for _, w := range []int{1, 2, 3} {
		res, err := Run(context.Background(), caseB(), &Settings{Method: MonteCarlo, Samples: 10_000_000, TargetCoV: 0.03, Seed: 3, Workers: w})
		if err != nil {
			t.Fatal(err)
		}
		if res.PfCoV > 0.03 || res.Incomplete {
			t.Errorf("%d workers: CoV %v, incomplete %v", w, res.PfCoV, res.Incomplete)
		}
		evals = append(evals, res.Evaluations)
	}
	// CoV 0.03 at pf 0.029 needs (1-pf)/(pf 0.03^2) = 37,000 samples:
	// the stop must come at the first block boundary past that.
	if evals[0] != evals[1] || evals[0] != evals[2] || evals[0] > 6*blockSize || evals[0]%blockSize != 0 {
		t.Errorf("stopping points %v, want equal multiples of %d below %d", evals, blockSize, 6*blockSize)
	}
}

func TestZeroFailures(t *testing.T) {
	t.Parallel()
	m := caseA()
	m.G = func(x, out []float64) float64 { return 1 }
	res, err := Run(context.Background(), m, &Settings{Method: MonteCarlo, Samples: 50_000, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	if want := 1 - math.Pow(0.025, 1.0/50_000); res.Pf != 0 || res.PfCI[0] != 0 || math.Abs(res.PfCI[1]-want) > 1e-15 {
		t.Errorf("zero failures: pf %v ci %v, want 0 and [0, %v]", res.Pf, res.PfCI, want)
	}
	if !math.IsInf(res.Beta, 1) || math.Abs(res.BetaCI[0]-BetaFromPf(res.PfCI[1])) > 0 {
		t.Errorf("beta %v ci %v", res.Beta, res.BetaCI)
	}
}

func TestCancelledRun(t *testing.T) {
	t.Parallel()
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	res, err := Run(ctx, caseB(), &Settings{Method: MonteCarlo, Samples: 1_000_000, Seed: 1})
	if err != nil {
		t.Fatal(err)
	}
	if !res.Incomplete || res.Evaluations >= 1_000_000 {
		t.Errorf("cancelled run: incomplete %v after %d evaluations", res.Incomplete, res.Evaluations)
	}
}

// TestOutputStatistics checks the streaming statistics of the outputs of
// case B against the lognormal input they copy: mean, sd and quantiles
// (exact lognormal quantiles) within sampling tolerance.
func TestOutputStatistics(t *testing.T) {
	t.Parallel()
	var calls []Progress
	res, err := Run(context.Background(), caseB(), &Settings{Method: MonteCarlo, Samples: 400_000, Seed: 9, Keep: 10,
		Progress: func(p Progress) { calls = append(calls, p) }})
	if err != nil {
		t.Fatal(err)
	}
	if len(res.Outputs) != 3 || res.Outputs[0].Name != "capacity" || res.Outputs[2].Name != "g" {
		t.Fatalf("outputs %v", res.Outputs)
	}
	c := res.Outputs[0]
	d := caseB().Vars[0].Dist
	if math.Abs(c.Mean-150) > 0.1 || math.Abs(c.SD-15) > 0.1 || c.N != 400_000 {
		t.Errorf("capacity mean %v sd %v n %d, want 150, 15, 400000", c.Mean, c.SD, c.N)
	}
	for i, p := range QuantileLevels {
		if want := d.Quantile(p); math.Abs(c.Quantiles[i]-want) > 0.5 {
			t.Errorf("capacity quantile %v = %v, want %v", p, c.Quantiles[i], want)
		}
	}
	total := c.Hist.Under + c.Hist.Over
	for _, k := range c.Hist.Counts {
		total += k
	}
	if total != 400_000 || c.Min >= c.Quantiles[0] || c.Max <= c.Quantiles[4] {
		t.Errorf("histogram holds %v values; min %v max %v", total, c.Min, c.Max)
	}
	if len(res.Kept.Rows) != 10 || len(res.Kept.Names) != 5 || res.Kept.Names[4] != "g" || res.Kept.Rows[3][4] != res.Kept.Rows[3][0]-res.Kept.Rows[3][1] {
		t.Errorf("kept %v", res.Kept)
	}
	if len(calls) == 0 || calls[len(calls)-1].Done != 400_000 {
		t.Errorf("progress calls %v", calls)
	}
	for i := 1; i < len(calls); i++ {
		if calls[i].Done <= calls[i-1].Done {
			t.Errorf("progress not increasing: %v", calls)
		}
	}
}

func TestLatinHypercubeCaseB(t *testing.T) {
	t.Parallel()
	want := PfFromBeta(caseBBeta())
	res, err := Run(context.Background(), caseB(), &Settings{Method: LatinHypercube, Samples: 500_000, Seed: 5, Confidence: 0.99})
	if err != nil {
		t.Fatal(err)
	}
	if want < res.PfCI[0] || want > res.PfCI[1] {
		t.Errorf("exact pf %v outside the 99%% interval %v (pf %v)", want, res.PfCI, res.Pf)
	}
}

func TestMonteCarloCaseB(t *testing.T) {
	t.Parallel()
	// Reference: references.md case B, beta = 1.894516.
	if b := caseBBeta(); math.Abs(b-1.894516) > 1e-6 {
		t.Fatalf("case B beta %v, want 1.894516", b)
	}
	want := PfFromBeta(caseBBeta())
	res, err := Run(context.Background(), caseB(), &Settings{Method: MonteCarlo, Samples: 1_000_000, Seed: 8, Confidence: 0.99})
	if err != nil {
		t.Fatal(err)
	}
	if want < res.PfCI[0] || want > res.PfCI[1] {
		t.Errorf("exact pf %v outside the 99%% interval %v (pf %v)", want, res.PfCI, res.Pf)
	}
}

// foreign hides a distribution's unexported methods, as a Dist written
// outside the package would; Run must then draw it by inversion.
type foreign struct{ Dist }

func TestForeignDist(t *testing.T) {
	t.Parallel()
	m := caseA()
	for i := range m.Vars {
		m.Vars[i].Dist = foreign{m.Vars[i].Dist}
	}
	want := PfFromBeta(100 / math.Sqrt(1300))
	res, err := Run(context.Background(), m, &Settings{Method: MonteCarlo, Samples: 1_000_000, Seed: 3, Confidence: 0.99})
	if err != nil {
		t.Fatal(err)
	}
	if want < res.PfCI[0] || want > res.PfCI[1] {
		t.Errorf("exact pf %v outside the 99%% interval %v (pf %v)", want, res.PfCI, res.Pf)
	}
}

// TestCancelMidRun cancels from the progress callback: Run must stop soon,
// flag the result and report only whole blocks.
func TestCancelMidRun(t *testing.T) {
	t.Parallel()
	for _, method := range []Method{MonteCarlo, ConditionalQMC} {
		ctx, cancel := context.WithCancel(context.Background())
		calls := 0
		res, err := Run(ctx, caseB(), &Settings{Method: method, Samples: 1 << 30, Seed: 1, AuxSamples: -1,
			Progress: func(p Progress) {
				calls++
				if calls == 3 {
					cancel()
				}
			}})
		cancel()
		if err != nil {
			t.Fatal(err)
		}
		if !res.Incomplete || res.Evaluations >= 1<<30 || res.Evaluations == 0 || math.IsNaN(res.Pf) {
			t.Errorf("%s: incomplete %v after %d evaluations, pf %v", method, res.Incomplete, res.Evaluations, res.Pf)
		}
	}
}
