package report

import (
	"encoding/json"
	"math"
	"strconv"
)

// Index is a reliability index that may be unbounded: +Inf when no
// sample failed (pf = 0), -Inf when every one did (pf = 1). JSON has no
// infinity, so an unbounded Index is written as null; its sign follows
// from its place (a beta with pf 0 or the upper end of an interval is
// +inf, a beta with pf 1 or the lower end is -inf). null is read back as
// NaN. Text says "inf (unbounded)" (BetaText).
type Index float64

// MarshalJSON writes x as a JSON number, or null when it is not finite.
func (x Index) MarshalJSON() ([]byte, error) {
	if !finite(float64(x)) {
		return []byte("null"), nil
	}
	return json.Marshal(float64(x))
}

// UnmarshalJSON reads a number, or null as NaN.
func (x *Index) UnmarshalJSON(b []byte) error {
	if string(b) == "null" {
		*x = Index(math.NaN())
		return nil
	}
	var v float64
	if err := json.Unmarshal(b, &v); err != nil {
		return err
	}
	*x = Index(v)
	return nil
}

// Indices converts float64 values to a slice of Index.
func Indices(v ...float64) []Index {
	out := make([]Index, len(v))
	for i, x := range v {
		out[i] = Index(x)
	}
	return out
}

// BetaText formats a reliability index with two decimals; an infinite one
// is "inf (unbounded)" (no failure seen) or "-inf (unbounded)" (every
// sample failed), never a 309-digit number.
func BetaText(x float64) string {
	switch {
	case math.IsInf(x, 1):
		return "inf (unbounded)"
	case math.IsInf(x, -1):
		return "-inf (unbounded)"
	}
	return fixed(x, 2)
}

// csvIndex writes a reliability index in a CSV cell: an unbounded one as
// "inf" or "-inf", which spreadsheets and numerical libraries read.
func csvIndex(x Index) string {
	switch {
	case math.IsInf(float64(x), 1):
		return "inf"
	case math.IsInf(float64(x), -1):
		return "-inf"
	}
	return strconv.FormatFloat(float64(x), 'g', 8, 64)
}
