package main

import (
	"flag"
	"fmt"
	"io"
	"strutrisk/internal/report"

	"strutrisk/internal/outdir"
)

const checkHelp = `Usage: strutrisk check STUDY.toml [--json]

Validates a study file and prints the deterministic picture at nominal
values, without sampling: section properties per axis, slenderness and
relative slenderness, Euler load, the K used, the capacity and which axis
and limit govern it, the utilisation under the mean loads, and the code
check beside beta (EN 1993-1-1 6.3.1 at characteristic values, the EN 1990
6.10 design load, partial factors of [code_check]: recommended values by
default, the National Annex may differ). A study with an [inventory] adds
the check of every member (slenderness, governing axis, design load and
resistance, utilisation, the code's verdict; --json: inventory_check).
Every
problem in the file is listed with its line; the exit status is then 2.

Flags:
`

func checkCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("check", flag.ContinueOnError)
	asJSON := fs.Bool("json", false, "print the result document (without sampling fields) as JSON on standard output")
	pos, help, err := parseArgs(fs, args)
	if help {
		fmt.Fprint(stdout, checkHelp+flagHelp(fs)+"\n"+report.CautionText+"\n")
		return exitOK
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk check: %v (strutrisk check --help)\n", err)
		return exitInput
	}
	if len(pos) != 1 {
		fmt.Fprintf(stderr, "strutrisk check: give one study file (strutrisk check --help)\n")
		return exitInput
	}
	l, code := load(pos[0], stderr)
	if code != exitOK {
		return code
	}
	if _, err := outdir.Resolve(outdir.Request{StudyFile: pos[0], Dir: l.Study.Output.Dir}); err != nil {
		// Not a problem of the study itself: --out can stand in for it.
		l.Study.Warnings = append(l.Study.Warnings, fmt.Sprintf("output.dir (line %d): %v; `strutrisk run` refuses it unless --out is given", l.Study.Output.DirLine, err))
	}
	if *asJSON {
		return printJSON(l.CheckDocument(), stdout, stderr)
	}
	fmt.Fprint(stdout, l.CheckText())
	return exitOK
}
