package report

import (
	"bytes"
	"context"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
	"time"
)

// TestPrintPDF prints the demo report with headless Chromium and checks
// the PDF: A4 pages, the record and the caution on page 1, "page n of N"
// in the bottom margin of every page, each picture's title and caption on
// the same page (no picture cut), and the study file printed in full. It
// is skipped when Chromium is not installed; the text checks need
// pdftotext (poppler-utils) and the page count is read from the PDF's
// bytes without it.
func TestPrintPDF(t *testing.T) {
	chromium := findTool("chromium", "/usr/bin/chromium", "chromium-browser")
	if chromium == "" {
		t.Skip("chromium is not installed: the print style is not checked (apt-get install chromium to check it)")
	}
	b := recordBundle()
	study, err := os.ReadFile(filepath.Join("..", "..", "studies", "retrofit-column.toml"))
	if err != nil {
		t.Fatal(err)
	}
	b.StudyText = study
	pdf, path := printPDF(t, chromium, b)

	// A4 is 210 mm x 297 mm, 595.28 pt x 841.89 pt (ISO 216).
	boxes := regexp.MustCompile(`/MediaBox\s*\[\s*0 0 ([0-9.]+) ([0-9.]+)\s*\]`).FindAllSubmatch(pdf, -1)
	if len(boxes) == 0 {
		t.Fatal("the PDF has no page size")
	}
	for _, m := range boxes {
		w, _ := strconv.ParseFloat(string(m[1]), 64)
		h, _ := strconv.ParseFloat(string(m[2]), 64)
		if abs(w-595.28) > 1 || abs(h-841.89) > 1 {
			t.Errorf("a page is %g x %g pt, not A4 (595.28 x 841.89)", w, h)
		}
	}
	n := len(regexp.MustCompile(`/Type\s*/Page[^s]`).FindAll(pdf, -1))
	if n < 2 || n > 40 {
		t.Fatalf("the PDF has %d pages", n)
	}
	pdftotext := findTool("pdftotext")
	if pdftotext == "" {
		t.Logf("pdftotext is not installed (poppler-utils): only the page size and count (%d) are checked", n)
		return
	}
	pages := pdfPages(t, pdftotext, pdf)
	if len(pages) != n {
		t.Fatalf("pdftotext finds %d pages, the PDF's bytes %d", len(pages), n)
	}
	for i, p := range pages {
		if want := "page " + strconv.Itoa(i+1) + " of " + strconv.Itoa(n); !strings.Contains(p, want) {
			t.Errorf("page %d lacks %q in its margin", i+1, want)
		}
		// The browser's own header (date, title) and footer (the file's
		// address) give way to the style sheet's margin boxes.
		if strings.Contains(p, "file:") || i > 0 && strings.Count(p, b.Doc.Title) != 1 {
			t.Errorf("page %d carries the browser's header or footer:\n%s", i+1, p)
		}
	}
	first := pages[0]
	for _, w := range []string{b.Doc.Title, "Warehouse B & annex <refurb>", "B. Checker", "2026-12-05", words(Caution, 10), "Target NOT met"} {
		if !strings.Contains(first, w) {
			t.Errorf("page 1 lacks %q:\n%s", w, first)
		}
	}
	figs, _ := figures(b)
	for _, f := range figs {
		title, caption := "", words(f.Caption, 6)
		if len(f.Plots) > 0 {
			title = words(f.Plots[0].Title.Text, 6)
		}
		pc := pageOf(pages, caption)
		switch {
		case pc < 0:
			t.Errorf("picture %s: its caption %q is not printed", f.Name, caption)
		case !strings.Contains(pages[pc], title):
			t.Errorf("picture %s is cut: its title %q is not on the page of its caption (%d)", f.Name, title, pc+1)
		}
	}
	// pdftotext sets the aligned comments of a line apart from its
	// setting: each part is looked for alone.
	all := strings.Join(pages, " ")
	for _, l := range strings.Split(string(study), "\n") {
		setting, comment, _ := strings.Cut(l, "#")
		for _, part := range []string{words(setting, 6), words("#"+comment, 6)} {
			if part != "" && part != "#" && !strings.Contains(all, part) {
				t.Errorf("the study line %q is not printed", l)
			}
		}
	}
	if pdftoppm := findTool("pdftoppm"); pdftoppm != "" {
		png, err := exec.Command(pdftoppm, "-r", "30", "-png", "-f", "1", "-l", "1", path).Output()
		if err != nil || !bytes.HasPrefix(png, []byte("\x89PNG")) {
			t.Errorf("pdftoppm does not render page 1: %v", err)
		}
	}
}

// printPDF writes the HTML report of b and prints it to PDF with Chromium
// as a user would, its own header and footer left on: the report's
// margin boxes must replace them.
func printPDF(t *testing.T, chromium string, b *Bundle) (pdf []byte, path string) {
	t.Helper()
	page, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	in, out := filepath.Join(dir, "report.html"), filepath.Join(dir, "report.pdf")
	if err := os.WriteFile(in, page, 0o644); err != nil {
		t.Fatal(err)
	}
	// The limit only stops a hung browser; it is not a timing check.
	ctx, cancel := context.WithTimeout(context.Background(), 5*time.Minute)
	defer cancel()
	cmd := exec.CommandContext(ctx, chromium, "--headless", "--no-sandbox", "--disable-gpu",
		"--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
		"--user-data-dir="+filepath.Join(dir, "profile"), "--print-to-pdf="+out, "file://"+in)
	cmd.WaitDelay = 10 * time.Second
	if msg, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("chromium: %v\n%s", err, msg)
	}
	pdf, err = os.ReadFile(out)
	if err != nil || !bytes.HasPrefix(pdf, []byte("%PDF-")) {
		t.Fatalf("chromium wrote no PDF: %v", err)
	}
	return pdf, out
}

// pdfPages returns the text of each page of pdf, its white space
// collapsed to single spaces.
func pdfPages(t *testing.T, pdftotext string, pdf []byte) []string {
	t.Helper()
	cmd := exec.Command(pdftotext, "-enc", "UTF-8", "-", "-")
	cmd.Stdin = bytes.NewReader(pdf)
	txt, err := cmd.Output()
	if err != nil {
		t.Fatalf("pdftotext: %v", err)
	}
	pages := strings.Split(string(txt), "\f")
	if len(pages) > 0 && strings.TrimSpace(pages[len(pages)-1]) == "" {
		pages = pages[:len(pages)-1]
	}
	for i, p := range pages {
		pages[i] = strings.Join(strings.Fields(p), " ")
	}
	return pages
}

// words returns the first n words of s joined by single spaces.
func words(s string, n int) string {
	f := strings.Fields(s)
	if len(f) > n {
		f = f[:n]
	}
	return strings.Join(f, " ")
}

// pageOf returns the index of the first page holding s, -1 if none.
func pageOf(pages []string, s string) int {
	for i, p := range pages {
		if strings.Contains(p, s) {
			return i
		}
	}
	return -1
}

// findTool returns the first of names found on the path (or as an
// absolute path), "" when none is.
func findTool(names ...string) string {
	for _, n := range names {
		if p, err := exec.LookPath(n); err == nil {
			return p
		}
	}
	return ""
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}
