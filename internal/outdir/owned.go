package outdir

import (
	"os"
	"path/filepath"
	"regexp"
	"slices"
	"strings"
)

// Marker is the file that marks a folder as written by strutrisk. It lists
// the files of the run, one a line, after a first line that says what the
// folder is. It is written last: a folder with a marker is complete.
const Marker = ".strutrisk"

// markerHead is the marker's first line.
const markerHead = "# written by strutrisk: this folder is replaced as a whole by the next run into it"

// legacyNames are the files strutrisk wrote before the marker existed; a
// folder without a marker that holds nothing else is taken as strutrisk's.
var legacyNames = []string{
	"results.json", "samples.csv", "sweep.csv", "summary.txt", "summary.md", "report.html",
}

// legacyPicture matches the pictures written before the marker existed.
var legacyPicture = regexp.MustCompile(`^(capacity-demand|margin|convergence|tornado|tornado-beta|sobol|sobol-capacity|slenderness|sweep|variants|beam-column|update-[0-9]+)\.(svg|png)$`)

// legacyTemp matches the temporary files of the per-file writes of
// earlier versions (".results.json.tmp-123").
var legacyTemp = regexp.MustCompile(`^\..+\.tmp-[0-9]+$`)

// readMarker returns the file names listed in the marker of dir and
// whether dir has a marker.
func readMarker(dir string) ([]string, bool) {
	b, err := os.ReadFile(filepath.Join(dir, Marker))
	if err != nil {
		return nil, false
	}
	lines := strings.Split(string(b), "\n")
	if len(lines) == 0 || lines[0] != markerHead {
		return nil, false
	}
	var names []string
	for _, l := range lines[1:] {
		if l != "" {
			names = append(names, l)
		}
	}
	return names, true
}

// markerText is the marker listing names.
func markerText(names []string) []byte {
	return []byte(markerHead + "\n" + strings.Join(names, "\n") + "\n")
}

// foreign returns the entries of the folder dir that strutrisk did not
// write: with a marker, those it does not list; without, those that are
// not names strutrisk writes. It returns nil for a missing folder.
func foreign(dir string) ([]string, error) {
	entries, err := os.ReadDir(dir)
	if err != nil {
		if os.IsNotExist(err) {
			return nil, nil
		}
		return nil, err
	}
	listed, marked := readMarker(dir)
	var out []string
	for _, e := range entries {
		n := e.Name()
		switch {
		case n == Marker && marked:
		case legacyTemp.MatchString(n) && !e.IsDir():
		case marked && slices.Contains(listed, n) && !e.IsDir():
		case !marked && (slices.Contains(legacyNames, n) || legacyPicture.MatchString(n)) && !e.IsDir():
		default:
			out = append(out, n)
		}
	}
	return out, nil
}
