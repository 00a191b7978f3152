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

// TestRigidSpringsWarn: an end spring written "rigid" is a fixed end as
// well (K = 0.5 with both ends rigid, Timoshenko & Gere ch. 2), warned of
// once per key with its line; a finite stiffness is not.
func TestRigidSpringsWarn(t *testing.T) {
	for _, c := range []struct {
		springs string
		want    []string
	}{
		{"spring_top = \"rigid\"\nspring_bottom = \"rigid\"", []string{"member.spring_top (line 3): \"rigid\"", "member.spring_bottom (line 4): \"rigid\""}},
		{"spring_top = \"rigid\"\nspring_bottom = { major = \"rigid\", minor = 0 }", []string{"member.spring_top (line 3)", "member.spring_bottom.major (line 4)"}},
		{"spring_top = 5e9\nspring_bottom = 0", nil},
	} {
		text := "[member]\nlength = 3000\n" + c.springs + `
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
		var got []string
		for _, w := range parse(t, text).Warnings {
			if strings.HasPrefix(w, "member.spring") {
				got = append(got, w)
			}
		}
		if len(got) != len(c.want) {
			t.Errorf("%s: warnings %q, want %d", c.springs, got, len(c.want))
			continue
		}
		for i, w := range c.want {
			if !strings.HasPrefix(got[i], w) || !strings.Contains(got[i], "cannot rotate at all") {
				t.Errorf("%s: warning %q, want it to start %q", c.springs, got[i], w)
			}
		}
	}
}
