// Command strutrisk runs reliability and sensitivity studies of columns:
// run samples a study (or a shard of it, joined by merge), check validates
// it and prints the deterministic picture at nominal values, new prints a
// starter study, help keys lists every key of a study file, model-factor
// estimates a model factor from tests. `strutrisk --help` prints the usage
// (internal/cli/help/usage.txt) and `strutrisk COMMAND --help` the flags.
//
// Exit status: 0 done (target met or not); 1 target not met with
// --require-target; 2 bad input; 3 an internal failure; 130 interrupted
// by SIGINT, 143 by SIGTERM (what finished is written, "complete": false).
//
// Results depend entirely on the inputs and models stated in the study.
// strutrisk supports, and never replaces, the judgement of a licensed
// engineer and the codes that apply where the structure stands.
package main

import (
	"fmt"
	"io"
	"os"
	"runtime/debug"

	"strutrisk/internal/analysis"
	"strutrisk/internal/cli"
	"strutrisk/internal/report"
)

// version is the tool version written into every result document.
const version = analysis.Version

// Exit statuses.
const (
	exitOK       = 0
	exitTarget   = 1
	exitInput    = 2
	exitInternal = 3
)

// usage is strutrisk's help, the caution last.
var usage = cli.Usage + report.CautionText + "\n"

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}

// run is the whole command: it reads args (without the program name),
// writes to stdout and stderr, and returns the exit status. A panic is an
// internal failure (status 3), not the runtime's status 2 of bad input.
func run(args []string, stdout, stderr io.Writer) (code int) {
	defer func() {
		if e := recover(); e != nil {
			fmt.Fprintf(stderr, "strutrisk: internal failure: %v\n%s", e, debug.Stack())
			code = exitInternal
		}
	}()
	if len(args) == 0 {
		fmt.Fprint(stderr, usage)
		return exitInput
	}
	switch args[0] {
	case "run":
		return runCmd(args[1:], stdout, stderr)
	case "merge":
		return mergeCmd(args[1:], stdout, stderr)
	case "check":
		return checkCmd(args[1:], stdout, stderr)
	case "new":
		return newCmd(args[1:], stdout, stderr)
	case "model-factor":
		return modelFactorCmd(args[1:], stdout, stderr)
	case "keys":
		return keysCmd(args[1:], stdout, stderr)
	case "help", "-h", "-help", "--help":
		if len(args) > 1 {
			return helpCmd(args[1:], stdout, stderr)
		}
		fmt.Fprint(stdout, usage)
		return exitOK
	case "version", "--version":
		fmt.Fprintln(stdout, "strutrisk", version)
		return exitOK
	}
	fmt.Fprintf(stderr, "strutrisk: unknown command %q: use run, merge, check, new, model-factor or help keys (strutrisk --help)\n", args[0])
	return exitInput
}
