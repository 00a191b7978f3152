package sim

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/stat/distuv"
)

// distuvLike is the part of a gonum distribution compared here.
type distuvLike interface {
	CDF(float64) float64
	Prob(float64) float64
	Quantile(float64) float64
	Survival(float64) float64
	Mean() float64
	StdDev() float64
}

// TestDistAgainstDistuv compares each distribution with gonum's distuv
// implementation of the same law (the reference values).
func TestDistAgainstDistuv(t *testing.T) {
	t.Parallel()
	ln := func(mean, cov float64) distuv.LogNormal {
		s2 := math.Log1p(cov * cov)
		return distuv.LogNormal{Mu: math.Log(mean) - s2/2, Sigma: math.Sqrt(s2)}
	}
	gscale := 0.15e6 * math.Sqrt(6) / math.Pi
	for _, c := range []struct {
		name string
		got  Dist
		want distuvLike
		xs   []float64
	}{
		{"normal", mustDist(NewNormal(1.2e6, 1.2e5)), distuv.Normal{Mu: 1.2e6, Sigma: 1.2e5}, []float64{0.9e6, 1.1e6, 1.2e6, 1.5e6}},
		{"lognormal", mustDist(NewLognormal(300, 21)), ln(300, 0.07), []float64{250, 290, 300, 350}},
		{"lognormal log", mustDist(NewLognormalLog(5.7, 0.1)), distuv.LogNormal{Mu: 5.7, Sigma: 0.1}, []float64{250, 300, 350}},
		{"gumbel", mustDist(NewGumbel(0.6e6, 0.15e6)), distuv.GumbelRight{Mu: 0.6e6 - eulerGamma*gscale, Beta: gscale}, []float64{0.4e6, 0.6e6, 1.2e6}},
		{"gumbel loc", mustDist(NewGumbelLoc(10, 2)), distuv.GumbelRight{Mu: 10, Beta: 2}, []float64{5, 10, 20}},
		{"weibull", mustDist(NewWeibull(2.5, 40)), distuv.Weibull{K: 2.5, Lambda: 40}, []float64{5, 30, 40, 90}},
		{"uniform", mustDist(NewUniform(0.7, 1)), distuv.Uniform{Min: 0.7, Max: 1}, []float64{0.71, 0.85, 0.99}},
		{"triangular", mustDist(NewTriangular(1, 2, 5)), distuv.NewTriangle(1, 5, 2, nil), []float64{1.5, 2, 3, 4.5}},
		{"gamma", mustDist(NewGammaShape(3, 2)), distuv.Gamma{Alpha: 3, Beta: 0.5}, []float64{0.5, 4, 6, 20}},
		{"gamma mean", mustDist(NewGamma(10, 5)), distuv.Gamma{Alpha: 4, Beta: 0.4}, []float64{2, 10, 25}},
	} {
		for _, x := range c.xs {
			for _, f := range []struct {
				n         string
				got, want float64
			}{
				{"CDF", c.got.CDF(x), c.want.CDF(x)},
				{"Survival", c.got.Survival(x), c.want.Survival(x)},
				{"Prob", c.got.Prob(x), c.want.Prob(x)},
			} {
				if !scalar.EqualWithinAbsOrRel(f.got, f.want, 1e-12, 1e-9) {
					t.Errorf("%s %s(%v) = %v, want %v", c.name, f.n, x, f.got, f.want)
				}
			}
		}
		for _, p := range []float64{0.001, 0.05, 0.5, 0.95, 0.999} {
			if got, want := c.got.Quantile(p), c.want.Quantile(p); !scalar.EqualWithinAbsOrRel(got, want, 1e-9, 1e-7) {
				t.Errorf("%s Quantile(%v) = %v, want %v", c.name, p, got, want)
			}
		}
		if !scalar.EqualWithinRel(c.got.Mean(), c.want.Mean(), 1e-12) || !scalar.EqualWithinRel(c.got.StdDev(), c.want.StdDev(), 1e-9) {
			t.Errorf("%s mean, sd = %v, %v, want %v, %v", c.name, c.got.Mean(), c.got.StdDev(), c.want.Mean(), c.want.StdDev())
		}
	}
}

