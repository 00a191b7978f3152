package study

import (
	"context"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
	"gonum.org/v1/gonum/stat/distuv"
	"strutrisk/sim"
)

// twoLoads is a member whose capacity is fixed but for a normal model
// factor, with a fixed dead load and two variable loads whose maxima and
// companions are normal: every case's margin is a normal variable, the
// cases correlated through the model factor alone.
const twoLoads = `[member]
length = 3000
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 168.3
thickness = 8
[material]
modulus = 205000
yield = 355
[imperfection]
bow = "L/1000"
[capacity]
model_factor = { dist = "normal", mean = 1.0, sd = 0.1 }
[loads]
dead = 300000
imposed = { dist = "normal", mean = 400000, sd = 80000, companion = { dist = "normal", mean = 150000, sd = 50000 } }
snow = { dist = "normal", mean = 350000, sd = 90000, companion = { dist = "normal", mean = 100000, sd = 40000 } }
`

// unionPf is the failure probability of the union of the two cases of
// twoLoads by one-dimensional integration over the model factor M
// (Gauss-Legendre quadrature on M within 12 sd): given M the cases are
// independent, case i failing when its normal load sum S_i exceeds
// M c0 - G, so
//
//	1 - pf = ∫ phi_M(m) P(S_1 <= m c0 - G) P(S_2 <= m c0 - G) dm.
func unionPf(c0 float64) float64 {
	m := distuv.Normal{Mu: 1, Sigma: 0.1}
	s1 := distuv.Normal{Mu: 400000 + 100000, Sigma: math.Hypot(80000, 40000)} // imposed leads
	s2 := distuv.Normal{Mu: 150000 + 350000, Sigma: math.Hypot(50000, 90000)} // snow leads
	f := func(x float64) float64 {
		r := x*c0 - 300000
		// 1 - P(S1 <= r) P(S2 <= r), accurate in the tails.
		fail := s1.Survival(r) + s2.Survival(r) - s1.Survival(r)*s2.Survival(r)
		return m.Prob(x) * fail
	}
	return quad.Fixed(f, 1-1.2, 1+1.2, 2000, nil, 0)
}

// TestTurkstraUnion: Turkstra's rule on two loads. The system failure
// probability of the study's model, by plain Monte Carlo sampling of the
// union (sim.Run, monte-carlo), lies within its 99.9 % interval around
// the exact union probability (unionPf); each case's FORM index is its
// exact one (a linear limit state in normal variables: beta =
// mean/sd of the margin, Cornell 1969); and the first-order series
// system of the two cases (sim.SeriesPf) is the union of the two normal
// margins correlated through the model factor, so it matches unionPf to
// quadrature accuracy.
func TestTurkstraUnion(t *testing.T) {
	st := parse(t, twoLoads)
	c := st.Combination
	if c == nil || len(c.Cases) != 2 {
		t.Fatalf("combination %+v, want two Turkstra cases", c)
	}
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	nom, err := md.Nominal()
	if err != nil {
		t.Fatal(err)
	}
	c0 := nom.Capacity // the model factor's mean is 1
	want := unionPf(c0)
	if want < 1e-3 || want > 0.2 {
		t.Fatalf("union pf %g: the check wants a probability plain sampling measures well", want)
	}
	var names []string
	for _, v := range md.Sim.Vars {
		names = append(names, v.Name)
	}
	if got := strings.Join(names, " "); got != "capacity.model_factor loads.imposed.companion loads.imposed loads.snow.companion loads.snow" {
		t.Errorf("variables %s", got)
	}
	res, err := sim.Run(context.Background(), md.Sim, &sim.Settings{Method: sim.MonteCarlo, Samples: 400000, Seed: 7, Workers: 2})
	if err != nil {
		t.Fatal(err)
	}
	// 99.9 % interval of a binomial proportion, normal approximation.
	half := 3.29 * math.Sqrt(want*(1-want)/float64(res.Evaluations))
	if math.Abs(res.Pf-want) > half {
		t.Errorf("sampled union pf %.5g, exact %.5g (+- %.2g)", res.Pf, want, half)
	}
	sd := []float64{math.Sqrt(math.Pow(0.1*c0, 2) + 80000*80000 + 40000*40000), math.Sqrt(math.Pow(0.1*c0, 2) + 50000*50000 + 90000*90000)}
	var betas []float64
	var alphas [][]float64
	for i := range 2 {
		cm, err := md.CaseModel(i)
		if err != nil {
			t.Fatal(err)
		}
		f, err := sim.FORM(cm, nil)
		if err != nil || !f.Converged {
			t.Fatalf("case %d: FORM %v", i, err)
		}
		exact := (c0 - 300000 - 500000) / sd[i]
		if math.Abs(f.Beta-exact) > 1e-4 {
			t.Errorf("case %s: FORM beta %.6f, exact %.6f", c.Cases[i].Name(), f.Beta, exact)
		}
		betas = append(betas, f.Points[0].Beta)
		alphas = append(alphas, f.Points[0].Alpha)
	}
	if got := sim.SeriesPf(betas, alphas); math.Abs(got-want) > 1e-4*want {
		t.Errorf("FORM series system pf %.6g, exact union %.6g", got, want)
	}
	if _, err := md.CaseModel(2); err == nil {
		t.Error("a third case of two accepted")
	}
}

