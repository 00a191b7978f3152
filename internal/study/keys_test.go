package study

import (
	"bytes"
	"sort"
	"strings"
	"testing"
)

// TestRegistryMatchesParserTables checks that the lists the parser keeps
// beside the registry (end names, section dimensions, measured
// quantities, distributions) agree with it, so the help never lists a
// key or choice the parser refuses, nor misses one it takes.
func TestRegistryMatchesParserTables(t *testing.T) {
	ends := sortedKeys(endNames)
	got := append([]string(nil), choicesOf("member", "ends")...)
	sort.Strings(got)
	if strings.Join(got, " ") != strings.Join(ends, " ") {
		t.Errorf("member.ends choices %v, parser accepts %v", got, ends)
	}
	for _, mt := range measureTargets {
		if !registered("measurements", mt.key) {
			t.Errorf("measurements.%s is not in the registry", mt.key)
		}
	}
	for _, tab := range keyTables {
		for _, k := range tab.Keys {
			if k.Required && k.Default != "" {
				t.Errorf("%s.%s is required and has a default", tab.Path, k.Name)
			}
			if k.Meaning == "" || k.Takes == "" {
				t.Errorf("%s.%s lacks its meaning or what it takes", tab.Path, k.Name)
			}
		}
	}
}

// TestRegistryDrivesUnknownKeys: a key the registry lists is accepted and
// a near miss is answered with the registry's name.
func TestRegistryDrivesUnknownKeys(t *testing.T) {
	for _, c := range []struct{ edit, want string }{
		{"[analysis]\nmethd = \"form\"\n", "did you mean analysis.method?"},
		{"[sensitivity]\ntornadoo = false\n", "did you mean sensitivity.tornado?"},
		{"[output]\nformat = [\"json\"]\n", "did you mean output.formats?"},
		{"[analysis]\nmethod = \"conditional-qmc\"\n", ""},
		{"[sweep]\nparameter = \"member.length\"\nfrom = 1000\nto = 2000\nsteps = 3\nscale = \"log\"\n", ""},
	} {
		_, err := Parse("s.toml", []byte(base+c.edit))
		switch {
		case c.want == "" && err != nil:
			t.Errorf("%q: %v", c.edit, err)
		case c.want != "" && (err == nil || !strings.Contains(err.Error(), c.want)):
			t.Errorf("%q: error %v, want %q", c.edit, err, c.want)
		}
	}
}

// TestKeyHelpListsRegistry: the help names every table and key of the
// registry, with the choices of text keys.
func TestKeyHelpListsRegistry(t *testing.T) {
	var b bytes.Buffer
	if err := WriteKeyHelp(&b); err != nil {
		t.Fatal(err)
	}
	out := b.String()
	for _, tab := range KeyTables() {
		if !strings.Contains(out, tableHeading(&tab)) {
			t.Errorf("help lacks table %q", tab.Path)
		}
		for _, k := range tab.Keys {
			if !strings.Contains(out, "  "+k.Name+" ") {
				t.Errorf("help lacks key %s.%s", tab.Path, k.Name)
			}
			if len(k.Choices) > 0 && !strings.Contains(out, strings.Join(k.Choices, " | ")) {
				t.Errorf("help lacks the choices of %s.%s", tab.Path, k.Name)
			}
		}
	}
	for _, want := range []string{"[member.section]", "[[variant]]", "conditional-qmc", "kN*m/rad", "default 1000000"} {
		if !strings.Contains(out, want) {
			t.Errorf("help lacks %q", want)
		}
	}
}
