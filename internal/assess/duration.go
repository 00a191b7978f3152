package assess

import (
	"fmt"
	"strconv"
	"strings"
)

// durationUnits are the accepted units of a duration and their length in
// years (a month is a twelfth of a year, a week 7/365.25 of one, a day
// 1/365.25).
var durationUnits = map[string]float64{
	"year": 1, "years": 1, "yr": 1, "yrs": 1, "y": 1, "a": 1,
	"month": 1.0 / 12, "months": 1.0 / 12,
	"week": 7 / 365.25, "weeks": 7 / 365.25,
	"day": 1 / 365.25, "days": 1 / 365.25,
}

// ParseYears reads a duration such as "50 years", "1 year", "6 months"
// and returns it in years. It fails on anything else (free text, a
// number without a unit, a duration that is not positive).
func ParseYears(s string) (float64, error) {
	f := strings.Fields(strings.TrimSpace(s))
	if len(f) == 1 {
		// "50years", "50y": split the number from the unit.
		i := strings.IndexFunc(f[0], func(r rune) bool { return r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' })
		if i > 0 {
			f = []string{f[0][:i], f[0][i:]}
		}
	}
	if len(f) != 2 {
		return 0, fmt.Errorf("%q is not a duration: write a number and a unit, e.g. \"50 years\" or \"1 year\"", s)
	}
	n, err := strconv.ParseFloat(strings.ReplaceAll(f[0], "_", ""), 64)
	if err != nil {
		return 0, fmt.Errorf("%q is not a duration: %q is not a number (write e.g. \"50 years\")", s, f[0])
	}
	per, ok := durationUnits[strings.ToLower(f[1])]
	if !ok {
		return 0, fmt.Errorf("%q is not a duration: unit %q is not years, months, weeks or days", s, f[1])
	}
	if !(n > 0) || n > 1e4 {
		return 0, fmt.Errorf("%q: a reference period is positive and at most 10000 years", s)
	}
	return n * per, nil
}
