package sim

import (
	"context"
	"testing"
)

// benchModelSpace is the lognormal R - S model seen in standard normal
// space through its transformation, as the estimators see it.
func benchModelSpace(tb testing.TB) *uSpace {
	r, _ := NewLognormal(270, 27)
	s, _ := NewLognormal(100, 20)
	m := &Model{
		Vars: []Variable{{Name: "R", Dist: r}, {Name: "S", Dist: s}},
		G:    func(x, _ []float64) float64 { return x[0] - x[1] },
	}
	t, err := NewTransform(m)
	if err != nil {
		tb.Fatal(err)
	}
	return modelSpace(m, t)
}

func TestRareHotPathsDoNotAllocate(t *testing.T) {
	sp := benchModelSpace(t)
	f := formRun(sp, nil)
	is := isSetup(sp, f.Points)
	ws := &isWorker{g: sp.newG(), u: make([]float64, 2), a: make([]float64, len(f.Points)), rng: newBlockRNG()}
	if a := testing.AllocsPerRun(10, func() {
		ws.rng.seed(1, streamImportance, 0)
		importanceBlock(ws, 100, is.centres, is.logPi, is.cum)
	}); a != 0 {
		t.Errorf("importance sampling block: %v allocations", a)
	}
	ss := &ssWorker{g: sp.newG(), v: make([]float64, 2), rng: newBlockRNG()}
	us, gs := make([]float64, 20), make([]float64, 10)
	u0 := f.Points[0].U
	if a := testing.AllocsPerRun(10, func() {
		ss.rng.seed(1, streamSubset, 0)
		subsetChain(ss, u0, 0, 0, 0.6, us, gs)
	}); a != 0 {
		t.Errorf("subset chain: %v allocations", a)
	}
}

// BenchmarkImportanceSample measures one importance sample (draw, limit
// state through the transformation, weight) of the lognormal R - S model.
func BenchmarkImportanceSample(b *testing.B) {
	sp := benchModelSpace(b)
	f := formRun(sp, nil)
	is := isSetup(sp, f.Points)
	ws := &isWorker{g: sp.newG(), u: make([]float64, 2), a: make([]float64, len(f.Points)), rng: newBlockRNG()}
	ws.rng.seed(1, streamImportance, 0)
	b.ReportAllocs()
	b.ResetTimer()
	importanceBlock(ws, b.N, is.centres, is.logPi, is.cum)
}

// BenchmarkSubsetStep measures one conditional-sampling step of a subset
// chain of the same model.
func BenchmarkSubsetStep(b *testing.B) {
	sp := benchModelSpace(b)
	f := formRun(sp, nil)
	ss := &ssWorker{g: sp.newG(), v: make([]float64, 2), rng: newBlockRNG()}
	ss.rng.seed(1, streamSubset, 0)
	us, gs := make([]float64, 20), make([]float64, 10)
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i += 9 {
		subsetChain(ss, f.Points[0].U, 0, 0, 0.6, us, gs)
	}
}

// BenchmarkSubsetRun measures a whole subset simulation of the beta 4.5
// case with a budget of 50000 evaluations.
func BenchmarkSubsetRun(b *testing.B) {
	sp := benchModelSpace(b)
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		if _, err := subsetRun(context.Background(), sp, &Settings{Samples: 50000, Seed: uint64(i)}, 0); err != nil {
			b.Fatal(err)
		}
	}
}
