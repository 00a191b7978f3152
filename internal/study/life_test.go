package study

import (
	"context"
	"errors"
	"math"
	"strings"
	"testing"

	"strutrisk/internal/life"
	"strutrisk/sim"
)

// lifeBase is base with a random yield and a Gumbel imposed load of
// annual maxima.
var lifeBase = strings.Replace(strings.Replace(base, "yield = 355", "yield = { dist = \"lognormal\", mean = 355, cov = 0.08 }", 1),
	"dead = 300000\n", "dead = 300000\nimposed = { dist = \"gumbel\", mean = 250000, cov = 0.3, period = \"1 year\" }\n", 1)

// TestLifeErrors: each problem of [life] names its key and line.
func TestLifeErrors(t *testing.T) {
	for _, c := range []struct{ study, key, msg string }{
		{lifeBase + "[life]\ncorrosion_rate = \"0.05 mm\"\n", "life.years", "missing"},
		{lifeBase + "[life]\nyears = 2.5\ncorrosion_rate = \"0.05 mm\"\n", "life.years", "whole number"},
		{lifeBase + "[life]\nyears = \"30 days\"\ncorrosion_rate = \"0.05 mm\"\n", "life.years", "whole number"},
		{lifeBase + "[life]\nyears = 10\nstep = 20\ncorrosion_rate = \"0.05 mm\"\n", "life.step", "longer than years"},
		{lifeBase + "[life]\nyears = 10\n", "life.corrosion_rate", "missing"},
		{lifeBase + "[life]\nyears = 10\ncorrosion_rate = \"-0.05 mm\"\n", "life.corrosion_rate", "zero or positive"},
		{lifeBase + "[life]\nyears = 10\ncorrosion_rate = \"0.05 mm\"\ncorrosion_exponent = 0\n", "life.corrosion_exponent", "positive"},
		{lifeBase + "[life]\nyears = 10\ncorosion_rate = \"0.05 mm\"\n", "life.corosion_rate", "did you mean life.corrosion_rate"},
		{lifeBase + "[life]\nyears = 10\ncorrosion_rate = \"0.05 mm\"\nsamples = 10\n", "life.samples", "too few"},
		{strings.Replace(lifeBase, `period = "1 year"`, `period = "point-in-time"`, 1) + "[life]\nyears = 10\ncorrosion_rate = \"0.05 mm\"\n",
			"loads.imposed", "not its point-in-time value"},
		{strings.Replace(lifeBase, `"gumbel", mean = 250000, cov = 0.3, period = "1 year"`, `"lognormal", mean = 250000, cov = 0.3`, 1) +
			"[target]\nbeta = 3.8\nreference_period = \"50 years\"\n[life]\nyears = 10\ncorrosion_rate = \"0.05 mm\"\n",
			"loads.imposed", "only a gumbel converts"},
		{strings.Replace(lifeBase, `, period = "1 year"`, "", 1) + "[life]\nyears = 10\ncorrosion_rate = \"0.05 mm\"\n",
			"loads.imposed", "give period = \"1 year\""},
		{lifeBase + "[[correlation]]\npair = [\"material.yield\", \"loads.imposed\"]\nrho = 0.2\n[life]\nyears = 10\ncorrosion_rate = \"0.05 mm\"\n",
			"correlation", "independently"},
	} {
		_, err := Parse("t.toml", []byte(c.study))
		var se *Error
		if !errors.As(err, &se) {
			t.Errorf("%s: no error", c.key)
			continue
		}
		found := false
		for _, p := range se.Problems {
			if p.Key == c.key && strings.Contains(p.Msg, c.msg) {
				found = true
				if p.Line == 0 {
					t.Errorf("%s: no line in %v", c.key, p)
				}
			}
		}
		if !found {
			t.Errorf("want %s with %q, got\n%v", c.key, c.msg, err)
		}
	}
}

