package report

import (
	"math"
	"sort"
	"strconv"
	"strings"
)

// byRankCorrelation returns a copy of the rank correlations kv sorted by
// the absolute value of the coefficient, largest first; ties keep their
// order, and a value that is not a number goes last.
func byRankCorrelation(kv []KV) []KV {
	out := append([]KV(nil), kv...)
	mag := func(s string) float64 {
		s = strings.Replace(strings.TrimSpace(s), "−", "-", 1)
		x, err := strconv.ParseFloat(s, 64)
		if err != nil || math.IsNaN(x) {
			return -1
		}
		return math.Abs(x)
	}
	sort.SliceStable(out, func(i, j int) bool { return mag(out[i].Value) > mag(out[j].Value) })
	return out
}
