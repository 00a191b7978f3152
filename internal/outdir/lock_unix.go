//go:build unix

package outdir

import (
	"errors"
	"os"
	"strconv"
	"strings"
	"syscall"
)

// errBusy is the error of a folder another run holds.
var errBusy = errors.New("busy")

// busyError is errBusy with the process that holds the lock.
type busyError struct{ pid string }

func (e *busyError) Error() string   { return "busy" }
func (e *busyError) Is(t error) bool { return t == errBusy }

// who names the process holding the lock, for the message.
func (e *busyError) who() string {
	if e.pid == "" {
		return ""
	}
	return " (process " + e.pid + ")"
}

// lockFile takes the lock file at path without waiting. The lock is the
// advisory lock of flock(2) on the open file; it goes with the process,
// so a killed run leaves a file that locks nothing.
func lockFile(path string) (*os.File, error) {
	for range 10 {
		f, err := os.OpenFile(path, os.O_RDWR|os.O_CREATE, 0o644)
		if err != nil {
			return nil, err
		}
		if err := syscall.Flock(int(f.Fd()), syscall.LOCK_EX|syscall.LOCK_NB); err != nil {
			b := make([]byte, 32)
			n, _ := f.Read(b)
			f.Close()
			if errors.Is(err, syscall.EWOULDBLOCK) {
				return nil, &busyError{pid: strings.TrimSpace(string(b[:n]))}
			}
			return nil, err
		}
		// The run that held it removes the file before it lets go: lock
		// the file that is at path now.
		fi, err1 := f.Stat()
		pi, err2 := os.Stat(path)
		if err1 == nil && err2 == nil && os.SameFile(fi, pi) {
			f.Truncate(0)
			f.WriteAt([]byte(strconv.Itoa(os.Getpid())+"\n"), 0)
			return f, nil
		}
		f.Close()
	}
	return nil, &busyError{}
}

// unlockFile removes the lock file and releases the lock.
func unlockFile(f *os.File) {
	os.Remove(f.Name())
	f.Close()
}