// TestParameterRelations checks the published relations between the
// moment and native parameters.
func TestParameterRelations(t *testing.T) {
	t.Parallel()
	// Lognormal: sigma^2 = ln(1 + cov^2), mu = ln(mean) - sigma^2/2
	// (Aitchison and Brown 1957, The Lognormal Distribution).
	l := mustDist(NewLognormal(300, 21)).(Lognormal)
	if want := math.Sqrt(math.Log(1 + 0.07*0.07)); !scalar.EqualWithinRel(l.sigma, want, 1e-14) {
		t.Errorf("lognormal sigma %v, want %v", l.sigma, want)
	}
	// Gumbel: scale = sd sqrt(6)/pi, location = mean - 0.5772 scale
	// (Gumbel 1958, Statistics of Extremes).
	g := mustDist(NewGumbel(0.6e6, 0.15e6)).(Gumbel)
	if want := 0.15e6 * math.Sqrt(6) / math.Pi; !scalar.EqualWithinRel(g.scale, want, 1e-14) {
		t.Errorf("gumbel scale %v, want %v", g.scale, want)
	}
	if want := 0.6e6 - 0.5772156649*g.scale; !scalar.EqualWithinRel(g.loc, want, 1e-10) {
		t.Errorf("gumbel location %v, want %v", g.loc, want)
	}
	// Characteristic value: the 5 % fractile of the lognormal equals xk.
	// References: JCSS Probabilistic Model Code part 3 (S355, lambda =
	// 5.959456, zeta = 0.069914, 5 % fractile 345.3 MPa).
	c := mustDist(NewLognormalChar(345.3, 0.05, math.Sqrt(math.Expm1(0.069914*0.069914))))
	if got := c.Quantile(0.05); !scalar.EqualWithinRel(got, 345.3, 1e-12) {
		t.Errorf("characteristic lognormal 5%% fractile %v, want 345.3", got)
	}
	// 345.3 is rounded to 0.05 MPa, that is 1.5e-4 in ln(x).
	if got := c.(Lognormal).mu; math.Abs(got-5.959456) > 1.5e-4 {
		t.Errorf("characteristic lognormal mu %v, want 5.959456", got)
	}
	// Weibull from mean and cov: shape 2 is the Rayleigh law with
	// cov = sqrt(4/pi - 1) (Johnson, Kotz and Balakrishnan, vol. 1, ch. 18).
	w := mustDist(NewWeibullMean(10, math.Sqrt(4/math.Pi-1))).(Weibull)
	if math.Abs(w.k-2) > 1e-9 || !scalar.EqualWithinRel(w.Mean(), 10, 1e-12) {
		t.Errorf("weibull shape %v mean %v, want 2 and 10", w.k, w.Mean())
	}
	// Shape 1 is the exponential law, cov = 1.
	if w := mustDist(NewWeibullMean(3, 1)).(Weibull); math.Abs(w.k-1) > 1e-9 {
		t.Errorf("weibull cov 1 shape %v, want 1", w.k)
	}
	for _, cov := range []float64{0.05, 0.2, 0.6} {
		w := mustDist(NewWeibullMean(5, cov))
		if got := w.StdDev() / w.Mean(); !scalar.EqualWithinRel(got, cov, 1e-9) || !scalar.EqualWithinRel(w.Mean(), 5, 1e-12) {
			t.Errorf("weibull mean 5 cov %v: got mean %v cov %v", cov, w.Mean(), got)
		}
	}
	// Half-normal: N(0, s) cut at 0 has mean s sqrt(2/pi) = 0.79788 s and
	// cov 0.75551 (JCSS Probabilistic Model Code part 3, eccentricities).
	h := mustDist(NewTruncNormal(0, 5, 0, math.Inf(1)))
	if !scalar.EqualWithinRel(h.Mean(), 5*math.Sqrt(2/math.Pi), 1e-12) || math.Abs(h.StdDev()/h.Mean()-0.75551) > 1e-5 {
		t.Errorf("half-normal mean %v cov %v, want %v and 0.75551", h.Mean(), h.StdDev()/h.Mean(), 5*math.Sqrt(2/math.Pi))
	}
	// Doubly truncated standard normal on [-1, 2]: mean
	// (phi(-1) - phi(2))/(Phi(2) - Phi(-1)) (Johnson, Kotz and
	// Balakrishnan vol. 1, ch. 13), checked against a sample.
	tn := mustDist(NewTruncNormal(0, 1, -1, 2))
	r := rand.New(rand.NewPCG(3, 4))
	sum := 0.0
	const n = 200000
	for i := 0; i < n; i++ {
		sum += tn.(drawer).draw(r)
	}
	if math.Abs(sum/n-tn.Mean()) > 4*tn.StdDev()/math.Sqrt(n) {
		t.Errorf("truncated normal sample mean %v, want %v", sum/n, tn.Mean())
	}
}

