package study

import (
	"fmt"
	"strings"
)

// Problem is one thing wrong with a study file: where it is, which key, and
// what to do about it.
type Problem struct {
	File string // the study file as named by the caller
	Line int    // 1-based; 0 when the key has no line (e.g. a missing table)
	Key  string // the key path, e.g. "material.yield"
	Msg  string
}

// String formats the problem as "file:line: key: message".
func (p Problem) String() string {
	var b strings.Builder
	b.WriteString(p.File)
	if p.Line > 0 {
		fmt.Fprintf(&b, ":%d", p.Line)
	}
	if p.Key != "" {
		b.WriteString(": ")
		b.WriteString(p.Key)
	}
	b.WriteString(": ")
	b.WriteString(p.Msg)
	return b.String()
}

// Error lists every problem found in a study file. Load returns it when the
// file cannot be used; all problems are listed, not only the first.
type Error struct {
	Problems []Problem
	// Unlisted counts the problems found beyond the first maxProblems,
	// which are not listed.
	Unlisted int
}

// Error returns the problems, one per line, and the count of those not
// listed.
func (e *Error) Error() string {
	lines := make([]string, len(e.Problems), len(e.Problems)+1)
	for i, p := range e.Problems {
		lines[i] = p.String()
	}
	if e.Unlisted > 0 {
		lines = append(lines, e.UnlistedLine())
	}
	return strings.Join(lines, "\n")
}

// UnlistedLine says how many problems are not listed; empty when none.
func (e *Error) UnlistedLine() string {
	if e.Unlisted == 0 {
		return ""
	}
	return fmt.Sprintf("%d more problems not listed (fix the first %d first)", e.Unlisted, len(e.Problems))
}

// editDistance is the Levenshtein distance of a and b.
func editDistance(a, b string) int {
	prev := make([]int, len(b)+1)
	cur := make([]int, len(b)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(a); i++ {
		cur[0] = i
		for j := 1; j <= len(b); j++ {
			cost := 1
			if a[i-1] == b[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(b)]
}

// nearest returns the candidate closest to s when it is a plausible typo.
func nearest(s string, candidates []string) (string, bool) {
	best, bestD := "", 1<<30
	ls := strings.ToLower(s)
	if len(s) >= 3 {
		for _, c := range candidates {
			if strings.HasPrefix(strings.ToLower(c), ls) {
				return c, true
			}
		}
	}
	for _, c := range candidates {
		d := editDistance(ls, strings.ToLower(c))
		if d < bestD {
			best, bestD = c, d
		}
	}
	limit := 2
	if len(s) <= 4 {
		limit = 1
	}
	if bestD <= limit {
		return best, true
	}
	return "", false
}
