package sim

import "math"

// The 15-point Gauss-Kronrod rule on [-1, 1] and its embedded 7-point
// Gauss rule (Piessens et al., QUADPACK, Springer 1983, routine QK15):
// the nodes from the outermost in, the last one 0; the Gauss rule uses
// every other node, from the second.
var (
	kronrodX = [8]float64{
		0.991455371120812639206854697526329,
		0.949107912342758524526189684047851,
		0.864864423359769072789712788640926,
		0.741531185599394439863864773280788,
		0.586087235467691130294144845693013,
		0.405845151377397166906606412076961,
		0.207784955007898467600689403773245,
		0,
	}
	kronrodW = [8]float64{
		0.022935322010529224963732008058970,
		0.063092092629978553290700663189204,
		0.104790010322250183839876322541518,
		0.140653259715525918745189590510238,
		0.169004726639267902826583426598550,
		0.190350578064785409913256402421014,
		0.204432940075298892414161999234649,
		0.209482141084727828012999174891714,
	}
	gaussW = [4]float64{
		0.129484966168869693270611432679082,
		0.279705391489276667901467771423780,
		0.381830050505118944950369775488975,
		0.417959183673469387755102040816327,
	}
)

// kronrod15 returns the 15-point Kronrod estimate of the integral of f
// over [a, b] and its distance from the 7-point Gauss estimate (a bound
// on the error of the Gauss rule, far above that of the Kronrod rule for
// a smooth f).
func kronrod15(f func(float64) float64, a, b float64) (sum, err float64) {
	c, h := (a+b)/2, (b-a)/2
	fc := f(c)
	k, g := kronrodW[7]*fc, gaussW[3]*fc
	for i := range 7 {
		d := h * kronrodX[i]
		s := f(c-d) + f(c+d)
		k += kronrodW[i] * s
		if i%2 == 1 {
			g += gaussW[i/2] * s
		}
	}
	return k * h, math.Abs(k-g) * h
}

// kronrodAdaptive integrates f over [a, b] to absolute tolerance tol by
// 15-point Gauss-Kronrod rules, halving an interval whose Gauss and
// Kronrod estimates differ by more than its share of tol, with at most
// kronrodSplits halvings in all (then, or where f is NaN, it keeps the
// Kronrod estimates it has).
func kronrodAdaptive(f func(float64) float64, a, b, tol float64) float64 {
	splits := kronrodSplits
	return kronrodSplit(f, a, b, tol, &splits)
}

// kronrodSplits bounds the halvings of one kronrodAdaptive: a smooth
// integrand needs a few dozen.
const kronrodSplits = 400

func kronrodSplit(f func(float64) float64, a, b, tol float64, splits *int) float64 {
	s, e := kronrod15(f, a, b)
	if !(e > tol) || *splits <= 0 {
		return s
	}
	*splits--
	m := (a + b) / 2
	return kronrodSplit(f, a, m, tol/2, splits) + kronrodSplit(f, m, b, tol/2, splits)
}
