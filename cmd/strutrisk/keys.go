package main

import (
	"fmt"
	"io"

	"strutrisk/internal/study"
)

// helpCmd is `strutrisk help TOPIC`: keys, or a command's help.
func helpCmd(args []string, stdout, stderr io.Writer) int {
	switch args[0] {
	case "keys":
		return keysCmd(args[1:], stdout, stderr)
	case "run", "check", "new":
		return run([]string{args[0], "--help"}, stdout, stderr)
	}
	fmt.Fprintf(stderr, "strutrisk help: no help on %q: try strutrisk help keys, or strutrisk run --help\n", args[0])
	return exitInput
}

// keysCmd prints every table and key of a study file.
func keysCmd(args []string, stdout, stderr io.Writer) int {
	if len(args) > 0 {
		fmt.Fprintf(stderr, "strutrisk help keys: takes no arguments (got %q)\n", args[0])
		return exitInput
	}
	if err := study.WriteKeyHelp(stdout); err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInternal
	}
	return exitOK
}
