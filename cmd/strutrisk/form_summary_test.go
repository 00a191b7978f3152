package main

import (
	"path/filepath"
	"strings"
	"testing"
)

// TestRunFORMSummaryNoInterval: FORM is an approximation, not a sample,
// so the summary gives no sampling interval or CoV for it (an interval of
// zero width would read as certainty).
func TestRunFORMSummaryNoInterval(t *testing.T) {
	t.Parallel() // sets no hook: runs beside the other slow tests
	var out, errs strings.Builder
	study := filepath.Join("..", "..", "studies", "eccentric-strut.toml")
	if code := run([]string{"run", study, "--method", "form", "--out", t.TempDir()}, &out, &errs); code != exitOK {
		t.Fatalf("exit %d; stderr:\n%s", code, errs.String())
	}
	s := out.String()
	for _, bad := range []string{"95 % interval", "cov of pf"} {
		if strings.Contains(s, bad) {
			t.Errorf("FORM summary shows %q:\n%s", bad, s)
		}
	}
	for _, want := range []string{"no sampling interval", "method             form", "reserve factor"} {
		if !strings.Contains(s, want) {
			t.Errorf("FORM summary lacks %q:\n%s", want, s)
		}
	}
}
