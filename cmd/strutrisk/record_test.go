package main

import (
	"encoding/json"
	"html"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// recordStudy is good with a [record] whose text needs escaping in HTML.
var recordStudy = strings.Replace(good, "[target]", `[record]
project = "Warehouse B & annex <refurb>"
member = "column C4, grid B/3"
prepared_by = "A. Engineer"
checked_by = "B. Checker"
date = 2026-12-05
revision = "B"
notes = "Loads from the 2019 survey."
[target]`, 1)

// TestRunRecord: run takes [record] into results.json (record, the same
// field names as the study), every report shows it at its head, the HTML
// report embeds the study file verbatim (escaped) beside its SHA-256, and
// the summary names report.html.
func TestRunRecord(t *testing.T) {
	dir := t.TempDir()
	path := writeStudy(t, recordStudy)
	code, out, errs := invoke(t, "run", path, "--method", "form", "--out", dir)
	if code != 0 && code != 1 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	js, err := os.ReadFile(filepath.Join(dir, "results.json"))
	if err != nil {
		t.Fatal(err)
	}
	var raw struct {
		Record map[string]string `json:"record"`
		SHA    string            `json:"input_sha256"`
	}
	if err := json.Unmarshal(js, &raw); err != nil {
		t.Fatal(err)
	}
	want := map[string]string{"project": "Warehouse B & annex <refurb>", "member": "column C4, grid B/3", "prepared_by": "A. Engineer",
		"checked_by": "B. Checker", "date": "2026-12-05", "revision": "B", "notes": "Loads from the 2019 survey."}
	for k, v := range want {
		if raw.Record[k] != v {
			t.Errorf("results.json record.%s = %q, want %q", k, raw.Record[k], v)
		}
	}
	if len(raw.Record) != len(want) {
		t.Errorf("results.json record has %d fields, want %d: %v", len(raw.Record), len(want), raw.Record)
	}

	// The summary, printed and filed alike, names the HTML report (issue
	// 13 item 7) by its path in the results folder; standard error gives
	// the whole path.
	filed, err := os.ReadFile(filepath.Join(dir, "summary.txt"))
	if err != nil {
		t.Fatal(err)
	}
	for name, text := range map[string]string{"standard output": out, "summary.txt": string(filed)} {
		if !strings.Contains(text, "  report             report.html in the results folder\n") {
			t.Errorf("%s does not name report.html:\n%s", name, text)
		}
	}
	if rep := filepath.Join(dir, "report.html"); !strings.Contains(errs, "report             "+rep+"\n") {
		t.Errorf("the run does not name %s on standard error:\n%s", rep, errs)
	}
	if !strings.Contains(out, "  checked by         B. Checker\n") {
		t.Errorf("the run summary lacks the record:\n%s", out)
	}
	page, err := os.ReadFile(filepath.Join(dir, "report.html"))
	if err != nil {
		t.Fatal(err)
	}
	h := string(page)
	for _, w := range []string{
		"<th>project</th><td>Warehouse B &amp; annex &lt;refurb&gt;</td>",
		"<details class=\"study\"><summary>The study file as run (SHA-256 <code>" + raw.SHA + "</code>)</summary>",
		"<pre class=\"study\">" + html.EscapeString(recordStudy) + "</pre>",
	} {
		if !strings.Contains(h, w) {
			t.Errorf("report.html lacks %q", w)
		}
	}
	// The record stands at the head: before the result.
	if i, j := strings.Index(h, "<th>checked by</th>"), strings.Index(h, `id="result"`); i < 0 || i > j {
		t.Errorf("report.html: the record is not at the head (at %d, result at %d)", i, j)
	}
	for _, f := range []string{"summary.txt", "summary.md"} {
		b, _ := os.ReadFile(filepath.Join(dir, f))
		if !strings.Contains(string(b), "B. Checker") || !strings.Contains(string(b), "2026-12-05") {
			t.Errorf("%s lacks the record:\n%s", f, b)
		}
	}
}

// TestCheckJSONRecord: check --json carries the record too; a study
// without [record] has none.
func TestCheckJSONRecord(t *testing.T) {
	d, _ := ctCheckJSON(t, recordStudy)
	if d.Record == nil || d.Record.PreparedBy != "A. Engineer" || d.Record.Date != "2026-12-05" {
		t.Errorf("check --json record %+v", d.Record)
	}
	_, raw := ctCheckJSON(t, good)
	if _, ok := raw["record"]; ok {
		t.Errorf("a study without [record] has a record in its document")
	}
	code, out, errs := invoke(t, "check", writeStudy(t, recordStudy))
	if code != 0 || !strings.HasPrefix(out, "test strut\n  project      Warehouse B & annex <refurb>\n  member       column C4, grid B/3\n") {
		t.Errorf("check (exit %d %s) does not open with the record:\n%s", code, errs, out)
	}
}
