package outdir

import (
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strings"
)

// leftover matches the folders a run writes beside its target: a run
// being written (tmp) and a previous run being replaced (old), each with
// the number os.MkdirTemp or the swap gives it.
var leftover = regexp.MustCompile(`^\.(.+)\.(tmp|old)-[0-9]+$`)

// cleanLeftovers removes what interrupted runs into the folder left: the
// hidden folders beside it and the temporary files in it. When the target
// is missing and a complete run (one with its marker) is among them, the
// run was stopped between the two renames of its swap: the newest such
// run is put in place instead of removed.
func (f *Folder) cleanLeftovers() {
	entries, err := os.ReadDir(f.parent)
	if err != nil {
		return
	}
	var done []string // complete runs, to be put in place
	for _, e := range entries {
		m := leftover.FindStringSubmatch(e.Name())
		if m == nil || m[1] != f.base || !e.IsDir() {
			continue
		}
		p := filepath.Join(f.parent, e.Name())
		if _, marked := readMarker(p); marked && m[2] == "tmp" {
			done = append(done, p)
			continue
		}
		os.RemoveAll(p)
	}
	if _, err := os.Lstat(f.abs); os.IsNotExist(err) && len(done) > 0 {
		sort.Slice(done, func(i, j int) bool { return modTime(done[i]) > modTime(done[j]) })
		if os.Rename(done[0], f.abs) == nil {
			done = done[1:]
		}
	}
	for _, p := range done {
		os.RemoveAll(p)
	}
	if in, err := os.ReadDir(f.abs); err == nil {
		for _, e := range in {
			if legacyTemp.MatchString(e.Name()) && !e.IsDir() && strings.HasPrefix(e.Name(), ".") {
				os.Remove(filepath.Join(f.abs, e.Name()))
			}
		}
	}
}

func modTime(p string) int64 {
	fi, err := os.Stat(p)
	if err != nil {
		return 0
	}
	return fi.ModTime().UnixNano()
}
