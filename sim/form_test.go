package sim

import (
	"math"
	"strings"
	"sync/atomic"
	"testing"
)

// lnParams returns the parameters of ln X for a lognormal X of mean m and
// coefficient of variation v: sigma^2 = ln(1 + v^2), mu = ln m - sigma^2/2
// (the standard moment relations of the lognormal distribution).
func lnParams(m, v float64) (mu, sigma float64) {
	sigma = math.Sqrt(math.Log(1 + v*v))
	return math.Log(m) - sigma*sigma/2, sigma
}

// lognormalRSBeta is the exact reliability index of g = R - S for
// independent lognormal R and S (means mr, ms; CoVs vr, vs):
//
//	beta = ln[(mr/ms) sqrt((1+vs^2)/(1+vr^2))] / sqrt(ln[(1+vr^2)(1+vs^2)])
//
// since ln R - ln S is normal (e.g. Melchers, Structural Reliability
// Analysis and Prediction, 2nd ed., Wiley 1999, ch. 3; from memory).
func lognormalRSBeta(mr, vr, ms, vs float64) float64 {
	return math.Log(mr/ms*math.Sqrt((1+vs*vs)/(1+vr*vr))) / math.Sqrt(math.Log((1+vr*vr)*(1+vs*vs)))
}

// lognormalRSSpace is g = R - S in standard normal space for lognormal R, S.
func lognormalRSSpace(mr, vr, ms, vs float64) *uSpace {
	mur, sr := lnParams(mr, vr)
	mus, ss := lnParams(ms, vs)
	return funcSpace(2, func(u []float64) float64 {
		return math.Exp(mur+sr*u[0]) - math.Exp(mus+ss*u[1])
	})
}

func TestFORMSinglePoint(t *testing.T) {
	cases := []struct {
		name     string
		sp       *uSpace
		beta     float64
		tol      float64
		wantImp0 float64 // importance of the first input; < 0 to skip
	}{
		{
			// Cornell (1969): R ~ N(200, 20), S ~ N(100, 30), g = R - S,
			// beta = (muR - muS)/sqrt(sR^2 + sS^2) = 100/sqrt(1300).
			name: "normal R-S",
			sp: funcSpace(2, func(u []float64) float64 {
				return (200 + 20*u[0]) - (100 + 30*u[1])
			}),
			beta:     100 / math.Sqrt(1300),
			tol:      1e-6,
			wantImp0: 400.0 / 1300,
		},
		{
			// Lognormal R (mean 150, V 0.10) and S (mean 100, V 0.20):
			// exact formula in lognormalRSBeta, 1.894516.
			name:     "lognormal R-S",
			sp:       lognormalRSSpace(150, 0.10, 100, 0.20),
			beta:     lognormalRSBeta(150, 0.10, 100, 0.20),
			tol:      1e-6,
			wantImp0: math.Log(1.01) / math.Log(1.01*1.04),
		},
		{
			// Paraboloid g = beta - u2 + (kappa/2) u1^2, beta = 3,
			// kappa = 0.2: the design point is (0, 3), so FORM gives
			// Phi(-3) (the exact Pf is 1.04360e-3 by quadrature; FORM
			// cannot see the curvature). Standard curved benchmark,
			// e.g. Breitung, J. Eng. Mech. 110(3), 1984, 357-366.
			name: "paraboloid kappa 0.2",
			sp: funcSpace(2, func(u []float64) float64 {
				return 3 - u[1] + 0.1*u[0]*u[0]
			}),
			beta:     3,
			tol:      1e-6,
			wantImp0: 0,
		},
		{
			name: "paraboloid kappa -0.2",
			sp: funcSpace(2, func(u []float64) float64 {
				return 3 - u[1] - 0.1*u[0]*u[0]
			}),
			beta:     3,
			tol:      1e-6,
			wantImp0: 0,
		},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			var calls atomic.Int64
			sp := &uSpace{dim: c.sp.dim, newG: func() func([]float64) float64 { return countingG(c.sp.newG(), &calls) }}
			r := formRun(sp, nil)
			if !r.Converged {
				t.Fatalf("not converged: %s", r.Status)
			}
			if len(r.Points) != 1 {
				t.Fatalf("%d design points, want 1: %+v", len(r.Points), r.Points)
			}
			if math.Abs(r.Beta-c.beta) > c.tol {
				t.Errorf("beta = %.9f, want %.9f", r.Beta, c.beta)
			}
			if want := formTail(c.beta); math.Abs(r.Pf-want) > 1e-6*want {
				t.Errorf("pf = %.6g, want Phi(-beta) = %.6g", r.Pf, want)
			}
			p := r.Points[0]
			var sum float64
			for _, v := range p.Importance {
				sum += v
			}
			if math.Abs(sum-1) > 1e-12 {
				t.Errorf("importance factors sum to %v", sum)
			}
			if math.Abs(p.Importance[0]-c.wantImp0) > 1e-5 {
				t.Errorf("importance[0] = %.7f, want %.7f", p.Importance[0], c.wantImp0)
			}
			// Alpha = -U/Beta at the design point.
			for i := range p.U {
				if math.Abs(p.Alpha[i]+p.U[i]/p.Beta) > 1e-5 {
					t.Errorf("alpha[%d] = %v, -u/beta = %v", i, p.Alpha[i], -p.U[i]/p.Beta)
				}
			}
			if int64(r.Evaluations) != calls.Load() {
				t.Errorf("Evaluations = %d, g was called %d times", r.Evaluations, calls.Load())
			}
		})
	}
}