// TestLifeCustomRefused: a custom section cannot corrode.
func TestLifeCustomRefused(t *testing.T) {
	s := strings.Replace(lifeBase, "shape = \"CHS\"\ndiameter = 168.3\nthickness = 8\n",
		"shape = \"custom\"\narea = 4000\ni_major = 1.3e7\ni_minor = 1.3e7\nc_major = 84\nc_minor = 84\n", 1)
	s = strings.Replace(s, "[capacity]", "", 1) + "[capacity]\ncurve = \"c\"\n[life]\nyears = 10\ncorrosion_rate = \"0.05 mm\"\n"
	_, err := Parse("t.toml", []byte(s))
	if err == nil || !strings.Contains(err.Error(), "custom section has no faces") {
		t.Errorf("want the custom section refused, got %v", err)
	}
}

// TestLifeAnnualMaxima: a Gumbel of maxima over the 50-year reference
// period becomes annual maxima with the same scale and the location
// lowered by scale ln 50 (max-stability, Gumbel 1958, Statistics of
// Extremes); a Gumbel of annual maxima is kept as written.
func TestLifeAnnualMaxima(t *testing.T) {
	for _, c := range []struct {
		name, loads string
		shift       float64
	}{
		{"50-year maxima", `imposed = { dist = "gumbel", location = 300000, scale = 30000 }`, 30000 * math.Log(50)},
		{"annual maxima", `imposed = { dist = "gumbel", location = 300000, scale = 30000, period = "1 year" }`, 0},
	} {
		st := parse(t, periodStudy(c.loads+"\n", "50 years")+"[life]\nyears = 10\ncorrosion_rate = \"0.05 mm\"\n")
		if len(st.Life.Annual) != 1 {
			t.Fatalf("%s: annual loads %+v", c.name, st.Life.Annual)
		}
		a := st.Life.Annual[0]
		loc := 300000 - c.shift
		for _, x := range []float64{200000, 300000, 400000} {
			want := math.Exp(-math.Exp(-(x - loc) / 30000))
			if got := a.Dist.CDF(x); math.Abs(got-want) > 1e-12 {
				t.Errorf("%s: CDF(%g) = %.15g, want %.15g (%s)", c.name, x, got, want, a.Basis)
			}
		}
	}
}

// TestLifeLossLaw: the capacity of year t is that of the section with
// thickness_loss + r t^b, here 0.5 mm + 0.1 mm x 16^0.5 = 0.9 mm, at
// nominal values: the same number as the study written with that loss.
func TestLifeLossLaw(t *testing.T) {
	withLoss := func(loss string) string {
		return strings.Replace(lifeBase, "thickness = 8\n", "thickness = 8\nthickness_loss = "+loss+"\n", 1)
	}
	md, err := Build(parse(t, withLoss("0.5")+"[life]\nyears = 20\ncorrosion_rate = 0.1\ncorrosion_exponent = 0.5\n"))
	if err != nil {
		t.Fatal(err)
	}
	ref, err := Build(parse(t, withLoss("0.9")))
	if err != nil {
		t.Fatal(err)
	}
	n, err := ref.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	got, _ := md.LifeCapacity(16)
	if math.Abs(got/n.Capacity-1) > 1e-12 {
		t.Errorf("capacity in year 16 %.10g, study with 0.9 mm loss %.10g", got, n.Capacity)
	}
	if now, _ := md.LifeCapacity(0); !(now > got) {
		t.Errorf("capacity now %g is not above that of year 16, %g", now, got)
	}
	if l := md.LifeLoss(16); math.Abs(l-0.9) > 1e-12 {
		t.Errorf("loss in year 16 %g mm, want 0.9", l)
	}
}

