package study

import "strings"

// source is a study file decoded once, from which every case (a variant,
// a swept value) is read again without decoding the file: the document
// without its [sweep] and [[variant]] tables, their lines apart. A case
// copies the document (a few kilobytes) and the lines of its own variant,
// so checking n cases takes time in proportion to n, not to n times the
// file.
type source struct {
	doc   map[string]any // without "sweep", "variant" and "inventory"; never changed
	lines map[string]int // lines of doc's keys
	// parts holds the lines under "sweep" and under each "variant[i]",
	// keyed by that prefix.
	parts map[string]map[string]int
}

// newSource keeps the decoded document raw and its key lines.
func newSource(raw map[string]any, lines map[string]int) *source {
	src := &source{doc: map[string]any{}, lines: map[string]int{}, parts: map[string]map[string]int{}}
	for k, v := range raw {
		if k != "sweep" && k != "variant" && k != "inventory" {
			src.doc[k] = v
		}
	}
	for k, n := range lines {
		part := casePart(k)
		if part == "" {
			src.lines[k] = n
			continue
		}
		m := src.parts[part]
		if m == nil {
			m = map[string]int{}
			src.parts[part] = m
		}
		m[k] = n
	}
	return src
}

// casePart returns the prefix of a key path that belongs to one case:
// "sweep" or "variant[i]"; "" for the study's own keys.
func casePart(key string) string {
	switch {
	case key == "sweep" || strings.HasPrefix(key, "sweep.") || strings.HasPrefix(key, "sweep["):
		return "sweep"
	case key == "variant":
		return "sweep" // the array's own line travels with every case
	case strings.HasPrefix(key, "variant["):
		if i := strings.IndexByte(key, ']'); i > 0 {
			return key[:i+1]
		}
	}
	return ""
}

// caseDoc returns a copy of the document that overrides may change, and
// the lines of the study's keys with those of the parts the overrides are
// written in.
func (src *source) caseDoc(ovs []override) (map[string]any, map[string]int) {
	lines := make(map[string]int, len(src.lines)+8)
	for k, n := range src.lines {
		lines[k] = n
	}
	for k, n := range src.parts["sweep"] {
		lines[k] = n
	}
	for _, o := range ovs {
		for k, n := range src.parts[casePart(o.at)] {
			lines[k] = n
		}
	}
	return copyValue(src.doc).(map[string]any), lines
}

// copyValue copies the tables and lists of a decoded value; the scalars
// in them are immutable and shared.
func copyValue(v any) any {
	switch x := v.(type) {
	case map[string]any:
		m := make(map[string]any, len(x))
		for k, e := range x {
			m[k] = copyValue(e)
		}
		return m
	case []map[string]any:
		l := make([]map[string]any, len(x))
		for i, e := range x {
			l[i] = copyValue(e).(map[string]any)
		}
		return l
	case []any:
		l := make([]any, len(x))
		for i, e := range x {
			l[i] = copyValue(e)
		}
		return l
	}
	return v
}