// TestCombinationCases: the companions a load takes by default, the
// names of the companions of three loads, and a single variable load
// left as it was. F^n of repetitions: the maximum of n independent pulses
// (Gumbel 1958, Statistics of Extremes, 1.2), checked against the pulse's
// CDF raised to n.
func TestCombinationCases(t *testing.T) {
	st := parse(t, periodStudy(`imposed = { dist = "lognormal", mean = 100000, cov = 0.3, period = "1 year" }
wind = { dist = "gumbel", mean = 60000, cov = 0.2, repetitions = 50 }
crane = { dist = "normal", mean = 40000, sd = 4000, period = "point-in-time" }
`, "50 years"))
	c := st.Combination
	if c == nil || len(c.Cases) != 3 {
		t.Fatalf("combination %+v, want three cases", c)
	}
	imposed, wind, crane := find(st, "loads.imposed"), find(st, "loads.wind"), find(st, "loads.crane")
	for _, x := range []float64{40000, 60000, 120000} {
		if got, want := wind.Dist.CDF(x), math.Pow(wind.Written.CDF(x), 50); math.Abs(got-want) > 1e-12 {
			t.Errorf("wind: CDF(%g) %.15g, pulse^50 %.15g", x, got, want)
		}
	}
	for _, cc := range []struct {
		path string
		want sim.Dist // the companion's distribution
	}{
		{"loads.imposed.companion.wind", imposed.Written}, // its 1-year maxima
		{"loads.imposed.companion.crane", imposed.Written},
		{"loads.wind.companion.imposed", wind.Written}, // one pulse
		{"loads.crane.companion.wind", crane.Dist},     // point-in-time as written
	} {
		q := find(st, cc.path)
		if q == nil || q.Dist != cc.want {
			t.Errorf("%s: %v, want %v", cc.path, q, cc.want)
		}
	}
	if cs := c.Cases[1]; cs.Leading != wind || cs.Loads[0].Path != "loads.imposed.companion.wind" || cs.Loads[1] != wind {
		t.Errorf("case wind: %+v", cs)
	}
	txt := st.CombinationText()
	for _, w := range []string{"3 cases", "case crane: loads.crane", "loads.wind.companion.crane"} {
		if !strings.Contains(txt, w) {
			t.Errorf("check text lacks %q:\n%s", w, txt)
		}
	}
	one := parse(t, periodStudy(`imposed = { dist = "gumbel", mean = 100000, cov = 0.3, companion = { dist = "gamma", mean = 30000, cov = 0.5 } }
`, "50 years"))
	if one.Combination != nil || !hasWarning(one, "loads.imposed.companion", "only random variable load") {
		t.Errorf("single load: combination %+v, warnings %q", one.Combination, one.Warnings)
	}
	sum := parse(t, periodStudy(`imposed = { dist = "gumbel", mean = 100000, cov = 0.3 }
snow = { dist = "gumbel", mean = 80000, cov = 0.3 }
`, "50 years"))
	if sum.Combination == nil || !hasWarning(sum, "loads.snow", "no companion", "conservative") {
		t.Errorf("loads given as reference-period maxima: no warning of the sum of maxima: %q", sum.Warnings)
	}
}

