package main

import (
	"bytes"
	"os"
	"testing"
)

// TestProgressOnlyOnTerminal: the report is drawn on a terminal (a
// pseudo-terminal's master side) unless --json forbids it, and never on
// a buffer (which terminals are: internal/cli TestIsTerminal).
func TestProgressOnlyOnTerminal(t *testing.T) {
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
