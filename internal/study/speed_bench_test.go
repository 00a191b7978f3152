package study

import (
	"context"
	"testing"

	"strutrisk/sim"
)

// BenchmarkReferenceRun is crude Monte Carlo on one worker through the
// study's model of the seven-variable reference strut (studies/bench):
// the path `strutrisk run --workers 1` takes, without the reports. One op
// is one sample.
func BenchmarkReferenceRun(b *testing.B) {
	md := loadDemo(b, "bench/reference-strut.toml")
	s := sim.Settings{Method: sim.MonteCarlo, Workers: 1, Seed: 1, Samples: int64(max(b.N, 1))}
	b.ReportAllocs()
	b.ResetTimer()
	res, err := sim.Run(context.Background(), md.Sim, &s)
	if err != nil {
		b.Fatal(err)
	}
	b.StopTimer()
	b.ReportMetric(float64(res.Evaluations)/b.Elapsed().Seconds(), "samples/s")
}

// BenchmarkReferenceG is one evaluation of the reference strut's limit
// state at its medians.
func BenchmarkReferenceG(b *testing.B) {
	md := loadDemo(b, "bench/reference-strut.toml")
	x := medians(md)
	out := make([]float64, 2)
	b.ReportAllocs()
	for b.Loop() {
		md.Sim.G(x, out)
	}
}
