package analysis

import (
	"context"
	"fmt"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/internal/report"
)

// linStudy is stocky made linear and normal: a normal yield (mean 300
// MPa, CoV 0.10) and a fixed model factor, so R = A fy = 1e4 fy N is
// normal (mean 3e6 N, sd 3e5 N; chi = 1, see stocky), under a normal
// axial load of the given mean and CoV: g = R - S is linear in normals,
// where FORM is exact (Ditlevsen & Madsen, Structural Reliability
// Methods, 1996, ch. 5, from memory).
func linStudy(meanKN, cov float64, method string, samples int, shared string) string {
	text := strings.Replace(stocky, `yield = { dist = "lognormal", mean = 300, cov = 0.10 }`,
		`yield = { dist = "normal", mean = 300, cov = 0.10 }`, 1)
	text = strings.Replace(text, `model_factor = { dist = "lognormal", mean = 1.0, cov = 0.05 }`, "", 1)
	text = strings.Replace(text, `axial = { dist = "lognormal", mean = "1500 kN", cov = 0.20 }`,
		fmt.Sprintf(`axial = { dist = "normal", mean = "%g kN", cov = %g }`, meanKN, cov), 1)
	text = strings.Replace(text, "samples = 2_000_000", fmt.Sprintf("samples = %d\nmethod = %q", samples, method), 1)
	return text + "[inventory]\nfile = \"members.csv\"\n" + shared
}

const linMuR, linSdR = 3e6, 3e5

// simpson integrates f over [-10, 10] by the composite Simpson rule with
// 4000 intervals (f smooth and negligible beyond).
func simpson(f func(float64) float64) float64 {
	const a, b, k = -10.0, 10.0, 4000
	h := (b - a) / k
	sum := f(a) + f(b)
	for i := 1; i < k; i++ {
		sum += float64(2+2*(i%2)) * f(a+float64(i)*h)
	}
	return sum * h / 3
}

// equicorrelatedPf is the probability that one of n members R_i ~ N(muR,
// sdR), independent, fails under their one shared normal load S ~ N(mu,
// sd): given S = mu + sd z the members fail independently, so
//
//	P(system) = 1 - integral of phi(z) Phi((muR - mu - sd z)/sdR)^n dz,
//
// the survival integrated (not the failure) and subtracted from one
// only for a pf that is not tiny; for a tiny pf the failure,
// 1 - Phi^n by expm1 of n log Phi.
func equicorrelatedPf(n int, mu, sd float64) float64 {
	return simpson(func(z float64) float64 {
		c := distuv.UnitNormal.CDF((linMuR - mu - sd*z) / linSdR)
		return distuv.UnitNormal.Prob(z) * -math.Expm1(float64(n)*math.Log(c))
	})
}

// relClose tells whether got is within rel of want, relatively.
func relClose(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Abs(want)
}

// TestFormSystemEquicorrelated is check (a): identical linear normal
// members sharing their load ("all"), where FORM is exact, so the
// first-order system pf equals the integral over the load to 1e-6.
func TestFormSystemEquicorrelated(t *testing.T) {
	members := "name\nA\nB\nC\nD\nE\n"
	sys := runSystemStudy(t, linStudy(2000, 0.15, "auto", 200_000, `shared = { "loads.axial" = "all" }`+"\n"), members, 2).System
	want := equicorrelatedPf(5, 2000e3, 0.15*2000e3)
	if sys.FormPf == nil || !relClose(*sys.FormPf, want, 1e-6) {
		t.Fatalf("form_pf %v, want %.9g (the integral over the load)", sys.FormPf, want)
	}
	if *sys.FormPfError > 1e-9*want {
		t.Errorf("form_pf_error %.3g: the quadrature should be far finer", *sys.FormPfError)
	}
	if sys.Headline != "joint sampling" || !within(want, sys.Pf, sys.PfCI) {
		t.Errorf("headline %q, sampled pf %.4g [%.4g, %.4g], exact %.4g", sys.Headline, sys.Pf, sys.PfCI[0], sys.PfCI[1], want)
	}
}

