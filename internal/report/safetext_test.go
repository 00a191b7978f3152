package report

import (
	"bytes"
	"encoding/csv"
	"regexp"
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestCSVCell: text a spreadsheet would run as a formula is neutralised
// with a leading apostrophe (common practice against CSV formula
// injection); numbers, negative ones included, stay numbers.
func TestCSVCell(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"=HYPERLINK(\"x\")", "'=HYPERLINK(\"x\")"},
		{"+1+cmd", "'+1+cmd"},
		{"-2+3", "'-2+3"},
		{"@SUM(A1)", "'@SUM(A1)"},
		{"\t=1", "'\t=1"},
		{"-1.5", "-1.5"},
		{"+2e-3", "+2e-3"},
		{"-.5E+10", "-.5E+10"},
		{"material.yield (MPa)", "material.yield (MPa)"},
		{"", ""},
	} {
		if got := csvCell(c.in); got != c.want {
			t.Errorf("csvCell(%q) = %q, want %q", c.in, got, c.want)
		}
	}
}

// TestMarkdownText: user text reads as written in Markdown: no raw HTML,
// emphasis, link, code, cell break or block marker survives unescaped.
func TestMarkdownText(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"<script>alert(1)</script>", `\<script\>alert(1)\</script\>`},
		{"a | b", `a \| b`},
		{"**bold** _it_ `code`", "\\*\\*bold\\*\\* \\_it\\_ \\`code\\`"},
		{"[x](javascript:y) ![i](u)", `\[x\](javascript:y) !\[i\](u)`},
		{"AT&amp;T", `AT\&amp;T`},
		{"capacity.model_factor", "capacity.model_factor"},
		{"# heading", `\# heading`},
		{"- item", `\- item`},
		{"---", `\---`},
		{"-1.5 kN", "-1.5 kN"},
		{"two\nlines", "two lines"},
		{`back\slash`, `back\\slash`},
	} {
		if got := mdText(c.in); got != c.want {
			t.Errorf("mdText(%q) = %q, want %q", c.in, got, c.want)
		}
	}
}

// TestHostileNames: names and titles written by a user reach summary.md
// escaped and the CSV files neutralised.
func TestHostileNames(t *testing.T) {
	b := demoBundle()
	b.Doc.Title = "<script>alert(1)</script>"
	b.Doc.Warnings = append(b.Doc.Warnings, "<img src=x onerror=alert(1)>")
	b.Series = []Series{{Name: "=cmd|' /C calc'!A0", Points: []Point{{Value: -1.5, Pf: 1e-3, Beta: 3.09, PfCI: [2]float64{9e-4, 1.1e-3}}}}}
	b.Samples = &sim.Samples{Names: []string{"@SUM(1)", "g"}, Rows: [][]float64{{-1.5, 2}}}
	md := Markdown(b)
	if raw := regexp.MustCompile(`(^|[^\\])<(script|img)`).FindString(md); raw != "" {
		t.Errorf("summary.md carries raw HTML %q", raw)
	}
	if !strings.Contains(md, `# \<script\>alert(1)\</script\>`) {
		t.Errorf("summary.md does not show the title as text")
	}
	files, err := Files(b, []string{"json"})
	if err != nil {
		t.Fatal(err)
	}
	for _, f := range files {
		if !strings.HasSuffix(f.Name, ".csv") {
			continue
		}
		recs, err := csv.NewReader(bytes.NewReader(f.Data)).ReadAll()
		if err != nil {
			t.Fatal(err)
		}
		for _, r := range recs {
			for _, c := range r {
				if c != "" && strings.ContainsRune("=+-@", rune(c[0])) && !csvNumber.MatchString(c) {
					t.Errorf("%s: cell %q would be a formula", f.Name, c)
				}
			}
		}
		if f.Name == "sweep.csv" && !strings.Contains(string(f.Data), "-1.5") {
			t.Errorf("sweep.csv lost the number -1.5:\n%s", f.Data)
		}
	}
}
