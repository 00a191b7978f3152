package study

import (
	"strings"
)

// KeyInfo describes one key of a study-file table: the parser takes the
// names it accepts (and the choices of a text key) from here, and
// `strutrisk help keys` prints the same rows for people.
type KeyInfo struct {
	// Name is the key as written; "<name>" stands for a name of the
	// user's choice (the loads).
	Name string
	// Takes says what the key takes: "length", "force", "stress",
	// "number", "text", "true/false", a list... A quantity's dimension
	// names its internal unit in the help.
	Takes string
	// Choices are the accepted values of a text key, in the order of the
	// documentation; the parser accepts exactly these.
	Choices []string
	// Default is what applies when the key is not given; empty when the
	// key is required or has no default (see Required).
	Default string
	// Required reports that the study must give the key.
	Required bool
	// Meaning says what the key is for, in one or two sentences.
	Meaning string
}

// TableInfo describes one table of a study file and its keys.
type TableInfo struct {
	// Path is the table's key path ("member.section"); empty for the top
	// of the file; a "*" part stands for any name ("measurements.*").
	Path string
	// Array reports an array of tables ([[variant]]).
	Array bool
	// Meaning says what the table holds.
	Meaning string
	// Keys are its keys in the order of the documentation.
	Keys []KeyInfo
}

// KeyTables returns the tables and keys of a study file in the order of
// the documentation. The slice is a copy: changing it does not change what
// the parser accepts.
func KeyTables() []TableInfo {
	out := make([]TableInfo, len(keyTables))
	for i, t := range keyTables {
		out[i] = *t
		out[i].Keys = append([]KeyInfo(nil), t.Keys...)
	}
	return out
}

// tableInfo returns the registry entry of a table path: indices of arrays
// of tables are dropped ("variant[3]" is "variant") and a name of the
// user's choice matches "*". It returns nil for a path the registry does
// not describe.
func tableInfo(path string) *TableInfo {
	path = dropIndices(path)
	for _, t := range keyTables {
		if t.Path == path {
			return t
		}
	}
	if i := strings.LastIndexByte(path, '.'); i >= 0 {
		wild := path[:i] + ".*"
		for _, t := range keyTables {
			if t.Path == wild {
				return t
			}
		}
	}
	return nil
}

// dropIndices removes the "[n]" parts of a key path.
func dropIndices(path string) string {
	if !strings.Contains(path, "[") {
		return path
	}
	var b strings.Builder
	skip := false
	for _, c := range path {
		switch {
		case c == '[':
			skip = true
		case c == ']':
			skip = false
		case !skip:
			b.WriteRune(c)
		}
	}
	return b.String()
}

// knownKeys lists the names accepted in the table at path: its own keys
// and the tables below it, as the registry says.
func knownKeys(path string) []string {
	t := tableInfo(path)
	if t == nil {
		return nil
	}
	var names []string
	for _, k := range t.Keys {
		if !strings.HasPrefix(k.Name, "<") {
			names = append(names, k.Name)
		}
	}
	for _, sub := range keyTables {
		if parent, name, ok := cutLast(sub.Path); ok && parent == t.Path && name != "*" {
			names = append(names, name)
		}
	}
	return names
}

// cutLast splits a path at its last dot; a path without one is a table
// at the top of the file.
func cutLast(path string) (parent, name string, ok bool) {
	if path == "" {
		return "", "", false
	}
	i := strings.LastIndexByte(path, '.')
	if i < 0 {
		return "", path, true
	}
	return path[:i], path[i+1:], true
}

// keyInfo returns the registry row of key in the table at path.
func keyInfo(path, key string) (KeyInfo, bool) {
	t := tableInfo(path)
	if t == nil {
		return KeyInfo{}, false
	}
	for _, k := range t.Keys {
		if k.Name == key || strings.HasPrefix(k.Name, "<") {
			return k, true
		}
	}
	return KeyInfo{}, false
}

// choicesOf returns the accepted values of a text key, e.g.
// choicesOf("capacity", "model").
func choicesOf(path, key string) []string {
	k, ok := keyInfo(path, key)
	if !ok || len(k.Choices) == 0 {
		panic("study: no choices for " + path + "." + key + " in the key registry (keys.go)")
	}
	return k.Choices
}

// registered reports whether the table at path takes key: a key of its
// own, a table below it, or any name where the registry has "<name>".
func registered(path, key string) bool {
	if _, ok := keyInfo(path, key); ok {
		return true
	}
	for _, k := range knownKeys(path) {
		if k == key {
			return true
		}
	}
	return false
}
