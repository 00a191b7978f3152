package outdir

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestSafeName(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"bay3.toml", "bay3"},
		{"studies/retrofit-column.toml", "retrofit-column"},
		{"...toml", "study"}, // would be ".." : the parent folder
		{".toml", "study"},   // would be "": out/ itself
		{"..toml", "study"},  // would be "."
		{"a/.hidden.toml", "hidden"},
		{"-rf.toml", "rf"}, // not option-like
		{"My Study (v2).toml", "My-Study--v2-"},
		{"Säule 3.toml", "Säule-3"},
		{"x\x1b[31m.toml", "x--31m"},
		{"no-extension", "no-extension"},
		{strings.Repeat("a", 200) + ".toml", strings.Repeat("a", 80)},
	} {
		if got := SafeName(c.in); got != c.want {
			t.Errorf("SafeName(%q) = %q, want %q", c.in, got, c.want)
		}
	}
}

func TestResolve(t *testing.T) {
	study := filepath.Join("projects", "bay3", "study.toml")
	for _, c := range []struct {
		name      string
		r         Request
		want, bad string // bad: a word of the error
	}{
		{"default", Request{StudyFile: study}, filepath.Join("out", "study"), ""},
		{"default of a dotted name", Request{StudyFile: "...toml"}, filepath.Join("out", "study"), ""},
		{"dir beside the study", Request{StudyFile: study, Dir: "out/bay3"}, filepath.Join("projects", "bay3", "out", "bay3"), ""},
		{"dir with a harmless ..", Request{StudyFile: study, Dir: "a/../b"}, filepath.Join("projects", "bay3", "b"), ""},
		{"flag wins", Request{StudyFile: study, Dir: "../../x", Flag: "../elsewhere/"}, filepath.Join("..", "elsewhere"), ""},
		{"dir escapes", Request{StudyFile: study, Dir: "../../x"}, "", "leaves the study's folder"},
		{"dir escapes after a detour", Request{StudyFile: study, Dir: "a/../../x"}, "", "leaves the study's folder"},
		{"absolute dir", Request{StudyFile: study, Dir: "/tmp/x"}, "", "absolute"},
		{"the study's folder", Request{StudyFile: study, Dir: "./"}, "", "study's own folder"},
	} {
		t.Run(c.name, func(t *testing.T) {
			got, err := Resolve(c.r)
			if c.bad == "" {
				if err != nil || got != c.want {
					t.Errorf("Resolve = %q, %v; want %q", got, err, c.want)
				}
				return
			}
			var de *ErrDir
			if !errors.As(err, &de) || !strings.Contains(err.Error(), c.bad) || !strings.Contains(err.Error(), "--out") {
				t.Errorf("Resolve = %q, %v; want an *ErrDir saying %q and naming --out", got, err, c.bad)
			}
		})
	}
}

// TestResolveLink: a dir that leaves the study's folder through a
// symbolic link inside it is refused like "../x".
func TestResolveLink(t *testing.T) {
	studies, elsewhere := t.TempDir(), t.TempDir()
	if err := os.Symlink(elsewhere, filepath.Join(studies, "link")); err != nil {
		t.Skipf("no symbolic links here: %v", err)
	}
	os.Mkdir(filepath.Join(studies, "real"), 0o755)
	study := filepath.Join(studies, "s.toml")
	for _, c := range []struct {
		dir string
		ok  bool
	}{
		{"link/x", false},
		{"link", false},
		{"real/x", true},
		{"new/deeper", true},
	} {
		_, err := Resolve(Request{StudyFile: study, Dir: c.dir})
		if c.ok != (err == nil) || (err != nil && !strings.Contains(err.Error(), "symbolic link")) {
			t.Errorf("dir %q: %v", c.dir, err)
		}
	}
}
