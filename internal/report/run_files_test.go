package report

import (
	"strings"
	"testing"
)

// RunFiles points the summary at report.html exactly when the formats
// write it, and FilesText names the folder, the count and the report.
func TestRunFiles(t *testing.T) {
	for _, c := range []struct {
		formats []string
		html    bool
	}{
		{nil, true},
		{[]string{"html", "json"}, true},
		{[]string{"json", "csv"}, false},
	} {
		b := &Bundle{Doc: &Document{Method: "monte-carlo"}}
		files, err := RunFiles(b, c.formats)
		if err != nil {
			t.Fatal(err)
		}
		var summary string
		hasHTML := false
		for _, f := range files {
			hasHTML = hasHTML || f.Name == "report.html"
			if f.Name == "summary.txt" {
				summary = string(f.Data)
			}
		}
		if hasHTML != c.html || (b.ReportPath == "report.html") != c.html || strings.Contains(summary, "report.html") != c.html {
			t.Errorf("formats %v: report.html written %v, ReportPath %q, in the summary %v; want %v",
				c.formats, hasHTML, b.ReportPath, strings.Contains(summary, "report.html"), c.html)
		}
	}
	if s := FilesText("out/x", nil); s != "" {
		t.Errorf("no files: %q, want nothing", s)
	}
	s := FilesText("out/x", []string{"out/x/results.json", "out/x/report.html"})
	if !strings.Contains(s, "out/x/ (2 files") || !strings.Contains(s, "report             out/x/report.html") {
		t.Errorf("FilesText: %q", s)
	}
}
