package main

// Contract tests of the command: flags, standard output, exit statuses
// and the output folder (the contract of the study file itself is tested
// next to the pipeline, internal/analysis/contract_test.go).

import (
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
	"strutrisk/internal/report"
)

// TestContractCommands: flags before or after the file, --json alone on
// standard output, check --json without sampling fields, exit statuses.
func TestContractCommands(t *testing.T) {
	t.Parallel() // sets no hook: runs beside the other slow tests
	s := fmt.Sprintf(ctRS, `{ dist = "normal", mean = 200, sd = 20 }`, `{ dist = "normal", mean = "100 kN", sd = "30 kN" }`)
	study := writeStudy(t, s)
	dir := t.TempDir()
	c1, a, e1 := invoke(t, "run", "--json", "--samples", "4000", "--method", "monte-carlo", "--seed", "5", "--out", dir, study)
	c2, b, _ := invoke(t, "run", study, "--method=monte-carlo", "--out="+dir, "--seed", "5", "--json", "--samples=4000")
	c3, c, _ := invoke(t, "run", "--seed", "5", study, "--json", "--samples", "4000", "--out", dir, "--method", "monte-carlo")
	if c1 != 0 || c2 != 0 || c3 != 0 || a != b || a != c {
		t.Errorf("flags before and after the file differ: exits %d %d %d\n%s", c1, c2, c3, e1)
	}
	if !strings.HasPrefix(a, "{") || !json.Valid([]byte(a)) {
		t.Errorf("--json stdout is not the document alone:\n%s", a)
	}
	var d report.Document
	json.Unmarshal([]byte(a), &d)
	// input_sha256 is the SHA-256 of the study file's bytes (FIPS 180-4).
	if sum := sha256.Sum256([]byte(s)); d.InputSHA256 != hex.EncodeToString(sum[:]) {
		t.Errorf("input_sha256 %s, want %x", d.InputSHA256, sum)
	}
	if d.Method != "monte-carlo" || *d.Seed != 5 || *d.Evaluations > 4000 {
		t.Errorf("flags not applied: method %s, seed %d, evaluations %d", d.Method, *d.Seed, *d.Evaluations)
	}
	if b, err := os.ReadFile(filepath.Join(dir, "results.json")); err != nil || !json.Valid(b) {
		t.Errorf("results.json: %v", err)
	}

	// check --json: the same document, sampling fields absent.
	code, out, _ := invoke(t, "check", study, "--json")
	var raw map[string]any
	if code != 0 || json.Unmarshal([]byte(out), &raw) != nil {
		t.Fatalf("check --json: exit %d\n%s", code, out)
	}
	for _, k := range []string{"title", "tool_version", "input_sha256", "units", "target_beta", "governing_axis", "nominal", "warnings"} {
		if _, ok := raw[k]; !ok {
			t.Errorf("check --json lacks %q", k)
		}
	}
	for _, k := range []string{"method", "seed", "evaluations", "pf", "pf_ci", "pf_cov", "beta", "beta_ci", "meets_target", "capacity", "demand", "form", "tornado", "sobol", "sweep", "variants"} {
		if _, ok := raw[k]; ok {
			t.Errorf("check --json carries the sampling field %q", k)
		}
	}

	// Exit statuses: 1 for an unmet target only with --require-target;
	// 2 for bad input of every kind.
	if code, _, _ := invoke(t, "run", study, "--method", "form", "--out", dir); code != 0 {
		t.Errorf("unmet target without --require-target: exit %d, want 0", code)
	}
	if code, _, _ := invoke(t, "run", "--require-target", study, "--method", "form", "--out", dir); code != 1 {
		t.Errorf("unmet target with --require-target: exit %d, want 1", code)
	}
	met := writeStudy(t, strings.Replace(s, "beta = 3.8", "beta = 2.0", 1))
	if code, _, _ := invoke(t, "run", met, "--require-target", "--method", "form", "--out", dir); code != 0 {
		t.Errorf("met target with --require-target: exit %d, want 0", code)
	}
	noTarget := writeStudy(t, strings.Replace(s, "[target]\nbeta = 3.8\n", "", 1))
	for _, args := range [][]string{
		{"run", noTarget, "--require-target", "--out", dir},
		{"run", filepath.Join(dir, "missing.toml")},
		{"run", study, "--bogus"},
		{"run", study, "--method", "guess"},
		{"run", study, "--samples", "0"},
		{"run"},
		{"check"},
		{"check", study, study},
		{"frobnicate"},
	} {
		if code, _, _ := invoke(t, args...); code != 2 {
			t.Errorf("%q: exit %d, want 2", args, code)
		}
	}
}

