package outdir

import (
	"errors"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
)

// names lists the entries of dir, sorted.
func names(t *testing.T, dir string) []string {
	t.Helper()
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var out []string
	for _, e := range entries {
		out = append(out, e.Name())
	}
	return out
}

// commit prepares dir, commits files and closes it.
func commit(t *testing.T, dir string, files ...File) {
	t.Helper()
	f, err := Prepare(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if _, err := f.Commit(files); err != nil {
		t.Fatal(err)
	}
}

func put(t *testing.T, path, text string) {
	t.Helper()
	if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
}

// TestCommitReplacesWhole: a run's files replace the previous run's as a
// whole: a file the new run does not write (sweep.csv) does not stay, and
// nothing but the run and its marker is left, in the folder or beside it.
func TestCommitReplacesWhole(t *testing.T) {
	parent := t.TempDir()
	dir := filepath.Join(parent, "out", "bay3")
	commit(t, dir, File{"results.json", []byte("1")}, File{"sweep.csv", []byte("s")}, File{"sweep.png", []byte("p")})
	commit(t, dir, File{"results.json", []byte("2")})
	if got := names(t, dir); !slices.Equal(got, []string{Marker, "results.json"}) {
		t.Errorf("folder holds %v, want the marker and results.json", got)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "results.json")); string(b) != "2" {
		t.Errorf("results.json holds %q, want the second run's", b)
	}
	if got := names(t, filepath.Join(parent, "out")); !slices.Equal(got, []string{"bay3"}) {
		t.Errorf("beside the folder: %v, want nothing but bay3 (no lock, no hidden run)", got)
	}
	listed, marked := readMarker(dir)
	if !marked || !slices.Equal(listed, []string{"results.json"}) {
		t.Errorf("marker lists %v (marked %v), want results.json", listed, marked)
	}
}

// TestPrepareRefuses: folders a run must not write are refused before any
// work, with a message naming the folder and what to do.
func TestPrepareRefuses(t *testing.T) {
	for _, c := range []struct {
		name  string
		setup func(t *testing.T, dir string) // dir does not exist yet
		want  string
	}{
		{"a file in its place", func(t *testing.T, dir string) { put(t, dir, "x") }, "is a file"},
		{"a file in place of its parent", func(t *testing.T, dir string) { put(t, filepath.Dir(dir), "x") }, "cannot create"},
		{"a user's file", func(t *testing.T, dir string) { put(t, filepath.Join(dir, "notes.txt"), "mine") }, "notes.txt"},
		{"a user's folder", func(t *testing.T, dir string) { os.MkdirAll(filepath.Join(dir, "data"), 0o755) }, "data"},
		{"a user's file in a folder strutrisk wrote", func(t *testing.T, dir string) {
			commit(t, dir, File{"results.json", []byte("1")})
			put(t, filepath.Join(dir, "results-edited.json"), "mine")
		}, "results-edited.json"},
		{"a user's file named like a run's file but not listed", func(t *testing.T, dir string) {
			commit(t, dir, File{"results.json", []byte("1")})
			put(t, filepath.Join(dir, "summary.txt"), "mine")
		}, "summary.txt"},
		{"the working folder", func(t *testing.T, dir string) {
			os.MkdirAll(filepath.Join(dir, "sub"), 0o755)
			t.Chdir(filepath.Join(dir, "sub"))
		}, "working folder"},
	} {
		t.Run(c.name, func(t *testing.T) {
			dir := filepath.Join(t.TempDir(), "p", "bay3")
			c.setup(t, dir)
			before := snapshot(t, dir)
			f, err := Prepare(dir)
			var oe *Error
			if !errors.As(err, &oe) || !strings.Contains(err.Error(), c.want) || !strings.Contains(err.Error(), dir) {
				if f != nil {
					f.Close()
				}
				t.Fatalf("Prepare: %v; want an *Error naming %s and saying %q", err, dir, c.want)
			}
			if after := snapshot(t, dir); after != before {
				t.Errorf("the folder changed:\n%s\nnow:\n%s", before, after)
			}
		})
	}
}

// snapshot describes the files under dir (or the file dir).
func snapshot(t *testing.T, dir string) string {
	t.Helper()
	var b strings.Builder
	filepath.Walk(dir, func(p string, fi os.FileInfo, err error) error {
		if err == nil {
			data := ""
			if !fi.IsDir() {
				d, _ := os.ReadFile(p)
				data = string(d)
			}
			b.WriteString(p + " " + data + "\n")
		}
		return nil
	})
	return b.String()
}

// TestPrepareReadOnly: a folder that cannot be written is found before any
// work. The superuser ignores permission bits, so the test cannot be made
// to fail as root and is skipped there.
func TestPrepareReadOnly(t *testing.T) {
	if os.Geteuid() == 0 {
		t.Skip("permission bits do not bind the superuser")
	}
	for _, which := range []string{"folder", "parent"} {
		t.Run(which, func(t *testing.T) {
			dir := filepath.Join(t.TempDir(), "bay3")
			commit(t, dir, File{"results.json", []byte("1")})
			ro := dir
			if which == "parent" {
				ro = filepath.Dir(dir)
			}
			os.Chmod(ro, 0o555)
			defer os.Chmod(ro, 0o755)
			if f, err := Prepare(dir); err == nil {
				f.Close()
				t.Fatal("a read-only folder was accepted")
			}
		})
	}
}

