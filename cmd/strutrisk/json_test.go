package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestRunJSONIsResultsJSON: `run --json` prints results.json byte for
// byte (one encoder, report.DocumentJSON): "<", ">" and "&" of a title as
// written, not escaped for HTML, and "warnings" an array when the run
// has none (the stocky strut on Table 6.2's own curve c, by importance
// sampling, which reaches its target CoV), not null.
func TestRunJSONIsResultsJSON(t *testing.T) {
	study := strings.Replace(stocky, `title = "stocky strut, lognormal R and S"`, `title = "strut <A> & <B>"`, 1)
	study = strings.Replace(study, `curve = "b"`, `curve = "c"`, 1)
	dir := t.TempDir()
	code, out, errs := invoke(t, "run", writeStudy(t, study), "--json", "--out", dir, "--method", "importance")
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	file, err := os.ReadFile(filepath.Join(dir, "results.json"))
	if err != nil {
		t.Fatal(err)
	}
	if out != string(file) {
		t.Errorf("run --json differs from results.json:\n--- stdout\n%.600s\n--- results.json\n%.600s", out, file)
	}
	if !strings.Contains(out, `"title": "strut <A> & <B>"`) {
		t.Errorf("the title is not written as given:\n%.400s", out)
	}
	if !strings.Contains(out, `"warnings": []`) {
		t.Errorf("a run without warnings does not print \"warnings\": []:\n%s", out)
	}
}
