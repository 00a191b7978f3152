package report

import (
	"strings"
	"testing"
)

// recordStudyText is a study file whose text must be escaped in HTML.
const recordStudyText = `title = "a </pre><script>alert(1)</script> & <b>"
[record]
project = "Warehouse B & annex"
`

// recordBundle is demoBundle with a record and the study file.
func recordBundle() *Bundle {
	b := demoBundle()
	b.Doc.Record = &Record{Project: "Warehouse B & annex <refurb>", Member: "column C4, grid B/3", PreparedBy: "A. Engineer",
		CheckedBy: "B. Checker", Date: "2026-12-05", Revision: "B", Notes: "Loads from the 2019 survey."}
	b.StudyText = []byte(recordStudyText)
	return b
}

// TestRecordHead: the record opens the HTML, text and Markdown reports,
// in the order of the study file, given fields only.
func TestRecordHead(t *testing.T) {
	b := recordBundle()
	b.Doc.Record.Revision = ""
	page, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	h := string(page)
	head := h[:strings.Index(h, `<section id="result">`)]
	for _, w := range []string{"<th>project</th><td>Warehouse B &amp; annex &lt;refurb&gt;</td>", "<th>prepared by</th><td>A. Engineer</td>",
		"<th>date</th><td>2026-12-05</td>", "<th>notes</th><td>Loads from the 2019 survey.</td>", Caution} {
		if !strings.Contains(head, w) {
			t.Errorf("the HTML head lacks %q", w)
		}
	}
	if strings.Contains(head, "<th>revision</th>") {
		t.Errorf("an empty field is shown")
	}
	txt := SummaryText(b)
	if want := b.Doc.Title + "\n  project            Warehouse B & annex <refurb>\n  member             column C4, grid B/3\n  prepared by"; !strings.HasPrefix(txt, want) {
		t.Errorf("summary.txt starts\n%s\nwant\n%s", txt[:200], want)
	}
	md := Markdown(b)
	i, j := strings.Index(md, "| checked by | B. Checker |"), strings.Index(md, "## Result")
	if i < 0 || i > j {
		t.Errorf("summary.md: the record is not at its head:\n%s", md[:600])
	}
	b.Doc.Record = nil
	if page, _ := HTML(b); strings.Contains(string(page), `class="record"`) {
		t.Errorf("no record, yet a record table")
	}
}

// TestStudyEmbedded: the study file stands in the HTML escaped (no tag of
// it is live), once collapsed beside its SHA-256 and once for print.
func TestStudyEmbedded(t *testing.T) {
	b := recordBundle()
	page, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	h := string(page)
	esc := "a &lt;/pre&gt;&lt;script&gt;alert(1)&lt;/script&gt; &amp; &lt;b&gt;"
	if n := strings.Count(h, esc); n != 2 {
		t.Errorf("the escaped study text stands %d times, want 2 (collapsed and for print)", n)
	}
	if strings.Contains(h, "<script") {
		t.Errorf("a tag of the study file is live in the HTML")
	}
	sum := `<details class="study"><summary>The study file as run (SHA-256 <code>` + b.Doc.InputSHA256 + `</code>)</summary>`
	if !strings.Contains(h, sum) {
		t.Errorf("the HTML lacks %q", sum)
	}
	for _, w := range []string{"@page{size:A4", "counter(page)", "counter(pages)", "break-inside:avoid", "details.study{display:none}"} {
		if !strings.Contains(h, w) {
			t.Errorf("the print style lacks %q", w)
		}
	}
	b.StudyText = nil
	if page, _ := HTML(b); strings.Contains(string(page), "<details") {
		t.Errorf("no study text, yet a study block")
	}
}

// TestPrintFooterTitle: the title in the print footer (a CSS string) is
// escaped: a quote or a closing style tag in it ends nothing.
func TestPrintFooterTitle(t *testing.T) {
	b := recordBundle()
	b.Doc.Title = `Bay "3" </style><b>x`
	page, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	h := string(page)
	style := h[strings.Index(h, "<style>"):strings.Index(h, "</style>")]
	if !strings.Contains(style, `@bottom-left{content:"Bay \22 3\22  \3c\2fstyle\3e\3c b\3ex"`) {
		t.Errorf("the footer's title is not escaped as a CSS string:\n%s", style[strings.Index(style, "@page"):])
	}
	if strings.Count(h, "</style>") != 1 {
		t.Errorf("the title closes the style sheet")
	}
}
