package main

import (
	"io"
	"os"
)

// drawsProgress says whether the progress line is drawn on w: only when
// allowed (not --json) and w is a terminal.
func drawsProgress(w io.Writer, allowed bool) bool {
	f, ok := w.(*os.File)
	return ok && allowed && isTerminal(f)
}

// stageHook, when set (by tests), is called as each step of a run begins.
var stageHook func(name string)
