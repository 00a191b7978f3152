package main

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/internal/report"
)

// TestRunDesignValuesClosedForm: the stocky strut (run_test.go) has R = A
// fy theta with lognormal fy and theta against a lognormal S, so ln R -
// ln S is linear in standard normal space and FORM is exact. With lambda,
// zeta the mean and sd of each log and D = sqrt(zeta_fy^2 + zeta_theta^2
// + zeta_S^2), alpha_i = zeta_i / D for the resistances and -zeta_S / D
// for the load, and at a target beta_t (EN 1990 Annex C, C.7)
//
//	x_d = exp(lambda_i - alpha_i beta_t zeta_i)
//
// The characteristic values (EN 1990 4.1.2, 4.2): fy its 5 % fractile
// exp(lambda - 1.6449 zeta); theta its mean, 1; S, a variable load whose
// distribution describes maxima over the reference period of n years, the
// 98 % fractile of annual maxima, exp(lambda + zeta Phi^-1(0.98^n)); a
// permanent load its mean. gamma = x_k / x_d (resistance), x_d / x_k
// (action). Checked to 1e-6 against FORM's design values.
func TestRunDesignValuesClosedForm(t *testing.T) {
	t.Parallel() // sets no hook: runs beside the other slow tests
	logs := func(mean, cov float64) (lambda, zeta float64) {
		zeta = math.Sqrt(math.Log1p(cov * cov))
		return math.Log(mean) - zeta*zeta/2, zeta
	}
	lf, zf := logs(300, 0.10)
	lt, zt := logs(1, 0.05)
	ls, zs := logs(1.5e6, 0.20)
	D := math.Sqrt(zf*zf + zt*zt + zs*zs)
	std := distuv.UnitNormal
	for _, c := range []struct {
		name, edit string
		beta       float64
		loadK      float64 // characteristic load
		role       string
	}{
		{"variable load, 1 year", "", 3.8, math.Exp(ls + zs*std.Quantile(0.98)), "action"},
		// EN 1990 Annex B Table B2, RC1 over 50 years: 3.3 (from memory).
		{"variable load, 50 years", "consequence = \"low\"\nreference_period = \"50 years\"", 3.3, math.Exp(ls + zs*std.Quantile(math.Pow(0.98, 50))), "action"},
		{"permanent load", "permanent = [\"axial\"]\nreserve_on = \"all\"\nbeta = 3.8", 3.8, 1.5e6, "action"},
	} {
		t.Run(c.name, func(t *testing.T) {
			s := stocky
			if c.edit != "" {
				s = strings.Replace(s, "beta = 3.8\n", c.edit+"\n", 1)
			}
			code, out, errs := invoke(t, "run", writeStudy(t, s), "--json", "--method", "form", "--out", t.TempDir())
			if code != 0 {
				t.Fatalf("exit %d\n%s", code, errs)
			}
			var d report.Document
			if err := json.Unmarshal([]byte(out), &d); err != nil {
				t.Fatal(err)
			}
			f := d.FORM
			if f == nil || f.DesignBeta == nil || *f.DesignBeta != c.beta {
				t.Fatalf("form %+v, want design values at beta %g", f, c.beta)
			}
			bt := c.beta
			want := []struct {
				name, role     string
				design, charac float64
			}{
				{"material.yield", "resistance", math.Exp(lf - zf*zf/D*bt), math.Exp(lf - 1.6448536269514722*zf)},
				{"capacity.model_factor", "resistance", math.Exp(lt - zt*zt/D*bt), 1},
				{"loads.axial", c.role, math.Exp(ls + zs*zs/D*bt), c.loadK},
			}
			for _, w := range want {
				gamma := w.charac / w.design
				if w.role == "action" {
					gamma = w.design / w.charac
				}
				rel := func(got, want float64) bool { return math.Abs(got/want-1) <= 1e-6 }
				if !rel(f.DesignValues[w.name], w.design) || !rel(f.CharacteristicValues[w.name], w.charac) ||
					!rel(f.PartialFactors[w.name], gamma) || f.DesignRoles[w.name] != w.role {
					t.Errorf("%s: %s design %.9g, characteristic %.9g, gamma %.9g; closed form %s %.9g, %.9g, %.9g",
						w.name, f.DesignRoles[w.name], f.DesignValues[w.name], f.CharacteristicValues[w.name], f.PartialFactors[w.name],
						w.role, w.design, w.charac, gamma)
				}
			}
		})
	}
}

// TestRunDesignValuesReports: the HTML, Markdown and text reports carry
// the table of design values and partial factors.
func TestRunDesignValuesReports(t *testing.T) {
	s := stocky
	dir := t.TempDir()
	code, _, errs := invoke(t, "run", writeStudy(t, s), "--method", "form", "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	for file, want := range map[string][]string{
		"report.html": {"Design values and partial factors at β = 3.80", "<td>material.yield</td><td>resistance</td>", "5 % fractile", "98 % fractile of annual maxima"},
		"summary.md":  {"### Design values and partial factors at β = 3.80", "| material.yield | resistance |"},
		"summary.txt": {"design values      at beta 3.80", "loads.axial (action):", "gamma"},
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

// TestRunDesignValuesNoTarget: without a target the design values are at
// FORM's own beta, i.e. the coordinates of the design point itself.
func TestRunDesignValuesNoTarget(t *testing.T) {
	s := strings.Replace(stocky, "[target]\nbeta = 3.8\n", "", 1)
	code, out, errs := invoke(t, "run", writeStudy(t, s), "--json", "--method", "form", "--out", t.TempDir())
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatal(err)
	}
	f := d.FORM
	if f == nil || f.DesignBeta == nil || math.Abs(*f.DesignBeta-f.Beta) > 1e-12 || !strings.Contains(f.DesignNote, "no target") {
		t.Fatalf("form %+v: want design values at FORM's beta", f)
	}
	// -alpha beta and the point's U agree to the search's tolerance on
	// the direction (1e-6).
	for k, x := range f.DesignPoint {
		if math.Abs(f.DesignValues[k]/x-1) > 1e-5 {
			t.Errorf("%s: design value %.9g, design point %.9g", k, f.DesignValues[k], x)
		}
	}
}
