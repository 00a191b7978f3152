package report

import (
	"errors"
	"fmt"
	"slices"

	"strutrisk/internal/outdir"
)

// DefaultFormats are the output formats Write uses when given none.
var DefaultFormats = []string{"html", "json", "csv", "svg", "png"}

// knownFormats are the formats Write accepts.
var knownFormats = []string{"html", "json", "csv", "svg", "png", "md", "txt"}

// Write writes the report of b into dir and returns the paths written, in
// order: it is Prepare, Files and Commit of package outdir, whose rules
// say which folders it takes and how a run replaces the previous one as a
// whole (the folder ends up holding exactly the files of this run and the
// marker outdir.Marker). A failure leaves any earlier report in dir as it
// was.
func Write(dir string, b *Bundle, formats []string) ([]string, error) {
	files, err := Files(b, formats)
	if err != nil {
		return nil, err
	}
	f, err := outdir.Prepare(dir)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	return f.Commit(files)
}

// Files renders the report of b: whatever the formats, results.json (the
// Document, indented), summary.txt (SummaryText), summary.md (Markdown),
// when the bundle holds sample points, samples.csv, and when it holds
// sweep curves, sweep.csv (one row per series and value), and when it
// holds sweep or variant cases, cases.csv (one row per case). The formats
// add:
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
// All numbers in b are in N, mm and MPa, like the Document; the pictures
// and text show forces in kN.
func Files(b *Bundle, formats []string) ([]outdir.File, error) {
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

	var files []outdir.File
	js, err := DocumentJSON(b.Doc)
	if err != nil {
		return nil, err
	}
	files = append(files, outdir.File{Name: "results.json", Data: js})
	if b.Samples != nil && len(b.Samples.Rows) > 0 {
		csv, err := samplesCSV(b.Samples)
		if err != nil {
			return nil, err
		}
		files = append(files, outdir.File{Name: "samples.csv", Data: csv})
	}
	if len(b.Series) > 0 {
		csv, err := seriesCSV(b)
		if err != nil {
			return nil, err
		}
		files = append(files, outdir.File{Name: "sweep.csv", Data: csv})
	}
	if b.Cases != nil {
		csv, err := casesCSV(b)
		if err != nil {
			return nil, err
		}
		files = append(files, outdir.File{Name: "cases.csv", Data: csv})
	}
	if inv := b.Doc.Inventory; inv != nil {
		csv, err := inventoryCSV(inv, b.InventoryColumns)
		if err != nil {
			return nil, err
		}
		files = append(files, outdir.File{Name: "inventory.csv", Data: csv})
	}
	files = append(files, outdir.File{Name: "summary.txt", Data: []byte(SummaryText(b))})
	files = append(files, outdir.File{Name: "summary.md", Data: []byte(Markdown(b))})

	if want("html") || want("svg") || want("png") {
		pics, notes := renderPictures(b, want("svg") || want("html"), want("png"))
		if want("html") {
			html, err := htmlReport(b, pics, notes)
			if err != nil {
				return nil, err
			}
			files = append(files, outdir.File{Name: "report.html", Data: html})
		}
		for _, p := range pics {
			if want("svg") && p.svg != nil {
				files = append(files, outdir.File{Name: p.fig.Name + ".svg", Data: p.svg})
			}
			if want("png") && p.png != nil {
				files = append(files, outdir.File{Name: p.fig.Name + ".png", Data: p.png})
			}
		}
	}
	return files, nil
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
