package main

import (
	"path/filepath"
	"strings"
	"testing"
)

// TestRunUnsuitedMethod: a method the study cannot use, or a budget too
// small for it, is a problem in the input: exit 2 with a message that says
// what to change, and nothing written.
func TestRunUnsuitedMethod(t *testing.T) {
	for _, c := range []struct {
		name, study string
		flags       []string
		want        string
	}{
		{"budget below one point per replicate", "retrofit-column.toml",
			[]string{"--method", "conditional-qmc", "--samples", "10"}, "at least 16 samples"},
		{"no load to integrate exactly", "eccentric-strut.toml",
			[]string{"--method", "conditional-qmc"}, "no linear input"},
	} {
		t.Run(c.name, func(t *testing.T) {
			dir := t.TempDir()
			args := append([]string{"run", filepath.Join("..", "..", "studies", c.study), "--out", dir}, c.flags...)
			var out, errs strings.Builder
			if code := run(args, &out, &errs); code != exitInput {
				t.Fatalf("exit %d, want %d; stderr:\n%s", code, exitInput, errs.String())
			}
			msg := errs.String()
			for _, w := range []string{c.want, "--method"} {
				if !strings.Contains(msg, w) {
					t.Errorf("stderr lacks %q:\n%s", w, msg)
				}
			}
			if m, _ := filepath.Glob(filepath.Join(dir, "*")); len(m) > 0 {
				t.Errorf("files written: %v", m)
			}
		})
	}
}
