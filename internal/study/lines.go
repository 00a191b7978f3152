package study

import (
	"strconv"
	"strings"
)

// keyLines maps every key path of a TOML document to the line where it is
// written: "member.length", "correlation[1].rho", "member.k_minor.dist".
// Tables are recorded under their own path ("member.section"), arrays of
// tables under their indexed path ("correlation[0]"). The document must
// already have been parsed successfully; the scanner is lenient and only
// follows the structure that determines key paths.
func keyLines(doc string) map[string]int {
	s := &scanner{src: doc, line: 1, lines: make(map[string]int), count: make(map[string]int)}
	s.document()
	return s.lines
}

type scanner struct {
	src   string
	pos   int
	line  int
	lines map[string]int
	count map[string]int // arrays of tables: number of elements so far
}

func (s *scanner) peek() byte {
	if s.pos < len(s.src) {
		return s.src[s.pos]
	}
	return 0
}

func (s *scanner) next() byte {
	c := s.src[s.pos]
	s.pos++
	if c == '\n' {
		s.line++
	}
	return c
}

func (s *scanner) eof() bool { return s.pos >= len(s.src) }

// space skips blanks; with newlines also line breaks and comments.
func (s *scanner) space(newlines bool) {
	for !s.eof() {
		switch c := s.peek(); {
		case c == ' ' || c == '\t' || c == '\r':
			s.next()
		case c == '#':
			for !s.eof() && s.peek() != '\n' {
				s.next()
			}
		case c == '\n' && newlines:
			s.next()
		default:
			return
		}
	}
}

func (s *scanner) skipLine() {
	for !s.eof() && s.next() != '\n' {
	}
}

func (s *scanner) record(path string, line int) {
	if _, ok := s.lines[path]; !ok {
		s.lines[path] = line
	}
}

func (s *scanner) document() {
	prefix := ""
	for {
		s.space(true)
		if s.eof() {
			return
		}
		line := s.line
		if s.peek() == '[' {
			s.next()
			array := s.peek() == '['
			if array {
				s.next()
			}
			s.space(false)
			key := s.key()
			s.space(false)
			s.skipLine()
			if key == nil {
				continue
			}
			path := join("", key)
			if array {
				n := s.count[path]
				s.count[path] = n + 1
				s.record(path, line)
				path += "[" + strconv.Itoa(n) + "]"
			}
			s.record(path, line)
			prefix = path
			continue
		}
		if !s.keyValue(prefix) {
			s.skipLine()
		}
	}
}

// keyValue reads key = value below prefix and reports success.
func (s *scanner) keyValue(prefix string) bool {
	line := s.line
	key := s.key()
	if key == nil {
		return false
	}
	s.space(false)
	if s.peek() != '=' {
		return false
	}
	s.next()
	s.space(false)
	path := join(prefix, key)
	s.record(path, line)
	return s.value(path)
}

// key reads a dotted key of bare and quoted parts.
func (s *scanner) key() []string {
	var parts []string
	for {
		s.space(false)
		var part string
		switch c := s.peek(); {
		case c == '"' || c == '\'':
			str, ok := s.str()
			if !ok {
				return nil
			}
			part = str
		case isBare(c):
			start := s.pos
			for !s.eof() && isBare(s.peek()) {
				s.next()
			}
			part = s.src[start:s.pos]
		default:
			return nil
		}
		parts = append(parts, part)
		s.space(false)
		if s.peek() != '.' {
			return parts
		}
		s.next()
	}
}

func isBare(c byte) bool {
	return c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || c >= '0' && c <= '9' || c == '_' || c == '-'
}

// str reads a basic or literal string (single or multi-line) and returns
// its raw contents (escapes are kept as written).
func (s *scanner) str() (string, bool) {
	q := s.next()
	multi := strings.HasPrefix(s.src[s.pos:], string([]byte{q, q}))
	if multi {
		s.next()
		s.next()
	}
	start := s.pos
	for !s.eof() {
		c := s.peek()
		if c == '\\' && q == '"' {
			s.next()
			if !s.eof() {
				s.next()
			}
			continue
		}
		if c == q {
			if !multi {
				str := s.src[start:s.pos]
				s.next()
				return str, true
			}
			if strings.HasPrefix(s.src[s.pos:], string([]byte{q, q, q})) {
				str := s.src[start:s.pos]
				s.next()
				s.next()
				s.next()
				for s.peek() == q { // up to two quotes may end the content
					s.next()
				}
				return str, true
			}
		}
		if c == '\n' && !multi {
			return "", false
		}
		s.next()
	}
	return "", false
}

// value reads one value; inline tables and arrays record their inner keys
// below path.
func (s *scanner) value(path string) bool {
	switch c := s.peek(); c {
	case '"', '\'':
		_, ok := s.str()
		return ok
	case '{':
		s.next()
		for {
			s.space(true)
			if s.peek() == '}' {
				s.next()
				return true
			}
			if !s.keyValue(path) {
				return false
			}
			s.space(true)
			if s.peek() == ',' {
				s.next()
			}
		}
	case '[':
		s.next()
		for i := 0; ; i++ {
			s.space(true)
			if s.peek() == ']' {
				s.next()
				return true
			}
			elem := path + "[" + strconv.Itoa(i) + "]"
			s.record(elem, s.line)
			if !s.value(elem) {
				return false
			}
			s.space(true)
			if s.peek() == ',' {
				s.next()
			}
		}
	default:
		start := s.pos
		for !s.eof() {
			c := s.peek()
			if c == ',' || c == ']' || c == '}' || c == '\n' || c == '#' {
				break
			}
			s.next()
		}
		return s.pos > start
	}
}

func join(prefix string, key []string) string {
	p := strings.Join(key, ".")
	if prefix == "" {
		return p
	}
	return prefix + "." + p
}
