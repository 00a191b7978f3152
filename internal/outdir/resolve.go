package outdir

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"unicode"
)

// Request says where a run's output was asked to go.
type Request struct {
	// StudyFile is the study's path as given on the command line.
	StudyFile string
	// Dir is the study's [output] dir as written ("" when absent).
	Dir string
	// Flag is the --out flag ("" when absent); it wins over Dir.
	Flag string
}

// ErrDir is a problem with the study's [output] dir: the caller reports
// it at the key's line.
type ErrDir struct{ Msg string }

func (e *ErrDir) Error() string { return e.Msg }

// Resolve returns the output folder of a run. --out is used as given;
// [output] dir is taken relative to the study file's folder and must be a
// sub-folder of it (an *ErrDir otherwise); the default is
// out/<SafeName(study file)> relative to the working folder.
func Resolve(r Request) (string, error) {
	switch {
	case r.Flag != "":
		return filepath.Clean(r.Flag), nil
	case r.Dir != "":
		d := filepath.FromSlash(r.Dir)
		if filepath.IsAbs(d) || filepath.VolumeName(d) != "" {
			return "", &ErrDir{fmt.Sprintf("%q is an absolute path: [output] dir is a folder inside the study's folder (e.g. \"out/bay3\"); to write elsewhere give --out", r.Dir)}
		}
		if !filepath.IsLocal(d) {
			return "", &ErrDir{fmt.Sprintf("%q leaves the study's folder: [output] dir is a folder inside it (e.g. \"out/bay3\"); to write elsewhere give --out", r.Dir)}
		}
		if filepath.Clean(d) == "." {
			return "", &ErrDir{fmt.Sprintf("%q is the study's own folder: strutrisk replaces its output folder as a whole, so name a sub-folder (e.g. \"out/bay3\") or give --out", r.Dir)}
		}
		p := filepath.Join(filepath.Dir(r.StudyFile), d)
		if !insideAfterLinks(filepath.Dir(r.StudyFile), p) {
			return "", &ErrDir{fmt.Sprintf("%q leaves the study's folder through a symbolic link: [output] dir is a folder inside it; to write elsewhere give --out", r.Dir)}
		}
		return p, nil
	}
	return filepath.Join("out", SafeName(r.StudyFile)), nil
}

// insideAfterLinks says whether the path p, lexically inside the folder
// base, stays inside it once the symbolic links of its existing part are
// followed. Where the file system cannot tell, it says yes: the lexical
// check stands.
func insideAfterLinks(base, p string) bool {
	rb, err := filepath.EvalSymlinks(base)
	if err != nil {
		return true
	}
	q := p
	for {
		if _, err := os.Lstat(q); err == nil {
			break
		}
		up := filepath.Dir(q)
		if up == q {
			return true
		}
		q = up
	}
	rq, err := filepath.EvalSymlinks(q)
	if err != nil {
		return true
	}
	rel, err := filepath.Rel(rb, rq)
	return err == nil && (rel == "." || filepath.IsLocal(rel))
}

// maxName bounds the length of a default folder name, in bytes.
const maxName = 80

// SafeName is the name of the default output folder for the study file
// path: its base name without the extension, with every character that is
// not a letter, a digit, '.', '_' or '-' replaced by '-', leading dots and
// dashes removed (no hidden folder, no "." or "..", no option-like name),
// at most 80 bytes; "study" when nothing is left.
func SafeName(path string) string {
	base := filepath.Base(filepath.FromSlash(path))
	base = strings.TrimSuffix(base, filepath.Ext(base))
	var b strings.Builder
	for _, c := range base {
		switch {
		case unicode.IsLetter(c) || unicode.IsDigit(c) || c == '.' || c == '_' || c == '-':
			if b.Len()+len(string(c)) > maxName {
				return finish(b.String())
			}
			b.WriteRune(c)
		default:
			if b.Len()+1 > maxName {
				return finish(b.String())
			}
			b.WriteByte('-')
		}
	}
	return finish(b.String())
}

func finish(s string) string {
	s = strings.TrimLeft(s, ".-")
	s = strings.TrimRight(s, ".")
	if s == "" {
		return "study"
	}
	return s
}
