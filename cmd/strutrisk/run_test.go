package main

import (
	"context"
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
	"strutrisk/internal/report"
)

// stocky is fixture.Stocky.
const stocky = fixture.Stocky

const (
	stockyBeta = 3.1082970551683173
	stockyPf   = 9.408441526629896e-4
)

func TestRunLognormalClosedForm(t *testing.T) {
	t.Parallel() // sets no hook: runs beside the other slow tests
	for _, method := range []string{"auto", "monte-carlo", "form"} {
		t.Run(method, func(t *testing.T) {
			dir := t.TempDir()
			code, out, errs := invoke(t, "run", writeStudy(t, stocky), "--json", "--out", dir, "--method", method)
			if code != 0 {
				t.Fatalf("exit %d\n%s", code, errs)
			}
			var d report.Document
			if err := json.Unmarshal([]byte(out), &d); err != nil {
				t.Fatalf("stdout is not the JSON document: %v\n%s", err, out)
			}
			if d.Pf == nil || d.Beta == nil || len(d.PfCI) != 2 || len(d.BetaCI) != 2 {
				t.Fatalf("missing pf/beta: %s", out)
			}
			if method == "form" {
				// FORM is exact here: ln R - ln S is linear in normal space.
				if math.Abs(float64(*d.Beta)-stockyBeta) > 1e-4 {
					t.Errorf("FORM beta %.6f, want %.6f", *d.Beta, stockyBeta)
				}
			} else if !(d.PfCI[0] <= stockyPf && stockyPf <= d.PfCI[1]) {
				t.Errorf("exact pf %.6g outside the interval [%.6g, %.6g] (pf %.6g, method %s)", stockyPf, d.PfCI[0], d.PfCI[1], *d.Pf, d.Method)
			}
			if d.MeetsTarget == nil || *d.MeetsTarget {
				t.Errorf("meets_target %v, want false (beta 3.11 < 3.8)", d.MeetsTarget)
			}
			if d.Nominal == nil || math.Abs(d.Nominal.Capacity-3e6) > 1e-6*3e6 {
				t.Errorf("nominal capacity %+v, want A fy = 3e6 N", d.Nominal)
			}
			if d.Capacity == nil || d.Demand == nil || d.FORM == nil || d.Seed == nil || *d.Seed != 7 || d.Evaluations == nil {
				t.Errorf("incomplete document: %s", out)
			}
			if d.FORM != nil && math.Abs(d.FORM.Beta-stockyBeta) > 1e-3 {
				t.Errorf("form.beta %.5f, want %.5f", d.FORM.Beta, stockyBeta)
			}
			if len(d.Tornado) != 3 {
				t.Errorf("tornado has %d rows, want 3", len(d.Tornado))
			}
			for _, f := range []string{"results.json", "samples.csv", "summary.txt"} {
				if _, err := os.Stat(filepath.Join(dir, f)); err != nil {
					t.Errorf("%s not written: %v", f, err)
				}
			}
			// results.json is the document printed.
			b, _ := os.ReadFile(filepath.Join(dir, "results.json"))
			var fromFile report.Document
			if err := json.Unmarshal(b, &fromFile); err != nil || fromFile.InputSHA256 != d.InputSHA256 {
				t.Errorf("results.json differs from the printed document: %v", err)
			}
		})
	}
}

func TestRunRequireTarget(t *testing.T) {
	study := writeStudy(t, stocky)
	code, out, _ := invoke(t, "run", study, "--out", t.TempDir(), "--method", "form", "--require-target")
	if code != 1 {
		t.Errorf("unmet target with --require-target: exit %d, want 1", code)
	}
	if !strings.Contains(out, "NOT met") {
		t.Errorf("summary does not say the target is not met:\n%s", out)
	}
	lowered := strings.Replace(stocky, "beta = 3.8", "beta = 2.5", 1)
	if code, _, errs := invoke(t, "run", writeStudy(t, lowered), "--out", t.TempDir(), "--method", "form", "--require-target"); code != 0 {
		t.Errorf("met target: exit %d, want 0\n%s", code, errs)
	}
}

