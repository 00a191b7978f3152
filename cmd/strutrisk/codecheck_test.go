package main

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestCheckJSONCodeCheck: check --json carries code_check, computed here by
// hand for the study good (main_test.go): a solid rect 100 x 50 mm, 2 m,
// pinned, yield lognormal mean 250 MPa CoV 0.1, dead normal mean 100 kN,
// imposed Gumbel mean 80 kN CoV 0.3 (1-year maxima: no reference period).
//
//	f_yk = exp(lambda - 1.6449 zeta)                 5 % fractile (EN 1990 4.2)
//	i_z = 50 / sqrt(12), lambda_z = (2000 / i_z) / (pi sqrt(E / f_yk))  (6.50)
//	curve c (EN 1993-1-1 Table 6.2, solid sections), alpha 0.49          (6.49)
//	N_Rd = chi A f_yk / 1.0
//	Q_k = u - ln(-ln 0.98) / a, a = pi / (sd sqrt 6), u = mean - 0.5772 / a
//	      (98 % fractile of the Gumbel, EN 1990 4.1.2)
//	N_Ed = 1.35 * 100 kN + 1.5 Q_k                    (EN 1990 6.10)
func TestCheckJSONCodeCheck(t *testing.T) {
	d, raw := ctCheckJSON(t, good)
	cc, ok := raw["code_check"].(map[string]any)
	if !ok || d.CodeCheck == nil {
		t.Fatalf("no code_check in check --json: %v", raw["code_check"])
	}
	for _, k := range []string{"resistance", "design_load", "utilisation", "gamma_m0", "gamma_m1", "gamma_g", "gamma_q", "psi_0", "chi", "curve", "relative_slenderness", "characteristic"} {
		if _, ok := cc[k]; !ok {
			t.Errorf("code_check lacks %q", k)
		}
	}
	zeta := math.Sqrt(math.Log1p(0.1 * 0.1))
	fyk := math.Exp(math.Log(250) - zeta*zeta/2 - 1.6448536269514722*zeta)
	lam := 2000 / (50 / math.Sqrt(12)) / (math.Pi * math.Sqrt(200000/fyk))
	phi := 0.5 * (1 + 0.49*(lam-0.2) + lam*lam)
	chi := 1 / (phi + math.Sqrt(phi*phi-lam*lam))
	nrd := chi * 5000 * fyk
	sd := 0.3 * 80e3
	a := math.Pi / (sd * math.Sqrt(6))
	u := 80e3 - 0.5772156649015329/a
	qk := u - math.Log(-math.Log(0.98))/a
	ned := 1.35*100e3 + 1.5*qk
	c := d.CodeCheck
	for _, k := range []struct {
		name      string
		got, want float64
	}{
		{"yield", c.Yield, fyk}, {"relative_slenderness", c.RelativeSlenderness, lam}, {"chi", c.Chi, chi},
		{"resistance", c.Resistance, nrd}, {"characteristic loads.imposed", c.Characteristic["loads.imposed"], qk},
		{"design_load", c.DesignLoad, ned}, {"utilisation", c.Utilisation, ned / nrd},
		{"gamma_g", c.GammaG, 1.35}, {"gamma_q", c.GammaQ, 1.5}, {"gamma_m1", c.GammaM1, 1},
	} {
		if math.Abs(k.got/k.want-1) > 1e-6 {
			t.Errorf("code_check %s %.7g, want %.7g", k.name, k.got, k.want)
		}
	}
	if c.Curve != "c" || c.Axis != "minor" || c.LeadingLoad != "loads.imposed" || c.LoadFactors["loads.dead"] != 1.35 {
		t.Errorf("curve %q axis %q leading %q dead factor %g", c.Curve, c.Axis, c.LeadingLoad, c.LoadFactors["loads.dead"])
	}
	// Set factors are used, and check prints the check beside the rest.
	s := strings.Replace(good, "[target]", "[code_check]\ngamma_m1 = 1.1\ngamma_g = 1.2\n[target]", 1)
	d2, _ := ctCheckJSON(t, s)
	if c2 := d2.CodeCheck; math.Abs(c2.Resistance/(nrd/1.1)-1) > 1e-6 || math.Abs(c2.DesignLoad/(1.2*100e3+1.5*qk)-1) > 1e-6 {
		t.Errorf("gamma_m1 1.1, gamma_g 1.2: resistance %g design load %g", c2.Resistance, c2.DesignLoad)
	}
	code, out, errs := invoke(t, "check", writeStudy(t, good))
	if code != 0 || !strings.Contains(out, "Code check at characteristic values") || !strings.Contains(out, "National Annex may differ") {
		t.Errorf("check text (exit %d %s) lacks the code check:\n%s", code, errs, out)
	}
}

// TestRunCodeCheckReports: the run summary, summary.txt, summary.md and
// report.html show the code check with the National Annex caution.
func TestRunCodeCheckReports(t *testing.T) {
	dir := t.TempDir()
	code, out, errs := invoke(t, "run", writeStudy(t, good), "--method", "form", "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	if !strings.Contains(out, "code check") {
		t.Errorf("run summary lacks the code check:\n%s", out)
	}
	for file, want := range map[string][]string{
		"report.html":  {"Code check beside β", "utilisation N_Ed / N_Rd", "National Annex"},
		"summary.md":   {"### Code check beside beta", "National Annex"},
		"summary.txt":  {"code check", "National Annex"},
		"results.json": {`"code_check"`, `"design_load"`},
	} {
		b, err := os.ReadFile(filepath.Join(dir, file))
		if err != nil {
			t.Fatal(err)
		}
		for _, w := range want {
			if !strings.Contains(string(b), w) {
				t.Errorf("%s lacks %q", file, w)
			}
		}
	}
}
