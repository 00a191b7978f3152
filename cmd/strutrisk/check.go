package main

import (
	"flag"
	"fmt"
	"io"

	"strutrisk/internal/cli"
	"strutrisk/internal/outdir"
)

func checkCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("check", flag.ContinueOnError)
	asJSON := fs.Bool("json", false, "print the result document (without sampling fields) as JSON on standard output")
	pos, help, err := cli.ParseArgs(fs, args)
	if help {
		fmt.Fprint(stdout, helpText(cli.CheckHelp, fs))
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