// TestContractOutput: [output] dir (relative to the study file's folder)
// and formats are honoured; the nominal length of a random length is its
// mean (Perry's load, ctPerry, at L = 3000 mm with the bow L/500 of that
// length).
func TestContractOutput(t *testing.T) {
	s := fmt.Sprintf(ctStrut, "", `{ dist = "uniform", min = 2000, max = 4000 }`, "100", "50", "200000", "250", `"L/500"`, "100000") +
		"[analysis]\nsamples = 3000\n[sensitivity]\nsobol = false\n[output]\ndir = \"out/a\"\nformats = [\"json\", \"csv\"]\n"
	study := writeStudy(t, s)
	dir := filepath.Join(filepath.Dir(study), "out", "a")
	code, _, errs := invoke(t, "run", study)
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	b, err := os.ReadFile(filepath.Join(dir, "results.json"))
	if err != nil {
		t.Fatal(err)
	}
	var d report.Document
	if err := json.Unmarshal(b, &d); err != nil {
		t.Fatal(err)
	}
	ctClose(t, "nominal capacity at the mean length", d.Nominal.Capacity, ctPerry(5000, 100*50*50*50/12.0, 25, 3000, 200000, 250, 6), 1e-9)
	if _, err := os.Stat(filepath.Join(dir, "report.html")); err == nil {
		t.Errorf("report.html written though formats lists only json and csv")
	}
}

// ctPanicWriter fails every write by panicking.
type ctPanicWriter struct{}

func (ctPanicWriter) Write([]byte) (int, error) { panic("writer failed") }

// TestContractInternalFailure: a failure inside the tool exits with 3,
// not with the runtime's 2, which means bad input.
func TestContractInternalFailure(t *testing.T) {
	var errs strings.Builder
	if code := run([]string{"new"}, ctPanicWriter{}, &errs); code != 3 {
		t.Errorf("exit %d, want 3", code)
	}
	if !strings.Contains(errs.String(), "internal failure") {
		t.Errorf("stderr does not say internal failure:\n%s", errs.String())
	}
}

// ctStrut is fixture.Strut.
const ctStrut = fixture.Strut

// ctPerry is fixture.Perry.
var ctPerry = fixture.Perry

// ctRS is fixture.RS.
const ctRS = fixture.RS

// ctCheckJSON runs check --json on a study text.
func ctCheckJSON(t *testing.T, study string) (report.Document, map[string]any) {
	t.Helper()
	code, out, errs := invoke(t, "check", "--json", writeStudy(t, study))
	if code != 0 {
		t.Fatalf("check exit %d\n%s\nstudy:\n%s", code, errs, study)
	}
	var d report.Document
	var raw map[string]any
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatalf("stdout is not the document: %v\n%s", err, out)
	}
	json.Unmarshal([]byte(out), &raw)
	return d, raw
}

func ctClose(t *testing.T, what string, got, want, rel float64) {
	t.Helper()
	if !(math.Abs(got-want) <= rel*math.Abs(want)) {
		t.Errorf("%s = %.10g, want %.10g (rel. tol. %g)", what, got, want, rel)
	}
}
