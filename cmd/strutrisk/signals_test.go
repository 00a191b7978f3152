package main

import (
	"context"
	"encoding/json"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"syscall"
	"testing"

	"strutrisk/internal/report"
)

// TestRunSignals: a run stopped by a signal writes what it finished with
// "complete": false and the reason, and exits 128 + the signal's number
// (the shell's convention: SIGINT is 2, SIGTERM 15, POSIX numbering).
func TestRunSignals(t *testing.T) {
	for _, c := range []struct {
		sig  syscall.Signal
		name string
		code int
	}{
		{syscall.SIGINT, "SIGINT", 130},
		{syscall.SIGTERM, "SIGTERM", 143},
	} {
		t.Run(c.name, func(t *testing.T) {
			signalHook = func(ctx context.Context) {
				// The process signals itself; the handler is in place, so
				// the run is cancelled, not the test binary killed. The
				// hook returns once the cancellation has arrived.
				if err := syscall.Kill(os.Getpid(), c.sig); err != nil {
					t.Fatal(err)
				}
				<-ctx.Done()
			}
			defer func() { signalHook = nil }()
			dir := t.TempDir()
			code, out, errs := invoke(t, "run", writeStudy(t, stocky), "--out", dir, "--method", "monte-carlo", "--json")
			if code != c.code {
				t.Errorf("exit %d, want %d\n%s", code, c.code, errs)
			}
			if !strings.Contains(errs, c.name) {
				t.Errorf("stderr does not name %s:\n%s", c.name, errs)
			}
			var d report.Document
			if err := json.Unmarshal([]byte(out), &d); err != nil {
				t.Fatalf("stdout is not the document: %v", err)
			}
			if d.Complete || !strings.Contains(d.IncompleteReason, c.name) {
				t.Errorf("complete %v, incomplete_reason %q: want false and a reason naming %s", d.Complete, d.IncompleteReason, c.name)
			}
			b, err := os.ReadFile(filepath.Join(dir, "results.json"))
			if err != nil {
				t.Fatal(err)
			}
			if !strings.Contains(string(b), `"complete": false`) {
				t.Errorf("results.json lacks \"complete\": false")
			}
		})
	}
}

// TestRunComplete: a run that finishes says so; so does check --json.
func TestRunComplete(t *testing.T) {
	study := writeStudy(t, stocky)
	for _, args := range [][]string{
		{"run", study, "--json", "--method", "form", "--out", t.TempDir()},
		{"check", study, "--json"},
	} {
		code, out, errs := invoke(t, args...)
		if code != 0 {
			t.Fatalf("%s: exit %d\n%s", args[0], code, errs)
		}
		var m map[string]any
		if err := json.Unmarshal([]byte(out), &m); err != nil {
			t.Fatal(err)
		}
		if m["complete"] != true {
			t.Errorf("%s: complete = %v, want true", args[0], m["complete"])
		}
		if _, ok := m["incomplete_reason"]; ok {
			t.Errorf("%s: incomplete_reason present in a complete document", args[0])
		}
	}
}

// TestRunSignalAfterMainRun: a signal after the main run keeps its
// estimate; the reason names the step that was under way.
func TestRunSignalAfterMainRun(t *testing.T) {
	var runCtx context.Context
	signalHook = func(ctx context.Context) { runCtx = ctx }
	stageHook = func(name string) {
		if name == "FORM" {
			syscall.Kill(os.Getpid(), syscall.SIGTERM)
			<-runCtx.Done()
		}
	}
	defer func() { signalHook, stageHook = nil, nil }()
	code, out, errs := invoke(t, "run", writeStudy(t, stocky), "--out", t.TempDir(), "--method", "monte-carlo", "--samples", "100000", "--json")
	if code != exitTerminated {
		t.Errorf("exit %d, want %d\n%s", code, exitTerminated, errs)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatalf("stdout is not the document: %v", err)
	}
	if d.Complete || !strings.Contains(d.IncompleteReason, "during FORM") || !strings.Contains(d.IncompleteReason, "main estimate is complete") {
		t.Errorf("complete %v, incomplete_reason %q: want false, naming FORM and the complete main estimate", d.Complete, d.IncompleteReason)
	}
	if !slices.ContainsFunc(d.Warnings, func(w string) bool { return strings.HasPrefix(w, "incomplete: ") }) {
		t.Errorf("no warning says the run is incomplete (the summary and report show the warnings): %q", d.Warnings)
	}
	if d.Pf == nil || d.Evaluations == nil || *d.Evaluations != 100000 {
		t.Errorf("the main estimate is missing or cut short: pf %v, evaluations %v", d.Pf, d.Evaluations)
	}
}
