package report

import (
	"bytes"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"testing"

	"strutrisk/internal/outdir"
)

// allPictures are the picture names the demo bundle must produce.
var allPictures = []string{"capacity-demand", "margin", "convergence", "tornado", "tornado-beta", "sobol", "slenderness", "sweep", "beam-column", "update-1"}

func TestWriteDemo(t *testing.T) {
	dir := t.TempDir()
	b := demoBundle()
	paths, err := Write(dir, b, []string{"html", "json", "csv", "svg", "png"})
	if err != nil {
		t.Fatal(err)
	}
	if view := os.Getenv("STRUTRISK_REPORT_DIR"); view != "" {
		// For looking at the pictures: go test -run WriteDemo with the variable set.
		if _, err := Write(view, b, nil); err != nil {
			t.Fatal(err)
		}
	}
	want := []string{"results.json", "samples.csv", "sweep.csv", "summary.txt", "summary.md", "report.html"}
	for _, p := range allPictures {
		want = append(want, p+".svg", p+".png")
	}
	var got []string
	for _, p := range paths {
		got = append(got, filepath.Base(p))
	}
	sort.Strings(got)
	sort.Strings(want)
	if strings.Join(got, " ") != strings.Join(want, " ") {
		t.Errorf("written:\n%v\nwant:\n%v", got, want)
	}
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	if len(entries) != len(want)+1 {
		t.Errorf("%d files in the directory, want %d and the marker (temporary files left?)", len(entries), len(want))
	}
	for _, e := range entries {
		if e.Name() == outdir.Marker {
			continue
		}
		if strings.Contains(e.Name(), ".tmp-") {
			t.Errorf("temporary file %s left behind", e.Name())
		}
		data, err := os.ReadFile(filepath.Join(dir, e.Name()))
		if err != nil {
			t.Fatal(err)
		}
		if len(data) == 0 {
			t.Errorf("%s is empty", e.Name())
		}
		switch filepath.Ext(e.Name()) {
		case ".svg":
			if !bytes.Contains(data, []byte("<svg")) || !bytes.HasSuffix(bytes.TrimSpace(data), []byte("</svg>")) {
				t.Errorf("%s does not look like SVG", e.Name())
			}
			if !bytes.Contains(data, []byte("Liberation Sans")) {
				t.Errorf("%s is not in the sans-serif face", e.Name())
			}
		case ".png":
			if !bytes.HasPrefix(data, []byte("\x89PNG\r\n\x1a\n")) {
				t.Errorf("%s does not start with the PNG signature", e.Name())
			}
		}
		if e.Name() != "samples.csv" && bytes.Contains(data, []byte("NaN")) {
			t.Errorf("%s contains NaN", e.Name())
		}
	}
}

func TestHTMLStructure(t *testing.T) {
	b := demoBundle()
	out, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	html := string(out)
	for _, s := range []string{"result", "inputs", "check", "sensitivity", "sweep", "updates", "beam-column", "method", "reproducibility", "cautions"} {
		if !strings.Contains(html, `<section id="`+s+`">`) {
			t.Errorf("section %s missing", s)
		}
	}
	for _, p := range allPictures {
		i := strings.Index(html, `<figure id="fig-`+p+`">`)
		if i < 0 {
			t.Errorf("picture %s missing", p)
			continue
		}
		fig := html[i:]
		fig = fig[:strings.Index(fig, "</figure>")]
		if !strings.Contains(fig, "<svg") || !strings.Contains(fig, "</svg>") || len(fig) < 2000 {
			t.Errorf("picture %s has no inline SVG (%d bytes)", p, len(fig))
		}
	}
	for _, bad := range []string{"NaN", "Inf", "<?xml", "<script", `src="http`, `href="http`, "url(http", "<no value>"} {
		if strings.Contains(html, bad) {
			t.Errorf("the HTML contains %q", bad)
		}
	}
	for _, s := range []string{
		Caution,
		"material.yield", "characteristic 275 MPa, fractile 0.05, cov 0.07", // inputs table
		"1.84e-3", "1.76e-3 to 1.93e-3", "2.90", "Target NOT met", "0.81", // result, interval, target, reserve
		"20261201", "3f1c9a0d5e2b", "0.1.0-test", "studies/retrofit-demo.toml", // reproducibility
		"Rank correlation", "importance α²", "Sobol", "capacity", // sensitivities
		"converged in 6 iterations", // diagnostics
	} {
		if !strings.Contains(html, s) {
			t.Errorf("the HTML lacks %q", s)
		}
	}
}

func TestWriteErrors(t *testing.T) {
	dir := t.TempDir()
	if _, err := Write(dir, &Bundle{}, nil); err == nil {
		t.Error("no document: no error")
	}
	if _, err := Write(dir, demoBundle(), []string{"pdf"}); err == nil || !strings.Contains(err.Error(), "pdf") {
		t.Errorf("unknown format: error %v", err)
	}
}

func TestPicturesDeterministic(t *testing.T) {
	a, _ := renderPictures(demoBundle(), true, true)
	b, _ := renderPictures(demoBundle(), true, true)
	if len(a) != len(b) || len(a) != len(allPictures) {
		t.Fatalf("%d and %d pictures, want %d", len(a), len(b), len(allPictures))
	}
	for i := range a {
		if !bytes.Equal(a[i].svg, b[i].svg) || !bytes.Equal(a[i].png, b[i].png) {
			t.Errorf("picture %s differs between two renderings", a[i].fig.Name)
		}
	}
}
