package sim

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// TestMaximumOfGumbel: the Gumbel distribution is max-stable (Gumbel 1958,
// Statistics of Extremes; any extreme-value text): F(x)^n is again a
// Gumbel of the same scale, its location moved by scale ln n. The
// converted CDF must equal F^n computed directly, to 1e-12, for n above
// and below 1.
func TestMaximumOfGumbel(t *testing.T) {
	base := mustDist(NewGumbel(300, 90)) // mean 300, cov 0.3
	g := base.(Gumbel)
	for _, n := range []float64{50, 10, 1, 0.5, 1.0 / 50} {
		d, err := MaximumOf(base, n)
		if err != nil {
			t.Fatal(err)
		}
		c, ok := d.(Gumbel)
		if !ok {
			t.Fatalf("n %g: %T, want an exact gumbel", n, d)
		}
		if c.scale != g.scale || math.Abs(c.loc-(g.loc+g.scale*math.Log(n))) > 1e-12*g.loc {
			t.Errorf("n %g: location %g scale %g", n, c.loc, c.scale)
		}
		for _, x := range []float64{0, 150, 300, 600, 1000, 1500} {
			// Direct F^n, with the CDF of the base written out.
			direct := math.Pow(math.Exp(-math.Exp(-(x-g.loc)/g.scale)), n)
			if got := d.CDF(x); math.Abs(got-direct) > 1e-12 {
				t.Errorf("n %g x %g: CDF %.15g, F^n %.15g", n, x, got, direct)
			}
		}
	}
}

// TestMaximumOfAgainstDirect: the maximum of n for a normal and a
// lognormal against F^n and F^-1(p^(1/n)) computed directly with gonum's
// distuv, at several fractiles including far tails. Both bases are a
// monotone map of a standard normal z (x = mu + sigma z, x = exp(m + s z)),
// so the references take F(x) = Phi(z) and 1 - F(x) = Phi(-z) from
// distuv.UnitNormal.CDF, accurate in both tails (distuv's Survival is
// 1 - Erf, which is not), and 1 - F^n = -expm1(n log1p(-Phi(-z))).
func TestMaximumOfAgainstDirect(t *testing.T) {
	s2 := math.Log1p(0.25 * 0.25)
	m, s := math.Log(100)-s2/2, math.Sqrt(s2)
	std := distuv.UnitNormal
	for _, c := range []struct {
		name string
		base Dist
		ref  distuv.Quantiler
		x    func(z float64) float64
	}{
		{"normal", mustDist(NewNormal(100, 20)), distuv.Normal{Mu: 100, Sigma: 20}, func(z float64) float64 { return 100 + 20*z }},
		{"lognormal", mustDist(NewLognormal(100, 25)), distuv.LogNormal{Mu: m, Sigma: s}, func(z float64) float64 { return math.Exp(m + s*z) }},
	} {
		for _, n := range []float64{2, 50, 1000} {
			d, err := MaximumOf(c.base, n)
			if err != nil {
				t.Fatal(err)
			}
			// Quantiles: F^-1(p^(1/n)), p^(1/n) by exp(ln p / n), from distuv.
			for _, p := range []float64{1e-12, 1e-6, 0.05, 0.5, 0.98} {
				want := c.ref.Quantile(math.Exp(math.Log(p) / n))
				if got := d.Quantile(p); math.Abs(got/want-1) > 1e-9 {
					t.Errorf("%s n %g: Quantile(%g) %.12g, want %.12g", c.name, n, p, got, want)
				}
			}
			// Upper tail through FromStdNormal: Phi(u) = 1 - q with q tiny;
			// the base fractile is 1 - q' with q' = -expm1(log1p(-q)/n), so
			// z = -Phi^-1(q').
			for _, u := range []float64{3, 5, 7, 8} {
				q := std.CDF(-u)
				qb := -math.Expm1(math.Log1p(-q) / n)
				want := c.x(-std.Quantile(qb))
				if got := d.FromStdNormal(u); math.Abs(got/want-1) > 1e-9 {
					t.Errorf("%s n %g: FromStdNormal(%g) %.12g, want %.12g", c.name, n, u, got, want)
				}
				if back := d.ToStdNormal(d.FromStdNormal(u)); math.Abs(back-u) > 1e-7 {
					t.Errorf("%s n %g: ToStdNormal(FromStdNormal(%g)) = %g", c.name, n, u, back)
				}
			}
			// CDF and survival against F^n, including far tails.
			for _, z := range []float64{-3, 0, 2, 4, 6, 8} {
				x := c.x(z)
				wantC := math.Pow(std.CDF(z), n)
				wantS := -math.Expm1(n * math.Log1p(-std.CDF(-z)))
				if got := d.CDF(x); math.Abs(got-wantC) > 1e-12 {
					t.Errorf("%s n %g: CDF(%g) %.15g, want %.15g", c.name, n, x, got, wantC)
				}
				if got := d.Survival(x); math.Abs(got/wantS-1) > 1e-9 {
					t.Errorf("%s n %g: Survival(%g) %.15g, want %.15g", c.name, n, x, got, wantS)
				}
			}
		}
	}
}

// TestMaximumOfMoments: the mean of the maximum of 2 iid normals is
// mu + sigma/sqrt(pi) and its variance sigma^2 (1 - 1/pi) (order
// statistics of two normals; e.g. David & Nagaraja, Order Statistics).
func TestMaximumOfMoments(t *testing.T) {
	d, err := MaximumOf(mustDist(NewNormal(100, 20)), 2)
	if err != nil {
		t.Fatal(err)
	}
	if want := 100 + 20/math.Sqrt(math.Pi); math.Abs(d.Mean()-want) > 1e-8 {
		t.Errorf("mean %.12g, want %.12g", d.Mean(), want)
	}
	if want := 20 * math.Sqrt(1-1/math.Pi); math.Abs(d.StdDev()-want) > 1e-8 {
		t.Errorf("sd %.12g, want %.12g", d.StdDev(), want)
	}
}

func TestMaximumOfRefuses(t *testing.T) {
	nd := mustDist(NewNormal(100, 20))
	for _, n := range []float64{0, -1, math.NaN(), math.Inf(1), 0.5} {
		if _, err := MaximumOf(nd, n); err == nil {
			t.Errorf("n = %g accepted for a normal", n)
		}
	}
}
