package analysis

import (
	"errors"
	"fmt"

	"strutrisk/internal/outdir"
	"strutrisk/internal/study"
)

// PrepareOutput finds the output folder of a run of the study of l (path
// is the study file as given, flag the --out given, "" none) and checks
// and locks it before any work (package outdir has the rules). The error
// says why the folder is refused; an [output] dir that cannot be one is a
// problem of the study, named with its key and line.
func (l *Loaded) PrepareOutput(path, flag string) (*outdir.Folder, error) {
	st := l.Study
	dir, err := outdir.Resolve(outdir.Request{StudyFile: path, Dir: st.Output.Dir, Flag: flag})
	var de *outdir.ErrDir
	if errors.As(err, &de) {
		p := study.Problem{File: st.File, Line: st.Output.DirLine, Key: "output.dir", Msg: de.Msg}
		return nil, errors.New(p.String())
	}
	if err != nil {
		return nil, err
	}
	f, err := outdir.Prepare(dir)
	if err != nil {
		return nil, fmt.Errorf("%v; nothing was run", err)
	}
	return f, nil
}

// WarnOutputDir adds a warning to the study of l, read from path as
// given, when its [output] dir is one `strutrisk run` refuses. It is not
// a problem of the study itself: --out can stand in for it.
func (l *Loaded) WarnOutputDir(path string) {
	st := l.Study
	if _, err := outdir.Resolve(outdir.Request{StudyFile: path, Dir: st.Output.Dir}); err != nil {
		st.Warnings = append(st.Warnings, fmt.Sprintf("output.dir (line %d): %v; `strutrisk run` refuses it unless --out is given", st.Output.DirLine, err))
	}
}
