package cli

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"strings"
)

// ParseArgs parses flags that may stand before or after the positional
// arguments; "--" ends the flags. It returns the positional arguments;
// help reports -h or --help (then pos and err are nil). fs prints
// nothing: the caller words the error.
func ParseArgs(fs *flag.FlagSet, args []string) (pos []string, help bool, err error) {
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

// FlagHelp lists the flags of fs for a help text: "  --name ARG" and
// the usage indented below it, in the order of their names.
func FlagHelp(fs *flag.FlagSet) string {
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

// Set are the names of the flags of fs given on the command line.
func Set(fs *flag.FlagSet) map[string]bool {
	set := map[string]bool{}
	fs.Visit(func(f *flag.Flag) { set[f.Name] = true })
	return set
}
