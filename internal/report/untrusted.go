package report

// untrustedMark follows the numbers of a case whose estimate the engine
// does not trust in the tables of the variants.
const untrustedMark = "not trusted (?)"

// untrustedLine says of the case named name that its estimate is not
// trusted, and why when reason is known.
func untrustedLine(name, reason string) string {
	s := "? " + name + ": the estimate is not trusted, it is no result and no verdict is drawn from it"
	if reason != "" {
		s += ": " + reason
	}
	return s
}

// untrustedNote is the report's note on a case whose estimate is not
// trusted, with the reason when known.
func untrustedNote(reason string) string {
	s := untrustedMark + ": no result, no verdict"
	if reason != "" {
		s += "; " + reason
	}
	return s
}
