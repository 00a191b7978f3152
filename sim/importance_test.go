package sim

import (
	"context"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// lognormalRSModel is g = R - S with independent lognormal R and S.
func lognormalRSModel(t *testing.T, mr, vr, ms, vs float64) *Model {
	t.Helper()
	r, err := NewLognormal(mr, vr*mr)
	if err != nil {
		t.Fatal(err)
	}
	s, err := NewLognormal(ms, vs*ms)
	if err != nil {
		t.Fatal(err)
	}
	return &Model{
		Vars: []Variable{{Name: "R", Dist: r}, {Name: "S", Dist: s}},
		G:    func(x, _ []float64) float64 { return x[0] - x[1] },
	}
}

// The beta-about-4.5 case of the checks: R lognormal (mean 270, V 0.10),
// S lognormal (mean 100, V 0.20); lognormalRSBeta gives beta = 4.53.
const (
	rs45MR, rs45VR = 270.0, 0.10
	rs45MS, rs45VS = 100.0, 0.20
)

// sumExpSpace is g = C - sum_{i=1..n} X_i with X_i iid Exp(1), written in
// standard normal space through X = -ln Phi(-u).
func sumExpSpace(n int, c float64) *uSpace {
	return funcSpace(n, func(u []float64) float64 {
		s := c
		for _, v := range u {
			s += math.Log(distuv.UnitNormal.CDF(-v))
		}
		return s
	})
}

// sumExpPf is the exact Pf of sumExpSpace: the sum of n unit exponentials
// is Gamma(n, 1), so P(sum > C) = Q(n, C) = e^-C sum_{k<n} C^k/k!
// (Erlang survival function; the sum-of-exponentials benchmark family of
// Engelund and Rackwitz, Structural Safety 12, 1993).
func sumExpPf(n int, c float64) float64 {
	term, sum := 1.0, 1.0
	for k := 1; k < n; k++ {
		term *= c / float64(k)
		sum += term
	}
	return math.Exp(-c) * sum
}

func TestImportanceLognormal45(t *testing.T) {
	m := lognormalRSModel(t, rs45MR, rs45VR, rs45MS, rs45VS)
	exact := lognormalRSBeta(rs45MR, rs45VR, rs45MS, rs45VS)
	tr, err := NewTransform(m)
	if err != nil {
		t.Fatal(err)
	}
	f, err := FORM(m, nil)
	if err != nil || !f.Converged {
		t.Fatalf("FORM: %v %+v", err, f)
	}
	// FORM is exact here: ln R - ln S = 0 is a plane in u space.
	if math.Abs(f.Beta-exact) > 1e-6 {
		t.Errorf("FORM beta %.8f, exact %.8f", f.Beta, exact)
	}
	r, err := importanceSampling(context.Background(), m, tr, f, &Settings{Samples: 20000, Seed: 7})
	if err != nil {
		t.Fatal(err)
	}
	total := r.Evaluations + int64(f.Evaluations)
	if total > 50000 {
		t.Errorf("%d evaluations, more than 50000", total)
	}
	if math.Abs(r.Beta-exact) > 0.05 {
		t.Errorf("beta %.4f, exact %.4f", r.Beta, exact)
	}
	if p := formTail(exact); p < r.PfCI[0] || p > r.PfCI[1] {
		t.Errorf("exact pf %.5g outside the 95 %% interval %v", p, r.PfCI)
	}
	if len(r.Warnings) != 0 || r.Method != Importance || r.FORM != f {
		t.Errorf("warnings %v, method %s, FORM %p", r.Warnings, r.Method, r.FORM)
	}
	t.Logf("beta %.4f (exact %.4f), pf %.4g, CoV %.3f, %d evaluations", r.Beta, exact, r.Pf, r.PfCoV, total)
}

func TestImportanceBenchmarks(t *testing.T) {
	cases := []struct {
		name  string
		sp    *uSpace
		exact float64
		n     int64
	}{
		// Paraboloid g = 4 - u2 + 0.05 u1^2 (beta 4, kappa 0.1):
		// Pf = ∫ phi(u1) Phi(-4 - 0.05 u1^2) du1 = 2.65075e-5.
		{"paraboloid 4, 0.1", paraboloidSpace(4, 0.1), paraboloidPf(4, 0.1), 10000},
		{"paraboloid 2.5, 0.5", paraboloidSpace(2.5, 0.5), paraboloidPf(2.5, 0.5), 10000},
		// g = b - |u1|, two opposite design points: Pf = 2 Phi(-3.5).
		{"symmetric", funcSpace(2, func(u []float64) float64 { return 3.5 - math.Abs(u[0]) + 0*u[1] }), 2 * formTail(3.5), 10000},
		{"paraboloid 3, -0.2", paraboloidSpace(3, -0.2), paraboloidPf(3, -0.2), 10000},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			f := formRun(c.sp, nil)
			if !f.Converged {
				t.Fatalf("FORM: %s", f.Status)
			}
			r, err := importanceRun(context.Background(), c.sp, f.Points, &Settings{Samples: c.n, Seed: 3})
			if err != nil {
				t.Fatal(err)
			}
			se := r.Pf * r.PfCoV
			if math.Abs(r.Pf-c.exact) > 3*se || r.PfCoV > 0.1 {
				t.Errorf("pf %.5g ± %.2g, exact %.5g", r.Pf, se, c.exact)
			}
			if importanceDegenerate(r) {
				t.Errorf("flagged degenerate: %v", r.Warnings)
			}
			t.Logf("pf %.5g ± %.2g (exact %.5g, FORM %.5g with %d points), %d+%d evaluations", r.Pf, se, c.exact, f.Pf, len(f.Points), f.Evaluations, r.Evaluations)
		})
	}
}

