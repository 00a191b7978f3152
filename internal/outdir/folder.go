package outdir

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strings"
)

// File is one file of a run: its name in the folder and its contents.
type File struct {
	Name string
	Data []byte
}

// Error is a problem with the output folder found by Prepare, before any
// work: the caller reports it as bad input. Dir is the folder as given.
type Error struct {
	Dir string
	Msg string
}

func (e *Error) Error() string { return "output folder " + e.Dir + ": " + e.Msg }

// Folder is an output folder checked and locked for one run. Commit
// writes the run into it; Close releases it.
type Folder struct {
	// Path is the folder as given to Prepare.
	Path   string
	abs    string
	parent string
	base   string
	lock   *os.File
}

// Prepare checks that dir can take a run's files and locks it for this
// run, before any work: it must not be a file, the working folder or a
// folder holding it, nor hold files strutrisk did not write (see the
// package comment); its parent is created if needed, a probe folder is
// created and removed beside it and a probe file in it. Leftovers of
// interrupted runs into dir are removed (or, when a complete one is all
// there is, put in place). Every problem is an *Error.
func Prepare(dir string) (*Folder, error) {
	fail := func(format string, args ...any) (*Folder, error) {
		return nil, &Error{Dir: dir, Msg: fmt.Sprintf(format, args...)}
	}
	abs, err := filepath.Abs(dir)
	if err != nil {
		return fail("%v", err)
	}
	parent, base := filepath.Dir(abs), filepath.Base(abs)
	if parent == abs {
		return fail("is the root of the file system: give a folder of its own, e.g. out/bay3")
	}
	if holdsWorkingDir(abs) {
		return fail("is the working folder or holds it: strutrisk replaces its output folder as a whole, so give a folder of its own, e.g. out/bay3")
	}
	if fi, err := os.Stat(abs); err == nil && !fi.IsDir() {
		return fail("is a file, not a folder: remove it or give another folder (--out)")
	}
	if err := os.MkdirAll(parent, 0o755); err != nil {
		return fail("cannot create the folder that holds it: %v", unwrapPath(err))
	}
	lock, err := lockFile(filepath.Join(parent, "."+base+".lock"))
	if err != nil {
		if errors.Is(err, errBusy) {
			return fail("another strutrisk run is writing it now%s: wait for that run to finish or give another folder (--out)", err.(*busyError).who())
		}
		return fail("cannot lock it (strutrisk writes %s beside it): %v", "."+base+".lock", unwrapPath(err))
	}
	f := &Folder{Path: dir, abs: abs, parent: parent, base: base, lock: lock}
	if err := f.check(); err != nil {
		f.Close()
		return nil, err
	}
	return f, nil
}

// check cleans leftovers, refuses foreign files and probes the folder.
func (f *Folder) check() error {
	fail := func(format string, args ...any) error {
		return &Error{Dir: f.Path, Msg: fmt.Sprintf(format, args...)}
	}
	f.cleanLeftovers()
	names, err := foreign(f.abs)
	if err != nil {
		return fail("cannot read it: %v", unwrapPath(err))
	}
	if len(names) > 0 {
		return fail("holds files strutrisk did not write (%s): strutrisk replaces its output folder as a whole and never deletes such files, so give a new or empty folder, or one strutrisk wrote (it carries %s)", listNames(names), Marker)
	}
	probe, err := os.MkdirTemp(f.parent, "."+f.base+".tmp-")
	if err != nil {
		return fail("cannot write beside it in %s (a run is written there first, then swapped in): %v", f.parent, unwrapPath(err))
	}
	err = os.WriteFile(filepath.Join(probe, "probe"), nil, 0o644)
	os.RemoveAll(probe)
	if err != nil {
		return fail("cannot write beside it in %s: %v", f.parent, unwrapPath(err))
	}
	if _, err := os.Stat(f.abs); err == nil {
		// The old run's files are removed from it after the swap.
		p, err := os.CreateTemp(f.abs, ".probe.tmp-")
		if err != nil {
			return fail("cannot write in it: %v", unwrapPath(err))
		}
		p.Close()
		os.Remove(p.Name())
	}
	return nil
}

// Close releases the folder's lock. It is safe to call more than once.
func (f *Folder) Close() {
	if f.lock != nil {
		unlockFile(f.lock)
		f.lock = nil
	}
}

// holdsWorkingDir says whether the folder abs is the working folder or
// one of its parents.
func holdsWorkingDir(abs string) bool {
	wd, err := os.Getwd()
	if err != nil {
		return false
	}
	if r, err := filepath.EvalSymlinks(wd); err == nil {
		wd = r
	}
	if r, err := filepath.EvalSymlinks(abs); err == nil {
		abs = r
	}
	rel, err := filepath.Rel(abs, wd)
	return err == nil && (rel == "." || filepath.IsLocal(rel))
}

// listNames lists at most three names.
func listNames(names []string) string {
	if len(names) > 3 {
		return strings.Join(names[:3], ", ") + fmt.Sprintf(" and %d more", len(names)-3)
	}
	return strings.Join(names, ", ")
}

// unwrapPath drops the operation and path of a *PathError, which the
// caller's message already names.
func unwrapPath(err error) error {
	var pe *os.PathError
	if errors.As(err, &pe) {
		return pe.Err
	}
	return err
}
