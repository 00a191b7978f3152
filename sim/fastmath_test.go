package sim

import (
	"math"
	"math/rand/v2"
	"testing"
)

// TestFastExp compares fastExp with math.Exp (the reference) over the
// range the samplers use, to 2 units in the last place.
func TestFastExp(t *testing.T) {
	t.Parallel()
	r := rand.New(rand.NewPCG(1, 1))
	for i := 0; i < 1_000_000; i++ {
		x := (r.Float64()*2 - 1) * 720
		if i%2 == 0 {
			x /= 100
		}
		got, want := fastExp(x), math.Exp(x)
		if math.Abs(got-want) > 2*ulp(want) {
			t.Fatalf("fastExp(%v) = %v, math.Exp gives %v", x, got, want)
		}
	}
	for _, x := range []float64{0, 1, -1, math.Inf(1), math.Inf(-1), 709, -745} {
		if got, want := fastExp(x), math.Exp(x); got != want && math.Abs(got-want) > 2*ulp(want) {
			t.Errorf("fastExp(%v) = %v, want %v", x, got, want)
		}
	}
	if !math.IsNaN(fastExp(math.NaN())) {
		t.Error("fastExp(NaN) is not NaN")
	}
}

func ulp(x float64) float64 { return math.Nextafter(x, math.Inf(1)) - x }

func BenchmarkFastExp(b *testing.B) {
	s := 0.0
	for i := 0; i < b.N; i++ {
		s += fastExp(float64(i&1023) * 1e-3)
	}
	benchSink = s
}

func BenchmarkMathExp(b *testing.B) {
	s := 0.0
	for i := 0; i < b.N; i++ {
		s += math.Exp(float64(i&1023) * 1e-3)
	}
	benchSink = s
}
