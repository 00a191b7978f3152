package study

import "math"

// secantSlope is the first guess of the slope of the FORM index against
// the logarithm of the factor on the loads: a member's index falls by
// about 3 when its loads are multiplied by e (a lognormal margin whose
// resistance and load have a combined CoV of about 0.3; common practice),
// so the first step from a known index lands near the root.
const secantSlope = -3.0

// secantSteps bounds the analyses of secantRoot.
const secantSteps = 6

// secantRoot finds a root of f, a function falling smoothly from f0 =
// f(x0), by the secant method: the first step on the slope secantSlope,
// the next through the last two points, until |f| < ReserveTol. It gives
// up (ok false) after secantSteps evaluations, or when a step leaves [lo,
// hi] or the last two values are equal: the caller then brackets the root
// (fallingRoot), which also handles a function that jumps. Near a smooth
// root it takes two or three evaluations where bracketing from x0 takes
// four to six.
func secantRoot(f func(float64) (float64, error), x0, f0, lo, hi float64) (x float64, ok bool, err error) {
	if math.Abs(f0) < ReserveTol {
		return x0, true, nil
	}
	a, fa := x0, f0
	b := x0 - f0/secantSlope
	for range secantSteps {
		if !(b >= lo && b <= hi) {
			return 0, false, nil
		}
		fb, err := f(b)
		if err != nil {
			return 0, false, err
		}
		if math.Abs(fb) < ReserveTol {
			return b, true, nil
		}
		if fb == fa {
			return 0, false, nil
		}
		a, fa, b = b, fb, b-fb*(b-a)/(fb-fa)
	}
	return 0, false, nil
}
