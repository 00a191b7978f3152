package modelerror

import (
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// The fractile factors of EN 1990 Annex D for an infinite number of tests:
// KInf for the characteristic value (the 5 % fractile, D.7.2 Table D.1) and
// KdInf for the design value of a leading resistance (alpha_R beta =
// 0.8 x 3.8 = 3.04, D.7.3 Table D.2).
const (
	KInf  = 1.64
	KdInf = 3.04
)

// tableN are the numbers of tests the columns of Tables D.1 and D.2 are
// given for; 0 stands for infinity.
var tableN = [...]int{1, 2, 3, 4, 5, 6, 8, 10, 20, 30, 0}

// The rows of EN 1990:2002 Tables D.1 (k_n, 5 % characteristic value) and
// D.2 (k_d,n, ULS design value), V_X known and unknown; NaN where the
// standard gives no value.
var (
	tableD1Known   = [...]float64{2.31, 2.01, 1.89, 1.83, 1.80, 1.77, 1.74, 1.72, 1.68, 1.67, 1.64}
	tableD1Unknown = [...]float64{nan, nan, 3.37, 2.63, 2.33, 2.18, 2.00, 1.92, 1.76, 1.73, 1.64}
	tableD2Known   = [...]float64{4.36, 3.77, 3.56, 3.44, 3.37, 3.33, 3.27, 3.23, 3.16, 3.13, 3.04}
	tableD2Unknown = [...]float64{nan, nan, nan, 11.40, 7.85, 6.36, 5.07, 4.51, 3.64, 3.44, 3.04}
)

var nan = math.NaN()

// Kn returns k_n of EN 1990 Table D.1 for n tests: the entry of the
// largest tabulated number of tests not above n (between columns the
// standard gives no rule; the smaller n is the safe side). NaN when the
// table has no value (fewer than 3 tests with V_X unknown).
func Kn(n int, vxKnown bool) float64 {
	if vxKnown {
		return lookup(tableD1Known[:], n)
	}
	return lookup(tableD1Unknown[:], n)
}

// Kdn returns k_d,n of EN 1990 Table D.2 for n tests, read as Kn reads
// Table D.1. NaN when the table has no value (fewer than 4 tests with V_X
// unknown).
func Kdn(n int, vxKnown bool) float64 {
	if vxKnown {
		return lookup(tableD2Known[:], n)
	}
	return lookup(tableD2Unknown[:], n)
}

func lookup(row []float64, n int) float64 {
	if n < 1 {
		return nan
	}
	k := nan
	for i, m := range tableN[:len(tableN)-1] {
		if m <= n {
			k = row[i]
		}
	}
	return k
}

// FractileFactor returns the prediction-fractile factor behind the tables:
// for a normal population estimated from n tests, the fractile at the
// standard-normal value u lies u sqrt(1 + 1/n) standard deviations from
// the mean when the standard deviation is known, and t_(n-1) sqrt(1 + 1/n)
// when it is estimated from the same tests (Student's t with n-1 degrees
// of freedom at probability Phi(u)). NaN for n < 1, or n < 2 when unknown.
func FractileFactor(n int, u float64, vxKnown bool) float64 {
	if n < 1 || !vxKnown && n < 2 {
		return nan
	}
	f := math.Sqrt(1 + 1/float64(n))
	if vxKnown {
		return u * f
	}
	t := distuv.StudentsT{Mu: 0, Sigma: 1, Nu: float64(n - 1)}
	return t.Quantile(distuv.UnitNormal.CDF(u)) * f
}