// paraboloidSpace is the paraboloid g = beta - u2 + (kappa/2) u1^2, the
// standard curved limit state of second-order reliability (Breitung,
// "Asymptotic approximations for multinormal integrals", Journal of
// Engineering Mechanics 110(3), 1984, 357-366).
func paraboloidSpace(beta, kappa float64) *uSpace {
	return funcSpace(2, func(u []float64) float64 { return beta - u[1] + kappa/2*u[0]*u[0] })
}

// paraboloidPf is the exact Pf of g = beta - u2 + (kappa/2) u1^2 by
// quadrature of ∫ phi(u1) Phi(-beta - kappa u1^2/2) du1.
func paraboloidPf(beta, kappa float64) float64 {
	f := func(z float64) float64 { return 2 * formPhi(z) * formTail(beta+kappa*z*z/2) }
	return formSimpson(f, 0, 12, 1e-18)
}

func TestParaboloidReference(t *testing.T) {
	// Guards the quadrature used as a reference: published values of the
	// exact paraboloid Pf (1.04360e-3 at beta 3, kappa 0.2; 3.94416e-3 at
	// beta 2.5, kappa 0.5), computed from the same integral.
	for _, c := range []struct{ beta, kappa, want float64 }{{3, 0.2, 1.04360e-3}, {2.5, 0.5, 3.94416e-3}, {3, -0.2, 2.12569e-3}, {4, 0.1, 2.65075e-5}} {
		if got := paraboloidPf(c.beta, c.kappa); math.Abs(got-c.want) > 1e-5*c.want {
			t.Errorf("paraboloid(%v, %v) = %.6g, want %.6g", c.beta, c.kappa, got, c.want)
		}
	}
	if got := sumExpPf(20, 40); math.Abs(got-1.76303e-4) > 1e-5*1.76303e-4 {
		t.Errorf("Q(20, 40) = %.6g, want 1.76303e-4", got)
	}
}

func TestImportanceSinglePointMissesHalf(t *testing.T) {
	// With only one of the two design points of g = b - |u1|, sampling
	// never reaches the other half of the failure domain: the estimate is
	// about Phi(-b), half the truth. The mixture of TestImportanceBenchmarks
	// is what fixes it.
	sp := funcSpace(2, func(u []float64) float64 { return 3.5 - math.Abs(u[0]) + 0*u[1] })
	f := formRun(sp, nil)
	r, err := importanceRun(context.Background(), sp, f.Points[:1], &Settings{Samples: 10000, Seed: 3})
	if err != nil {
		t.Fatal(err)
	}
	if ratio := r.Pf / (2 * formTail(3.5)); math.Abs(ratio-0.5) > 0.05 {
		t.Errorf("one-point estimate / truth = %.3f, want about 0.5", ratio)
	}
}

