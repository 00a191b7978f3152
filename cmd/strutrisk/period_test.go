package main

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"strutrisk/internal/report"
)

// TestCheckLoadPeriods: check shows the conversion of a load's annual
// maxima to the 50-year reference period, and check --json lists it in
// load_periods. The Gumbel (mean 80 kN, cov 0.3) keeps its sd and its mean
// moves by scale ln 50 (max-stability, Gumbel 1958, Statistics of
// Extremes): scale = sd sqrt(6) / pi.
func TestCheckLoadPeriods(t *testing.T) {
	text := strings.Replace(edit(16, `imposed = { dist = "gumbel", mean = "80 kN", cov = 0.3, period = "1 year" }`+"\n"+
		`wind = { dist = "lognormal", mean = "20 kN", cov = 0.3, period = "1 year" }`),
		"beta = 3.8", "beta = 3.8\nreference_period = \"50 years\"", 1)
	p := writeStudy(t, text)
	code, out, errs := invoke(t, "check", p)
	if code != 0 {
		t.Fatalf("check exit %d:\n%s", code, errs)
	}
	for _, w := range []string{"Loads in time", "loads.imposed: maxima over 1 year", "n = 50, gumbel max-stability", "n = 50, F^n"} {
		if !strings.Contains(out, w) {
			t.Errorf("check output lacks %q:\n%s", w, out)
		}
	}
	_, js, _ := invoke(t, "check", "--json", p)
	var d report.Document
	if err := json.Unmarshal([]byte(js), &d); err != nil {
		t.Fatal(err)
	}
	if len(d.LoadPeriods) != 2 {
		t.Fatalf("load_periods %+v, want two", d.LoadPeriods)
	}
	sd := 0.3 * 80e3
	scale := sd * math.Sqrt(6) / math.Pi
	g, w := d.LoadPeriods[0], d.LoadPeriods[1]
	if g.Load != "loads.imposed" || g.N != 50 || g.ReferenceYears != 50 || g.Method != "gumbel max-stability" ||
		math.Abs(g.Mean-(80e3+scale*math.Log(50))) > 1e-6 || math.Abs(g.SD-sd) > 1e-6 {
		t.Errorf("imposed: %+v, want mean %g sd %g", g, 80e3+scale*math.Log(50), sd)
	}
	// The maximum of 50 is larger than the annual mean, by F^n.
	if w.Load != "loads.wind" || w.Method != "F^n" || !(w.Mean > 20e3) || w.Converted == "" {
		t.Errorf("wind: %+v", w)
	}
	// A bad period exits 2 naming the key and its line.
	code, _, errs = invoke(t, "check", writeStudy(t, edit(16, `imposed = { dist = "gumbel", mean = "80 kN", cov = 0.3, period = "1 yeer" }`)))
	if code != 2 || !strings.Contains(errs, ":16: loads.imposed: period:") {
		t.Errorf("bad period: exit %d, %s", code, errs)
	}
}

// TestCheckCombinationCases: with two random variable loads check lists
// Turkstra's cases, each load leading once with the other at its
// companion (the companion as given, or a load's maxima over its own
// period).
func TestCheckCombinationCases(t *testing.T) {
	text := strings.Replace(edit(16, `imposed = { dist = "gumbel", mean = "80 kN", cov = 0.3, period = "1 year", companion = { dist = "gamma", mean = "25 kN", cov = 0.6 } }`+"\n"+
		`wind = { dist = "lognormal", mean = "20 kN", cov = 0.3, period = "1 year" }`),
		"beta = 3.8", "beta = 3.8\nreference_period = \"50 years\"", 1)
	p := writeStudy(t, text)
	code, out, errs := invoke(t, "check", p)
	if code != 0 {
		t.Fatalf("check exit %d:\n%s", code, errs)
	}
	for _, w := range []string{"Load combination (turkstra's rule", "case imposed: loads.imposed at its reference-period maximum",
		"loads.wind.companion: lognormal", "case wind:", "loads.imposed.companion: gamma", "the combination case of the largest mean load"} {
		if !strings.Contains(out, w) {
			t.Errorf("check output lacks %q:\n%s", w, out)
		}
	}
}
