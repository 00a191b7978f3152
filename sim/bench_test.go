package sim

import (
	"context"
	"math"
	"testing"
)

// The reference model of these benchmarks is columnModel (run_test.go),
// the seven-variable Perry-Robertson strut of the numpy baseline script
// shipped with the project's benchmarks: lognormal E, fy and model factor,
// |normal| bow, uniform K, normal dead load, Gumbel imposed load.

// BenchmarkModel times one sample: drawing the seven inputs and evaluating
// the limit state with its two outputs.
func BenchmarkModel(b *testing.B) {
	m := columnModel(1.2e6)
	t, err := NewTransform(m)
	if err != nil {
		b.Fatal(err)
	}
	g := newBlockRNG()
	g.seed(1, streamMC, 0)
	x, z, out := make([]float64, 7), make([]float64, 7), make([]float64, 2)
	sum := 0.0
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		t.drawX(x, z, g.r)
		sum += m.G(x, out)
	}
	benchSink = sum
}

// BenchmarkDrawOnly draws the same seven variates and sums them.
func BenchmarkDrawOnly(b *testing.B) {
	m := columnModel(1.2e6)
	t, err := NewTransform(m)
	if err != nil {
		b.Fatal(err)
	}
	g := newBlockRNG()
	g.seed(1, streamMC, 0)
	x, z := make([]float64, 7), make([]float64, 7)
	sum := 0.0
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		t.drawX(x, z, g.r)
		sum += x[0] + x[1] + x[2] + x[3] + x[4] + x[5] + x[6]
	}
	benchSink = sum
}

var benchSink float64

func benchRun(b *testing.B, s Settings) {
	m := columnModel(1.2e6)
	s.Samples = int64(max(b.N, 1))
	b.ReportAllocs()
	b.ResetTimer()
	res, err := Run(context.Background(), m, &s)
	if err != nil {
		b.Fatal(err)
	}
	b.StopTimer()
	b.ReportMetric(float64(res.Evaluations)/b.Elapsed().Seconds(), "samples/s")
}

// BenchmarkRunMC1Worker is crude Monte Carlo on one goroutine; one op is
// one sample (statistics of both outputs and of g included).
func BenchmarkRunMC1Worker(b *testing.B) {
	benchRun(b, Settings{Method: MonteCarlo, Workers: 1, Seed: 1})
}

// BenchmarkRunMC2Workers is the same on two goroutines.
func BenchmarkRunMC2Workers(b *testing.B) {
	benchRun(b, Settings{Method: MonteCarlo, Workers: 2, Seed: 1})
}

// BenchmarkConditionalQMC times conditional quasi-Monte Carlo on all
// cores; one op is one point (one evaluation of the capacity).
func BenchmarkConditionalQMC(b *testing.B) {
	m := columnModel(1.2e6)
	s := Settings{Method: ConditionalQMC, Seed: 1, Samples: int64(max(b.N, 16)), AuxSamples: -1}
	b.ReportAllocs()
	b.ResetTimer()
	res, err := Run(context.Background(), m, &s)
	if err != nil {
		b.Fatal(err)
	}
	b.StopTimer()
	b.ReportMetric(float64(res.Evaluations)/b.Elapsed().Seconds(), "samples/s")
}

// benchTimeToCoV times a whole run of conditional quasi-Monte Carlo to a
// CoV of 1 % on the reference model; compare with the time crude sampling
// needs for (1 - pf)/(pf 0.01^2) samples.
func benchTimeToCoV(b *testing.B, dead float64) {
	m := columnModel(dead)
	var res *Result
	for i := 0; i < b.N; i++ {
		var err error
		res, err = Run(context.Background(), m, &Settings{Method: ConditionalQMC, Seed: uint64(i), Samples: 1 << 26, TargetCoV: 0.01, AuxSamples: -1})
		if err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(res.Pf, "pf")
	b.ReportMetric(float64(res.Evaluations), "evals")
	b.ReportMetric(res.PfCoV, "cov")
	b.ReportMetric((1-res.Pf)/(res.Pf*1e-4), "crude-n")
	if math.IsNaN(res.Pf) {
		b.Fatal("no estimate")
	}
}

func BenchmarkTimeToCoV1pctDead1200k(b *testing.B) { benchTimeToCoV(b, 1.2e6) }
func BenchmarkTimeToCoV1pctDead600k(b *testing.B)  { benchTimeToCoV(b, 0.6e6) }