// TestFormSystemIndependent is check (b): linear normal members that
// share nothing: 1 - prod(1 - Phi(-beta_i)), beta_i = (muR - muS_i) /
// sqrt(sdR^2 + sdS_i^2) (Cornell's index of normal R and S, exact).
func TestFormSystemIndependent(t *testing.T) {
	members := "name, loads.axial.mean (kN)\nA, 2000\nB, 1800\nC, 2200\n"
	sys := runSystemStudy(t, linStudy(2000, 0.15, "auto", 200_000, ""), members, 1).System
	logSurv := 0.0
	for _, mu := range []float64{2000e3, 1800e3, 2200e3} {
		beta := (linMuR - mu) / math.Hypot(linSdR, 0.15*mu)
		logSurv += math.Log(distuv.UnitNormal.CDF(beta))
	}
	want := -math.Expm1(logSurv)
	if sys.FormPf == nil || !relClose(*sys.FormPf, want, 1e-6) {
		t.Fatalf("form_pf %v, want %.9g", sys.FormPf, want)
	}
	if !strings.Contains(sys.FormMethod, "exact") {
		t.Errorf("form_method %q", sys.FormMethod)
	}
}

// TestFormSystemRare is check (d): five equicorrelated linear normal
// members whose system pf is about 7e-7, far below what 20,000 joint
// samples see: FORM still gives the integral's value, and it becomes the
// headline.
func TestFormSystemRare(t *testing.T) {
	members := "name\nA\nB\nC\nD\nE\n"
	sys := runSystemStudy(t, linStudy(1200, 0.15, "form", 20_000, `shared = { "loads.axial" = "all" }`+"\n"), members, 2).System
	want := equicorrelatedPf(5, 1200e3, 0.15*1200e3)
	if want > 1e-6 || want < 1e-8 {
		t.Fatalf("the closed form gives %.3g: the study is not rare as meant", want)
	}
	if sys.Status != "no failures" || sys.Headline != "form" {
		t.Errorf("status %q, headline %q: want no failures, form", sys.Status, sys.Headline)
	}
	if sys.FormPf == nil || !relClose(*sys.FormPf, want, 1e-6) {
		t.Fatalf("form_pf %v, want %.9g", sys.FormPf, want)
	}
}

// TestFormSystemGroups shares the load by a column: two groups, two
// shared normals, integrated by sampling them. The groups are
// independent, so the system pf is 1 - (1 - P_1)(1 - P_2) with P_g the
// equicorrelated integral of group g's members; the estimate must hold
// it within four of its standard errors.
func TestFormSystemGroups(t *testing.T) {
	members := "name, floor, loads.axial.mean (kN)\nA, 1, 2000\nB, 1, 2000\nC, 1, 2000\nD, 2, 1800\nE, 2, 1800\n"
	sys := runSystemStudy(t, linStudy(2000, 0.15, "form", 20_000, `shared = { "loads.axial" = "floor" }`+"\n"), members, 2).System
	p1 := equicorrelatedPf(3, 2000e3, 0.15*2000e3)
	p2 := equicorrelatedPf(2, 1800e3, 0.15*1800e3)
	want := 1 - (1-p1)*(1-p2)
	if sys.FormPf == nil {
		t.Fatal("no form_pf")
	}
	if got, se := *sys.FormPf, *sys.FormPfError; math.Abs(got-want) > 4*se || se > 0.02*want {
		t.Errorf("form_pf %.6g, standard error %.3g; want %.6g", got, se, want)
	}
	if !strings.Contains(sys.FormMethod, "2 shared normals") {
		t.Errorf("form_method %q", sys.FormMethod)
	}
}

