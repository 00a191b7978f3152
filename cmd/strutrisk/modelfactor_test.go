package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// The model-factor command end to end on the demo test series: the fit
// and design values printed, the files written, and bad input refused
// with the file, line and column, exit 2.
func TestModelFactorCommand(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "mf")
	var out, errb bytes.Buffer
	code := run([]string{"model-factor", "../../studies/eccentric-strut.toml", "../../studies/brace-tests.csv", "--design", "--out", dir}, &out, &errb)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errb.String())
	}
	for _, want := range []string{"mean-value correction b", "model_factor = { dist = \"lognormal\"", "design r_d", "licensed"} {
		if !strings.Contains(out.String(), want) {
			t.Errorf("output lacks %q:\n%s", want, out.String())
		}
	}
	data, err := os.ReadFile(filepath.Join(dir, "model-factor.json"))
	if err != nil {
		t.Fatal(err)
	}
	var doc struct {
		Count  int
		B      float64
		Design *struct {
			Rd float64 `json:"r_d"`
			Rk float64 `json:"r_k"`
		}
	}
	if err := json.Unmarshal(data, &doc); err != nil {
		t.Fatal(err)
	}
	if doc.Count != 12 || !(doc.B > 0.9 && doc.B < 1.2) || doc.Design == nil || !(doc.Design.Rd > 0 && doc.Design.Rd < doc.Design.Rk) {
		t.Errorf("model-factor.json: %+v", doc)
	}
	for _, f := range []string{"model-factor.csv", "model-factor.png", "summary.txt"} {
		if _, err := os.Stat(filepath.Join(dir, f)); err != nil {
			t.Error(err)
		}
	}

	bad := filepath.Join(t.TempDir(), "bad.csv")
	os.WriteFile(bad, []byte("resistance (kN),material.yield (MPa)\n200,390\n210,39O\n220,380\n"), 0o644)
	out.Reset()
	errb.Reset()
	code = run([]string{"model-factor", "../../studies/eccentric-strut.toml", bad}, &out, &errb)
	if code != exitInput || !strings.Contains(errb.String(), "bad.csv:3: column material.yield") {
		t.Errorf("a bad cell: exit %d, stderr %q; want 2 naming bad.csv:3, column material.yield", code, errb.String())
	}
}
