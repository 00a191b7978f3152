package report

import (
	"regexp"
	"strings"
)

// csvNumber matches a decimal number as a spreadsheet reads one.
var csvNumber = regexp.MustCompile(`^[+-]?([0-9]+\.?[0-9]*|\.[0-9]+)([eE][+-]?[0-9]+)?$`)

// csvCell neutralises a cell a spreadsheet would take as a formula: text
// beginning with '=', '+', '-', '@', a tab or a carriage return gets a
// leading apostrophe (common practice against formula injection). Numbers
// such as -1.5 stay as they are.
func csvCell(s string) string {
	if s == "" || csvNumber.MatchString(s) {
		return s
	}
	switch s[0] {
	case '=', '+', '-', '@', '\t', '\r':
		return "'" + s
	}
	return s
}

// csvCells applies csvCell to every cell of rows, in place, and returns
// rows.
func csvCells(rows ...[]string) [][]string {
	for _, r := range rows {
		for i, c := range r {
			r[i] = csvCell(c)
		}
	}
	return rows
}

// mdPunct are the characters that start inline Markdown (emphasis, code,
// links, raw HTML, entities, strike-through, table cells) and the escape
// itself; each is written with a backslash (CommonMark 0.31, section 2.4:
// any ASCII punctuation may be backslash-escaped).
const mdPunct = "\\`*[]<>&|~"

// mdText escapes text for Markdown so that it reads as written: no raw
// HTML (a <script> stays text), no emphasis, link, image or code span, no
// table cell break, and no block (heading, quote, list) where it starts a
// line or follows a list marker. Line breaks become spaces. An underscore
// is escaped unless it joins two letters or digits (model_factor), where
// it cannot start emphasis.
func mdText(s string) string {
	var b strings.Builder
	rs := []rune(s)
	alnum := func(i int) bool {
		if i < 0 || i >= len(rs) {
			return false
		}
		c := rs[i]
		return c >= '0' && c <= '9' || c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z'
	}
	for i, c := range rs {
		switch {
		case c == '\n' || c == '\r':
			b.WriteByte(' ')
			continue
		case c < 0x80 && strings.ContainsRune(mdPunct, c):
			b.WriteByte('\\')
		case c == '_' && !(alnum(i-1) && alnum(i+1)):
			b.WriteByte('\\')
		case i == 0 && mdBlockStart(rs):
			b.WriteByte('\\')
		}
		b.WriteRune(c)
	}
	return b.String()
}

// mdBlockStart says whether text at the start of a line would open a
// heading, quote or list item: '#', '>', '+' or '-' followed by a blank
// or nothing ('>' always). An ordered list ("1. ") is left alone: its
// marker is not the first character.
func mdBlockStart(rs []rune) bool {
	if len(rs) == 0 {
		return false
	}
	blankAfter := len(rs) == 1 || rs[1] == ' ' || rs[1] == '\t'
	switch rs[0] {
	case '>':
		return false // escaped as punctuation already
	case '#', '+', '-', '=':
		return blankAfter || allSame(rs)
	}
	return false
}

// allSame says whether every rune of rs is rs[0] ("---", "===").
func allSame(rs []rune) bool {
	for _, c := range rs {
		if c != rs[0] {
			return false
		}
	}
	return true
}
