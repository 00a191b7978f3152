package study

import (
	"fmt"
	"sort"
	"strings"
)

// checkText refuses control and bidirectional-formatting characters in
// every key and text value of the decoded document doc: study text is
// printed on terminals and written into reports, where ESC or BEL act,
// NUL truncates and a right-to-left override reorders what a reader sees.
// A bad key is reported at its table with the key escaped, so the
// message itself carries no such character.
func (p *parser) checkText(v any, path string) {
	switch x := v.(type) {
	case string:
		if r, bad := badText(x); bad {
			p.errorf(path, "the text contains %s: remove it (text is shown on terminals and in reports)", runeName(r))
		}
	case map[string]any:
		keys := make([]string, 0, len(x))
		for k := range x {
			keys = append(keys, k)
		}
		sort.Strings(keys)
		for _, k := range keys {
			if r, bad := badText(k); bad {
				at := path
				if at == "" {
					at = "(top of the file)"
				}
				// At the key's own line, named by its table.
				line := p.line(joinKey(path, k))
				if p.errorf(at, "the key %q contains %s: remove it from the key", k, runeName(r)); len(p.probs) > 0 {
					p.probs[len(p.probs)-1].Line = line
				}
				continue
			}
			p.checkText(x[k], joinKey(path, k))
		}
	case []map[string]any:
		for i, e := range x {
			p.checkText(e, fmt.Sprintf("%s[%d]", path, i))
		}
	case []any:
		for i, e := range x {
			p.checkText(e, fmt.Sprintf("%s[%d]", path, i))
		}
	}
}

// hasBadText reports whether any key or text value of v holds a
// character badText refuses; it allocates nothing, so a clean document
// (nearly all) costs one walk.
func hasBadText(v any) bool {
	switch x := v.(type) {
	case string:
		_, bad := badText(x)
		return bad
	case map[string]any:
		for k, e := range x {
			if _, bad := badText(k); bad || hasBadText(e) {
				return true
			}
		}
	case []map[string]any:
		for _, e := range x {
			if hasBadText(e) {
				return true
			}
		}
	case []any:
		for _, e := range x {
			if hasBadText(e) {
				return true
			}
		}
	}
	return false
}

func joinKey(path, k string) string {
	if path == "" {
		return k
	}
	return path + "." + k
}

// badText returns the first character of s that may not stand in study
// text: C0 and C1 control characters (tab and line breaks included), DEL,
// and the characters that change the direction or the lines of text.
func badText(s string) (rune, bool) {
	for _, r := range s {
		switch {
		case r < 0x20, r == 0x7f, r >= 0x80 && r < 0xa0:
			return r, true
		case r == 0x061c, r == 0x200e, r == 0x200f, r >= 0x202a && r <= 0x202e,
			r >= 0x2066 && r <= 0x2069, r == 0x2028, r == 0x2029:
			return r, true
		}
	}
	return 0, false
}

// runeNames name the characters most often met.
var runeNames = map[rune]string{
	0x00: "NUL", 0x07: "BEL", 0x08: "backspace", 0x09: "a tab", 0x0a: "a line break", 0x0d: "a carriage return",
	0x1b: "ESC (a terminal escape)", 0x7f: "DEL", 0x202e: "a right-to-left override", 0x202d: "a left-to-right override",
	0x2066: "a left-to-right isolate", 0x2067: "a right-to-left isolate", 0x2068: "a first-strong isolate",
	0x200f: "a right-to-left mark", 0x200e: "a left-to-right mark",
}

// runeName names r for a message, e.g. "the control character U+001B ESC".
func runeName(r rune) string {
	kind := "the control character"
	if r >= 0x200 {
		kind = "the formatting character"
	}
	s := fmt.Sprintf("%s U+%04X", kind, r)
	if n, ok := runeNames[r]; ok {
		s += " (" + n + ")"
	}
	return strings.TrimSpace(s)
}