// TestLifeNoLossIsReferencePeriod: without corrosion the member is the
// same every year, so the cumulative pf to year 10 is the pf of the study
// against the 10-year maxima of the load (its Gumbel converted exactly),
// estimated by the study's own analysis; and every year has the same
// annual pf.
func TestLifeNoLossIsReferencePeriod(t *testing.T) {
	text := strings.Replace(strings.Replace(lifeBase, "dead = 300000", "dead = 400000", 1), "mean = 250000", "mean = 350000", 1)
	md, err := Build(parse(t, text+"[target]\nbeta = 3\nreference_period = \"10 years\"\n[life]\nyears = 10\ncorrosion_rate = 0\nsamples = 100000\n"))
	if err != nil {
		t.Fatal(err)
	}
	p, err := md.LifeProblem(2)
	if err != nil {
		t.Fatal(err)
	}
	res, err := life.Run(context.Background(), p)
	if err != nil {
		t.Fatal(err)
	}
	for _, pt := range res.Points[1:] {
		if pt.Pf != res.Points[0].Pf {
			t.Errorf("year %d: pf %g, year 1 %g: without loss every year is the same", pt.Year, pt.Pf, res.Points[0].Pf)
		}
	}
	s := sim.Settings{Method: sim.MonteCarlo, Samples: 400_000, Seed: 3, Workers: 2}
	ref, err := sim.Run(context.Background(), md.Sim, &s)
	if err != nil {
		t.Fatal(err)
	}
	got := res.Points[9]
	tol := 3 * math.Hypot(got.CoVCumulative, ref.PfCoV)
	if d := math.Abs(got.PfCumulative/ref.Pf - 1); d > tol {
		t.Errorf("cumulative pf to year 10 %.5g (cov %.2g), study against 10-year maxima %.5g (cov %.2g)", got.PfCumulative, got.CoVCumulative, ref.Pf, ref.PfCoV)
	}
	if tol > 0.05 {
		t.Errorf("the comparison is too loose to tell: tolerance %.2g", tol)
	}
}

// TestLifeEnds: a step of 3 over 10 years evaluates years 3, 6, 9 and 10.
func TestLifeEnds(t *testing.T) {
	got := LifeEnds(10, 3)
	want := []int{3, 6, 9, 10}
	if len(got) != len(want) {
		t.Fatalf("ends %v, want %v", got, want)
	}
	for i := range want {
		if got[i] != want[i] {
			t.Fatalf("ends %v, want %v", got, want)
		}
	}
}

// TestLifeCombinedLoads: with two variable loads combined by Turkstra's
// rule, [life] adds their annual maxima every year (and warns): the
// companions are not inputs of the paths, and the second load is sampled.
// A load given as pulses takes F^(pulses a year) of its pulse.
func TestLifeCombinedLoads(t *testing.T) {
	loads := `imposed = { dist = "gumbel", mean = 200000, cov = 0.3, period = "1 year", companion = { dist = "normal", mean = 80000, sd = 20000 } }
wind = { dist = "gumbel", mean = 20000, cov = 0.2, repetitions = 100 }
`
	st := parse(t, periodStudy(loads, "50 years")+"[life]\nyears = 5\ncorrosion_rate = \"0.1 mm\"\n")
	if !hasWarning(st, "life", "are added in every year") {
		t.Errorf("no warning that the annual maxima are added: %q", st.Warnings)
	}
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	p, err := md.LifeProblem(1)
	if err != nil {
		t.Fatal(err)
	}
	for _, v := range p.Vars {
		if strings.Contains(v.Name, "companion") || strings.HasPrefix(v.Name, "loads.") {
			t.Errorf("path input %s: a path draws no variable load nor companion", v.Name)
		}
	}
	if len(p.Annual) != 2 {
		t.Fatalf("annual loads %v, want imposed and wind", p.Annual)
	}
	wind := p.Annual[1]
	pulse, err := sim.NewGumbel(20000, 4000)
	if err != nil {
		t.Fatal(err)
	}
	// 100 pulses in 50 years: 2 a year, F^2.
	for _, x := range []float64{15000, 25000, 35000} {
		if got, want := wind.Dist.CDF(x), math.Pow(pulse.CDF(x), 2); math.Abs(got-want) > 1e-12 {
			t.Errorf("wind annual maxima CDF(%g) = %g, want F^2 = %g", x, got, want)
		}
	}
	res, err := life.Run(context.Background(), p)
	if err != nil {
		t.Fatal(err)
	}
	if res.Exact != "loads.imposed" || len(res.Sampled) != 1 {
		t.Errorf("exact %q sampled %q: want imposed exact, wind sampled", res.Exact, res.Sampled)
	}
}

