package analysis

import (
	"errors"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
)

// TestLoadFailure: a study's problems are told one a line with the
// count, in the singular for one, beyond the 50 listed the number left
// out; another error is told with the file's name.
func TestLoadFailure(t *testing.T) {
	many := fixture.Good + "[analysis]\n"
	for i := range 60 {
		many += "bogus" + string(rune('a'+i%26)) + string(rune('a'+i/26)) + " = 1\n"
	}
	missing := filepath.Join(t.TempDir(), "gone.toml")
	for _, c := range []struct {
		name, path string
		want       []string // the lines, "..." for any number between
	}{
		{"one problem", writeStudy(t, strings.Replace(fixture.Good, "length = 2000", "length = \"2 kN\"", 1)), []string{
			"%s:3: member.length: \"2 kN\" is a force but this key takes a length (units mm cm m in ft)", "1 problem in %s; nothing was run"}},
		{"two problems", writeStudy(t, strings.Replace(fixture.Good, "length = 2000", "length = -1\nlenght = 3", 1)), []string{
			"%s:3: member.length: a length must be positive (got -1 mm)", "%s:4: member.lenght: unknown key in [member]; did you mean member.length?", "2 problems in %s; nothing was run"}},
		{"beyond the listed", writeStudy(t, many), []string{"...", "10 more problems not listed (fix the first 50 first)", "60 problems in %s; nothing was run"}},
		{"no file", missing, []string{"%s: no such file (give the path of a study; `strutrisk new` prints a starter)", "1 problem in %s; nothing was run"}},
		{"section not built", writeStudy(t, strings.Replace(fixture.Good, "shape = \"rect\"", "shape = \"RHS\"\nthickness = 5\nradius = 30", 1)), []string{
			"%s:5: member.section: section: corner radius 30 mm must be zero or positive and at most half the smaller side (depth 100 mm, width 50 mm)", "1 problem in %s; nothing was run"}},
	} {
		err := loadErr(t, c.path)
		got := LoadFailure(c.path, err)
		want := slices.Clone(c.want)
		for i, w := range want {
			want[i] = strings.ReplaceAll(w, "%s", c.path)
		}
		if want[0] == "..." {
			got = got[len(got)-len(want)+1:]
			want = want[1:]
		}
		if !slices.Equal(got, want) {
			t.Errorf("%s:\n%q\nwant\n%q", c.name, got, want)
		}
	}
	// An error other than the file's problems (a nominal member that
	// cannot be built) is told with the file's name.
	if got := LoadFailure("s.toml", errors.New("member.section: no")); !slices.Equal(got, []string{"s.toml: member.section: no"}) {
		t.Errorf("another error: %q", got)
	}
}

// loadErr is the error of Load of the study at path, which must fail.
func loadErr(t *testing.T, path string) error {
	t.Helper()
	_, err := Load(path)
	if err == nil {
		t.Fatalf("%s loaded", path)
	}
	return err
}
