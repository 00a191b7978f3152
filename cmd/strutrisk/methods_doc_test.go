package main

import (
	"os"
	"regexp"
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestMethodListsFollowSim checks that every place a user reads the list
// of methods (run --help, the starter study, the contributor guide's key
// table) lists sim.Methods in its order: the guide and the starter are
// text, so this test is what keeps them in step with the one list.
func TestMethodListsFollowSim(t *testing.T) {
	want := sim.MethodNames()
	_, help, _ := invoke(t, "run", "--help")
	helpLine := lineWith(t, "run --help", help, "estimator")
	guide, err := os.ReadFile("../../DEVELOPERS.md")
	if err != nil {
		t.Fatal(err)
	}
	cases := []struct {
		where, line string
	}{
		{"run --help", helpLine},
		{"starter.toml", afterHash(lineWith(t, "starter.toml", starter, "method "))},
		{"DEVELOPERS.md", lineWith(t, "DEVELOPERS.md", string(guide), "| `[analysis]` |")},
	}
	for _, c := range cases {
		var got []string
		for _, w := range regexp.MustCompile(`[a-z]+(-[a-z]+)*`).FindAllString(c.line, -1) {
			if _, err := sim.ParseMethod(w); err == nil {
				got = append(got, w)
			}
		}
		if strings.Join(got, " ") != strings.Join(want, " ") {
			t.Errorf("%s lists the methods %v, want sim.Methods %v:\n%s", c.where, got, want, c.line)
		}
	}
	_, _, errs := invoke(t, "run", "x.toml", "--method", "mc")
	for _, m := range want {
		if !strings.Contains(errs, m) {
			t.Errorf("an unknown --method: the message does not name %q: %s", m, errs)
		}
	}
}

// lineWith returns the first line of text that contains s.
func lineWith(t *testing.T, where, text, s string) string {
	t.Helper()
	for _, l := range strings.Split(text, "\n") {
		if strings.Contains(l, s) {
			return l
		}
	}
	t.Fatalf("%s has no line with %q", where, s)
	return ""
}

// afterHash returns the comment of a TOML line.
func afterHash(l string) string {
	_, c, _ := strings.Cut(l, "#")
	return c
}
