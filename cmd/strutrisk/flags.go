package main

import (
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"strings"
)

// parseArgs parses flags that may stand before or after the positional
// arguments. It returns the positional arguments; help reports --help.
func parseArgs(fs *flag.FlagSet, args []string) (pos []string, help bool, err error) {
	fs.SetOutput(io.Discard)
	for {
		if err := fs.Parse(args); err != nil {
			if errors.Is(err, flag.ErrHelp) {
				return nil, true, nil
			}
			return nil, false, err
		}
		rest := fs.Args()
		if len(rest) == 0 {
			return pos, false, nil
		}
		if rest[0] == "--" {
			return append(pos, rest[1:]...), false, nil
		}
		pos = append(pos, rest[0])
		args = rest[1:]
	}
}

// flagHelp lists the flags of fs for a help text.
func flagHelp(fs *flag.FlagSet) string {
	var b strings.Builder
	fs.VisitAll(func(f *flag.Flag) {
		name, use := flag.UnquoteUsage(f)
		fmt.Fprintf(&b, "  --%s", f.Name)
		if name != "" {
			fmt.Fprintf(&b, " %s", name)
		}
		fmt.Fprintf(&b, "\n      %s\n", use)
	})
	return b.String()
}

// outputFlags adds to fs the flags run and merge share: --out, --json
// and --require-target.
func outputFlags(fs *flag.FlagSet, o *runOptions) {
	fs.StringVar(&o.out, "out", "", "write results into `DIR`, replacing it as a whole (default: [output] dir, else out/<study file name>)")
	fs.BoolVar(&o.json, "json", false, "print the result document as JSON on standard output, nothing else there")
	fs.BoolVar(&o.requireTarget, "require-target", false, "exit with status 1 when the target reliability index is not met")
}

// printJSON prints v as indented JSON on stdout; a value that cannot be
// encoded is an internal failure.
func printJSON(v any, stdout, stderr io.Writer) int {
	out, err := json.MarshalIndent(v, "", "  ")
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInternal
	}
	stdout.Write(append(out, '\n'))
	return exitOK
}
