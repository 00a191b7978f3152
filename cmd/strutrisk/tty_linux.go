package main

import (
	"os"
	"syscall"
	"unsafe"
)

// isTerminal says whether f is a terminal: the terminal attributes can be
// read from it (a pipe, a file or /dev/null has none).
func isTerminal(f *os.File) bool {
	var t syscall.Termios
	_, _, e := syscall.Syscall(syscall.SYS_IOCTL, f.Fd(), syscall.TCGETS, uintptr(unsafe.Pointer(&t)))
	return e == 0
}