// TestFormSystemNonlinear is check (c): lognormal capacities (stocky's R,
// see rsR) under one shared normal load, where FORM linearises a curved
// margin. The first-order system pf must agree with the joint sample
// within its interval (four standard errors) widened by FORM's own error,
// stated here as 10 % of pf (measured: 4 % above the exact value, see the
// log), and with the exact integral (the Simpson rule over the load, as
// in TestSystemEquicorrelated) within the same 10 %.
func TestFormSystemNonlinear(t *testing.T) {
	const n = 5
	inv := runSystemStudy(t, rsStudy(`shared = { "loads.axial" = "all" }`+"\n"), "name\nA\nB\nC\nD\nE\n", 2)
	sys := inv.System
	mu, sigma := 2000e3, 0.15*2000e3
	exact := simpson(func(z float64) float64 {
		return distuv.UnitNormal.Prob(z) * (1 - math.Pow(1-rsPf(mu+sigma*z), n))
	})
	if sys.FormPf == nil {
		t.Fatal("no form_pf")
	}
	got := *sys.FormPf
	t.Logf("form_pf %.5g, exact %.5g, sampled %.5g [%.5g, %.5g]", got, exact, sys.Pf, sys.PfCI[0], sys.PfCI[1])
	const formErr = 0.10
	if !relClose(got, exact, formErr) {
		t.Errorf("form_pf %.5g is more than %g of the exact %.5g", got, formErr, exact)
	}
	half := (sys.PfCI[1] - sys.PfCI[0]) / 2 * 4 / 1.96
	if math.Abs(got-sys.Pf) > half+formErr*got {
		t.Errorf("form_pf %.5g against the joint sample %.5g [%.5g, %.5g]", got, sys.Pf, sys.PfCI[0], sys.PfCI[1])
	}
}

// TestSystemHeadline checks which estimate of the system is to be read:
// the joint sample when a sample failed (warned of when FORM is outside
// its interval), FORM when none did, unless FORM lies above the sample's
// 95 % bound, which then stands.
func TestSystemHeadline(t *testing.T) {
	cases := []struct {
		status   string
		ci       [2]float64
		form     float64
		headline string
		warn     string
	}{
		{"converged", [2]float64{1e-3, 2e-3}, 1.5e-3, "joint sampling", ""},
		{"few failures", [2]float64{1e-5, 5e-5}, 8e-5, "joint sampling", "outside the joint sample's 95 % interval"},
		{"no failures", [2]float64{0, 3e-6}, 6e-7, "form", "not a verdict"},
		{"no failures", [2]float64{0, 3e-6}, 9e-6, "joint sampling", "the bound stands"},
		{"no samples", [2]float64{0, 1}, 1e-4, "form", "not a verdict"},
	}
	for _, c := range cases {
		d := &report.System{Status: c.status, PfCI: c.ci, Samples: 1000}
		if c.status == "no samples" {
			d.Samples = 0
		}
		h, w := systemHeadline(d, c.form)
		if h != c.headline || (c.warn == "") != (w == "") || !strings.Contains(w, c.warn) {
			t.Errorf("%s, interval %v, FORM %g: headline %q, warning %q; want %q and %q", c.status, c.ci, c.form, h, w, c.headline, c.warn)
		}
	}
}

// TestFormSystemDemo is check (c) with several shared normals: the
// building demo (lognormal yield and model factor, Gumbel imposed loads;
// five shared normals: two batches, two floors, one model factor), whose
// first-order system must agree with its joint sample of 1e6 within the
// sample's interval (four standard errors) widened by FORM's own error,
// stated as 10 % of pf as in TestFormSystemNonlinear.
func TestFormSystemDemo(t *testing.T) {
	l, err := Load("../../studies/building-inventory.toml")
	if err != nil {
		t.Fatal(err)
	}
	s := l.Settings(2)
	r, err := Run(context.Background(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	sys := r.Document().Inventory.System
	if sys == nil || sys.FormPf == nil {
		t.Fatalf("no first-order system: %v", r.warnings)
	}
	got := *sys.FormPf
	t.Logf("form_pf %.4g (error %.2g), sampled %.4g [%.4g, %.4g]", got, *sys.FormPfError, sys.Pf, sys.PfCI[0], sys.PfCI[1])
	half := (sys.PfCI[1] - sys.PfCI[0]) / 2 * 4 / 1.96
	if math.Abs(got-sys.Pf) > half+0.10*got || *sys.FormPfError > 0.01*got {
		t.Errorf("form_pf %.4g (error %.2g) against the joint sample %.4g [%.4g, %.4g]", got, *sys.FormPfError, sys.Pf, sys.PfCI[0], sys.PfCI[1])
	}
	if !strings.Contains(sys.FormMethod, "5 shared normals") || sys.Headline != "joint sampling" {
		t.Errorf("form_method %q, headline %q", sys.FormMethod, sys.Headline)
	}
}
