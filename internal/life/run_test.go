package life

import (
	"context"
	"math"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/sim"
)

// linearCase is a member whose resistance R0 - a t falls linearly with
// time, R0 normal, under a load whose annual maxima are Gumbel and
// independent from year to year.
type linearCase struct {
	mu, sd, a    float64 // R0 ~ N(mu, sd), loss a per year
	loc, scale   float64 // Gumbel annual maxima
	years, paths int
}

func (c linearCase) problem(t *testing.T, step int) Problem {
	t.Helper()
	r0, err := sim.NewNormal(c.mu, c.sd)
	if err != nil {
		t.Fatal(err)
	}
	s, err := sim.NewGumbelLoc(c.loc, c.scale)
	if err != nil {
		t.Fatal(err)
	}
	var ends []int
	for y := step; ; y += step {
		y = min(y, c.years)
		ends = append(ends, y)
		if y == c.years {
			break
		}
	}
	return Problem{
		Vars:   []sim.Variable{{Name: "r0", Dist: r0}},
		Annual: []sim.Variable{{Name: "s", Dist: s}},
		Ends:   ends,
		Split:  func(x []float64, t float64) (float64, float64) { return x[0] - c.a*t, 1 },
		Paths:  c.paths,
		Seed:   7,
	}
}

// reference returns the cumulative pf to year t and the pf within year t
// by one-dimensional numerical integration over R0 = mu + sd z:
//
//	pf_cum(t) = integral of phi(z) (1 - prod_{j=1..t} F_S(mu + sd z - a j)) dz
//	pf_year(t) = integral of phi(z) (1 - F_S(mu + sd z - a t)) dz
//
// with the Gumbel CDF F_S(x) = exp(-exp(-(x - loc)/scale)) (its closed
// form), by Gauss-Legendre quadrature of 2000 nodes over z in [-12, 12]
// (gonum integrate/quad), the normal density outside carrying less than
// 1e-32.
func (c linearCase) reference(t int) (cum, year float64) {
	logF := func(x float64) float64 { return -math.Exp(-(x - c.loc) / c.scale) }
	phi := func(z float64) float64 { return math.Exp(-z*z/2) / math.Sqrt(2*math.Pi) }
	cum = quad.Fixed(func(z float64) float64 {
		s := 0.0
		for j := 1; j <= t; j++ {
			s += logF(c.mu + c.sd*z - c.a*float64(j))
		}
		return phi(z) * -math.Expm1(s)
	}, -12, 12, 2000, quad.Legendre{}, 0)
	year = quad.Fixed(func(z float64) float64 {
		return phi(z) * -math.Expm1(logF(c.mu+c.sd*z-c.a*float64(t)))
	}, -12, 12, 2000, quad.Legendre{}, 0)
	return cum, year
}

// TestLinearLossGumbel checks the cumulative and the annual pf of a
// member with a deterministic linear loss, a normal resistance and
// independent Gumbel annual maxima against numerical integration, to 2 %.
func TestLinearLossGumbel(t *testing.T) {
	for _, c := range []linearCase{
		{mu: 1000, sd: 100, a: 5, loc: 450, scale: 60, years: 30, paths: 200_000},
		{mu: 1000, sd: 60, a: 8, loc: 400, scale: 50, years: 40, paths: 200_000},
	} {
		res, err := Run(context.Background(), c.problem(t, 1))
		if err != nil {
			t.Fatal(err)
		}
		if len(res.Points) != c.years {
			t.Fatalf("%d points, want %d", len(res.Points), c.years)
		}
		for _, pt := range res.Points {
			if pt.Year%10 != 0 && pt.Year != 1 {
				continue
			}
			cum, year := c.reference(pt.Year)
			if d := math.Abs(pt.PfCumulative/cum - 1); d > 0.02 {
				t.Errorf("%+v year %d: pf_cumulative %.5g, integration %.5g (off by %.2g %%, cov %.2g)", c, pt.Year, pt.PfCumulative, cum, 100*d, pt.CoVCumulative)
			}
			if d := math.Abs(pt.Pf/year - 1); d > 0.02 {
				t.Errorf("%+v year %d: pf %.5g, integration %.5g (off by %.2g %%, cov %.2g)", c, pt.Year, pt.Pf, year, 100*d, pt.CoV)
			}
			if math.Abs(pt.BetaCumulative+distuv.UnitNormal.Quantile(pt.PfCumulative)) > 1e-9 {
				t.Errorf("year %d: beta_cumulative %g is not -Phi^-1(%g)", pt.Year, pt.BetaCumulative, pt.PfCumulative)
			}
		}
	}
}