// TestCombinationErrors: each misuse names its load, its line and (for
// a key inside the load's table) the key.
func TestCombinationErrors(t *testing.T) {
	for _, c := range []struct {
		loads, key, msg string
	}{
		{`imposed = { dist = "gumbel", mean = 1e5, cov = 0.3, repetitions = 2.5 }`, "loads.imposed", "whole number"},
		{`imposed = { dist = "gumbel", mean = 1e5, cov = 0.3, repetitions = 0 }`, "loads.imposed", "from 1 to"},
		{`imposed = { dist = "gumbel", mean = 1e5, cov = 0.3, period = "1 year", repetitions = 50 }`, "loads.imposed", "remove one"},
		{`imposed = { dist = "gumbel", mean = 1e5, cov = 0.3, companion = { dist = "normal", mean = 1e4, sd = 1e3, period = "1 year" } }`, "loads.imposed", "companion: a companion is one distribution"},
		{`imposed = { dist = "fixed", value = 1e5, companion = 5e4 }`, "loads.imposed", "random variable load"},
		{`permanent = { dist = "normal", mean = 1e5, sd = 1e4, companion = 5e4 }`, "loads.permanent", "companion: a companion applies"},
	} {
		_, err := Parse("t.toml", []byte(periodStudy(c.loads+"\n", "50 years")))
		e, ok := err.(*Error)
		if !ok {
			t.Errorf("%s: error %v, want a study error at %s", c.loads, err, c.key)
			continue
		}
		found := false
		for _, pr := range e.Problems {
			found = found || pr.Key == c.key && strings.Contains(pr.Msg, c.msg) && pr.Line > 0
		}
		if !found {
			t.Errorf("%s: problems %v, want %s: ...%s...", c.loads, e.Problems, c.key, c.msg)
		}
	}
}

// TestCombinationCompanionNames: with three loads a companion read from
// the file becomes one variable per case it serves, and only those are
// variables; correlations take their names.
func TestCombinationCompanionNames(t *testing.T) {
	st := parse(t, periodStudy(`imposed = { dist = "gumbel", mean = 100000, cov = 0.3, companion = { dist = "gamma", mean = 30000, cov = 0.5 } }
wind = { dist = "gumbel", mean = 60000, cov = 0.2 }
crane = { dist = "normal", mean = 40000, sd = 4000, period = "point-in-time" }
[[correlation]]
pair = ["loads.imposed.companion.wind", "loads.crane.companion.wind"]
rho = 0.5
`, "50 years"))
	if find(st, "loads.imposed.companion") != nil {
		t.Error("the companion as read is still a quantity beside its copies")
	}
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	n := 0
	for _, v := range md.Sim.Vars {
		if strings.Contains(v.Name, ".companion.") {
			n++
		}
	}
	if n != 6 {
		t.Errorf("%d companion variables, want 6 (two per load)", n)
	}
	if len(st.Corr) != 1 {
		t.Errorf("correlations %+v", st.Corr)
	}
}

