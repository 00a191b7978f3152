package study

import (
	"testing"

	"github.com/BurntSushi/toml"
)

// What TOMLString writes, read back by a TOML parser, is the text it was
// given: quotes, backslashes, control characters, DEL and non-ASCII.
func TestTOMLString(t *testing.T) {
	for _, s := range []string{"", "Bay 7", `Bay 7 "A" column`, `C:\studies\x`, "tab\tnew\nline\r", "bell\x07 del\x7f", "Stütze 3 – Ø 114"} {
		var v struct{ T string }
		if _, err := toml.Decode(`t = "`+TOMLString(s)+`"`, &v); err != nil || v.T != s {
			t.Errorf("%q: read back %q, %v", s, v.T, err)
		}
	}
}
