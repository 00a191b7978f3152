package report

import (
	"fmt"
	"math"
	"math/rand/v2"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/sim"
)

// The bundle below is invented (a plausible retrofit column) to exercise
// the structure of the report; its numbers are not check values.

// testNormal is a test-only sim.Dist backed by gonum's normal.
type testNormal struct{ Mu, Sigma float64 }

func (d testNormal) n() distuv.Normal                { return distuv.Normal{Mu: d.Mu, Sigma: d.Sigma} }
func (d testNormal) CDF(x float64) float64           { return d.n().CDF(x) }
func (d testNormal) Survival(x float64) float64      { return d.n().Survival(x) }
func (d testNormal) Quantile(p float64) float64      { return d.n().Quantile(p) }
func (d testNormal) Prob(x float64) float64          { return d.n().Prob(x) }
func (d testNormal) Mean() float64                   { return d.Mu }
func (d testNormal) StdDev() float64                 { return d.Sigma }
func (d testNormal) FromStdNormal(u float64) float64 { return d.Mu + d.Sigma*u }
func (d testNormal) ToStdNormal(x float64) float64   { return (x - d.Mu) / d.Sigma }
func (d testNormal) String() string                  { return fmt.Sprintf("normal(mean %g, sd %g)", d.Mu, d.Sigma) }

var _ sim.Dist = testNormal{}

// binned returns a fixed-bin histogram of n values from cdf over [lo, hi)
// with nb bins: expected counts, no randomness.
func binned(cdf func(float64) float64, n, lo, hi float64, nb int) sim.Histogram {
	w := (hi - lo) / float64(nb)
	h := sim.Histogram{Lo: lo, Width: w, Counts: make([]float64, nb)}
	for i := range h.Counts {
		h.Counts[i] = math.Round(n * (cdf(lo+float64(i+1)*w) - cdf(lo+float64(i)*w)))
	}
	h.Under = math.Round(n * cdf(lo))
	h.Over = math.Round(n * (1 - cdf(hi)))
	return h
}

func ptr[T any](v T) *T { return &v }

