package cli

import (
	"io"
	"os"
	"syscall"
	"unsafe"
)

// IsTerminal says whether w is a terminal: a file whose terminal
// attributes can be read (a pipe, a file or /dev/null has none).
func IsTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	if !ok {
		return false
	}
	var t syscall.Termios
	_, _, e := syscall.Syscall(syscall.SYS_IOCTL, f.Fd(), syscall.TCGETS, uintptr(unsafe.Pointer(&t)))
	return e == 0
}
