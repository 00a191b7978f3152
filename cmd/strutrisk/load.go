package main

import (
	"errors"
	"fmt"
	"io"

	"strutrisk/internal/analysis"
	"strutrisk/internal/study"
)

// load reads, checks and builds the study at path, printing problems to
// stderr. A non-zero status means stop.
func load(path string, stderr io.Writer) (*analysis.Loaded, int) {
	l, err := analysis.Load(path)
	if err == nil {
		return l, exitOK
	}
	var se *study.Error
	if errors.As(err, &se) {
		for _, p := range se.Problems {
			fmt.Fprintf(stderr, "strutrisk: %s\n", p)
		}
		if se.Unlisted > 0 {
			fmt.Fprintf(stderr, "strutrisk: %s\n", se.UnlistedLine())
		}
		n := len(se.Problems) + se.Unlisted
		fmt.Fprintf(stderr, "strutrisk: %d problem%s in %s; nothing was run\n", n, plural(n), path)
		return nil, exitInput
	}
	fmt.Fprintf(stderr, "strutrisk: %s: %v\n", path, err)
	return nil, exitInput
}

func plural(n int) string {
	if n == 1 {
		return ""
	}
	return "s"
}