// TestNotIndependentYears checks that the integration of the test above
// tells the conditional answer from the product of independent years,
// 1 - prod (1 - pf_year(j)), which overstates the cumulative pf when the
// resistance is the same member every year.
func TestNotIndependentYears(t *testing.T) {
	c := linearCase{mu: 1000, sd: 100, a: 5, loc: 450, scale: 60, years: 30}
	cum, _ := c.reference(30)
	logS := 0.0
	for j := 1; j <= 30; j++ {
		_, y := c.reference(j)
		logS += math.Log1p(-y)
	}
	indep := -math.Expm1(logS)
	if indep/cum-1 < 0.1 {
		t.Errorf("independent years give %.4g, the member path %.4g: the 2 %% check would not tell them apart", indep, cum)
	}
}

// TestWorkersSameNumbers checks that the number of workers does not
// change the result.
func TestWorkersSameNumbers(t *testing.T) {
	c := linearCase{mu: 1000, sd: 100, a: 5, loc: 450, scale: 60, years: 12, paths: 3000}
	var first Result
	for i, w := range []int{1, 2, 5} {
		p := c.problem(t, 1)
		p.Workers = w
		r, err := Run(context.Background(), p)
		if err != nil {
			t.Fatal(err)
		}
		if i == 0 {
			first = r
			continue
		}
		for k := range r.Points {
			if r.Points[k] != first.Points[k] {
				t.Fatalf("workers %d: %+v, workers 1: %+v", w, r.Points[k], first.Points[k])
			}
		}
	}
}

// TestStepOnSafeSide checks that a step of several years, which holds
// each year at the resistance of the step's end, gives a cumulative pf no
// lower than yearly steps (the resistance only falls), and the same
// annual pf at the step ends.
func TestStepOnSafeSide(t *testing.T) {
	c := linearCase{mu: 1000, sd: 100, a: 5, loc: 450, scale: 60, years: 23, paths: 4000}
	one, err := Run(context.Background(), c.problem(t, 1))
	if err != nil {
		t.Fatal(err)
	}
	five, err := Run(context.Background(), c.problem(t, 5))
	if err != nil {
		t.Fatal(err)
	}
	want := []int{5, 10, 15, 20, 23}
	for k, pt := range five.Points {
		if pt.Year != want[k] {
			t.Fatalf("step 5 years: point %d at year %d, want %d", k, pt.Year, want[k])
		}
		y := one.Points[pt.Year-1]
		if pt.PfCumulative < y.PfCumulative {
			t.Errorf("year %d: step 5 cumulative pf %g below yearly %g", pt.Year, pt.PfCumulative, y.PfCumulative)
		}
		if pt.Year == 5 && pt.PfCumulative == y.PfCumulative {
			t.Errorf("year 5: step 5 gives the yearly cumulative pf %g exactly: the step is not applied", pt.PfCumulative)
		}
	}
}

// TestRefusals checks the problems Run refuses.
func TestRefusals(t *testing.T) {
	c := linearCase{mu: 1000, sd: 100, a: 5, loc: 450, scale: 60, years: 3, paths: 100}
	for name, edit := range map[string]func(p *Problem){
		"correlated load": func(p *Problem) { p.Corr = []sim.Correlation{{A: "r0", B: "s", Rho: 0.3}} },
		"no years":        func(p *Problem) { p.Ends = nil },
		"year 0":          func(p *Problem) { p.Ends = []int{0, 1} },
		"not increasing":  func(p *Problem) { p.Ends = []int{2, 2} },
		"one path":        func(p *Problem) { p.Paths = 1 },
	} {
		p := c.problem(t, 1)
		edit(&p)
		if _, err := Run(context.Background(), p); err == nil {
			t.Errorf("%s: no error", name)
		}
	}
}

