package main

import (
	"fmt"
	"io"

	"strutrisk/internal/analysis"
)

// load reads, checks and builds the study at path, printing problems to
// stderr. A non-zero status means stop.
func load(path string, stderr io.Writer) (*analysis.Loaded, int) {
	l, err := analysis.Load(path)
	if err == nil {
		return l, exitOK
	}
	for _, line := range analysis.LoadFailure(path, err) {
		fmt.Fprintf(stderr, "strutrisk: %s\n", line)
	}
	return nil, exitInput
}
