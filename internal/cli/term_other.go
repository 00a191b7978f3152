//go:build !linux

package cli

import (
	"io"
	"os"
)

// IsTerminal says whether w is a character device: a terminal, or on
// this system possibly another device.
func IsTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	if !ok {
		return false
	}
	fi, err := f.Stat()
	return err == nil && fi.Mode()&os.ModeCharDevice != 0
}
