package assess

import (
	"errors"
	"fmt"
	"math"
)

// invPhi is 1/phi, the golden ratio's inverse: each golden-section step
// keeps this share of the bracket.
var invPhi = (math.Sqrt(5) - 1) / 2

// MinimiseBounded returns the x in [lo, hi] that minimises f, to within
// tol in x, and f there. It first evaluates f on scan+1 evenly spaced
// points (scan >= 2), so that a function with more than one dip is not
// followed into the wrong one, then narrows the bracket around the best
// of them by golden-section search (Kiefer 1953; any numerical-methods
// text), which needs f only to be unimodal within that bracket. An error
// of f stops the search and is returned.
func MinimiseBounded(f func(x float64) (float64, error), lo, hi, tol float64, scan int) (x, fx float64, err error) {
	switch {
	case !(lo < hi) || math.IsInf(lo, 0) || math.IsInf(hi, 0):
		return 0, 0, fmt.Errorf("the range %g to %g is not a finite interval with its low end first", lo, hi)
	case !(tol > 0):
		return 0, 0, errors.New("the tolerance must be positive")
	case scan < 2:
		scan = 2
	}
	best, fbest := lo, math.Inf(1)
	h := (hi - lo) / float64(scan)
	for i := 0; i <= scan; i++ {
		xi := lo + float64(i)*h
		fi, err := f(xi)
		if err != nil {
			return 0, 0, err
		}
		if fi < fbest {
			best, fbest = xi, fi
		}
	}
	a, b := math.Max(lo, best-h), math.Min(hi, best+h)
	c, d := b-invPhi*(b-a), a+invPhi*(b-a)
	fc, err := f(c)
	if err != nil {
		return 0, 0, err
	}
	fd, err := f(d)
	if err != nil {
		return 0, 0, err
	}
	for b-a > tol {
		if fc <= fd {
			b, d, fd = d, c, fc
			c = b - invPhi*(b-a)
			if fc, err = f(c); err != nil {
				return 0, 0, err
			}
		} else {
			a, c, fc = c, d, fd
			d = a + invPhi*(b-a)
			if fd, err = f(d); err != nil {
				return 0, 0, err
			}
		}
	}
	x, fx = c, fc
	if fd < fc {
		x, fx = d, fd
	}
	if fbest < fx { // the bracket's end (a scan point) beats its inside
		x, fx = best, fbest
	}
	return x, fx, nil
}
