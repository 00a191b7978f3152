package study

import (
	"strings"
	"testing"
)

// TestFixedEndsWarn: member.ends with a fixed end takes the elastic
// eigenvalue of K (0.5, 0.699, 2: Timoshenko & Gere, Theory of Elastic
// Stability, ch. 2), which design practice raises because no connection is
// fully fixed (0.65, 0.80, 2.1: the recommended design values of the
// commentary to AISC 360, Table C-A-7.1, from memory). The study says so,
// naming the key and its line; pinned ends, an explicit k and springs
// say nothing.
func TestFixedEndsWarn(t *testing.T) {
	for _, c := range []struct {
		ends string
		want string // "" for no warning
	}{
		{`ends = "fixed-fixed"`, "member.ends (line 3): fixed-fixed takes K = 0.5, the theoretical value"},
		{`ends = "pinned-fixed"`, "member.ends (line 3): fixed-pinned takes K = 0.699, the theoretical value"},
		{`ends = "fixed-free"`, "member.ends (line 3): fixed-free takes K = 2, the theoretical value"},
		{`ends = "pinned-pinned"`, ""},
		{`k = 0.65`, ""},
		{"spring_top = \"rigid\"\nspring_bottom = \"rigid\"", ""},
	} {
		text := "[member]\nlength = 3000\n" + c.ends + `
[member.section]
shape = "rect"
depth = 100
width = 100
[material]
modulus = 210000
yield = 355
[loads]
dead = "100 kN"
[capacity]
model = "curve"
`
		st := parse(t, text)
		var got string
		for _, w := range st.Warnings {
			if strings.HasPrefix(w, "member.ends") {
				got = w
			}
		}
		switch {
		case c.want == "" && got != "":
			t.Errorf("%s: warning %q", c.ends, got)
		case c.want != "" && !strings.HasPrefix(got, c.want):
			t.Errorf("%s: warning %q, want it to start %q", c.ends, got, c.want)
		case c.want != "" && !strings.Contains(got, "design practice takes K = "):
			t.Errorf("%s: warning %q does not give the design value", c.ends, got)
		}
	}
}
