package main

import (
	_ "embed"
	"flag"
	"fmt"
	"io"
	"strings"

	"strutrisk/internal/cli"
	"strutrisk/internal/report"
	"strutrisk/internal/study"
)

//go:embed starter.toml
var starter string

func newCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("new", flag.ContinueOnError)
	pos, help, err := cli.ParseArgs(fs, args)
	if help {
		fmt.Fprint(stdout, cli.NewHelp+"\n"+report.CautionText+"\n")
		return exitOK
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk new: %v (strutrisk new --help)\n", err)
		return exitInput
	}
	if len(pos) > 1 {
		fmt.Fprintf(stderr, "strutrisk new: give at most one name (quote a name with spaces)\n")
		return exitInput
	}
	title := "A new column study"
	if len(pos) == 1 {
		title = pos[0]
	}
	fmt.Fprint(stdout, strings.Replace(starter, "{{TITLE}}", study.TOMLString(title), 1))
	return exitOK
}
