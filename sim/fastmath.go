package sim

import "math"

// Constants of the exponential's argument reduction and its rational
// approximation on [-ln2/2, ln2/2], from Sun Microsystems' fdlibm e_exp.c
// (P. T. P. Tang's method as implemented there); ln2 is split so that
// k*ln2Hi is exact.
const (
	expLn2Hi = 6.93147180369123816490e-01
	expLn2Lo = 1.90821492927058770002e-10
	expLog2e = 1.44269504088896338700e+00
	expP1    = 1.66666666666666657415e-01
	expP2    = -2.77777777770155933842e-03
	expP3    = 6.61375632143793436117e-05
	expP4    = -1.65339022054652515390e-06
	expP5    = 4.13813679705723846039e-08
)

// fastExp returns e^x to within about one unit in the last place. It is
// the fdlibm algorithm (reduce x = k ln2 + r, approximate e^r by
// 1 + 2r/(R(r) - r), scale by 2^k), written for the sampling loop, where
// the assembly math.Exp of some platforms is several times slower.
// Arguments outside [-700, 700] and NaN go to math.Exp.
func fastExp(x float64) float64 {
	if !(x > -700 && x < 700) {
		return math.Exp(x)
	}
	k := math.Floor(x*expLog2e + 0.5)
	hi := x - k*expLn2Hi
	lo := k * expLn2Lo
	r := hi - lo
	t := r * r
	c := r - t*(expP1+t*(expP2+t*(expP3+t*(expP4+t*expP5))))
	y := 1 - ((lo - (r*c)/(2-c)) - hi)
	return math.Float64frombits(math.Float64bits(y) + uint64(int64(k))<<52)
}