func TestFORMSymmetricTwoPoints(t *testing.T) {
	// g = b - |u1|: failure on both sides, exact Pf = 2 Phi(-b); the two
	// design points are opposite (rho = -1), so the series system is exact.
	const b = 3.0
	sp := funcSpace(2, func(u []float64) float64 { return b - math.Abs(u[0]) + 0*u[1] })
	r := formRun(sp, nil)
	if !r.Converged {
		t.Fatalf("not converged: %s", r.Status)
	}
	if len(r.Points) != 2 {
		t.Fatalf("%d design points, want 2", len(r.Points))
	}
	want := 2 * formTail(b)
	if math.Abs(r.Pf-want) > 1e-9*want {
		t.Errorf("pf = %.8g, want 2 Phi(-%g) = %.8g", r.Pf, b, want)
	}
	if u0, u1 := r.Points[0].U[0], r.Points[1].U[0]; math.Abs(u0+u1) > 1e-4 || math.Abs(math.Abs(u0)-b) > 1e-4 {
		t.Errorf("design points at u1 = %v and %v, want -+%g", u0, u1, b)
	}
}

// bowCase is g = R - S (1 + |e|) with R ~ N(muR, sR), S ~ N(muS, sS) and
// an imperfection e ~ N(0, se) as likely to either side.
type bowCase struct{ muR, sR, muS, sS, se float64 }

func (c bowCase) space() *uSpace {
	return funcSpace(3, func(u []float64) float64 {
		return (c.muR + c.sR*u[0]) - (c.muS+c.sS*u[1])*(1+math.Abs(c.se*u[2]))
	})
}

// exactPf integrates over e: given e, g is normal with mean
// muR - muS(1+|e|) and variance sR^2 + sS^2 (1+|e|)^2.
func (c bowCase) exactPf() float64 {
	f := func(z float64) float64 {
		k := 1 + c.se*z
		m := c.muR - c.muS*k
		s := math.Sqrt(c.sR*c.sR + c.sS*c.sS*k*k)
		return 2 * formPhi(z) * formTail(m/s)
	}
	return formSimpson(f, 0, 12, 1e-16)
}

func formPhi(z float64) float64 { return math.Exp(-z*z/2) / math.Sqrt(2*math.Pi) }

func TestFORMBowTwoPoints(t *testing.T) {
	// Single-point FORM sees one side of the bow only and misses about
	// half of Pf; the two-point series system recovers it. The reference
	// is the exact 1-D integral over e (bowCase.exactPf).
	c := bowCase{muR: 300, sR: 30, muS: 150, sS: 15, se: 0.3}
	exact := c.exactPf()
	r := formRun(c.space(), nil)
	if !r.Converged {
		t.Fatalf("not converged: %s", r.Status)
	}
	if len(r.Points) != 2 {
		t.Fatalf("%d design points, want 2: %s", len(r.Points), r.Status)
	}
	p0, p1 := r.Points[0], r.Points[1]
	if math.Abs(p0.Beta-p1.Beta) > 1e-4 || math.Abs(p0.U[2]+p1.U[2]) > 1e-3 || math.Abs(p0.U[2]) < 0.1 {
		t.Errorf("points not mirrored in e: %v, %v", p0.U, p1.U)
	}
	single := formTail(p0.Beta)
	if ratio := r.Pf / exact; math.Abs(ratio-1) > 0.15 {
		t.Errorf("two-point FORM pf = %.4g, exact %.4g (ratio %.3f)", r.Pf, exact, ratio)
	}
	if ratio := single / exact; ratio > 0.65 {
		t.Errorf("single-point pf = %.4g should miss about half of %.4g", single, exact)
	}
	t.Logf("exact %.5g, series %.5g, single point %.5g, beta %.4f, %d evaluations", exact, r.Pf, single, r.Beta, r.Evaluations)
}

