package main

import (
	"encoding/json"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/internal/report"
)

// tableD1 are the k_n factors for the 5 % characteristic value from n test
// results, EN 1990:2002 Annex D, Table D1 (from memory), with the
// coefficient of variation known and unknown.
var tableD1 = []struct {
	n                int
	known, unknownKn float64
}{
	{3, 1.89, 3.37},
	{5, 1.80, 2.33},
	{10, 1.72, 1.92},
	{30, 1.67, 1.73},
}

// coupons returns n invented yield strengths (MPa) with some scatter.
func coupons(n int) []float64 {
	x := make([]float64, n)
	for i := range x {
		x[i] = 300 * math.Exp(0.06*math.Sin(1.7*float64(i+1)))
	}
	return x
}

// TestCheckAnnexD: a study whose yield strength is updated from n coupons
// with a vague prior: check --json reports the updated 5 % fractile, which
// must be the characteristic value of EN 1990:2002 Annex D, D.7,
// exp(m_y - k_n s_y), with k_n from Table D1 (V unknown: s_y the sample
// standard deviation of ln x; V known: s_y = sqrt(ln(1 + V^2))). Table D1
// gives k_n to two decimals, so the match is to 0.01 s_y in ln x.
func TestCheckAnnexD(t *testing.T) {
	for _, c := range tableD1 {
		for _, known := range []bool{false, true} {
			name := fmt.Sprintf("n=%d/known=%v", c.n, known)
			t.Run(name, func(t *testing.T) {
				data := coupons(c.n)
				vals := make([]string, c.n)
				for i, v := range data {
					vals[i] = fmt.Sprintf("%q", fmt.Sprintf("%.6f MPa", v))
				}
				entry := "yield = { values = [" + strings.Join(vals, ", ") + "] }"
				const vKnown = 0.05
				if known {
					entry = strings.Replace(entry, "] }", fmt.Sprintf("], cov = %g }", vKnown), 1)
				}
				code, out, errs := invoke(t, "check", writeStudy(t, stocky+"[measurements]\n"+entry+"\n"), "--json")
				if code != 0 {
					t.Fatalf("exit %d\n%s", code, errs)
				}
				var d report.Document
				if err := json.Unmarshal([]byte(out), &d); err != nil {
					t.Fatal(err)
				}
				if len(d.Measurements) != 1 {
					t.Fatalf("measurements %+v", d.Measurements)
				}
				m := d.Measurements[0]
				var my, sy float64
				for _, v := range data {
					my += math.Log(v) / float64(c.n)
				}
				for _, v := range data {
					sy += (math.Log(v) - my) * (math.Log(v) - my) / float64(c.n-1)
				}
				sy = math.Sqrt(sy)
				kn := c.unknownKn
				if known {
					kn, sy = c.known, math.Sqrt(math.Log(1+vKnown*vKnown))
				}
				got := (my - math.Log(m.Updated.P05)) / sy
				if math.Abs(got-kn) > 0.01 {
					t.Errorf("updated 5%% fractile %.3f MPa is exp(m - %.4f s), Table D1 k_n = %.2f", m.Updated.P05, got, kn)
				}
				if m.N != c.n || m.Variable != "material.yield" || m.Unit != "MPa" {
					t.Errorf("measurement %+v", m)
				}
			})
		}
	}
}

// TestCheckMeasurementsText: check prints the prior against the update.
func TestCheckMeasurementsText(t *testing.T) {
	s := stocky + "[measurements]\nyield = { values = [\"287 MPa\", \"301 MPa\", \"279 MPa\", \"295 MPa\"], prior_tests = 3, prior_dof = 5 }\n"
	code, out, errs := invoke(t, "check", writeStudy(t, s))
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	for _, want := range []string{"Updated from measurements", "material.yield (MPa)", "300 / 0.100 /", "log-Student-t, 9 dof", "the reserve factor multiplies the variable loads: loads.axial"} {
		if !strings.Contains(out, want) {
			t.Errorf("check lacks %q:\n%s", want, out)
		}
	}
}

