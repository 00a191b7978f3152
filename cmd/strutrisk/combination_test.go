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

// combinedStudy is the test strut with two variable loads given as
// annual maxima (converted to 50 years), one with a companion.
func combinedStudy() string {
	return strings.Replace(edit(16, `imposed = { dist = "gumbel", mean = "80 kN", cov = 0.3, period = "1 year", companion = { dist = "gamma", mean = "25 kN", cov = 0.6 } }`+"\n"+
		`wind = { dist = "lognormal", mean = "20 kN", cov = 0.3, period = "1 year" }`),
		"beta = 3.8", "beta = 3.8\nreference_period = \"50 years\"", 1)
}

// TestRunCombinationCases: a run of two combined loads reports each
// case's FORM beta and pf (pf = Phi(-beta)), the governing case (the lowest
// beta), the first-order series system, whose pf is at least that of
// every case (a union, Ditlevsen and Madsen 1996, ch. 14, from memory),
// in results.json, in summary.txt and in the run's summary; check --json
// lists the cases without results.
func TestRunCombinationCases(t *testing.T) {
	p := writeStudy(t, combinedStudy())
	dir := filepath.Join(t.TempDir(), "out")
	code, out, errs := invoke(t, "run", p, "--method", "form", "--out", dir)
	if code != 0 {
		t.Fatalf("run exit %d:\n%s", code, errs)
	}
	raw, err := os.ReadFile(filepath.Join(dir, "results.json"))
	if err != nil {
		t.Fatal(err)
	}
	var d report.Document
	if err := json.Unmarshal(raw, &d); err != nil {
		t.Fatal(err)
	}
	c := d.Combination
	if c == nil || c.Rule != "turkstra" || c.CaseMethod != "form" || len(d.Combinations) != 2 || c.SeriesPf == nil {
		t.Fatalf("combination %+v, cases %+v", c, d.Combinations)
	}
	low := ""
	lowBeta := 0.0
	for _, cs := range d.Combinations {
		if cs.Beta == nil || cs.Pf == nil || cs.Converged == nil || !*cs.Converged || len(cs.Companions) != 1 {
			t.Fatalf("case %+v", cs)
		}
		if want := phiMinus(float64(*cs.Beta)); !nearRel(*cs.Pf, want, 1e-9) {
			t.Errorf("case %s: pf %g, Phi(-beta) %g", cs.Case, *cs.Pf, want)
		}
		if *c.SeriesPf < *cs.Pf*(1-1e-9) {
			t.Errorf("series pf %g below case %s's %g", *c.SeriesPf, cs.Case, *cs.Pf)
		}
		if low == "" || float64(*cs.Beta) < lowBeta {
			low, lowBeta = cs.Case, float64(*cs.Beta)
		}
	}
	if c.Governing != low {
		t.Errorf("governing %q, want %q", c.Governing, low)
	}
	if d.Combinations[0].Companions[0] != "loads.wind.companion" || d.Combinations[1].Companions[0] != "loads.imposed.companion" {
		t.Errorf("companions %+v", d.Combinations)
	}
	sum, _ := os.ReadFile(filepath.Join(dir, "summary.txt"))
	md, _ := os.ReadFile(filepath.Join(dir, "summary.md"))
	html, _ := os.ReadFile(filepath.Join(dir, "report.html"))
	for _, text := range []string{string(md), string(html)} {
		if !strings.Contains(text, "Load combination") || !strings.Contains(text, "(governs)") {
			t.Errorf("report lacks the combination table:\n%.300s", text)
		}
	}
	for _, text := range []string{out, string(sum)} {
		if !strings.Contains(text, "load combination") || !strings.Contains(text, low+" governs") {
			t.Errorf("summary lacks the load combination:\n%s", text)
		}
	}
	_, js, _ := invoke(t, "check", "--json", p)
	var cd report.Document
	if err := json.Unmarshal([]byte(js), &cd); err != nil {
		t.Fatal(err)
	}
	if cd.Combination == nil || len(cd.Combinations) != 2 || cd.Combinations[0].Beta != nil || cd.Combinations[1].Case != "wind" {
		t.Errorf("check --json: %+v %+v", cd.Combination, cd.Combinations)
	}
}

// phiMinus is Phi(-b), the standard normal tail (gonum's distuv).
func phiMinus(b float64) float64 { return distuv.UnitNormal.CDF(-b) }

func nearRel(a, b, tol float64) bool { return math.Abs(a-b) <= tol*math.Abs(b) }

// TestRunFerryBorges: with rule ferry-borges-castanheta the loads become
// one variable, loads.combined, shown by check and in results.json with
// its mean and sd, and named in the run's summary; the design point has
// it and not the loads it replaces.
func TestRunFerryBorges(t *testing.T) {
	text := strings.Replace(edit(16, `imposed = { dist = "gumbel", mean = "30 kN", cov = 0.4, repetitions = 10 }`+"\n"+
		`wind = { dist = "gumbel", mean = "8 kN", cov = 0.4, repetitions = 100 }`+"\n"+"[combination]\nrule = \"ferry-borges-castanheta\""),
		"beta = 3.8", "beta = 3.8\nreference_period = \"50 years\"", 1)
	p := writeStudy(t, text)
	code, out, errs := invoke(t, "check", p)
	if code != 0 {
		t.Fatalf("check exit %d:\n%s", code, errs)
	}
	if !strings.Contains(out, "Load combination (ferry-borges-castanheta") || !strings.Contains(out, "loads.combined: maximum of the sum of pulses 10 x gumbel") {
		t.Errorf("check output lacks the combined load:\n%s", out)
	}
	dir := filepath.Join(t.TempDir(), "out")
	code, out, errs = invoke(t, "run", p, "--method", "form", "--out", dir)
	if code != 0 {
		t.Fatalf("run exit %d:\n%s", code, errs)
	}
	raw, _ := os.ReadFile(filepath.Join(dir, "results.json"))
	var d report.Document
	if err := json.Unmarshal(raw, &d); err != nil {
		t.Fatal(err)
	}
	c := d.Combination
	if c == nil || c.Variable != "loads.combined" || c.Mean == nil || !(*c.Mean > 38e3) || len(d.Combinations) != 0 {
		t.Fatalf("combination %+v", c)
	}
	if _, ok := d.FORM.DesignPoint["loads.combined"]; !ok {
		t.Errorf("design point %v lacks loads.combined", d.FORM.DesignPoint)
	}
	if _, ok := d.FORM.DesignPoint["loads.imposed"]; ok {
		t.Errorf("design point %v has a load the combination replaced", d.FORM.DesignPoint)
	}
	if !strings.Contains(out, "into loads.combined, the maximum of their sum") {
		t.Errorf("run summary lacks the combination:\n%s", out)
	}
}
