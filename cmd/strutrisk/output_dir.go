package main

import (
	"errors"
	"fmt"
	"io"

	"strutrisk/internal/outdir"
	"strutrisk/internal/study"
)

// prepareOutput finds the output folder of a run of st (path is the study
// file as given) and checks and locks it before any work (package outdir
// has the rules). A non-zero status means stop: the folder is refused.
func prepareOutput(path string, st *study.Study, flag string, stderr io.Writer) (*outdir.Folder, int) {
	dir, err := outdir.Resolve(outdir.Request{StudyFile: path, Dir: st.Output.Dir, Flag: flag})
	if err != nil {
		var de *outdir.ErrDir
		if errors.As(err, &de) {
			p := study.Problem{File: st.File, Line: st.Output.DirLine, Key: "output.dir", Msg: de.Msg}
			fmt.Fprintf(stderr, "strutrisk: %s\n", p)
			return nil, exitInput
		}
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return nil, exitInput
	}
	f, err := outdir.Prepare(dir)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v; nothing was run\n", err)
		return nil, exitInput
	}
	return f, exitOK
}