// TestRunUndecided: a target next to the study's beta (3.108, exact; see
// stocky) with a small crude sample: the interval of beta straddles it, so
// the verdict is undecided, meets_target stays absent, the document says
// how many evaluations would decide it, and --require-target exits 1.
func TestRunUndecided(t *testing.T) {
	s := strings.Replace(stocky, "beta = 3.8", "beta = 3.11", 1)
	study := writeStudy(t, s)
	code, out, errs := invoke(t, "run", study, "--json", "--out", t.TempDir(), "--method", "monte-carlo", "--samples", "40000")
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatal(err)
	}
	if !(d.BetaCI[0] < 3.11 && 3.11 < d.BetaCI[1]) {
		t.Fatalf("the interval [%.3f, %.3f] does not straddle 3.11: pick another sample size", d.BetaCI[0], d.BetaCI[1])
	}
	if d.MeetsTarget != nil {
		t.Errorf("meets_target = %v, want absent when undecided", *d.MeetsTarget)
	}
	if d.Target == nil || d.Target.Verdict != "undecided" || d.Target.SamplesToDecide == nil {
		t.Fatalf("target %+v, want undecided with samples_to_decide", d.Target)
	}
	// n (CoV / CoV_needed)^2 with CoV_needed = |pt - pf| / (1.96 pf).
	pt := 0.5 * math.Erfc(3.11/math.Sqrt2)
	need := math.Abs(pt-*d.Pf) / (1.96 * *d.Pf)
	want := float64(*d.Evaluations) * math.Pow(*d.PfCoV/need, 2)
	if got := *d.Target.SamplesToDecide; math.Abs(got-want) > 1+1e-9*want || got <= float64(*d.Evaluations) {
		t.Errorf("samples_to_decide %g, want %g (more than the %d run)", got, want, *d.Evaluations)
	}
	code, out, errs = invoke(t, "run", study, "--out", t.TempDir(), "--method", "monte-carlo", "--samples", "40000", "--require-target")
	if code != exitTarget || !strings.Contains(errs, "undecided at this sample size") {
		t.Errorf("--require-target when undecided: exit %d, stderr %q; want 1", code, errs)
	}
	if !strings.Contains(out, "undecided at this sample size") || !strings.Contains(out, "evaluations would decide it") {
		t.Errorf("summary does not say undecided:\n%s", out)
	}
}

// TestRunReserve: the reserve factor of the lognormal R and S strut
// against the closed form lambda = exp((beta(1) - target) D) (see
// internal/study's TestReserveFactorClosedForm for the source): FORM is
// exact, and the sampling run at the factor confirms the target within
// its interval.
func TestRunReserve(t *testing.T) {
	vr2 := (1+0.10*0.10)*(1+0.05*0.05) - 1
	dd := math.Sqrt(math.Log((1 + vr2) * (1 + 0.04)))
	want := math.Exp((stockyBeta - 3.8) * dd)
	dir := t.TempDir()
	code, out, errs := invoke(t, "run", writeStudy(t, stocky), "--json", "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatal(err)
	}
	if d.ReserveFactor == nil || d.Target == nil || d.Target.ReserveFORMFactor == nil {
		t.Fatalf("no reserve factor: %s", out)
	}
	if f := *d.Target.ReserveFORMFactor; math.Abs(f-want) > 1e-4*want {
		t.Errorf("FORM reserve factor %.6f, want %.6f", f, want)
	}
	c := d.Target.Confirmation
	if c == nil {
		t.Fatal("no confirmation run")
	}
	if !(c.BetaCI[0] <= 3.8 && 3.8 <= c.BetaCI[1]) && math.Abs(float64(c.Beta)-3.8) > 0.005 {
		t.Errorf("confirmed beta %.3f [%.3f, %.3f] misses the target 3.8", c.Beta, c.BetaCI[0], c.BetaCI[1])
	}
	if f := *d.ReserveFactor; math.Abs(f-want) > 0.03*want {
		t.Errorf("reserve factor %.4f, closed form %.4f", f, want)
	}
	if d.Target.LargestAddedLoad == nil || *d.Target.LargestAddedLoad >= 0 {
		t.Errorf("largest added load %v: the target is missed, so it should be a load to take away", d.Target.LargestAddedLoad)
	}
	html, err := os.ReadFile(filepath.Join(dir, "report.html"))
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range []string{"Margin against the target", "reserve factor by FORM alone", "load to take away"} {
		if !strings.Contains(string(html), s) {
			t.Errorf("report.html lacks %q", s)
		}
	}
}

// TestRunMeasuredReport: the report shows the update as a table and a
// picture, and the run uses the updated distribution.
func TestRunMeasuredReport(t *testing.T) {
	s := stocky + "[measurements]\nyield = { values = [\"287 MPa\", \"301 MPa\", \"279 MPa\", \"295 MPa\"], prior_tests = 3, prior_dof = 5 }\n"
	dir := t.TempDir()
	code, out, errs := invoke(t, "run", writeStudy(t, s), "--json", "--out", dir, "--method", "form")
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatal(err)
	}
	if len(d.Measurements) != 1 || d.Measurements[0].Updated.Dist != "log-Student-t" || d.Measurements[0].Updated.DoF != 9 {
		t.Errorf("measurements %+v", d.Measurements)
	}
	html, err := os.ReadFile(filepath.Join(dir, "report.html"))
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range []string{"Updating from measurements", "fig-update-1", "updated 5% fractile", "fig-tornado-beta", "β at low"} {
		if !strings.Contains(string(html), s) {
			t.Errorf("report.html lacks %q", s)
		}
	}
}
