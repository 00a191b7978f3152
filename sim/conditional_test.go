package sim

import (
	"context"
	"errors"
	"math"
	"testing"
)

// TestConditionalQMCExact checks conditional quasi-Monte Carlo on cases A
// (Cornell's normal R - S) and B (lognormal R - S, exact formula) against
// the exact pf, inside the reported 99 % interval, with the variance far
// below that of crude Monte Carlo at the same budget.
func TestConditionalQMCExact(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		name string
		m    *Model
		beta float64
	}{
		{"A", caseA(), 100 / math.Sqrt(1300)},
		{"B", caseB(), caseBBeta()},
	} {
		want := PfFromBeta(c.beta)
		res, err := Run(context.Background(), c.m, &Settings{Method: ConditionalQMC, Samples: 65536, Seed: 2, Confidence: 0.99})
		if err != nil {
			t.Fatal(err)
		}
		if want < res.PfCI[0] || want > res.PfCI[1] {
			t.Errorf("case %s: pf %v interval %v, exact %v", c.name, res.Pf, res.PfCI, want)
		}
		se := res.PfCoV * res.Pf
		crude := want * (1 - want) / float64(res.Evaluations)
		if se*se*1e3 > crude {
			t.Errorf("case %s: variance %v is not 1e3 times below crude Monte Carlo's %v", c.name, se*se, crude)
		}
		if res.Method != ConditionalQMC || res.Outputs == nil {
			t.Errorf("case %s: method %v, outputs %v", c.name, res.Method, res.Outputs)
		}
	}
}

// lnProduct is g = R*theta - S with lognormal R, theta and S: ln g-terms
// are normal, so pf = Phi(-beta) with
// beta = (mR + mT - mS)/sqrt(sR^2 + sT^2 + sS^2) in log space.
func lnProduct() (*Model, float64) {
	r := mustDist(NewLognormal(150, 15)).(Lognormal)
	th := mustDist(NewLognormal(1, 0.1)).(Lognormal)
	s := mustDist(NewLognormal(80, 20)).(Lognormal)
	m := &Model{
		Vars: []Variable{{Name: "R", Dist: r}, {Name: "theta", Dist: th}, {Name: "S", Dist: s}},
		G:    func(x, out []float64) float64 { return x[0]*x[1] - x[2] },
		Linear: &Linear{Index: 2, Split: func(x []float64) (float64, float64) {
			return x[0] * x[1], 1
		}},
	}
	beta := (r.mu + th.mu - s.mu) / math.Sqrt(r.sigma*r.sigma+th.sigma*th.sigma+s.sigma*s.sigma)
	return m, PfFromBeta(beta)
}

// TestConditionalQMCHonestError runs 40 independent seeds and checks that
// the reported standard error matches the observed scatter of the
// estimates about the exact value (ratio within [0.6, 1.6], a range that
// 40 normal replicates leave with probability below 1e-3) and that the
// 95 % intervals cover the exact value in most runs.
func TestConditionalQMCHonestError(t *testing.T) {
	t.Parallel()
	m, want := lnProduct()
	const runs = 40
	var sq, seSum float64
	cover := 0
	for seed := uint64(0); seed < runs; seed++ {
		res, err := Run(context.Background(), m, &Settings{Method: ConditionalQMC, Samples: 16 * 256, Seed: seed, AuxSamples: -1, Keep: -1})
		if err != nil {
			t.Fatal(err)
		}
		d := res.Pf - want
		sq += d * d
		seSum += res.PfCoV * res.Pf
		if want >= res.PfCI[0] && want <= res.PfCI[1] {
			cover++
		}
	}
	observed := math.Sqrt(sq / runs)
	reported := seSum / runs
	if r := observed / reported; r < 0.6 || r > 1.6 {
		t.Errorf("observed error %v, reported %v (ratio %v)", observed, reported, r)
	}
	if cover < 34 {
		t.Errorf("95%% intervals cover the exact pf in %d of %d runs", cover, runs)
	}
}

