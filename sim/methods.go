package sim

import (
	"fmt"
	"strings"
)

// methodList is the one list of the estimators Run knows, in the order
// users see them. Flags, help texts, the study parser and the docs read it
// through Methods; add a method here and in Run.
var methodList = []Method{Auto, MonteCarlo, LatinHypercube, FORMMethod, Importance, Subset, ConditionalQMC, Surrogate}

// Methods returns the estimators Run knows, auto first. The slice is a
// copy.
func Methods() []Method {
	return append([]Method(nil), methodList...)
}

// MethodNames returns the names of Methods, for flags, help and choices.
func MethodNames() []string {
	out := make([]string, len(methodList))
	for i, m := range methodList {
		out[i] = string(m)
	}
	return out
}

// ParseMethod returns the method named s, or an error that lists the
// methods Run knows.
func ParseMethod(s string) (Method, error) {
	for _, m := range methodList {
		if string(m) == s {
			return m, nil
		}
	}
	return "", fmt.Errorf("unknown method %q (want one of %s)", s, strings.Join(MethodNames(), ", "))
}
