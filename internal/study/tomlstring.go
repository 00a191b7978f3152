package study

import (
	"fmt"
	"strings"
)

// TOMLString escapes s for the inside of a TOML basic string ("..."):
// quotes and backslashes escaped, control characters as \uXXXX.
func TOMLString(s string) string {
	var b strings.Builder
	for _, r := range s {
		switch {
		case r == '"' || r == '\\':
			b.WriteByte('\\')
			b.WriteRune(r)
		case r < 0x20 || r == 0x7f:
			fmt.Fprintf(&b, "\\u%04X", r)
		default:
			b.WriteRune(r)
		}
	}
	return b.String()
}