// TestConditionalQMCTargetCoV checks that doubling stops once the CoV
// target is met, at a deterministic power of two.
func TestConditionalQMCTargetCoV(t *testing.T) {
	t.Parallel()
	m := columnModel(0.6e6)
	res, err := Run(context.Background(), m, &Settings{Method: ConditionalQMC, Samples: 1 << 22, TargetCoV: 0.01, Seed: 4, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	n := res.Evaluations / DefaultReplicates
	if res.PfCoV > 0.01 || n&(n-1) != 0 || res.Evaluations >= 1<<22 {
		t.Errorf("CoV %v after %d evaluations", res.PfCoV, res.Evaluations)
	}
	// Crude Monte Carlo of the same model (the numpy baseline's, 4e8
	// samples would be needed for 1 %) gives about 4e-5; here the estimate
	// must lie within 5 % of a much longer conditional run.
	ref, err := Run(context.Background(), m, &Settings{Method: ConditionalQMC, Samples: 1 << 21, Seed: 99, AuxSamples: -1})
	if err != nil {
		t.Fatal(err)
	}
	if res.Pf < 2e-5 || res.Pf > 8e-5 || math.Abs(res.Pf-ref.Pf) > 4*math.Hypot(res.PfCoV*res.Pf, ref.PfCoV*ref.Pf) {
		t.Errorf("pf %v, want about 4e-5 and %v", res.Pf, ref.Pf)
	}
}

// TestConditionalQMCRefuses: a model or budget that conditional QMC
// cannot serve is refused with an error matching ErrUnsuited, so that a
// caller can tell the user to choose another method.
func TestConditionalQMCRefuses(t *testing.T) {
	t.Parallel()
	correlated := caseB()
	correlated.Corr = []Correlation{{A: "R", B: "S", Rho: 0.2}}
	noLinear := caseB()
	noLinear.Linear = nil
	for _, c := range []struct {
		name    string
		m       *Model
		samples int64
	}{
		{"correlated linear input", correlated, 0},
		{"model without Linear", noLinear, 0},
		{"fewer samples than the 16 replicates", caseB(), 15},
	} {
		_, err := Run(context.Background(), c.m, &Settings{Method: ConditionalQMC, Samples: c.samples})
		if err == nil {
			t.Errorf("%s: accepted", c.name)
			continue
		}
		if !errors.Is(err, ErrUnsuited) {
			t.Errorf("%s: error %q does not match ErrUnsuited", c.name, err)
		}
	}
	if _, err := Run(context.Background(), caseB(), &Settings{Method: ConditionalQMC, Samples: 16, AuxSamples: -1}); err != nil {
		t.Errorf("16 samples, one per replicate: %v", err)
	}
}

// TestConditionalGain reproduces the variance reductions the engine is
// built for, on the reference strut at pf about 9e-3 and 4e-5: the
// variance of each estimator against crude Monte Carlo's pf(1-pf)/n at the
// same number of evaluations. A numpy trial quoted in the project's issue
// found about 10x (conditional) and 500x (with scrambled Sobol') at 9e-3,
// 800x and 30,000x at 4e-5; the bounds here are a third of those, as the
// variance estimates from 16 replicates scatter by about 40 %.
func TestConditionalGain(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		dead         float64
		mc, qmc      float64 // minimum gains
		samples      int64
		pfLo, pfHigh float64
	}{
		{1.2e6, 3, 100, 1 << 20, 8e-3, 10e-3},
		{0.6e6, 250, 5000, 1 << 20, 3e-5, 6e-5},
	} {
		m := columnModel(c.dead)
		tr, err := NewTransform(m)
		if err != nil {
			t.Fatal(err)
		}
		s := (&Settings{Samples: c.samples, Seed: 1}).withDefaults()
		for _, q := range []bool{false, true} {
			res, err := conditional(context.Background(), m, tr, &s, q)
			if err != nil {
				t.Fatal(err)
			}
			se := res.PfCoV * res.Pf
			gain := res.Pf * (1 - res.Pf) / float64(res.Evaluations) / (se * se)
			want := c.mc
			if q {
				want = c.qmc
			}
			if gain < want || res.Pf < c.pfLo || res.Pf > c.pfHigh {
				t.Errorf("dead %g, qmc %v: pf %v, variance gain %.0f, want at least %v", c.dead, q, res.Pf, gain, want)
			}
			t.Logf("dead %g, qmc %v: pf %.4g, gain %.0f", c.dead, q, res.Pf, gain)
		}
	}
}
