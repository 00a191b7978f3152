package analysis

import (
	"errors"
	"fmt"

	"strutrisk/internal/study"
)

// LoadFailure is what to tell the user, one message a line, when Load of
// the study at path failed with err: each problem of the file with its
// line, the count of those not listed, and how many there are; or the
// error itself, naming the file.
func LoadFailure(path string, err error) []string {
	var se *study.Error
	if !errors.As(err, &se) {
		return []string{fmt.Sprintf("%s: %v", path, err)}
	}
	lines := make([]string, 0, len(se.Problems)+2)
	for _, p := range se.Problems {
		lines = append(lines, p.String())
	}
	if se.Unlisted > 0 {
		lines = append(lines, se.UnlistedLine())
	}
	n := len(se.Problems) + se.Unlisted
	s := "s"
	if n == 1 {
		s = ""
	}
	return append(lines, fmt.Sprintf("%d problem%s in %s; nothing was run", n, s, path))
}