func TestFORMNotConverged(t *testing.T) {
	cases := []struct {
		name, status string
		g            func(u []float64) float64
	}{
		// g >= 1 everywhere, flattening as u1 -> -inf.
		{"never negative", "", func(u []float64) float64 { return 2 + math.Tanh(u[0]) + 0*u[1] }},
		{"zero gradient", "zero gradient", func(u []float64) float64 { return 1 + u[0]*u[0] + u[1]*u[1] }},
		// The root u1 = 0.5 lies beyond the region where g is defined.
		{"undefined beyond", "undefined", func(u []float64) float64 {
			if u[0] > 0.4 {
				return math.NaN()
			}
			return 3 - 6*u[0] + 0*u[1]
		}},
		{"undefined at median", "median", func(u []float64) float64 { return math.NaN() }},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			r := formRun(funcSpace(2, c.g), &FORMSettings{MaxIter: 50})
			if r.Converged {
				t.Fatalf("converged (%s) on a pathological g", r.Status)
			}
			t.Logf("status: %s", r.Status)
			if !strings.Contains(r.Status, c.status) {
				t.Errorf("status %q does not mention %q", r.Status, c.status)
			}
		})
	}
}

func TestFORMIterationLimit(t *testing.T) {
	r := formRun(lognormalRSSpace(150, 0.10, 100, 0.20), &FORMSettings{MaxIter: 1, Tol: 1e-15})
	if r.Converged || !strings.Contains(r.Status, "not converged after 1") {
		t.Errorf("converged = %v, status %q", r.Converged, r.Status)
	}
}

func TestFORMSeriesSystem(t *testing.T) {
	// Sheppard (1899): P(Z1 > 0, Z2 > 0) = 1/4 + asin(rho)/(2 pi).
	for _, rho := range []float64{-0.9, -0.5, 0, 0.3, 0.8, 0.99} {
		got := formUnion2(0, 0, rho)
		want := 1 - (0.25 + math.Asin(rho)/(2*math.Pi))
		if math.Abs(got-want) > 1e-10 {
			t.Errorf("rho %v: union %.12f, want %.12f", rho, got, want)
		}
	}
	// Independent points: 1 - (1 - p1)(1 - p2), in the far tail.
	p1, p2 := formTail(4), formTail(4.5)
	if got, want := formUnion2(4, 4.5, 0), p1+p2-p1*p2; math.Abs(got-want) > 1e-9*want {
		t.Errorf("independent union %.10g, want %.10g", got, want)
	}
	// Three points, trivariate orthant probability (Steck 1962 / the
	// classical formula): P(all Z_i > 0) = 1/8 + sum asin(rho_ij)/(4 pi);
	// at b = 0, P(union Z_i > 0) = 1 - P(all Z_i <= 0) = 1 - P(all > 0).
	r := [][]float64{{1, 0.5, 0.2}, {0.5, 1, -0.3}, {0.2, -0.3, 1}}
	orth := 0.125 + (math.Asin(0.5)+math.Asin(0.2)+math.Asin(-0.3))/(4*math.Pi)
	if got := formUnionGenz([]float64{0, 0, 0}, r); math.Abs(got-(1-orth)) > 2e-4 {
		t.Errorf("trivariate union %.6f, want %.6f", got, 1-orth)
	}
	// Three independent tail events.
	b := []float64{3, 3.5, 4}
	id := [][]float64{{1, 0, 0}, {0, 1, 0}, {0, 0, 1}}
	want := 1 - (1-formTail(3))*(1-formTail(3.5))*(1-formTail(4))
	if got := formUnionGenz(b, id); math.Abs(got-want) > 1e-6*want {
		t.Errorf("independent 3-union %.8g, want %.8g", got, want)
	}
	// Singular: two opposite points and a third orthogonal one.
	al := [][]float64{{1, 0}, {-1, 0}, {0, 1}}
	want = 1 - (1-2*formTail(3))*(1-formTail(3.5))
	// (The regularised singular case makes the lattice integrand
	// discontinuous: about 1 % accuracy.)
	if got := formSeriesPf([]float64{3, 3, 3.5}, al); math.Abs(got-want) > 2e-2*want {
		t.Errorf("singular 3-union %.8g, want %.8g", got, want)
	}
}

