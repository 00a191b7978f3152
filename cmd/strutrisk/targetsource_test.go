package main

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/internal/report"
)

// TestCheckTargetSource: check shows the target, where it came from and
// its reference period; check --json carries them in target.
func TestCheckTargetSource(t *testing.T) {
	for _, c := range []struct {
		keys   string
		beta   float64
		years  float64 // 0: absent
		text   []string
		source string
	}{
		// EN 1990 Annex B Table B2, RC3 over 50 years: 4.3 (from memory).
		{`consequence = "high"`, 4.3, 50, []string{"Target reliability index 4.30", "target from EN 1990 Annex B Table B2, RC3 (consequence high), 50-year value", "reference period 50 years"}, "EN 1990 Annex B Table B2, RC3"},
		// ISO 2394:2015 / JCSS annual target, normal cost of safety and
		// moderate consequence: 4.2 (from memory).
		{"consequence = \"medium\"\ncost_of_safety = \"normal\"\nreference_period = \"1 year\"", 4.2, 1, []string{"Target reliability index 4.20", "target from ISO 2394:2015 / JCSS annual target (normal relative cost of safety, medium consequence)", "reference period 1 year"}, "ISO 2394"},
		{"beta = 3.8\nreference_period = \"50 years\"", 3.8, 50, []string{"Target reliability index 3.80", "target from target.beta as given"}, "target.beta as given"},
		{`beta = 3.8`, 3.8, 0, []string{"target from target.beta as given"}, "target.beta as given"},
	} {
		p := writeStudy(t, edit(18, c.keys))
		code, out, errs := invoke(t, "check", p)
		if code != 0 {
			t.Fatalf("%q: exit %d\n%s", c.keys, code, errs)
		}
		for _, w := range c.text {
			if !strings.Contains(out, w) {
				t.Errorf("%q: check output lacks %q:\n%s", c.keys, w, out)
			}
		}
		_, js, _ := invoke(t, "check", "--json", p)
		var d report.Document
		if err := json.Unmarshal([]byte(js), &d); err != nil {
			t.Fatal(err)
		}
		tg := d.Target
		if tg == nil || math.Abs(tg.Beta-c.beta) > 1e-12 || !strings.Contains(tg.Source, c.source) {
			t.Fatalf("%q: target %+v, want beta %g from %q", c.keys, tg, c.beta, c.source)
		}
		if (tg.ReferenceYears == nil) != (c.years == 0) || tg.ReferenceYears != nil && *tg.ReferenceYears != c.years {
			t.Errorf("%q: reference_period_years %v, want %g", c.keys, tg.ReferenceYears, c.years)
		}
		var raw map[string]map[string]any
		json.Unmarshal([]byte(js), &raw)
		if _, ok := raw["target"]["source"]; !ok {
			t.Errorf("%q: JSON target has no source field", c.keys)
		}
	}
}

// TestRunTargetSource: the run summary and summary.txt say where a table
// target came from (EN 1990 Annex B Table B2, RC2 over 50 years: 3.8,
// from memory).
func TestRunTargetSource(t *testing.T) {
	s := strings.Replace(stocky, "beta = 3.8\n", "consequence = \"medium\"\n", 1)
	dir := t.TempDir()
	code, out, errs := invoke(t, "run", writeStudy(t, s), "--method", "form", "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	if !strings.Contains(out, "target beta        3.80 (pf 7.23e-5, 50 years)") || !strings.Contains(out, "(target from EN 1990 Annex B Table B2, RC2 (consequence medium), 50-year value)") {
		t.Errorf("summary does not give the target and its source:\n%s", out)
	}
	b, err := os.ReadFile(filepath.Join(dir, "summary.txt"))
	if err != nil || !strings.Contains(string(b), "from EN 1990 Annex B Table B2, RC2") {
		t.Errorf("summary.txt does not give the target's source (%v):\n%s", err, b)
	}
}
