package modelerror

import (
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
	"strutrisk/internal/study"
)

// stocky is fixture.Stocky, a solid square strut whose relative
// slenderness stays below 0.2, so chi = 1 (EN 1993-1-1:2005 6.3.1.2(4))
// and its capacity is A fy = 10,000 mm^2 x fy, with a model factor of
// mean 1.3 that r_t must leave out.
var stocky = strings.Replace(fixture.Stocky, "mean = 1.0, cov = 0.05", "mean = 1.3, cov = 0.05", 1)

func parseStudy(t *testing.T, src string) *study.Study {
	t.Helper()
	st, err := study.Parse("stocky.toml", []byte(src))
	if err != nil {
		t.Fatal(err)
	}
	return st
}

// Tests generated from a known model error on the stocky strut: the
// theoretical resistance of each must be A fy at the test's yield (the
// model factor of the study left out), and the fit must recover the b and
// V_delta the data were made with.
func TestTheoreticalStocky(t *testing.T) {
	st := parseStudy(t, stocky)
	const n, b, v = 400, 1.08, 0.06
	s := math.Sqrt(math.Log1p(v * v))
	rng := rand.New(rand.NewPCG(3, 4))
	var csv strings.Builder
	csv.WriteString("name,resistance (kN),material.yield (MPa)\n")
	fy := make([]float64, n)
	for i := range fy {
		fy[i] = 250 + 100*rng.Float64()
		re := b * 1e4 * fy[i] * math.Exp(s*rng.NormFloat64()-0.5*s*s) / 1e3
		csv.WriteString("T" + itoa(i) + "," + ftoa(re) + "," + ftoa(fy[i]) + "\n")
	}
	tests, err := ReadTests("tests.csv", strings.NewReader(csv.String()), st.Units)
	if err != nil {
		t.Fatal(err)
	}
	rt, err := Theoretical(st, tests)
	if err != nil {
		t.Fatal(err)
	}
	for i, r := range rt {
		if want := 1e4 * fy[i]; math.Abs(r-want) > 1e-9*want {
			t.Fatalf("test %d: r_t = %.6f N, want A fy = %.6f N", i, r, want)
		}
	}
	re := make([]float64, n)
	for i, tt := range tests {
		re[i] = tt.Measured
	}
	f, err := Evaluate(re, rt)
	if err != nil {
		t.Fatal(err)
	}
	// Standard errors about b V / sqrt(n) = 0.003 and V / sqrt(2n) = 0.002.
	if math.Abs(f.B-b) > 0.012 || math.Abs(f.V-v) > 0.008 {
		t.Errorf("b = %.4f, V_delta = %.4f; generated with %.2f, %.2f", f.B, f.V, b, v)
	}
}

// The capacity A fy is linear in the yield, so the first-order V_rt is the
// yield's coefficient of variation, 0.10, exactly; the load and the model
// factor are not basic variables of the resistance.
func TestScatterLinear(t *testing.T) {
	grt, vrt, parts, err := Scatter(parseStudy(t, stocky))
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(grt-3e6) > 1e-6 {
		t.Errorf("g_rt(X_m) = %g N, want A fy = 3e6 N", grt)
	}
	if math.Abs(vrt-0.10) > 1e-9 {
		t.Errorf("V_rt = %.12f, want 0.10", vrt)
	}
	if len(parts) != 1 || parts[0].Key != "material.yield" {
		t.Errorf("contributions %+v, want the yield alone", parts)
	}
}

func TestReadTestsErrors(t *testing.T) {
	st := parseStudy(t, stocky)
	for _, c := range []struct {
		name, csv, want string
	}{
		{"no resistance", "name,material.yield\nA,300\nB,300\nC,300\n", `no "resistance" column`},
		{"few tests", "resistance (kN)\n3000\n3000\n", "at least 3"},
		{"negative", "resistance (kN)\n3000\n-3\n3000\n", "tests.csv:3: column resistance"},
		{"empty cell", "resistance (kN),material.yield\n3000,\n3000,300\n3000,300\n", "tests.csv:2: column material.yield: empty cell"},
		// A measured resistance of 3000 N under "(kN)" would have been
		// read as 3000 N silently, a thousandth of the intended r_e.
		{"cell unit against the header", "resistance (kN)\n3000\n3000 N\n3000\n", `tests.csv:3: column resistance: "3000 N" gives the unit N but the column's header gives kN`},
	} {
		_, err := ReadTests("tests.csv", strings.NewReader(c.csv), st.Units)
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: error %v, want one containing %q", c.name, err, c.want)
		}
	}
	// A value the study refuses is reported at the test's line and column.
	for _, bad := range []string{"-5", "abc"} {
		tests, err := ReadTests("tests.csv", strings.NewReader("resistance (kN),material.yield (MPa)\n3000,300\n3000,"+bad+"\n3000,300\n"), st.Units)
		if err != nil {
			t.Fatal(err)
		}
		_, err = Theoretical(st, tests)
		if err == nil || !strings.Contains(err.Error(), "tests.csv:3: column material.yield") {
			t.Errorf("yield %s: error %v, want it at tests.csv:3, column material.yield", bad, err)
		}
	}
	tests, err := ReadTests("tests.csv", strings.NewReader("resistance (kN),material.yeild (MPa)\n3000,300\n3000,300\n3000,300\n"), st.Units)
	if err != nil {
		t.Fatal(err)
	}
	if _, err = Theoretical(st, tests); err == nil || !strings.Contains(err.Error(), "material.yeild") {
		t.Errorf("a misspelt key: error %v, want it named", err)
	}
}

func itoa(i int) string     { return strconv.Itoa(i) }
func ftoa(x float64) string { return strconv.FormatFloat(x, 'g', -1, 64) }

// ReadTestsFile reads what ReadTests reads, and refuses a file larger
// than a study file may be, naming its size, before reading it.
func TestReadTestsFile(t *testing.T) {
	st := parseStudy(t, stocky)
	dir := t.TempDir()
	good := filepath.Join(dir, "tests.csv")
	if err := os.WriteFile(good, []byte("resistance (kN)\n3000\n3100\n2900\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	tests, err := ReadTestsFile(good, st.Units)
	if err != nil || len(tests) != 3 || tests[1].Measured != 3.1e6 || tests[1].Line != 3 {
		t.Errorf("a good file: %+v, %v; want 3 tests, the second 3.1e6 N at line 3", tests, err)
	}
	big := filepath.Join(dir, "big.csv")
	if err := os.WriteFile(big, []byte("resistance (kN)\n"+strings.Repeat("3000\n", study.MaxFileSize/5+1)), 0o644); err != nil {
		t.Fatal(err)
	}
	if _, err := ReadTestsFile(big, st.Units); err == nil || !strings.Contains(err.Error(), "a test database may have at most") {
		t.Errorf("a file over study.MaxFileSize: error %v, want it refused by size", err)
	}
	if _, err := ReadTestsFile(filepath.Join(dir, "none.csv"), st.Units); err == nil {
		t.Errorf("a missing file read without error")
	}
}
