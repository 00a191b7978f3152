package report

import (
	"fmt"
	"path/filepath"
	"slices"

	"strutrisk/internal/outdir"
)

// RunFiles are the files of a run's folder: Files of b in the formats,
// the summary pointing at report.html when the formats (nil: the
// defaults) hold "html".
func RunFiles(b *Bundle, formats []string) ([]outdir.File, error) {
	if b != nil && (formats == nil || slices.Contains(formats, "html")) {
		b.ReportPath = "report.html"
	}
	return Files(b, formats)
}

// FilesText says where the files of a run went: the folder dir, the
// number of files, and the HTML report among the paths; "" when no file
// was written.
func FilesText(dir string, paths []string) string {
	if len(paths) == 0 {
		return ""
	}
	s := fmt.Sprintf("  results in         %s/ (%d files: results.json, samples.csv, summary.txt, ...)\n", dir, len(paths))
	for _, f := range paths {
		if filepath.Base(f) == "report.html" {
			s += fmt.Sprintf("  report             %s\n", f)
		}
	}
	return s
}
