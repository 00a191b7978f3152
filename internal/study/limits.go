package study

import (
	"fmt"
	"io"
	"os"
)

// Limits of a study file, checked before the TOML parser sees it so that a
// hostile or broken file fails fast with a message instead of exhausting
// memory. A real study is a few kilobytes, at most a few levels deep.
const (
	// MaxFileSize is the largest study file read, in bytes (4 MiB).
	MaxFileSize = 4 << 20
	// MaxDepth is the deepest nesting of tables, inline tables, arrays
	// and dotted keys: the number of parts of the longest key path
	// ("variant[0].set.member.k.major.mean" has 6).
	MaxDepth = 6
	// MaxKeyPath is the longest key path, in bytes, tables and dotted
	// parts included ("member.section.thickness_loss" has 29).
	MaxKeyPath = 128
	// MaxCases is the most runs a study may ask for beside its own: each
	// variant, and the study and each variant at each swept value.
	MaxCases = 10000
	// maxProblems is the number of problems listed; the rest are counted.
	maxProblems = 50
)

// readLimited reads the file at path, refusing one larger than
// MaxFileSize without reading more than one byte beyond the limit (so
// /dev/zero and huge files fail at once).
func readLimited(path string) ([]byte, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	data, err := io.ReadAll(io.LimitReader(f, MaxFileSize+1))
	if err != nil {
		return nil, err
	}
	if len(data) > MaxFileSize {
		return nil, errTooLarge
	}
	return data, nil
}

var errTooLarge = fmt.Errorf("the file is larger than %d bytes (4 MiB), the limit of a study file: a study is a few kilobytes; split sweeps and variants into several studies", MaxFileSize)
