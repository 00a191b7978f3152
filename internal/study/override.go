package study

import (
	"fmt"
	"strings"
)

// Unset is the override value that removes a key from the study
// ("imperfection.bow" = "unset" in a variant's set).
const Unset = "unset"

// override sets one key path of the decoded study document to a TOML
// value before the study is checked: the study is then read as if the
// value had been written there, so every quantity form and every check
// applies.
type override struct {
	// key is the dotted path in the document ("imperfection.bow",
	// "loads.imposed.mean").
	key string
	// value is the TOML value as decoded (a number, a string, a table);
	// the string Unset removes the key.
	value any
	// at is where the value is written in the file
	// ("variant[0].set.imperfection.bow", "sweep.values[2]"): problems
	// with the value are reported there.
	at string
	// label names the case in messages about other keys ("variant
	// \"bow L/500\"").
	label string
}

// apply sets the overrides in the decoded document raw; it returns the
// problems of paths that cannot be set.
func apply(raw map[string]any, ovs []override) []string {
	var bad []string
	for _, o := range ovs {
		if err := setPath(raw, o.key, o.value); err != nil {
			bad = append(bad, o.at+": "+err.Error())
		}
	}
	return bad
}

// setPath sets the value at a dotted path of doc, making the tables on
// the way; Unset removes the key.
func setPath(doc map[string]any, path string, value any) error {
	parts := strings.Split(path, ".")
	for _, p := range parts {
		if p == "" {
			return fmt.Errorf("%q is not a key path: write it as table.key, e.g. \"imperfection.bow\"", path)
		}
	}
	m := doc
	for i, p := range parts[:len(parts)-1] {
		next, ok := m[p]
		if !ok {
			if value == Unset {
				return nil
			}
			t := map[string]any{}
			m[p] = t
			m = t
			continue
		}
		t, ok := next.(map[string]any)
		if !ok {
			at := strings.Join(parts[:i+1], ".")
			return fmt.Errorf("%s holds a value (%s), not a table, so %q cannot be set (set %s itself)", at, tomlType(next), path, at)
		}
		m = t
	}
	last := parts[len(parts)-1]
	if value == Unset {
		delete(m, last)
		return nil
	}
	m[last] = value
	return nil
}

// derive reads the study again from its source with the overrides
// applied, without its [sweep] and [[variant]] tables. Problems with an
// overridden key are reported at the override; others name the case.
func derive(name string, src *source, ovs []override) (*Study, []Problem) {
	p := newParser(name, nil)
	p.doc, p.lines = src.caseDoc(ovs)
	var bad []string
	p.edit = func(raw map[string]any) {
		bad = apply(raw, ovs)
	}
	p.relines = func(lines map[string]int) {
		for _, o := range ovs {
			// An element of a one-line list has its list's line.
			lines[o.key] = lineIn(lines, o.at)
			for k, n := range lines {
				if k == o.at || strings.HasPrefix(k, o.at+".") || strings.HasPrefix(k, o.at+"[") {
					lines[o.key+k[len(o.at):]] = n
				}
			}
		}
	}
	st := p.parse()
	probs := p.probs
	for _, b := range bad {
		at, msg, _ := strings.Cut(b, ": ")
		probs = append(probs, Problem{File: name, Line: p.line(at), Key: at, Msg: msg})
	}
	if len(probs) == 0 {
		return st, nil
	}
	for i := range probs {
		pr := &probs[i]
		mapped := false
		for _, o := range ovs {
			if pr.Key == o.key || strings.HasPrefix(pr.Key, o.key+".") || strings.HasPrefix(pr.Key, o.key+"[") {
				pr.Key = o.at + pr.Key[len(o.key):]
				mapped = true
				break
			}
			if pr.Key == o.at {
				mapped = true
			}
		}
		if !mapped && len(ovs) > 0 {
			pr.Msg = "with the values of " + ovs[0].label + ": " + pr.Msg
			if pr.Line == 0 {
				// A key the file does not have: point at the case.
				pr.Line = p.line(ovs[0].at)
			}
		}
	}
	return nil, probs
}
