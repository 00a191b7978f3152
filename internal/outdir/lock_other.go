//go:build !unix

package outdir

import (
	"errors"
	"os"
)

// errBusy is the error of a folder another run holds.
var errBusy = errors.New("busy")

// busyError is errBusy with the process that holds the lock.
type busyError struct{}

func (e *busyError) Error() string   { return "busy" }
func (e *busyError) Is(t error) bool { return t == errBusy }
func (e *busyError) who() string     { return "" }

// lockFile opens the lock file; on this system there is no lock, and two
// runs into one folder are not kept apart.
func lockFile(path string) (*os.File, error) {
	return os.OpenFile(path, os.O_RDWR|os.O_CREATE, 0o644)
}

// unlockFile removes the lock file.
func unlockFile(f *os.File) {
	f.Close()
	os.Remove(f.Name())
}