// TestPrepareAccepts: a new folder, an empty one and one written before the
// marker existed (only names strutrisk writes, and a temporary file of an
// interrupted write) are taken; the old files go with the next run.
func TestPrepareAccepts(t *testing.T) {
	base := t.TempDir()
	empty := filepath.Join(base, "empty")
	os.Mkdir(empty, 0o755)
	legacy := filepath.Join(base, "legacy")
	for _, n := range []string{"results.json", "sweep.png", "update-2.svg", ".summary.txt.tmp-123456"} {
		put(t, filepath.Join(legacy, n), "old")
	}
	for _, dir := range []string{filepath.Join(base, "new", "deep"), empty, legacy} {
		commit(t, dir, File{"results.json", []byte("new")})
		if got := names(t, dir); !slices.Equal(got, []string{Marker, "results.json"}) {
			t.Errorf("%s holds %v after the run", dir, got)
		}
	}
}

// TestLock: a second run into a folder in use is refused at once; after
// the first lets go, the folder is free again.
func TestLock(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "bay3")
	first, err := Prepare(dir)
	if err != nil {
		t.Fatal(err)
	}
	if f, err := Prepare(dir); err == nil || !strings.Contains(err.Error(), "another strutrisk run") {
		if f != nil {
			f.Close()
		}
		first.Close()
		t.Fatalf("second Prepare: %v, want a refusal naming another run", err)
	}
	first.Close()
	second, err := Prepare(dir)
	if err != nil {
		t.Fatalf("after Close: %v", err)
	}
	second.Close()
}

// TestCommitFailure: a run that cannot be written whole (a full disk)
// leaves the previous run as it was and nothing of itself.
func TestCommitFailure(t *testing.T) {
	parent := t.TempDir()
	dir := filepath.Join(parent, "bay3")
	commit(t, dir, File{"results.json", []byte("old")}, File{"summary.txt", []byte("old")})
	before := snapshot(t, parent)
	writeHook = func(name string) error {
		if name == "summary.txt" {
			return errors.New("no space left on device")
		}
		return nil
	}
	defer func() { writeHook = nil }()
	f, err := Prepare(dir)
	if err != nil {
		t.Fatal(err)
	}
	_, err = f.Commit([]File{{"results.json", []byte("new")}, {"summary.txt", []byte("new")}})
	f.Close()
	if err == nil || !strings.Contains(err.Error(), "summary.txt") {
		t.Fatalf("Commit: %v, want an error naming summary.txt", err)
	}
	if after := snapshot(t, parent); after != before {
		t.Errorf("after a failed run:\n%s\nwant as before:\n%s", after, before)
	}
}

// TestCommitForeignDuringRun: a file a user puts into the folder during a
// run is never removed: the run is not swapped in.
func TestCommitForeignDuringRun(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "bay3")
	commit(t, dir, File{"results.json", []byte("old")})
	f, err := Prepare(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	put(t, filepath.Join(dir, "notes.txt"), "mine")
	if _, err := f.Commit([]File{{"results.json", []byte("new")}}); err == nil || !strings.Contains(err.Error(), "notes.txt") {
		t.Fatalf("Commit: %v, want a refusal naming notes.txt", err)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "notes.txt")); string(b) != "mine" {
		t.Error("the user's file is gone")
	}
}

// TestLeftovers: what interrupted runs left beside the folder is removed;
// a run stopped between the two renames of its swap is put in place.
func TestLeftovers(t *testing.T) {
	parent := t.TempDir()
	dir := filepath.Join(parent, "bay3")
	commit(t, dir, File{"results.json", []byte("old")})
	// Killed while writing, and killed after moving the old run aside.
	put(t, filepath.Join(parent, ".bay3.tmp-111", "results.json"), "partial")
	put(t, filepath.Join(parent, ".bay3.old-222", "results.json"), "older")
	put(t, filepath.Join(parent, ".other.tmp-333", "results.json"), "another folder's")
	put(t, filepath.Join(dir, ".results.json.tmp-444"), "partial")
	f, err := Prepare(dir)
	if err != nil {
		t.Fatal(err)
	}
	f.Close()
	if got := names(t, parent); !slices.Equal(got, []string{".other.tmp-333", "bay3"}) {
		t.Errorf("beside the folder: %v, want only another folder's leftover and bay3", got)
	}
	if got := names(t, dir); !slices.Equal(got, []string{Marker, "results.json"}) {
		t.Errorf("in the folder: %v", got)
	}

	// Killed between the renames: the old run aside, the new one complete.
	os.Rename(dir, filepath.Join(parent, ".bay3.old-555"))
	put(t, filepath.Join(parent, ".bay3.tmp-666", "results.json"), "new")
	put(t, filepath.Join(parent, ".bay3.tmp-666", Marker), string(markerText([]string{"results.json"})))
	f, err = Prepare(dir)
	if err != nil {
		t.Fatal(err)
	}
	f.Close()
	if b, _ := os.ReadFile(filepath.Join(dir, "results.json")); string(b) != "new" {
		t.Errorf("results.json holds %q, want the complete run put in place", b)
	}
	if got := names(t, parent); !slices.Equal(got, []string{".other.tmp-333", "bay3"}) {
		t.Errorf("beside the folder: %v", got)
	}
}