func TestImportanceDegenerate(t *testing.T) {
	sp := funcSpace(2, func(u []float64) float64 { return 3 - u[0] })
	cases := []struct {
		name string
		u    []float64
		poor bool
	}{
		{"true design point", []float64{3, 0}, false},
		// Far from the failure domain u1 > 3 in the wrong direction: few
		// samples fail and their weights spread over many decades.
		{"wrong direction", []float64{0, 5}, true},
		// Deep inside the safe domain: no sample fails.
		{"safe side", []float64{-6, 0}, true},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			p := DesignPoint{U: c.u, Beta: formNorm(c.u)}
			r, err := importanceRun(context.Background(), sp, []DesignPoint{p}, &Settings{Samples: 20000, Seed: 1})
			if err != nil {
				t.Fatal(err)
			}
			if got := importanceDegenerate(r); got != c.poor {
				t.Errorf("degenerate = %v, want %v (pf %.4g, warnings %v)", got, c.poor, r.Pf, r.Warnings)
			}
			if c.poor {
				t.Logf("warning: %v", r.Warnings)
			}
		})
	}
}

func TestImportanceFlagsStrongCurvature(t *testing.T) {
	// The sum of 20 unit exponentials above 40 (exact Q(20, 40) =
	// 1.76303e-4) has its FORM beta at 4.93 against the true 3.57: the
	// design point describes the failure domain poorly, the weights
	// degenerate and the flag goes up, although the estimate itself stays
	// within its own error bars.
	sp := sumExpSpace(20, 40)
	f := formRun(sp, nil)
	r, err := importanceRun(context.Background(), sp, f.Points, &Settings{Samples: 20000, Seed: 3})
	if err != nil {
		t.Fatal(err)
	}
	if !importanceDegenerate(r) {
		t.Errorf("not flagged: FORM pf %.3g, IS %.4g, warnings %v", f.Pf, r.Pf, r.Warnings)
	}
	exact := sumExpPf(20, 40)
	if math.Abs(r.Pf-exact) > 3*r.Pf*r.PfCoV {
		t.Errorf("pf %.5g ± %.2g, exact %.5g", r.Pf, r.Pf*r.PfCoV, exact)
	}
}

func TestImportanceDeterminism(t *testing.T) {
	sp := paraboloidSpace(3, 0.2)
	f := formRun(sp, nil)
	var first *Result
	for _, w := range []int{1, 2, 4} {
		r, err := importanceRun(context.Background(), sp, f.Points, &Settings{Samples: 9500, Seed: 11, Workers: w})
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
	r, _ := importanceRun(context.Background(), sp, f.Points, &Settings{Samples: 9500, Seed: 12})
	if r.Pf == first.Pf {
		t.Errorf("seeds 11 and 12 gave the same pf %v", r.Pf)
	}
}

func TestImportanceTargetCoV(t *testing.T) {
	sp := paraboloidSpace(4, 0.1)
	f := formRun(sp, nil)
	var prev *Result
	for _, w := range []int{1, 3} {
		r, err := importanceRun(context.Background(), sp, f.Points, &Settings{Samples: 1_000_000, TargetCoV: 0.02, Seed: 5, Workers: w})
		if err != nil {
			t.Fatal(err)
		}
		if r.PfCoV > 0.02 || r.Evaluations >= 1_000_000 || r.Evaluations%importanceBlockSize != 0 {
			t.Errorf("stopped at %d evaluations with CoV %.4f", r.Evaluations, r.PfCoV)
		}
		if prev != nil && (r.Evaluations != prev.Evaluations || r.Pf != prev.Pf) {
			t.Errorf("stopping point depends on workers: %d vs %d", r.Evaluations, prev.Evaluations)
		}
		prev = r
	}
	// Exact paraboloid Pf within 3 standard errors.
	if exact := paraboloidPf(4, 0.1); math.Abs(prev.Pf-exact) > 3*prev.Pf*prev.PfCoV {
		t.Errorf("pf %.5g, exact %.5g", prev.Pf, exact)
	}
}

func TestImportanceNeedsFORM(t *testing.T) {
	m := lognormalRSModel(t, 150, 0.1, 100, 0.2)
	tr, _ := NewTransform(m)
	if _, err := importanceSampling(context.Background(), m, tr, &FORMResult{Status: "not converged after 3 iterations"}, nil); err == nil || !strings.Contains(err.Error(), "not converged") {
		t.Errorf("error %v", err)
	}
}