// demoBundle returns a complete, realistic-looking bundle.
func demoBundle() *Bundle {
	capD := distuv.LogNormal{Mu: math.Log(1450e3) - 0.5*0.1*0.1, Sigma: 0.1}
	demD := distuv.Normal{Mu: 900e3, Sigma: 110e3}
	marD := distuv.Normal{Mu: 550e3, Sigma: 190e3}
	const n = 1e6
	doc := &Document{
		Title: "Bay 3 mezzanine column, added plant load", ToolVersion: "0.1.0-test",
		InputSHA256: "3f1c9a0d5e2b7c4a9e8f6d1b0c3a5e7f9d2b4c6a8e0f1d3b5c7a9e2f4d6b8c0a", Units: "N-mm-MPa",
		Method: "monte-carlo", Seed: ptr(uint64(20261201)), Evaluations: ptr(int64(1000000)),
		Pf: ptr(1.84e-3), PfCI: []float64{1.76e-3, 1.93e-3}, PfCoV: ptr(0.0233),
		Beta: ptr(Index(2.904)), BetaCI: []Index{2.891, 2.918},
		TargetBeta: ptr(3.8), MeetsTarget: ptr(false), ReserveFactor: ptr(0.81),
		GoverningAxis: "minor",
		Nominal:       &Nominal{Capacity: 1402e3, EulerLoad: 3120e3, Slenderness: 84.2, RelativeSlenderness: 0.972, K: 1, Axis: "minor"},
		Capacity:      &Summary{Mean: 1450e3, SD: 145e3, P01: 1130e3, P05: 1225e3, P50: 1443e3, P95: 1690e3, P99: 1790e3},
		Demand:        &Summary{Mean: 900e3, SD: 110e3, P01: 650e3, P05: 720e3, P50: 900e3, P95: 1080e3, P99: 1160e3},
		FORM: &FORM{Beta: 2.95, Pf: 1.59e-3,
			DesignPoint: map[string]float64{"material.yield": 281.0, "loads.dead": 690e3, "loads.imposed": 402e3, "imperfection.bow": 8.9, "material.modulus": 203500},
			Importance:  map[string]float64{"material.yield": 0.31, "loads.dead": 0.12, "loads.imposed": 0.44, "imperfection.bow": 0.12, "material.modulus": 0.01}},
		Tornado: []Tornado{
			{Variable: "loads.imposed", LowValue: 160e3, HighValue: 290e3, Low: 520e3, High: 250e3},
			{Variable: "material.yield", LowValue: 282, HighValue: 345, Low: 290e3, High: 500e3},
			{Variable: "imperfection.bow", LowValue: 0.9, HighValue: 9.2, Low: 470e3, High: 310e3},
			{Variable: "loads.dead", LowValue: 520e3, HighValue: 720e3, Low: 480e3, High: 330e3},
			{Variable: "material.modulus", LowValue: 195000, HighValue: 215000, Low: 403e3, High: 409e3},
		},
		Sobol: []Sobol{
			{Variable: "loads.imposed", First: 0.41, Total: 0.49, FirstCI: [2]float64{0.37, 0.45}, TotalCI: [2]float64{0.45, 0.54}},
			{Variable: "material.yield", First: 0.22, Total: 0.31, FirstCI: [2]float64{0.18, 0.26}, TotalCI: [2]float64{0.27, 0.35}},
			{Variable: "imperfection.bow", First: 0.10, Total: 0.16, FirstCI: [2]float64{0.07, 0.13}, TotalCI: [2]float64{0.13, 0.19}},
			{Variable: "loads.dead", First: 0.08, Total: 0.12, FirstCI: [2]float64{0.05, 0.11}, TotalCI: [2]float64{0.10, 0.15}},
			{Variable: "material.modulus", First: 0.0, Total: 0.01, FirstCI: [2]float64{-0.02, 0.02}, TotalCI: [2]float64{0.005, 0.015}},
		},
		Sweep: []Point{
			{Value: 3000, Pf: 2.1e-5, Beta: 4.10, PfCI: [2]float64{1.6e-5, 2.7e-5}},
			{Value: 4000, Pf: 2.4e-4, Beta: 3.49, PfCI: [2]float64{2.1e-4, 2.7e-4}},
			{Value: 5000, Pf: 1.5e-3, Beta: 2.97, PfCI: [2]float64{1.4e-3, 1.6e-3}},
			{Value: 6000, Pf: 8.0e-3, Beta: 2.41, PfCI: [2]float64{7.7e-3, 8.3e-3}},
		},
		Variants: []Variant{
			{Name: "as built", Pf: 1.84e-3, Beta: 2.904, PfCI: [2]float64{1.76e-3, 1.93e-3}},
			{Name: "bow L/500", Pf: 4.6e-3, Beta: 2.605, PfCI: [2]float64{4.5e-3, 4.8e-3}},
		},
		Warnings: []string{"member.k_major: no end conditions given, K = 1 assumed"},
	}
	b := &Bundle{
		Doc:       doc,
		StudyFile: "studies/retrofit-demo.toml",
		Inputs: []Input{
			{Name: "member.length", Dist: "fixed", Params: "5.2 m", Mean: 5200, Unit: "mm"},
			{Name: "material.yield", Dist: "lognormal", Params: "characteristic 275 MPa, fractile 0.05, cov 0.07", Mean: 310, CoV: 0.07, Unit: "MPa"},
			{Name: "material.modulus", Dist: "lognormal", Params: "mean 205 GPa, cov 0.03", Mean: 205000, CoV: 0.03, Unit: "MPa"},
			{Name: "imperfection.bow", Dist: "normal", Params: "mean L/1000, sd L/2000, lower 0", Mean: 5.2, CoV: 0.5, Unit: "mm"},
			{Name: "loads.dead", Dist: "normal", Params: "mean 620 kN, cov 0.10", Mean: 620e3, CoV: 0.1, Unit: "N"},
			{Name: "loads.imposed", Dist: "gumbel", Params: "mean 210 kN, cov 0.25", Mean: 210e3, CoV: 0.25, Unit: "N"},
		},
		Check: []CheckRow{
			{Quantity: "effective length factor K", Major: "1.000", Minor: "1.000", Unit: "–"},
			{Quantity: "Euler load", Major: "10 840", Minor: "3 120", Unit: "kN"},
			{Quantity: "capacity", Major: "2 210", Minor: "1 402", Unit: "kN"},
		},
		Defaults:        []string{"capacity.model = perry-robertson"},
		Capacity:        &sim.OutputStats{Name: "capacity", N: n, Mean: 1450e3, SD: 145e3, Hist: binned(capD.CDF, n, 900e3, 2000e3, 60)},
		Demand:          &sim.OutputStats{Name: "demand", N: n, Mean: 900e3, SD: 110e3, Hist: binned(demD.CDF, n, 500e3, 1400e3, 60)},
		Margin:          &sim.OutputStats{Name: "g", N: n, Mean: 550e3, SD: 190e3, Hist: binned(marD.CDF, n, -200e3, 1300e3, 60)},
		NominalCapacity: 1402e3,
		Diagnostics:     []KV{{"method chosen", "monte-carlo (pf above 1e-4 at the pilot)"}, {"CoV of pf", "2.3%"}, {"FORM", "converged in 6 iterations"}},
		TornadoOutput:   "margin g (kN)",
		TornadoBase:     400e3,
		SobolOutput:     "capacity",
		SobolNote:       "The indices assume independent inputs.",
		Spearman:        []KV{{"material.yield", "0.52"}, {"loads.imposed", "-0.61"}, {"imperfection.bow", "-0.30"}},
		SweepLabel:      "member length (mm)",
		Samples:         &sim.Samples{Names: []string{"material.yield", "loads.dead", "capacity", "g"}, Rows: [][]float64{{300, 600e3, 1.4e6, 5e5}, {290, 640e3, 1.3e6, 4e5}}},
		Updates: []Update{{Variable: "material.yield", Unit: "MPa",
			Prior: testNormal{310, 21.7}, After: testNormal{298, 12.1}, Data: []float64{289, 301, 296, 305, 292}}},
	}
	for i := 1; i <= 40; i++ {
		e := float64(i) / 40 * 6
		evals := int64(math.Pow(10, e))
		if evals < 100 {
			continue
		}
		se := math.Sqrt(1.84e-3 / float64(evals))
		pf := 1.84e-3 * (1 + 0.3*math.Sin(e*3)/math.Sqrt(float64(evals)/100))
		b.Convergence = append(b.Convergence, sim.ConvergencePoint{Evaluations: evals, Pf: pf, PfCI: [2]float64{math.Max(0, pf-1.96*se), pf + 1.96*se}})
	}
	// Perry-Robertson-like curve and EN 1993-1-1 curve b (alpha 0.34).
	var lam, pr, cb []float64
	for i := 0; i <= 60; i++ {
		l := float64(i) * 0.05
		lam = append(lam, l)
		chi := func(eta float64) float64 {
			if l == 0 {
				return 1
			}
			phi := 0.5 * (1 + eta + l*l)
			return math.Min(1, 1/(phi+math.Sqrt(phi*phi-l*l)))
		}
		pr = append(pr, chi(0.003*l*100/1.2))
		cb = append(cb, chi(0.34*math.Max(0, l-0.2)))
	}
	b.Slenderness = &SlendernessChart{Curves: []Curve{{Name: "Perry-Robertson", X: lam, Y: pr}, {Name: "curve b (EN 1993-1-1)", X: lam, Y: cb}}, Member: [2]float64{0.972, 0.60}}
	r := rand.New(rand.NewPCG(1, 2))
	for i := 0; i < 1500; i++ {
		l := 0.972 * (1 + 0.04*r.NormFloat64())
		b.Slenderness.Cloud = append(b.Slenderness.Cloud, [2]float64{l, 0.60 * (1 + 0.09*r.NormFloat64())})
	}
	for _, v := range []struct {
		name  string
		shift float64
	}{{"as built", 0}, {"bow L/500", 0.45}} {
		s := Series{Name: v.name}
		for _, p := range doc.Sweep {
			beta := float64(p.Beta) - v.shift
			pf := sim.PfFromBeta(beta)
			s.Points = append(s.Points, Point{Value: p.Value, Beta: Index(beta), Pf: pf, PfCI: [2]float64{pf * 0.9, pf * 1.1}})
		}
		b.Series = append(b.Series, s)
	}
	// Amplified bow: v = e0 / (1 - P/Pcr), up to 0.9 Pcr (classic result).
	tr := &Trace{}
	for i := 0; i <= 30; i++ {
		P := 3120e3 * 0.9 * float64(i) / 30
		tr.Load = append(tr.Load, P)
		tr.Deflection = append(tr.Deflection, 5.2/(1-P/3120e3))
	}
	for i := 0; i <= 40; i++ {
		x := 5200 * float64(i) / 40
		tr.Position = append(tr.Position, x)
		tr.Shape = append(tr.Shape, 52*math.Sin(math.Pi*x/5200))
	}
	b.Trace = tr
	// Invented FORM betas with each input fixed (higher load, lower beta).
	b.TornadoBeta = []sim.TornadoRow{
		{Variable: "loads.imposed", LowValue: 160e3, HighValue: 290e3, LowBeta: 3.61, HighBeta: 2.21},
		{Variable: "material.yield", LowValue: 282, HighValue: 345, LowBeta: 2.41, HighBeta: 3.32},
		{Variable: "imperfection.bow", LowValue: 0.9, HighValue: 9.2, LowBeta: 3.35, HighBeta: 2.62},
		{Variable: "loads.dead", LowValue: 520e3, HighValue: 720e3, LowBeta: 3.15, HighBeta: 2.71},
		{Variable: "material.modulus", LowValue: 195000, HighValue: 215000, LowBeta: 2.93, HighBeta: 2.97},
	}
	return b
}