func TestFORMModel(t *testing.T) {
	// Through the Model and its transformation: references.md cases A and
	// B, from Cornell's formula and the exact lognormal formula.
	normal := func(m, s float64) Dist {
		d, err := NewNormal(m, s)
		if err != nil {
			t.Fatal(err)
		}
		return d
	}
	lognormal := func(m, v float64) Dist {
		d, err := NewLognormal(m, v*m)
		if err != nil {
			t.Fatal(err)
		}
		return d
	}
	cases := []struct {
		name string
		r, s Dist
		beta float64
	}{
		// Cornell: (200 - 100)/sqrt(20^2 + 30^2) = 2.773501.
		{"A normal", normal(200, 20), normal(100, 30), 100 / math.Sqrt(1300)},
		// Exact lognormal formula: 1.894516.
		{"B lognormal", lognormal(150, 0.10), lognormal(100, 0.20), lognormalRSBeta(150, 0.10, 100, 0.20)},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			m := &Model{
				Vars: []Variable{{Name: "R", Dist: c.r}, {Name: "S", Dist: c.s}},
				G:    func(x, _ []float64) float64 { return x[0] - x[1] },
			}
			r, err := FORM(m, nil)
			if err != nil {
				t.Fatal(err)
			}
			if !r.Converged || len(r.Points) != 1 {
				t.Fatalf("converged %v, %d points: %s", r.Converged, len(r.Points), r.Status)
			}
			if math.Abs(r.Beta-c.beta) > 1e-6 {
				t.Errorf("beta %.9f, want %.9f", r.Beta, c.beta)
			}
			p := r.Points[0]
			// The design point lies on the limit state: R* = S*.
			if math.Abs(p.X[0]-p.X[1]) > 1e-6*p.X[0] {
				t.Errorf("design point %v is not on g = 0", p.X)
			}
			// R is a resistance (alpha > 0), S a load (alpha < 0).
			if p.Alpha[0] <= 0 || p.Alpha[1] >= 0 {
				t.Errorf("alpha %v", p.Alpha)
			}
		})
	}
	// Correlated normal R and S (rho = 0.5): the Nataf transformation is
	// exact for normals and beta = (muR - muS)/sqrt(sR^2 + sS^2 -
	// 2 rho sR sS) (Cornell's index of the normal margin R - S).
	m := &Model{
		Vars: []Variable{{Name: "R", Dist: normal(200, 20)}, {Name: "S", Dist: normal(100, 30)}},
		Corr: []Correlation{{A: "R", B: "S", Rho: 0.5}},
		G:    func(x, _ []float64) float64 { return x[0] - x[1] },
	}
	r, err := FORM(m, nil)
	if err != nil || !r.Converged {
		t.Fatalf("correlated: %v %+v", err, r)
	}
	if want := 100 / math.Sqrt(400+900-2*0.5*20*30); math.Abs(r.Beta-want) > 1e-6 {
		t.Errorf("correlated: beta %.8f, want %.8f", r.Beta, want)
	}
	if _, err := FORM(&Model{Vars: []Variable{{Name: "R", Dist: normal(1, 1)}}}, nil); err == nil {
		t.Error("no error for a model without G")
	}
}

// countingG wraps g so that calls are counted in *n.
func countingG(g func(u []float64) float64, n *atomic.Int64) func(u []float64) float64 {
	return func(u []float64) float64 {
		n.Add(1)
		return g(u)
	}
}

func TestFORMFourPoints(t *testing.T) {
	// g = b - max(|u1|, |u2|): four design points at ±b on both axes;
	// exact Pf = 1 - (1 - 2 Phi(-b))^2, and the series system of the four
	// half-planes is exact too (to the accuracy of the Genz integration
	// of its singular correlation, about 1 %).
	const b = 3.0
	sp := funcSpace(2, func(u []float64) float64 { return b - math.Max(math.Abs(u[0]), math.Abs(u[1])) })
	r := formRun(sp, nil)
	if !r.Converged || len(r.Points) != 4 {
		t.Fatalf("converged %v, %d points: %s", r.Converged, len(r.Points), r.Status)
	}
	q := 2 * formTail(b)
	want := 1 - (1-q)*(1-q)
	if math.Abs(r.Pf-want) > 0.02*want {
		t.Errorf("pf %.6g, want %.6g", r.Pf, want)
	}
	// MaxPoints stops the search.
	r = formRun(sp, &FORMSettings{MaxPoints: 2})
	if len(r.Points) != 2 || !strings.Contains(r.Status, "MaxPoints") {
		t.Errorf("%d points with MaxPoints 2: %s", len(r.Points), r.Status)
	}
}

