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
	s := &scanner{src: doc, line: 1, lines: make(map[string]int), count: make(map[string]int), path: make([]byte, 0, 64)}
	s.document()
	return s.lines
}

type scanner struct {
	src   string
	pos   int
	line  int
	lines map[string]int
	count map[string]int // arrays of tables: number of elements so far
	// path is the key path being read, grown and cut back in place so
	// that a deep path is not rebuilt at every level.
	path []byte
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

// record notes the line of the current path, once. Looking a []byte up
// as a string does not allocate; only a new path is copied.
func (s *scanner) record(line int) {
	if _, ok := s.lines[string(s.path)]; !ok {
		s.lines[string(s.path)] = line
	}
}

func (s *scanner) document() {
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
			s.path = s.path[:0]
			ok := s.key()
			s.space(false)
			s.skipLine()
			if !ok {
				s.path = s.path[:0]
				continue
			}
			if array {
				name := string(s.path)
				n := s.count[name]
				s.count[name] = n + 1
				s.record(line)
				s.path = append(s.path, '[')
				s.path = strconv.AppendInt(s.path, int64(n), 10)
				s.path = append(s.path, ']')
			}
			s.record(line)
			continue
		}
		if !s.keyValue() {
			s.skipLine()
		}
	}
}

// keyValue reads key = value below the current path and reports success;
// the path is as before when it returns.
func (s *scanner) keyValue() bool {
	line := s.line
	mark := len(s.path)
	defer func() { s.path = s.path[:mark] }()
	if !s.key() {
		return false
	}
	s.space(false)
	if s.peek() != '=' {
		return false
	}
	s.next()
	s.space(false)
	s.record(line)
	return s.value(line)
}

// key appends a dotted key of bare and quoted parts to the path.
func (s *scanner) key() bool {
	for {
		s.space(false)
		if len(s.path) > 0 {
			s.path = append(s.path, '.')
		}
		switch c := s.peek(); {
		case c == '"' || c == '\'':
			str, ok := s.str()
			if !ok {
				return false
			}
			if c == '"' && strings.IndexByte(str, '\\') >= 0 {
				// The decoder's key has its escapes read (\t, \u001b).
				if u, err := strconv.Unquote(`"` + str + `"`); err == nil {
					str = u
				}
			}
			s.path = append(s.path, str...)
		case isBare(c):
			start := s.pos
			for !s.eof() && isBare(s.peek()) {
				s.next()
			}
			s.path = append(s.path, s.src[start:s.pos]...)
		default:
			return false
		}
		s.space(false)
		if s.peek() != '.' {
			return true
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
// below the current path. An element of an array is recorded only when it
// starts on another line than its parent (line): the line of an
// unrecorded path is its parent's, so a long one-line list costs nothing.
func (s *scanner) value(line int) bool {
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
			if !s.keyValue() {
				return false
			}
			s.space(true)
			if s.peek() == ',' {
				s.next()
			}
		}
	case '[':
		s.next()
		mark := len(s.path)
		defer func() { s.path = s.path[:mark] }()
		for i := 0; ; i++ {
			s.space(true)
			if s.peek() == ']' {
				s.next()
				return true
			}
			s.path = append(s.path[:mark], '[')
			s.path = strconv.AppendInt(s.path, int64(i), 10)
			s.path = append(s.path, ']')
			elemLine := line
			if s.line != line {
				elemLine = s.line
				s.record(elemLine)
			}
			if !s.value(elemLine) {
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
