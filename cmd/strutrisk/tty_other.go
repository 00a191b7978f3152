//go:build !linux

package main

import "os"

// isTerminal says whether f is a character device: a terminal, or on
// this system possibly another device.
func isTerminal(f *os.File) bool {
	fi, err := f.Stat()
	return err == nil && fi.Mode()&os.ModeCharDevice != 0
}
