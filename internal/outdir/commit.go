package outdir

import (
	"fmt"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"time"
)

// writeHook, when set (by tests), is called before each file of a run is
// written and can make the write fail.
var writeHook func(name string) error

// Commit writes files as the folder's new contents and returns their
// paths (the folder as given to Prepare joined with each name). The files
// are written into a fresh folder beside the target, the marker last,
// which then replaces the target. On failure the target is left as it was
// and nothing of the run remains.
func (f *Folder) Commit(files []File) ([]string, error) {
	if f.lock == nil {
		return nil, fmt.Errorf("outdir: %s: Commit after Close", f.Path)
	}
	if names, err := foreign(f.abs); err != nil || len(names) > 0 {
		if err == nil {
			err = fmt.Errorf("files strutrisk did not write appeared during the run (%s); they are left alone", listNames(names))
		}
		return nil, fmt.Errorf("cannot replace %s: %w", f.Path, err)
	}
	stage, err := os.MkdirTemp(f.parent, "."+f.base+".tmp-")
	if err != nil {
		return nil, fmt.Errorf("cannot write beside %s: %w", f.Path, err)
	}
	if err := writeAll(stage, files); err != nil {
		os.RemoveAll(stage)
		return nil, err
	}
	if err := f.swap(stage); err != nil {
		os.RemoveAll(stage)
		return nil, err
	}
	paths := make([]string, len(files))
	for i, fl := range files {
		paths[i] = filepath.Join(f.Path, fl.Name)
	}
	return paths, nil
}

// writeAll writes files into the folder stage, then the marker.
func writeAll(stage string, files []File) error {
	names := make([]string, 0, len(files))
	for _, fl := range files {
		if fl.Name == Marker || !filepath.IsLocal(fl.Name) || strings.ContainsAny(fl.Name, `/\`) || slices.Contains(names, fl.Name) {
			return fmt.Errorf("outdir: %q is not a file name a run may write", fl.Name)
		}
		names = append(names, fl.Name)
		if writeHook != nil {
			if err := writeHook(fl.Name); err != nil {
				return fmt.Errorf("cannot write %s: %w", fl.Name, err)
			}
		}
		if err := writeFile(filepath.Join(stage, fl.Name), fl.Data); err != nil {
			return fmt.Errorf("cannot write %s: %w", fl.Name, unwrapPath(err))
		}
	}
	if err := writeFile(filepath.Join(stage, Marker), markerText(names)); err != nil {
		return fmt.Errorf("cannot write %s: %w", Marker, unwrapPath(err))
	}
	return nil
}

// writeFile writes data to a new file and syncs it, so that a full disk
// shows here rather than after the swap.
func writeFile(name string, data []byte) error {
	fl, err := os.OpenFile(name, os.O_WRONLY|os.O_CREATE|os.O_EXCL, 0o644)
	if err != nil {
		return err
	}
	if _, err := fl.Write(data); err != nil {
		fl.Close()
		return err
	}
	if err := fl.Sync(); err != nil {
		fl.Close()
		return err
	}
	return fl.Close()
}

// swap puts the complete folder stage in the target's place and removes
// the old target.
func (f *Folder) swap(stage string) error {
	if _, err := os.Lstat(f.abs); os.IsNotExist(err) {
		if err := os.Rename(stage, f.abs); err != nil {
			return fmt.Errorf("cannot move the run into %s: %w", f.Path, unwrapLink(err))
		}
		return nil
	}
	old := filepath.Join(f.parent, fmt.Sprintf(".%s.old-%d", f.base, time.Now().UnixNano()))
	if err := os.Rename(f.abs, old); err != nil {
		return fmt.Errorf("cannot move the previous run of %s aside: %w", f.Path, unwrapLink(err))
	}
	if err := os.Rename(stage, f.abs); err != nil {
		os.Rename(old, f.abs) // put the previous run back
		return fmt.Errorf("cannot move the run into %s: %w", f.Path, unwrapLink(err))
	}
	os.RemoveAll(old) // only strutrisk's files: foreign checked it
	return nil
}

// unwrapLink drops the paths of a *LinkError.
func unwrapLink(err error) error {
	if le, ok := err.(*os.LinkError); ok {
		return le.Err
	}
	return err
}
