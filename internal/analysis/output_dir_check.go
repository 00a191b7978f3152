package analysis

import (
	"fmt"

	"strutrisk/internal/outdir"
)

// WarnOutputDir adds a warning to the study of l, read from path as
// given, when its [output] dir is one `strutrisk run` refuses. It is not
// a problem of the study itself: --out can stand in for it.
func (l *Loaded) WarnOutputDir(path string) {
	st := l.Study
	if _, err := outdir.Resolve(outdir.Request{StudyFile: path, Dir: st.Output.Dir}); err != nil {
		st.Warnings = append(st.Warnings, fmt.Sprintf("output.dir (line %d): %v; `strutrisk run` refuses it unless --out is given", st.Output.DirLine, err))
	}
}
