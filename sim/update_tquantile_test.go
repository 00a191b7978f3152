package sim

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mathext"
	"gonum.org/v1/gonum/stat/distuv"
)

// TestTLowerQuantile checks the Student-t quantile of the log-Student-t
// against gonum's inverse regularised incomplete beta function (the
// Student-t quantile, Abramowitz and Stegun 26.7.1; from memory) for whole
// and fractional degrees of freedom, at standard normal fractiles u out to
// -8 (p = 6e-16), and its round trip through gonum's Student-t CDF, for
// nu up to tMaxNu: above it both gonum functions lose relative accuracy in
// the far tail (the incomplete beta with x near 1) and tLowerQuantile uses
// the inverse incomplete beta as before.
func TestTLowerQuantile(t *testing.T) {
	t.Parallel()
	for _, nu := range []float64{0.7, 1, 2, 2.5, 3, 4, 7, 15.5, 30, 40} {
		c := newTConsts(nu)
		st := distuv.StudentsT{Mu: 0, Sigma: 1, Nu: nu}
		for u := -8.0; u < 0; u += 0.25 {
			p := stdCDF(u)
			got := tLowerQuantile(p, u, nu, c)
			x := mathext.InvRegIncBeta(nu/2, 0.5, 2*p)
			want := -math.Sqrt(nu * (1 - x) / x)
			if math.Abs(got-want) > 1e-9*math.Abs(want) {
				t.Errorf("nu %g, u %g: t quantile %.15g, inverse incomplete beta %.15g", nu, u, got, want)
			}
			if back := st.CDF(got); math.Abs(back-p) > 1e-9*p {
				t.Errorf("nu %g, u %g: CDF(quantile(%g)) = %g", nu, u, p, back)
			}
		}
	}
}
