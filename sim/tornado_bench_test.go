package sim

import "testing"

// BenchmarkFixVariableG measures one call of a reduced model's limit state
// (the hot path of FORM with a variable held fixed); it must not allocate.
func BenchmarkFixVariableG(b *testing.B) {
	r := FixVariable(linearRS(), 1, 0.5)
	x := []float64{200, 300}
	out := make([]float64, 1)
	b.ReportAllocs()
	for b.Loop() {
		r.G(x, out)
	}
}

// BenchmarkSobol measures the whole Sobol estimate of the Ishigami function
// at N = 2000 (10000 evaluations, 100 bootstrap resamples).
func BenchmarkSobol(b *testing.B) {
	m := ishigami()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Sobol(b.Context(), m, &SobolSettings{Samples: 2000, Bootstrap: 100, Workers: 1}); err != nil {
			b.Fatal(err)
		}
	}
}