// TestLifeRateWarning: a first-year loss written as a bare 0.06 in kN-m
// reads 60 mm and is warned of; "0.06 mm" is not.
func TestLifeRateWarning(t *testing.T) {
	kNm := "units = \"kN-m\"\n" + strings.NewReplacer("length = 3000", "length = 3.0", "diameter = 168.3", "diameter = \"168.3 mm\"", "thickness = 8", "thickness = \"8 mm\"",
		"modulus = 205000", "modulus = \"205 GPa\"", "mean = 355,", "mean = \"355 MPa\",", "dead = 300000", "dead = 300", "mean = 250000", "mean = 250").Replace(lifeBase)
	st := parse(t, kNm+"[life]\nyears = 10\ncorrosion_rate = 0.06\n")
	if !hasWarning(st, "life.corrosion_rate", "60 mm", "did you mean mm?") {
		t.Errorf("no warning of a bare rate read in m: %q", st.Warnings)
	}
	st = parse(t, kNm+"[life]\nyears = 10\ncorrosion_rate = \"0.06 mm\"\n")
	if hasWarning(st, "life.corrosion_rate") {
		t.Errorf("a warning on 0.06 mm: %q", st.Warnings)
	}
}

// TestLifeFerryBorges: with rule ferry-borges-castanheta the combined
// maximum over the reference period is no input of a path; the annual
// maxima of the pulses replace it (F^(pulses a year)).
func TestLifeFerryBorges(t *testing.T) {
	loads := `imposed = { dist = "gumbel", mean = 150000, sd = 50000, repetitions = 100 }
snow = { dist = "gumbel", mean = 100000, sd = 40000, repetitions = 50 }
`
	st := parse(t, periodStudy(loads, "50 years")+"[combination]\nrule = \"ferry-borges-castanheta\"\n[life]\nyears = 5\ncorrosion_rate = \"0.1 mm\"\n")
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	p, err := md.LifeProblem(1)
	if err != nil {
		t.Fatal(err)
	}
	for _, v := range p.Vars {
		if strings.HasPrefix(v.Name, "loads.") {
			t.Errorf("path input %s: a path draws no variable load", v.Name)
		}
	}
	if len(p.Annual) != 2 {
		t.Fatalf("annual loads %v, want imposed and snow", p.Annual)
	}
	pulse, _ := sim.NewGumbel(150000, 50000)
	if got, want := p.Annual[0].Dist.CDF(200000), math.Pow(pulse.CDF(200000), 2); math.Abs(got-want) > 1e-12 {
		t.Errorf("imposed annual maxima CDF %g, want F^2 = %g", got, want)
	}
}

// TestLifeWarnings: a loss that makes the CHS 168.3 x 8 (fy 355 MPa)
// class 4 before the horizon, which the study refuses (shell buckling),
// is warned of with the year: 0.5 mm a year from the outside gives d/t =
// 157.3/2.5 = 62.9 in year 11, beyond 90 eps^2 = 59.6 (EN 1993-1-1 Table
// 5.2), and 158.3/3 = 52.8 in year 10; 0.12 mm a year moves it from class
// 1 to class 2 by year 30 (161.1/4.4 = 36.6, between 50 and 70 eps^2); a
// small loss says nothing.
func TestLifeWarnings(t *testing.T) {
	for _, c := range []struct {
		life, want string
	}{
		{"years = 30\ncorrosion_rate = 0.5\n", "at the nominal loss of year 11 (5.5 mm from every face) the section cannot be evaluated"},
		{"years = 30\ncorrosion_rate = 0.12\n", "goes from class 1 now to class 2 in year 30"},
		{"years = 30\ncorrosion_rate = 0.01\n", ""},
	} {
		md, err := Build(parse(t, lifeBase+"[life]\n"+c.life))
		if err != nil {
			t.Fatal(err)
		}
		w := strings.Join(md.LifeWarnings(), "\n")
		if c.want == "" && w != "" || !strings.Contains(w, c.want) {
			t.Errorf("%q: warnings %q, want %q", c.life, w, c.want)
		}
	}
}