// TestSampledSecondLoad checks the annual pf with a second variable load,
// sampled each year, against two-dimensional Gauss-Legendre quadrature
// over the standard normals of R0 and of the second load (normal):
// pf_year(t) = integral of phi(z) phi(w) (1 - F_S(R0(z) - a t - Q(w))).
func TestSampledSecondLoad(t *testing.T) {
	c := linearCase{mu: 1300, sd: 100, a: 5, loc: 450, scale: 60, years: 10, paths: 100_000}
	p := c.problem(t, 1)
	q, err := sim.NewNormal(300, 40)
	if err != nil {
		t.Fatal(err)
	}
	p.Annual = append(p.Annual, sim.Variable{Name: "q", Dist: q})
	res, err := Run(context.Background(), p)
	if err != nil {
		t.Fatal(err)
	}
	if res.Exact != "s" || len(res.Sampled) != 1 || res.Sampled[0] != "q" {
		t.Fatalf("exact %q, sampled %q: want s exact (the larger spread), q sampled", res.Exact, res.Sampled)
	}
	phi := func(z float64) float64 { return math.Exp(-z*z/2) / math.Sqrt(2*math.Pi) }
	want := quad.Fixed(func(z float64) float64 {
		return phi(z) * quad.Fixed(func(w float64) float64 {
			x := c.mu + c.sd*z - c.a*10 - (300 + 40*w)
			return phi(w) * -math.Expm1(-math.Exp(-(x-c.loc)/c.scale))
		}, -10, 10, 200, quad.Legendre{}, 0)
	}, -10, 10, 400, quad.Legendre{}, 0)
	got := res.Points[9]
	if d := math.Abs(got.Pf/want - 1); d > 0.03 {
		t.Errorf("year 10: pf %.5g, quadrature %.5g (off by %.2g %%, cov %.2g)", got.Pf, want, 100*d, got.CoV)
	}
}

// TestFirstBelow checks the year the annual beta first falls below a
// target and its bracket, on points made by hand.
func TestFirstBelow(t *testing.T) {
	r := Result{Points: []Point{
		{Year: 1, Pf: 1e-5, CoV: 0.01},
		{Year: 2, Pf: 3e-5, CoV: 0.2},  // 2 sd reach 4.2e-5 > 4e-5: may be below
		{Year: 3, Pf: 5e-5, CoV: 0.2},  // below; 2 sd down 3e-5: not with confidence
		{Year: 4, Pf: 9e-5, CoV: 0.05}, // below with confidence
	}}
	target := -distuv.UnitNormal.Quantile(4e-5)
	c := r.FirstBelow(target)
	if c != (Crossing{Year: 3, Earliest: 2, Latest: 4}) {
		t.Errorf("crossing %+v, want year 3 between 2 and 4", c)
	}
	if !c.Resolved(r) {
		t.Errorf("a bracket of years 2 to 4 over yearly steps is within two steps: resolved")
	}
	if c := (Crossing{Year: 2, Earliest: 1, Latest: 4}); c.Resolved(r) {
		t.Errorf("a bracket of years 1 to 4 over yearly steps is three steps wide: not resolved")
	}
	if c := (Crossing{Year: 3, Earliest: 2, Latest: 0}); c.Resolved(r) {
		t.Errorf("a bracket reaching beyond the horizon is not resolved")
	}
	if c := r.FirstBelow(5); c != (Crossing{Year: 1, Earliest: 1, Latest: 1}) || !c.Resolved(r) {
		t.Errorf("target 5: crossing %+v, want year 1 resolved", c)
	}
	if c := r.FirstBelow(3); c != (Crossing{}) || !c.Resolved(r) {
		t.Errorf("target 3: crossing %+v, want none", c)
	}
}