// TestFerryBorgesStudy: rule ferry-borges-castanheta replaces the
// variable loads by one variable, loads.combined, the maximum of the sum
// of their pulses (sim.PulseMaximum, checked there against brute-force
// pulses). The study's model then fails with the probability of a
// one-dimensional integral over the normal model factor M (Gauss-Legendre
// quadrature): pf = ∫ phi_M(m) P(S > m c0 - G) dm. The same integral with
// the threshold found on the model's own limit state (by bisection on the
// combined load at each m) agrees to 1e-3 relative.
func TestFerryBorgesStudy(t *testing.T) {
	text := strings.Replace(twoLoads, `imposed = { dist = "normal", mean = 400000, sd = 80000, companion = { dist = "normal", mean = 150000, sd = 50000 } }
snow = { dist = "normal", mean = 350000, sd = 90000, companion = { dist = "normal", mean = 100000, sd = 40000 } }`,
		`imposed = { dist = "normal", mean = 150000, sd = 50000, repetitions = 5 }
snow = { dist = "gumbel", mean = 100000, sd = 40000, repetitions = 50 }
[combination]
rule = "ferry-borges-castanheta"`, 1)
	st := parse(t, text)
	c := st.Combination
	if c == nil || c.Combined == nil || c.Combined.Path != "loads.combined" || len(c.Cases) != 0 {
		t.Fatalf("combination %+v", c)
	}
	want, err := sim.PulseMaximum([]sim.Dist{find(st, "loads.imposed").Written, find(st, "loads.snow").Written}, []int{5, 50})
	if err != nil {
		t.Fatal(err)
	}
	s := c.Combined.Dist
	if math.Abs(s.Quantile(0.999)-want.Quantile(0.999)) > 1e-9 || math.Abs(find(st, "loads.imposed").Written.Mean()-150000) > 1e-6 {
		t.Errorf("combined %v, want %v", s, want)
	}
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	var names []string
	for _, v := range md.Sim.Vars {
		names = append(names, v.Name)
	}
	if got := strings.Join(names, " "); got != "capacity.model_factor loads.combined" {
		t.Errorf("variables %s", got)
	}
	nom, _ := md.Nominal()
	c0 := nom.Capacity
	m := distuv.Normal{Mu: 1, Sigma: 0.1}
	exact := quad.Fixed(func(x float64) float64 { return m.Prob(x) * s.Survival(x*c0-300000) }, -0.2, 2.2, 2000, nil, 0)
	// The model at the model factor's quantiles: its margin changes sign
	// where the combined load reaches m c0 - G.
	got := quad.Fixed(func(x float64) float64 {
		lo, hi := 0.0, c0*3 // bisection on the load at which g = 0
		for range 100 {
			mid := (lo + hi) / 2
			if md.Sim.G([]float64{x, mid}, nil) > 0 {
				lo = mid
			} else {
				hi = mid
			}
		}
		return m.Prob(x) * s.Survival(lo)
	}, -0.2, 2.2, 2000, nil, 0)
	if math.Abs(got-exact) > 1e-3*exact || exact < 1e-6 {
		t.Errorf("pf of the model %.6g, exact %.6g", got, exact)
	}
	for _, bad := range []struct{ loads, key string }{
		{`imposed = { dist = "normal", mean = 150000, sd = 50000, repetitions = 5 }
snow = { dist = "gumbel", mean = 100000, sd = 40000 }`, "loads.snow"},
		{`imposed = { dist = "normal", mean = 150000, sd = 50000, repetitions = 3 }
snow = { dist = "gumbel", mean = 100000, sd = 40000, repetitions = 50 }`, "combination.rule"},
		{`imposed = { dist = "normal", mean = 150000, sd = 50000, repetitions = 5 }
snow = { dist = "gumbel", mean = 100000, sd = 40000, repetitions = 50 }
[[correlation]]
pair = ["loads.snow", "loads.imposed"]
rho = 0.3`, "correlation[0].pair"},
	} {
		_, err := Parse("t.toml", []byte(periodStudy(bad.loads+"\n[combination]\nrule = \"ferry-borges-castanheta\"\n", "")))
		if e, ok := err.(*Error); !ok || e.Problems[0].Key != bad.key {
			t.Errorf("%s: %v, want a problem at %s", bad.loads, err, bad.key)
		}
	}
}

