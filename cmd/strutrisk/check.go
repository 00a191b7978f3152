package main

import (
	"flag"
	"fmt"
	"io"

	"strutrisk/internal/cli"
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
	l.WarnOutputDir(pos[0])
	if *asJSON {
		return printJSON(l.CheckDocument(), stdout, stderr)
	}
	fmt.Fprint(stdout, l.CheckText())
	return exitOK
}