// TestTailAccuracy checks that FromStdNormal and ToStdNormal keep the
// upper tail: u = 8 must not collapse to Phi(8) = 1.
func TestTailAccuracy(t *testing.T) {
	t.Parallel()
	// Near a finite bound x itself cannot resolve a tail of 1e-16 (the
	// spacing of floats), so bounded sides are checked to |u| = 5.
	for _, c := range []struct {
		d      Dist
		lo, hi float64
	}{
		{mustDist(NewNormal(1, 2)), -8, 8},
		{mustDist(NewTruncNormal(0, 1, -1, math.Inf(1))), -5, 8},
		{mustDist(NewTruncNormal(10, 1, 0, 12)), -8, 5},
		{mustDist(NewLognormal(300, 21)), -8, 8},
		{mustDist(NewGumbel(0.6e6, 0.15e6)), -8, 8},
		{mustDist(NewWeibull(2, 1)), -8, 8},
		{mustDist(NewUniform(0, 1)), -5, 5},
		{mustDist(NewTriangular(0, 0.2, 1)), -5, 5},
		{mustDist(NewGammaShape(3, 1)), -8, 8},
	} {
		d := c.d
		for _, u := range []float64{c.lo, -3, 0, 0.5, 3, c.hi} {
			x := d.FromStdNormal(u)
			back := d.ToStdNormal(x)
			tol := 1e-6
			if _, ok := d.(Gamma); ok {
				tol = 1e-4 // gonum's inverse incomplete gamma: relative 1e-6 in x
			}
			if math.Abs(back-u) > tol*math.Max(1, math.Abs(u)) {
				t.Errorf("%v: ToStdNormal(FromStdNormal(%v)) = %v", d, u, back)
			}
		}
		// Upper-tail probability at u = 8 is Phi(-8) = 6.22096e-16
		// (from memory; also gonum-notes' 6.221e-16).
		if x := d.FromStdNormal(8); c.hi == 8 && !scalar.EqualWithinRel(d.Survival(x), 6.220960574271785e-16, 1e-4) {
			if _, ok := d.(Gamma); !ok {
				t.Errorf("%v: Survival(FromStdNormal(8)) = %v, want 6.22096e-16", d, d.Survival(x))
			}
		}
	}
}

func TestDistErrors(t *testing.T) {
	t.Parallel()
	inf := math.Inf(1)
	for _, c := range []struct {
		err  error
		want string
	}{
		{second(NewNormal(1, 0)), "sd"},
		{second(NewNormal(math.NaN(), 1)), "mean"},
		{second(NewTruncNormal(0, 1, 2, 1)), "lower < upper"},
		{second(NewTruncNormal(0, 1, 50, inf)), "no probability"},
		{second(NewLognormal(-1, 1)), "mean"},
		{second(NewLognormal(1, 0)), "sd"},
		{second(NewLognormalLog(1, -1)), "sigma"},
		{second(NewLognormalChar(100, 1.5, 0.1)), "fractile"},
		{second(NewLognormalChar(100, 0.05, 0)), "cov"},
		{second(NewGumbel(1, 0)), "sd"},
		{second(NewGumbelLoc(1, -2)), "scale"},
		{second(NewWeibull(0, 1)), "shape"},
		{second(NewWeibullMean(1, 0)), "cov"},
		{second(NewUniform(2, 2)), "min < max"},
		{second(NewTriangular(0, 3, 2)), "mode"},
		{second(NewGamma(1, 0)), "sd"},
		{second(NewGammaShape(1, 0)), "scale"},
		{second(NewFixed(inf)), "value"},
	} {
		if c.err == nil || !strings.Contains(c.err.Error(), c.want) {
			t.Errorf("error %v, want one naming %q", c.err, c.want)
		}
	}
}

func second(_ Dist, err error) error { return err }

// TestDrawMatchesMoments checks each fast sampler against the mean and sd
// of its own distribution (sampling tolerance, 5 standard errors).
func TestDrawMatchesMoments(t *testing.T) {
	t.Parallel()
	r := rand.New(rand.NewPCG(5, 6))
	for _, d := range []Dist{
		mustDist(NewNormal(1, 2)), mustDist(NewTruncNormal(0.5, 1, 0, 1)), mustDist(NewLognormal(300, 21)),
		mustDist(NewGumbel(0.6e6, 0.15e6)), mustDist(NewWeibull(1.5, 3)), mustDist(NewUniform(0.7, 1)),
		mustDist(NewTriangular(1, 4, 5)), mustDist(NewGammaShape(0.5, 2)), mustDist(NewGammaShape(4, 2)),
	} {
		const n = 100000
		var s1, s2 float64
		for i := 0; i < n; i++ {
			x := d.(drawer).draw(r)
			s1 += x
			s2 += x * x
		}
		m := s1 / n
		sd := math.Sqrt(s2/n - m*m)
		if math.Abs(m-d.Mean()) > 5*d.StdDev()/math.Sqrt(n) || math.Abs(sd-d.StdDev()) > 0.02*d.StdDev() {
			t.Errorf("%v: sample mean %v sd %v, want %v %v", d, m, sd, d.Mean(), d.StdDev())
		}
	}
}
