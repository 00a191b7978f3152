package main

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"
)

// TestProgressOnlyOnTerminal: the report stays quiet on a pipe, a file and
// /dev/null, and draws on a terminal (a pseudo-terminal's master side).
func TestProgressOnlyOnTerminal(t *testing.T) {
	r, w, err := os.Pipe()
	if err != nil {
		t.Fatal(err)
	}
	defer r.Close()
	defer w.Close()
	file, err := os.Create(filepath.Join(t.TempDir(), "log"))
	if err != nil {
		t.Fatal(err)
	}
	defer file.Close()
	null, err := os.OpenFile(os.DevNull, os.O_WRONLY, 0)
	if err != nil {
		t.Fatal(err)
	}
	defer null.Close()
	for name, f := range map[string]*os.File{"pipe": w, "file": file, "/dev/null": null} {
		if drawsProgress(f, true) {
			t.Errorf("progress drawn on a %s", name)
		}
	}
	if drawsProgress(&bytes.Buffer{}, true) {
		t.Error("progress drawn on a buffer")
	}
	tty, err := os.OpenFile("/dev/ptmx", os.O_RDWR, 0)
	if err != nil {
		t.Skipf("no pseudo-terminal here: %v", err)
	}
	defer tty.Close()
	if !drawsProgress(tty, true) {
		t.Error("progress not drawn on a terminal")
	}
	if drawsProgress(tty, false) {
		t.Error("progress drawn though not allowed (--json)")
	}
}
