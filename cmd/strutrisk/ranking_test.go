package main

import (
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

// TestRankingOneFunction: the terminal summary, summary.txt and the HTML
// report rank the inputs by the same measure in the same order, name the
// measure, and say which ranking answers which question.
//
// The stocky strut has a lognormal resistance (yield x model factor, chi =
// 1 below relative slenderness 0.2, EN 1993-1-1 6.3.1.2(4)) and a lognormal
// load, so the FORM importance factors are closed-form: alpha_i^2 =
// ln(1+cov_i^2) / sum_j ln(1+cov_j^2) (lognormal R and S, e.g. Melchers &
// Beck, Structural Reliability Analysis and Prediction, 3rd ed., ch. 3):
// axial 0.0392207/0.0516676 = 0.759, yield 0.00995/0.0516676 = 0.193,
// model factor 0.0024969/0.0516676 = 0.048.
func TestRankingOneFunction(t *testing.T) {
	dir := t.TempDir()
	code, out, errs := invoke(t, "run", writeStudy(t, stocky), "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	want := "loads.axial (0.76), material.yield (0.19), capacity.model_factor (0.048)  [by FORM importance alpha^2]"
	txt, err := os.ReadFile(filepath.Join(dir, "summary.txt"))
	if err != nil {
		t.Fatal(err)
	}
	line := regexp.MustCompile(`most influential +(.*)`)
	for name, s := range map[string]string{"terminal": out, "summary.txt": string(txt)} {
		m := line.FindStringSubmatch(s)
		if m == nil || m[1] != want {
			t.Errorf("%s: most influential line %q, want %q", name, m, want)
		}
		flat := strings.Join(strings.Fields(s), " ")
		for _, q := range []string{"FORM importance alpha^2 answers whose scatter drives failure", "the total Sobol index answers what share of the margin's variance"} {
			if !strings.Contains(flat, q) {
				t.Errorf("%s: no sentence on which ranking answers which question (%q):\n%s", name, q, s)
			}
		}
	}
	html, err := os.ReadFile(filepath.Join(dir, "report.html"))
	if err != nil {
		t.Fatal(err)
	}
	for _, q := range []string{"loads.axial (0.76), material.yield (0.19), capacity.model_factor (0.048) — by FORM importance α²", "The rankings answer different questions"} {
		if !strings.Contains(string(html), q) {
			t.Errorf("report.html lacks %q", q)
		}
	}
}
