package main

import (
	"strings"
	"testing"
)

// TestControlCharactersRefused: control and direction-changing characters
// in study text (title, names, load keys) are refused with the key and
// line, exit 2, and the message itself carries none of them (issue 10,
// item 12).
func TestControlCharactersRefused(t *testing.T) {
	for _, c := range []struct {
		name, study string
		want        string
	}{
		{"ESC in title", edit(1, `title = "strut \u001b[2J\u001b[31m red"`), "study.toml:1: title: the text contains the control character U+001B (ESC"},
		{"raw BEL in title", edit(1, "title = \"bell \a\""), "study.toml:1: title: not valid TOML: TOML files cannot contain control characters"},
		{"NUL in title", edit(1, `title = "a\u0000b"`), "study.toml:1: title: the text contains the control character U+0000 (NUL)"},
		{"RLO in title", edit(1, "title = \"safe \u202egnp.exe\""), "study.toml:1: title: the text contains the formatting character U+202E (a right-to-left override)"},
		{"line break in title", edit(1, `title = """two
lines"""`), "study.toml:1: title: the text contains the control character U+000A (a line break)"},
		{"load name", edit(16, "\"imposed\\u001b[0m\" = 80000"), `study.toml:16: loads: the key "imposed\x1b[0m" contains the control character U+001B`},
		{"variant name", good + "[[variant]]\nname = \"v\\u0007\"\nset = { \"imperfection.bow\" = 3 }\n", "study.toml:20: variant[0].name: the text contains the control character U+0007 (BEL)"},
		{"list entry", good + "reference_period = \"50\\u2067 years\"\n", "study.toml:19: target.reference_period: the text contains the formatting character U+2067"},
	} {
		code, _, errs := invoke(t, "check", writeStudy(t, c.study))
		if code != exitInput || !strings.Contains(errs, c.want) {
			t.Errorf("%s: exit %d, stderr %q; want exit 2 and %q", c.name, code, errs, c.want)
		}
		if r, bad := badRuneIn(errs); bad {
			t.Errorf("%s: the message carries U+%04X", c.name, r)
		}
	}
}

func badRuneIn(s string) (rune, bool) {
	for _, r := range s {
		if r < 0x20 && r != '\n' || r == 0x7f || r >= 0x80 && r < 0xa0 || r >= 0x202a && r <= 0x202e || r >= 0x2066 && r <= 0x2069 {
			return r, true
		}
	}
	return 0, false
}
