package main

import (
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
