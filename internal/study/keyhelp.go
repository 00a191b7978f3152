package study

import (
	"fmt"
	"io"
	"strings"
)

// WriteKeyHelp writes every table and key of a study file with what it
// takes, its default and its meaning, from the registry the parser checks
// names and choices against, followed by the units each dimension
// accepts.
func WriteKeyHelp(w io.Writer) error {
	var b strings.Builder
	b.WriteString("Study-file keys. A quantity is a bare number in the study's units, a string\n" +
		"with a unit (\"5.2 m\", \"205 GPa\") or a distribution table { dist = ... };\n" +
		"dist is one of " + strings.Join(distNames, ", ") + ".\n")
	for _, t := range keyTables {
		b.WriteString("\n")
		b.WriteString(tableHeading(t))
		b.WriteString("  " + t.Meaning + "\n")
		for _, k := range t.Keys {
			writeKey(&b, k)
		}
	}
	b.WriteString("\nUnits accepted with a number (inside the program: N, mm, MPa):\n")
	for d := Length; d <= LineLoad; d++ {
		fmt.Fprintf(&b, "  %-24s %s\n", strings.TrimPrefix(strings.TrimPrefix(d.String(), "an "), "a "), unitsOf(d))
	}
	b.WriteString("Unit systems (units): N-mm, kN-m, kip-in; a bare number takes the system's unit.\n")
	b.WriteString("\nMagnitudes a study may use (check refuses others; L/n needs n of 1 or more):\n")
	b.WriteString(rangeHelp())
	_, err := io.WriteString(w, b.String())
	return err
}

// tableHeading is the table as written in a file: "[member.section]",
// "[[variant]]", or the top of the file.
func tableHeading(t *TableInfo) string {
	switch {
	case t.Path == "":
		return "(top of the file)\n"
	case t.Array:
		return "[[" + t.Path + "]]\n"
	}
	return "[" + strings.ReplaceAll(t.Path, "*", "<key>") + "]\n"
}

func writeKey(b *strings.Builder, k KeyInfo) {
	fmt.Fprintf(b, "  %-16s %s", k.Name, k.Takes)
	if len(k.Choices) > 0 {
		b.WriteString(": " + strings.Join(k.Choices, " | "))
	}
	switch {
	case k.Required:
		b.WriteString("; required")
	case k.Default != "":
		b.WriteString("; default " + k.Default)
	}
	b.WriteString("\n      " + k.Meaning + "\n")
}