// TestCaseIndicesMirroredPoints: a bow that acts by its magnitude gives
// each case two mirrored design points; the series system of the cases
// takes every point, so its pf is at least each case's (a union is never
// less likely than one of its parts, Ditlevsen and Madsen 1996, ch. 14,
// from memory).
func TestCaseIndicesMirroredPoints(t *testing.T) {
	text := strings.Replace(twoLoads, `bow = "L/1000"`, `bow = { dist = "normal", mean = 0, sd = "L/500" }`, 1)
	st := parse(t, text)
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	cb := md.CaseIndices(context.Background(), nil)
	if cb == nil || len(cb.Cases) != 2 {
		t.Fatalf("cases %+v", cb)
	}
	mirrored := false
	for _, c := range cb.Cases {
		if c.FORM == nil || !c.FORM.Converged {
			t.Fatalf("case %s: %v", c.Case, c.Err)
		}
		mirrored = mirrored || len(c.FORM.Points) > 1
		if cb.SeriesPf < c.FORM.Pf*(1-1e-9) {
			t.Errorf("series pf %g below case %s's pf %g", cb.SeriesPf, c.Case, c.FORM.Pf)
		}
	}
	if !mirrored {
		t.Error("no case found two design points: the check does not test what it says")
	}
	if g := cb.Cases[cb.Governing].FORM.Beta; g > cb.Cases[1-cb.Governing].FORM.Beta {
		t.Errorf("governing case beta %g is not the lowest", g)
	}
}

// TestCombinationRefused: the combination of two random variable loads is
// refused, naming the second load, where the model cannot take it yet:
// timber (k_mod by load-duration class) and [bending] (a load factor).
func TestCombinationRefused(t *testing.T) {
	for _, c := range []struct{ name, text, key string }{
		{"timber", strings.Replace(timberPost, `imposed = { dist = "fixed", value = 60000, duration = "medium" }`,
			`imposed = { dist = "gumbel", mean = 60000, cov = 0.3, duration = "medium" }`+"\n"+`snow = { dist = "gumbel", mean = 20000, cov = 0.3, duration = "short" }`, 1), "loads.snow"},
		{"bending", strings.Replace(bendingStudy, `dead = { dist = "normal", mean = "6.5 kN", cov = 0.08 }`,
			`dead = { dist = "normal", mean = "6.5 kN", cov = 0.08 }`+"\n"+`imposed = { dist = "gumbel", mean = "2 kN", cov = 0.3 }`+"\n"+`snow = { dist = "gumbel", mean = "1 kN", cov = 0.3 }`, 1), "loads.snow"},
	} {
		_, err := Parse("t.toml", []byte(c.text))
		e, ok := err.(*Error)
		if !ok || len(e.Problems) != 1 || e.Problems[0].Key != c.key || !strings.Contains(e.Problems[0].Msg, "not supported with") {
			t.Errorf("%s: %v, want one problem at %s", c.name, err, c.key)
		}
	}
}

// TestCombinationNoAllocation: one sample of the union of Turkstra's
// cases, of one case alone and of the Ferry Borges-Castanheta model (its
// tabulated maximum included) does not allocate (the hot path rule of
// DEVELOPERS.md).
func TestCombinationNoAllocation(t *testing.T) {
	md, err := Build(parse(t, twoLoads))
	if err != nil {
		t.Fatal(err)
	}
	cm, err := md.CaseModel(1)
	if err != nil {
		t.Fatal(err)
	}
	fbc, err := Build(parse(t, strings.Replace(twoLoads, `imposed = { dist = "normal", mean = 400000, sd = 80000, companion = { dist = "normal", mean = 150000, sd = 50000 } }
snow = { dist = "normal", mean = 350000, sd = 90000, companion = { dist = "normal", mean = 100000, sd = 40000 } }`,
		`imposed = { dist = "normal", mean = 150000, sd = 50000, repetitions = 5 }
snow = { dist = "gumbel", mean = 100000, sd = 40000, repetitions = 50 }
[combination]
rule = "ferry-borges-castanheta"`, 1)))
	if err != nil {
		t.Fatal(err)
	}
	for name, m := range map[string]*sim.Model{"union": md.Sim, "case snow": cm, "ferry-borges-castanheta": fbc.Sim} {
		u := make([]float64, len(m.Vars))
		x := make([]float64, len(m.Vars))
		out := make([]float64, len(m.Outputs))
		eval := func() {
			for i, v := range m.Vars {
				x[i] = v.Dist.FromStdNormal(u[i] + 0.5) // the sampling path, through each marginal
			}
			m.G(x, out)
		}
		if n := testing.AllocsPerRun(100, eval); n != 0 {
			t.Errorf("%s: %v allocations per evaluation", name, n)
		}
	}
}
