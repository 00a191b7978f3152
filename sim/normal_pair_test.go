package sim

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// TestNormalPair checks that normalPair gives, bit for bit, the two
// values of distuv.UnitNormal.CDF it replaces in the lattice of
// formUnionGenz (so FORM system results do not move), across the branches
// of the standard library's erfc: |c|/sqrt 2 below 0.84375, to 1.25, to
// 1/0.35, to 6, to 28 and beyond, and the special values.
func TestNormalPair(t *testing.T) {
	cs := []float64{0, math.Copysign(0, -1), math.Inf(1), math.Inf(-1), math.NaN(),
		1.25 * math.Sqrt2, math.Nextafter(1.25*math.Sqrt2, 0), 6 * math.Sqrt2, 28 * math.Sqrt2, 1e300, -1e300, 5e-324}
	for k := -60000; k <= 60000; k++ {
		c := float64(k) * 1e-3 * (1 + 1e-7*float64(k%7)) // off the decimal grid too
		cs = append(cs, c)
	}
	bad := 0
	for _, c := range cs {
		lo, up := normalPair(c)
		wl, wu := distuv.UnitNormal.CDF(c), distuv.UnitNormal.CDF(-c)
		same := func(a, b float64) bool {
			return math.Float64bits(a) == math.Float64bits(b) || (math.IsNaN(a) && math.IsNaN(b))
		}
		if !same(lo, wl) || !same(up, wu) {
			bad++
			if bad < 5 {
				t.Errorf("c %v: normalPair %v %v, CDF %v %v", c, lo, up, wl, wu)
			}
		}
	}
	if bad > 0 {
		t.Errorf("%d of %d values differ", bad, len(cs))
	}
}
