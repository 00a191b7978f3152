package analysis

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
)

// TestPrepareOutput: [output] dir relative to the study's folder is
// prepared and locked; one that leaves the folder is a problem of the
// study naming the key and its line, and check warns of it; --out stands
// in for it; a folder holding a user's files is refused before any work.
func TestPrepareOutput(t *testing.T) {
	l, err := Load(writeStudy(t, fixture.Good+"[output]\ndir = \"res\"\n"))
	if err != nil {
		t.Fatal(err)
	}
	path := filepath.Join(filepath.Dir(l.Study.File), "study.toml")
	f, err := l.PrepareOutput(path, "")
	if err != nil || f.Path != filepath.Join(filepath.Dir(path), "res") {
		t.Fatalf("PrepareOutput: %v, %v; want the folder res beside the study", f, err)
	}
	f.Close()

	bad := writeStudy(t, fixture.Good+"[output]\ndir = \"../x\"\n")
	if l, err = Load(bad); err != nil {
		t.Fatal(err)
	}
	if _, err := l.PrepareOutput(bad, ""); err == nil || !strings.Contains(err.Error(), "study.toml:20: output.dir: \"../x\" leaves the study's folder") {
		t.Errorf("dir leaving the study's folder: %v", err)
	}
	l.WarnOutputDir(bad)
	if w := strings.Join(l.Study.Warnings, "\n"); !strings.Contains(w, "output.dir (line 20)") || !strings.Contains(w, "unless --out is given") {
		t.Errorf("check does not warn of the dir:\n%s", w)
	}
	out := filepath.Join(t.TempDir(), "mine")
	if f, err := l.PrepareOutput(bad, out); err != nil {
		t.Errorf("--out given over a bad dir: %v", err)
	} else {
		f.Close()
	}
	mine := t.TempDir()
	os.WriteFile(filepath.Join(mine, "thesis.tex"), []byte("mine"), 0o644)
	if _, err := l.PrepareOutput(bad, mine); err == nil || !strings.Contains(err.Error(), "thesis.tex") || !strings.HasSuffix(err.Error(), "; nothing was run") {
		t.Errorf("a folder of a user's files: %v", err)
	}
}
