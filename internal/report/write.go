package report

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"slices"
)

// DefaultFormats are the output formats Write uses when given none.
var DefaultFormats = []string{"html", "json", "csv", "svg", "png"}

// knownFormats are the formats Write accepts.
var knownFormats = []string{"html", "json", "csv", "svg", "png", "md", "txt"}

// Write writes the report of b into dir (created if needed) and returns the
// paths written, in order. Whatever the formats, it writes results.json
// (the Document, indented), summary.txt (SummaryText), summary.md
// (Markdown), when the bundle holds sample points, samples.csv, and when
// it holds sweep curves, sweep.csv (one row per series and value). The
// formats add:
//
//	"html"  report.html, one self-contained file with inline SVG pictures
//	"svg"   every picture as NAME.svg
//	"png"   every picture as NAME.png (150 dpi)
//
// "json", "csv", "md" and "txt" are accepted and change nothing (those
// files are always written). nil formats mean DefaultFormats; an unknown
// format is an error. Pictures are named capacity-demand, margin,
// convergence, tornado, tornado-beta, sobol, slenderness, sweep,
// variants, beam-column and update-1, update-2...; a picture without data is left
// out (and one that cannot be drawn is listed in the HTML report).
//
// Write is atomic per run: every file is first written under a temporary
// name in dir, and only when all are complete are they renamed to their
// final names. A failure while writing removes the temporary files and
// leaves any earlier report in dir untouched.
//
// All numbers in b are in N, mm and MPa, like the Document; the pictures
// and text show forces in kN.
func Write(dir string, b *Bundle, formats []string) ([]string, error) {
	if b == nil || b.Doc == nil {
		return nil, errors.New("report: nothing to write: the bundle has no result document")
	}
	if formats == nil {
		formats = DefaultFormats
	}
	for _, f := range formats {
		if !slices.Contains(knownFormats, f) {
			return nil, fmt.Errorf("report: unknown output format %q (known: %v)", f, knownFormats)
		}
	}
	want := func(f string) bool { return slices.Contains(formats, f) }

	var files []outFile
	js, err := documentJSON(b.Doc)
	if err != nil {
		return nil, err
	}
	files = append(files, outFile{"results.json", js})
	if b.Samples != nil && len(b.Samples.Rows) > 0 {
		csv, err := samplesCSV(b.Samples)
		if err != nil {
			return nil, err
		}
		files = append(files, outFile{"samples.csv", csv})
	}
	if len(b.Series) > 0 {
		csv, err := seriesCSV(b)
		if err != nil {
			return nil, err
		}
		files = append(files, outFile{"sweep.csv", csv})
	}
	files = append(files, outFile{"summary.txt", []byte(SummaryText(b))})
	files = append(files, outFile{"summary.md", []byte(Markdown(b))})

	if want("html") || want("svg") || want("png") {
		pics, notes := renderPictures(b, want("svg") || want("html"), want("png"))
		if want("html") {
			html, err := htmlReport(b, pics, notes)
			if err != nil {
				return nil, err
			}
			files = append(files, outFile{"report.html", html})
		}
		for _, p := range pics {
			if want("svg") && p.svg != nil {
				files = append(files, outFile{p.fig.Name + ".svg", p.svg})
			}
			if want("png") && p.png != nil {
				files = append(files, outFile{p.fig.Name + ".png", p.png})
			}
		}
	}
	return writeAtomic(dir, files)
}

// outFile is a file's name within the output directory and its content.
type outFile struct {
	name string
	data []byte
}

// picture is a rendered figure.
type picture struct {
	fig      *figure
	svg, png []byte
}

// renderPictures draws every picture of b. Pictures that cannot be drawn
// are left out and described in notes.
func renderPictures(b *Bundle, svg, png bool) (pics []picture, notes []string) {
	figs, skipped := figures(b)
	for _, err := range skipped {
		notes = append(notes, err.Error())
	}
	for _, f := range figs {
		p := picture{fig: f}
		var err error
		if svg {
			if p.svg, err = f.render("svg"); err != nil {
				notes = append(notes, err.Error())
				continue
			}
		}
		if png {
			if p.png, err = f.render("png"); err != nil {
				notes = append(notes, err.Error())
				continue
			}
		}
		pics = append(pics, p)
	}
	return pics, notes
}

// documentJSON encodes d as indented JSON with "warnings" always an array.
func documentJSON(d *Document) ([]byte, error) {
	c := *d
	if c.Warnings == nil {
		c.Warnings = []string{}
	}
	var buf bytes.Buffer
	enc := json.NewEncoder(&buf)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	if err := enc.Encode(&c); err != nil {
		return nil, fmt.Errorf("report: cannot encode the result document (a value is probably NaN or infinite): %w", err)
	}
	return buf.Bytes(), nil
}

// writeHook, when set (by tests), is called before each temporary file is
// written and can make the write fail.
var writeHook func(name string) error

// writeAtomic writes files into dir under temporary names, then renames
// them all. On failure it removes its temporary files.
func writeAtomic(dir string, files []outFile) (paths []string, err error) {
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return nil, fmt.Errorf("report: cannot create the output directory: %w", err)
	}
	temps := make([]string, 0, len(files))
	defer func() {
		if err != nil {
			for _, t := range temps {
				os.Remove(t)
			}
		}
	}()
	for _, f := range files {
		t, err := writeTemp(dir, f)
		if t != "" {
			temps = append(temps, t)
		}
		if err != nil {
			return nil, err
		}
	}
	for i, f := range files {
		final := filepath.Join(dir, f.name)
		if err := os.Rename(temps[i], final); err != nil {
			return paths, fmt.Errorf("report: cannot move %s into place: %w", f.name, err)
		}
		temps[i] = "" // renamed; nothing to clean up
		paths = append(paths, final)
	}
	return paths, nil
}

// writeTemp writes f to a new temporary file in dir and returns its name.
func writeTemp(dir string, f outFile) (string, error) {
	tf, err := os.CreateTemp(dir, "."+f.name+".tmp-*")
	if err != nil {
		return "", fmt.Errorf("report: cannot write %s: %w", f.name, err)
	}
	name := tf.Name()
	fail := func(err error) (string, error) {
		tf.Close()
		return name, fmt.Errorf("report: cannot write %s: %w", f.name, err)
	}
	if writeHook != nil {
		if err := writeHook(f.name); err != nil {
			return fail(err)
		}
	}
	if _, err := tf.Write(f.data); err != nil {
		return fail(err)
	}
	if err := tf.Chmod(0o644); err != nil {
		return fail(err)
	}
	if err := tf.Close(); err != nil {
		return name, fmt.Errorf("report: cannot write %s: %w", f.name, err)
	}
	return name, nil
}
