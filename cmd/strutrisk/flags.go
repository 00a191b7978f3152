package main

import (
	"flag"
	"fmt"
	"io"

	"strutrisk/internal/cli"
	"strutrisk/internal/report"
)

// helpText is a command's help: head, its flags and the caution.
func helpText(head string, fs *flag.FlagSet) string {
	return head + cli.FlagHelp(fs) + "\n" + report.CautionText + "\n"
}

// outputFlags adds to fs the flags run and merge share: --out, --json
// and --require-target.
func outputFlags(fs *flag.FlagSet, o *runOptions) {
	fs.StringVar(&o.out, "out", "", "write results into `DIR`, replacing it as a whole (default: [output] dir, else out/<study file name>)")
	fs.BoolVar(&o.json, "json", false, "print the result document as JSON on standard output, nothing else there")
	fs.BoolVar(&o.requireTarget, "require-target", false, "exit with status 1 when the target reliability index is not met")
}

// printJSON prints the document d on stdout as results.json holds it
// (report.DocumentJSON); a document that cannot be encoded is an
// internal failure.
func printJSON(d *report.Document, stdout, stderr io.Writer) int {
	out, err := report.DocumentJSON(d)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInternal
	}
	stdout.Write(out)
	return exitOK
}
