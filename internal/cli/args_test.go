package cli

import (
	"flag"
	"slices"
	"strings"
	"testing"
)

// TestParseArgs: flags stand before, between or after the positional
// arguments; "--" ends them; -h and --help ask for help.
func TestParseArgs(t *testing.T) {
	for _, c := range []struct {
		args []string
		pos  []string
		n    int
		json bool
		help bool
		err  string
	}{
		{args: []string{"a.toml"}, pos: []string{"a.toml"}},
		{args: []string{"--n", "3", "a.toml", "--json"}, pos: []string{"a.toml"}, n: 3, json: true},
		{args: []string{"a.toml", "--n=4", "b", "-json"}, pos: []string{"a.toml", "b"}, n: 4, json: true},
		{args: []string{"a.toml", "--", "--n", "5"}, pos: []string{"a.toml", "--n", "5"}},
		{args: []string{"a.toml", "-h"}, help: true},
		{args: []string{"--help", "a.toml"}, help: true},
		{args: []string{"a.toml", "--bogus"}, err: "flag provided but not defined: -bogus"},
		{args: []string{"--n", "x"}, err: "invalid value"},
	} {
		fs := flag.NewFlagSet("t", flag.ContinueOnError)
		n := fs.Int("n", 0, "a number")
		j := fs.Bool("json", false, "JSON")
		pos, help, err := ParseArgs(fs, c.args)
		if c.err != "" {
			if err == nil || !strings.Contains(err.Error(), c.err) {
				t.Errorf("%q: error %v, want one saying %q", c.args, err, c.err)
			}
			continue
		}
		if err != nil || help != c.help || !slices.Equal(pos, c.pos) || *n != c.n || *j != c.json {
			t.Errorf("%q: pos %q, help %v, n %d, json %v, err %v; want %q, %v, %d, %v", c.args, pos, help, *n, *j, err, c.pos, c.help, c.n, c.json)
		}
	}
}

// TestFlagHelp: each flag on its line with its argument's name taken
// from the back-quoted word of its usage, the usage indented below; and
// Set names only the flags given.
func TestFlagHelp(t *testing.T) {
	fs := flag.NewFlagSet("t", flag.ContinueOnError)
	fs.String("out", "", "write into `DIR`")
	fs.Bool("json", false, "print JSON")
	want := "  --json\n      print JSON\n  --out DIR\n      write into DIR\n"
	if got := FlagHelp(fs); got != want {
		t.Errorf("FlagHelp:\n%q\nwant\n%q", got, want)
	}
	if _, _, err := ParseArgs(fs, []string{"x", "--json"}); err != nil {
		t.Fatal(err)
	}
	if set := Set(fs); !set["json"] || set["out"] || len(set) != 1 {
		t.Errorf("Set %v, want only json", set)
	}
}
