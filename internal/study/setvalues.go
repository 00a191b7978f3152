package study

import "strings"

// Setting is one key of a study set from outside the study file, such as
// a cell of a table of tests or of members: the key path ("material.yield"),
// the value as TOML would decode it (a float64, an int64 or a string with a
// unit such as "312 MPa") and where the value was written, for messages
// ("tests.csv:4: material.yield").
type Setting struct {
	Key   string
	Value any
	At    string
}

// With returns the study read again with the settings applied, without
// its sweep and variants, as Derive does for a variant. label names the
// case in messages about keys the settings do not touch ("the test on
// line 4"). A problem with a setting's own value is reported at the
// setting's At, with no study line.
func (s *Study) With(label string, sets []Setting) (*Study, *Error) {
	ovs := make([]override, len(sets))
	for i, st := range sets {
		ovs[i] = override{key: st.Key, value: st.Value, at: st.Key, label: label}
	}
	st, probs := derive(s.File, s.src, ovs)
	if len(probs) == 0 {
		st.File, st.SHA256, st.Data = s.File, s.SHA256, s.Data
		return st, nil
	}
	for i := range probs {
		pr := &probs[i]
		for _, set := range sets {
			if pr.Key == set.Key || strings.HasPrefix(pr.Key, set.Key+".") {
				pr.File, pr.Line, pr.Key = set.At, 0, ""
				break
			}
		}
	}
	return nil, &Error{Problems: probs}
}

// Convert reads text, a number with an optional unit ("312 MPa", "1_200"),
// as a quantity of dimension d; a bare number is in the system's unit. The
// value is returned in N, mm and MPa.
func (s System) Convert(text string, d Dim) (float64, error) {
	return convert(text, d, s)
}
