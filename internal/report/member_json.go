package report

import (
	"bytes"
	"encoding/json"
	"math"
)

// memberPlain is Member without its JSON methods.
type memberPlain Member

// MarshalJSON writes m as its fields, in their order, with pf null when
// it is not a number: a member that was not run, or was stopped midway,
// has no pf (Error says why), and JSON cannot hold NaN.
func (m Member) MarshalJSON() ([]byte, error) {
	if finite(m.Pf) {
		return json.Marshal(memberPlain(m))
	}
	p := memberPlain(m)
	p.Pf = 0
	data, err := json.Marshal(p)
	if err != nil {
		return nil, err
	}
	// The one place of these bytes outside a string: quotes inside the
	// name or a cell are escaped.
	return bytes.Replace(data, []byte(`"pf":0,"pf_ci":`), []byte(`"pf":null,"pf_ci":`), 1), nil
}

// UnmarshalJSON reads a member, pf null as NaN.
func (m *Member) UnmarshalJSON(b []byte) error {
	p := memberPlain{Pf: math.NaN()} // null leaves it so
	if err := json.Unmarshal(b, &p); err != nil {
		return err
	}
	*m = Member(p)
	return nil
}
