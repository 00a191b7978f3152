package analysis

import (
	"context"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/internal/report"
)

// rsStudy is stocky (R = A fy x model factor, lognormal, exactly: see
// stocky) under a normal axial load of mean 2000 kN and CoV 0.15, with the
// members listed in members.csv, sharing the load as shared says.
func rsStudy(shared string) string {
	text := strings.Replace(stocky, `axial = { dist = "lognormal", mean = "1500 kN", cov = 0.20 }`,
		`axial = { dist = "normal", mean = "2000 kN", cov = 0.15 }`, 1)
	text = strings.Replace(text, "target_cov = 0.04", "target_cov = 0.03", 1)
	return text + "[inventory]\nfile = \"members.csv\"\n" + shared
}

// rsR are the log-mean and log-standard deviation of stocky's capacity.
func rsR() (lam, zeta float64) {
	z2 := math.Log((1 + 0.1*0.1) * (1 + 0.05*0.05)) // 1+V^2 of a product of lognormals
	return math.Log(100*100*300.0) - z2/2, math.Sqrt(z2)
}

// rsPf is P(R < S) given S = s: the lognormal CDF of R at s.
func rsPf(s float64) float64 {
	if s <= 0 {
		return 0
	}
	lam, zeta := rsR()
	return distuv.UnitNormal.CDF((math.Log(s) - lam) / zeta)
}

// runSystemStudy runs the study with its members and returns the system.
func runSystemStudy(t *testing.T, text, members string, workers int) *report.Inventory {
	t.Helper()
	l := loadInventory(t, text, members)
	l.Study.Sensitivity.Tornado, l.Study.Sensitivity.Sobol = false, false
	s := l.Settings(workers)
	r, err := Run(context.Background(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	inv := r.Document().Inventory
	if inv == nil || inv.System == nil {
		t.Fatalf("no system: %v", r.warnings)
	}
	return inv
}

// within tells whether x is within four standard errors (the 95 %
// interval's half-width times 4/1.96) of the estimate.
func within(x, est float64, ci [2]float64) bool {
	return math.Abs(x-est) <= (ci[1]-ci[0])/2*4/1.96
}

// TestSystemEquicorrelated checks the series system of n identical
// members sharing their one normal load ("all"): given the load S = s the
// members fail independently with p(s) = P(R < s), so
//
//	P(system) = integral of phi(z) [1 - (1 - p(mu + sigma z))^n] dz,
//
// computed here by the composite Simpson rule on [-10, 10] with 4000
// intervals (the integrand is smooth and negligible beyond). The jointly
// sampled pf must hold it within its interval (four standard errors), and
// it is far from the independent members' 1 - (1 - pf)^n.
func TestSystemEquicorrelated(t *testing.T) {
	const n = 5
	members := "name\nA\nB\nC\nD\nE\n"
	inv := runSystemStudy(t, rsStudy(`shared = { "loads.axial" = "all" }`+"\n"), members, 2)
	mu, sigma := 2000e3, 0.15*2000e3
	f := func(z float64) float64 {
		return distuv.UnitNormal.Prob(z) * (1 - math.Pow(1-rsPf(mu+sigma*z), n))
	}
	const a, b, k = -10.0, 10.0, 4000
	h := (b - a) / k
	sum := f(a) + f(b)
	for i := 1; i < k; i++ {
		w := 2.0
		if i%2 == 1 {
			w = 4
		}
		sum += w * f(a+float64(i)*h)
	}
	want := sum * h / 3
	sys := inv.System
	if !within(want, sys.Pf, sys.PfCI) {
		t.Errorf("system pf %.5g, interval [%.5g, %.5g]; the integral gives %.5g", sys.Pf, sys.PfCI[0], sys.PfCI[1], want)
	}
	if indep := sys.PfIfIndependent; !(indep > want*1.15) {
		t.Errorf("pf if independent %.4g should be well above the shared system's %.4g", indep, want)
	}
	for _, m := range inv.Members {
		// By symmetry each member fails in pf/pf_sys of the system failures.
		if m.Share == nil || math.Abs(*m.Share-m.Pf/sys.Pf) > 0.1 {
			t.Errorf("member %s: share %v, want about %.3g", m.Name, m.Share, m.Pf/sys.Pf)
		}
	}
}

// TestSystemIndependent checks members that share nothing: the system pf
// is 1 - prod(1 - pf_i) with each pf_i the closed form of lognormal R and
// normal S, integral of p(s) over the normal S, by the Simpson rule as
// above.
func TestSystemIndependent(t *testing.T) {
	members := "name, loads.axial.mean (kN)\nA, 2000\nB, 1800\nC, 2200\n"
	inv := runSystemStudy(t, rsStudy(""), members, 1)
	prod := 1.0
	for _, mean := range []float64{2000e3, 1800e3, 2200e3} {
		sigma := 0.15 * mean
		f := func(z float64) float64 { return distuv.UnitNormal.Prob(z) * rsPf(mean+sigma*z) }
		const a, b, k = -10.0, 10.0, 4000
		h := (b - a) / k
		sum := f(a) + f(b)
		for i := 1; i < k; i++ {
			sum += float64(2+2*(i%2)) * f(a+float64(i)*h)
		}
		prod *= 1 - sum*h/3
	}
	want := 1 - prod
	sys := inv.System
	if !within(want, sys.Pf, sys.PfCI) {
		t.Errorf("system pf %.5g, interval [%.5g, %.5g]; 1 - prod(1 - pf_i) = %.5g", sys.Pf, sys.PfCI[0], sys.PfCI[1], want)
	}
	if math.Abs(sys.PfIfIndependent-want) > 0.05*want {
		t.Errorf("pf if independent %.5g, want %.5g", sys.PfIfIndependent, want)
	}
}

// TestSystemWorkers checks that the joint sample gives the same counts
// for any number of workers.
func TestSystemWorkers(t *testing.T) {
	members := "name, group\nA, 1\nB, 1\nC, 2\n"
	text := rsStudy(`shared = { "loads.axial" = "group", "material.yield" = "all" }` + "\n")
	a := runSystemStudy(t, text, members, 1).System
	b := runSystemStudy(t, text, members, 2).System
	if a.Pf != b.Pf || a.Samples != b.Samples {
		t.Errorf("1 worker: pf %v in %d samples; 2 workers: pf %v in %d", a.Pf, a.Samples, b.Pf, b.Samples)
	}
}