// TestRunReproducible: the same seed gives the same document; flags after
// or before the file mean the same.
func TestRunReproducible(t *testing.T) {
	study := writeStudy(t, stocky)
	_, a, _ := invoke(t, "run", study, "--json", "--seed", "11", "--samples", "200000", "--method", "monte-carlo", "--out", t.TempDir())
	_, b, _ := invoke(t, "run", "--seed", "11", "--json", "--out", t.TempDir(), "--samples", "200000", "--method", "monte-carlo", study, "--workers", "1")
	if a != b || a == "" {
		t.Errorf("two runs with seed 11 differ:\n%s\n---\n%s", a, b)
	}
}

// TestRunInterrupted: a cancelled run writes what it finished, marked
// incomplete, and exits non-zero.
func TestRunInterrupted(t *testing.T) {
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	baseContext = func() context.Context { return ctx }
	defer func() { baseContext = context.Background }()
	dir := t.TempDir()
	code, _, errs := invoke(t, "run", writeStudy(t, stocky), "--out", dir, "--method", "monte-carlo", "--json")
	if code != exitInterrupted {
		t.Errorf("exit %d, want %d\n%s", code, exitInterrupted, errs)
	}
	b, err := os.ReadFile(filepath.Join(dir, "results.json"))
	if err != nil {
		t.Fatalf("no results.json after an interrupted run: %v", err)
	}
	if !strings.Contains(string(b), "incomplete") {
		t.Errorf("results.json not marked incomplete:\n%s", b)
	}
	// No temporary files are left behind.
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if strings.Contains(e.Name(), "tmp") {
			t.Errorf("temporary file left: %s", e.Name())
		}
	}
}

// TestRunSummary: the terminal summary carries pf and beta with their
// intervals, the target verdict, the method and evaluations, the most
// influential variables and the caution, and is summary.txt byte for
// byte; standard error only says where the files went.
func TestRunSummary(t *testing.T) {
	dir := t.TempDir()
	code, out, errs := invoke(t, "run", writeStudy(t, stocky), "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	for _, want := range []string{"failure prob. pf", "95 % interval", "reliability beta", "target beta        3.80", "NOT met", "evaluations", "most influential   loads.axial", "licensed"} {
		if !strings.Contains(out, want) {
			t.Errorf("summary lacks %q:\n%s", want, out)
		}
	}
	if txt, err := os.ReadFile(filepath.Join(dir, "summary.txt")); err != nil || string(txt) != out {
		t.Errorf("standard output is not summary.txt (%v):\n%s\n---\n%s", err, out, txt)
	}
	want := "  results in         " + dir + "/ ("
	if !strings.HasPrefix(errs, want) {
		t.Errorf("standard error does not start with %q: %q", want, errs)
	}
	for _, l := range strings.Split(strings.TrimSuffix(errs, "\n"), "\n") {
		if !strings.HasPrefix(l, "  results in ") && !strings.HasPrefix(l, "  report ") {
			t.Errorf("standard error not quiet when not a terminal: %q", l)
		}
	}
}

// TestRunNothingUncertain: a study without random quantities is refused
// by run (exit 2) but checks.
func TestRunNothingUncertain(t *testing.T) {
	s := strings.Replace(good, `yield = { dist = "lognormal", mean = 250, cov = 0.1 }`, "yield = 250", 1)
	s = strings.Replace(s, `dead = { dist = "normal", mean = "100 kN", cov = 0.1 }`, `dead = "100 kN"`, 1)
	s = strings.Replace(s, `imposed = { dist = "gumbel", mean = "80 kN", cov = 0.3 }`, `imposed = "80 kN"`, 1)
	study := writeStudy(t, s)
	if code, _, errs := invoke(t, "check", study); code != 0 {
		t.Errorf("check exit %d\n%s", code, errs)
	}
	code, _, errs := invoke(t, "run", study, "--out", t.TempDir())
	if code != 2 || !strings.Contains(errs, "nothing in the study is uncertain") {
		t.Errorf("run exit %d, stderr %q", code, errs)
	}
}
