package study

import "fmt"

// nestingProblem reads data as TOML tokens, without building anything,
// and reports the first key path deeper than MaxDepth parts or longer
// than MaxKeyPath bytes (tables, dotted keys, inline tables and arrays
// all count), so that the TOML parser never sees such a file. It is
// lenient: what it cannot read is left to the TOML parser to report.
func nestingProblem(file string, data []byte) *Problem {
	n := nester{src: data, line: 1}
	n.stack = n.frames[:0]
	n.startKey()
	if n.scan() {
		return nil
	}
	return &Problem{File: file, Line: n.line, Msg: n.msg}
}

// frame is one open array or inline table; depth is the number of key
// path parts of its elements (arrays) or of the table itself, bytes the
// length of the key path.
type frame struct {
	table        bool
	depth, bytes int
}

type nester struct {
	src  []byte
	i    int
	line int
	msg  string

	frames [MaxDepth + 2]frame
	stack  []frame
	// base and baseBytes are the key path of the current [table] header.
	base, baseBytes int
	// key reports that a key is being read; parts and keyBytes count it.
	key             bool
	parts, keyBytes int
	// header reports that the key is a [table] header's.
	header bool
	// vdepth and vbytes are the key path of the value about to be read.
	vdepth, vbytes int
}

// scan walks the whole file; it returns false with msg set at the first
// path over a limit.
func (n *nester) scan() bool {
	for n.i < len(n.src) {
		c := n.src[n.i]
		switch {
		case c == '\n':
			n.line++
			n.i++
			if len(n.stack) == 0 {
				n.startKey()
				n.header = false
			}
		case c == ' ' || c == '\t' || c == '\r':
			n.i++
		case c == '#':
			for n.i < len(n.src) && n.src[n.i] != '\n' {
				n.i++
			}
		case c == '"' || c == '\'':
			start := n.i
			n.skipString()
			if n.key {
				n.keyBytes += n.i - start
			}
		case n.key:
			if !n.keyToken(c) {
				return false
			}
		default:
			if !n.valueToken(c) {
				return false
			}
		}
	}
	return true
}

func (n *nester) startKey() {
	n.key, n.parts, n.keyBytes = true, 1, 0
}

// keyToken reads one byte of a key (or of a [table] header).
func (n *nester) keyToken(c byte) bool {
	n.i++
	switch {
	case c == '[' && len(n.stack) == 0 && n.keyBytes == 0 && !n.header:
		n.header = true
		n.parts = 1
		if n.i < len(n.src) && n.src[n.i] == '[' {
			n.i++
		}
	case c == ']' && n.header:
		n.base, n.baseBytes = 0, 0
		if !n.check(n.parts, n.keyBytes+n.parts-1) {
			return false
		}
		n.base, n.baseBytes = n.parts, n.keyBytes+n.parts-1
		n.key = false // the rest of the line is "]" or a comment
		n.vdepth, n.vbytes = 0, 0
	case c == '.':
		n.parts++
	case c == '=' && !n.header:
		n.key = false
		outer, outerBytes := n.base, n.baseBytes
		if len(n.stack) > 0 {
			top := n.stack[len(n.stack)-1]
			outer, outerBytes = top.depth, top.bytes
		}
		n.vdepth, n.vbytes = outer+n.parts, outerBytes+n.keyBytes+n.parts-1
		if outerBytes > 0 {
			n.vbytes++ // the dot before the key
		}
		return n.check(n.vdepth, n.vbytes)
	case c == '}' || c == ']' || c == ',':
		// An empty inline table, or a syntax error left to the parser.
		n.key = false
		n.i--
	default:
		n.keyBytes++
	}
	return true
}

// valueToken reads one byte of a value: only brackets, braces and commas
// matter.
func (n *nester) valueToken(c byte) bool {
	n.i++
	switch c {
	case '[':
		if !n.push(frame{depth: n.vdepth + 1, bytes: n.vbytes}) {
			return false
		}
		n.vdepth = n.vdepth + 1
	case '{':
		if !n.push(frame{table: true, depth: n.vdepth, bytes: n.vbytes}) {
			return false
		}
		n.startKey()
	case ']', '}':
		if len(n.stack) > 0 {
			n.stack = n.stack[:len(n.stack)-1]
		}
		if len(n.stack) > 0 {
			n.vdepth, n.vbytes = n.stack[len(n.stack)-1].depth, n.stack[len(n.stack)-1].bytes
		}
	case ',':
		if len(n.stack) == 0 {
			return true
		}
		top := n.stack[len(n.stack)-1]
		if top.table {
			n.startKey()
		} else {
			n.vdepth, n.vbytes = top.depth, top.bytes
		}
	}
	return true
}

func (n *nester) push(f frame) bool {
	if len(n.stack) > MaxDepth || !n.check(f.depth, f.bytes) {
		if n.msg == "" {
			n.msg = fmt.Sprintf("nested deeper than %d levels (arrays, tables and dotted keys all count), the limit of a study file: a study is at most a few levels deep", MaxDepth)
		}
		return false
	}
	n.stack = append(n.stack, f)
	return true
}

// check sets msg when a key path of depth parts and size bytes is over a
// limit.
func (n *nester) check(depth, bytes int) bool {
	switch {
	case depth > MaxDepth:
		n.msg = fmt.Sprintf("nested deeper than %d levels (arrays, tables and dotted keys all count), the limit of a study file: a study is at most a few levels deep", MaxDepth)
	case bytes > MaxKeyPath:
		n.msg = fmt.Sprintf("a key path longer than %d characters (tables and dotted keys included), the limit of a study file: use shorter names", MaxKeyPath)
	default:
		return true
	}
	return false
}

// skipString moves past a basic or literal string, single or multi-line,
// counting the lines it spans. A single-line string ends at the end of
// its line even when unterminated (the parser reports it).
func (n *nester) skipString() {
	q := n.src[n.i]
	multi := n.i+2 < len(n.src) && n.src[n.i+1] == q && n.src[n.i+2] == q
	if multi {
		n.i += 3
	} else {
		n.i++
	}
	for n.i < len(n.src) {
		c := n.src[n.i]
		switch {
		case c == '\\' && q == '"':
			n.i++
			if n.i < len(n.src) && n.src[n.i] == '\n' {
				n.line++
			}
			n.i++
			continue
		case c == '\n':
			if !multi {
				return
			}
			n.line++
		case c == q && !multi:
			n.i++
			return
		case c == q && n.i+2 < len(n.src) && n.src[n.i+1] == q && n.src[n.i+2] == q:
			n.i += 3
			for n.i < len(n.src) && n.src[n.i] == q { // up to two quotes end the content
				n.i++
			}
			return
		}
		n.i++
	}
}
