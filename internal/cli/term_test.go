package cli

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"
)

// TestIsTerminal: a pipe, a file, /dev/null and a buffer are not
// terminals; a pseudo-terminal's master side is.
func TestIsTerminal(t *testing.T) {
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
		if IsTerminal(f) {
			t.Errorf("a %s taken for a terminal", name)
		}
	}
	if IsTerminal(&bytes.Buffer{}) {
		t.Error("a buffer taken for a terminal")
	}
	tty, err := os.OpenFile("/dev/ptmx", os.O_RDWR, 0)
	if err != nil {
		t.Skipf("no pseudo-terminal here: %v", err)
	}
	defer tty.Close()
	if !IsTerminal(tty) {
		t.Error("a terminal not taken for one")
	}
}
