package sim

import (
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// normalPair returns Phi(c) and Phi(-c), each exactly as
// distuv.UnitNormal.CDF gives it (0.5 erfc(-/+c/sqrt 2)), with one
// evaluation of the complementary error function where the standard
// library's erfc of a negative argument is 2 minus that of its magnitude
// (|c|/sqrt 2 of 1.25 or more, the branch with the exponentials); the
// test checks the equality bit for bit.
func normalPair(c float64) (lower, upper float64) {
	a := math.Abs(c) / math.Sqrt2
	if !(a >= 1.25) {
		return distuv.UnitNormal.CDF(c), distuv.UnitNormal.CDF(-c)
	}
	v := math.Erfc(a)
	near, far := 0.5*v, 0.5*(2-v)
	if c > 0 {
		return far, near
	}
	return near, far
}