// TestFORMNoisyLimitState checks FORM on a limit state with rounding noise,
// as an iterative capacity model has: g = 1e6 (3 - u1) plus a deterministic
// noise of a few units (a few parts in 1e6 of g0). The exact design point of
// the noise-free plane is beta = 3 (a linear limit state in standard normal
// space: beta is its distance from the origin, Hasofer and Lind 1974).
func TestFORMNoisyLimitState(t *testing.T) {
	noise := func(u []float64) float64 {
		h := math.Float64bits(u[0])*0x9e3779b97f4a7c15 ^ math.Float64bits(u[1])*0xbf58476d1ce4e5b9
		h ^= h >> 31
		return 5 * (float64(h>>11)/(1<<53) - 0.5)
	}
	r := formRun(funcSpace(2, func(u []float64) float64 {
		return 1e6*(3-u[0]) + noise(u)
	}), nil)
	t.Logf("status: %s; beta %.6f", r.Status, r.Beta)
	if !r.Converged {
		t.Fatalf("not converged on a noisy plane: %s", r.Status)
	}
	if math.Abs(r.Beta-3) > 1e-3 {
		t.Errorf("beta %v, want 3", r.Beta)
	}
}

// TestFORMNoisyLognormalRS checks FORM on g = R - S with lognormal R and S
// and a deterministic pseudo-noise of relative size 1e-5 on g, as a
// numerical capacity model has. Without the noise the exact index is
//
//	beta = ln[(muR/muS) sqrt((1+VS^2)/(1+VR^2))] / sqrt(ln[(1+VR^2)(1+VS^2)])
//
// (Melchers and Beck, Structural Reliability Analysis and Prediction, 3rd
// ed., 2018, chapter 3, lognormal R and S; from memory), and FORM finds it
// exactly: ln R - ln S is linear in standard normal space.
func TestFORMNoisyLognormalRS(t *testing.T) {
	noise := func(x []float64) float64 {
		h := math.Float64bits(x[0])*0x9e3779b97f4a7c15 ^ math.Float64bits(x[1])*0xbf58476d1ce4e5b9
		h ^= h >> 29
		h *= 0x94d049bb133111eb
		h ^= h >> 32
		return 2 * (float64(h>>11)/(1<<53) - 0.5) // in [-1, 1)
	}
	for _, c := range []struct {
		muR, vR, muS, vS float64
	}{
		{3000, 0.10, 1500, 0.20},
		{2500, 0.07, 1000, 0.30},
		{1800, 0.15, 1000, 0.10},
	} {
		r, err := NewLognormal(c.muR, c.vR*c.muR)
		if err != nil {
			t.Fatal(err)
		}
		s, err := NewLognormal(c.muS, c.vS*c.muS)
		if err != nil {
			t.Fatal(err)
		}
		m := &Model{
			Vars: []Variable{{Name: "R", Dist: r}, {Name: "S", Dist: s}},
			G: func(x, _ []float64) float64 {
				return (x[0] - x[1]) + 1e-5*c.muR*noise(x)
			},
		}
		want := math.Log(c.muR/c.muS*math.Sqrt((1+c.vS*c.vS)/(1+c.vR*c.vR))) /
			math.Sqrt(math.Log((1+c.vR*c.vR)*(1+c.vS*c.vS)))
		for _, step := range []float64{0, 1e-2} {
			f, err := FORM(m, &FORMSettings{Step: step})
			if err != nil {
				t.Fatal(err)
			}
			if !f.Converged || math.Abs(f.Beta-want) > 1e-3 {
				t.Errorf("%+v, step %g: beta %.6f (converged %v: %s), exact %.6f", c, step, f.Beta, f.Converged, f.Status, want)
			}
			t.Logf("%+v, step %g: beta %.6f exact %.6f, %d evaluations: %s", c, step, f.Beta, want, f.Evaluations, f.Status)
		}
	}
}
