package column

import (
	"errors"
	"math"
)

// RambergOsgood is the compound (two-stage) Ramberg-Osgood stress-strain
// law of stainless steel, EN 1993-1-4:2006+A1:2015 Annex C (eqs. C.1 and
// C.2) after Rasmussen (J. Constr. Steel Res. 59, 2003):
//
//	eps = s/E + 0.002 (s/fy)^n                               s <= fy
//	eps = 0.002 + fy/E + (s - fy)/Ey + eu ((s - fy)/(fu - fy))^m   fy < s <= fu
//
// with Ey = E / (1 + 0.002 n E / fy) the tangent modulus at fy,
// m = 1 + 3.5 fy/fu and eu = 1 - fy/fu. Fy is the 0.2 % proof stress.
// The law is odd (compression mirrors tension) and, beyond the strain at
// fu, the stress stays at fu.
type RambergOsgood struct {
	E, Fy, Fu, N float64
}

// ErrRambergOsgood reports a law whose parameters cannot describe a
// stress-strain curve.
var ErrRambergOsgood = errors.New("column: Ramberg-Osgood law needs E > 0, 0 < fy < fu and n >= 1, all finite")

// Validate checks the parameters of the law.
func (r *RambergOsgood) Validate() error {
	if !positive(r.E) || !positive(r.Fy) || !positive(r.Fu) || !(r.Fu > r.Fy) || !(r.N >= 1 && r.N <= 1e3) {
		return ErrRambergOsgood
	}
	return nil
}

// ey is the tangent modulus at fy (Annex C, eq. C.3).
func (r *RambergOsgood) ey() float64 { return r.E / (1 + 0.002*r.N*r.E/r.Fy) }

// Strain returns the strain at stress s (|s| at most Fu).
func (r *RambergOsgood) Strain(s float64) float64 {
	a := math.Abs(s)
	var e float64
	if a <= r.Fy {
		e = a/r.E + 0.002*math.Pow(a/r.Fy, r.N)
	} else {
		a = math.Min(a, r.Fu)
		m := 1 + 3.5*r.Fy/r.Fu
		eu := 1 - r.Fy/r.Fu
		e = 0.002 + r.Fy/r.E + (a-r.Fy)/r.ey() + eu*math.Pow((a-r.Fy)/(r.Fu-r.Fy), m)
	}
	return math.Copysign(e, s)
}

// Compliance returns d(strain)/d(stress) at stress s, the inverse of the
// tangent modulus.
func (r *RambergOsgood) Compliance(s float64) float64 {
	a := math.Abs(s)
	if a <= r.Fy {
		return 1/r.E + 0.002*r.N/r.Fy*math.Pow(a/r.Fy, r.N-1)
	}
	if a >= r.Fu {
		return math.Inf(1)
	}
	m := 1 + 3.5*r.Fy/r.Fu
	eu := 1 - r.Fy/r.Fu
	d := r.Fu - r.Fy
	return 1/r.ey() + eu*m/d*math.Pow((a-r.Fy)/d, m-1)
}

// Stress returns the stress at strain eps and the tangent modulus there
// (0 beyond the strain at Fu), inverting Strain by Newton's method kept
// inside a bracket. It does not allocate.
func (r *RambergOsgood) Stress(eps float64) (s, et float64) {
	return r.StressFrom(eps, math.NaN())
}

// StressFrom is Stress with Newton's method started from the stress
// guess (taken when it lies inside the bracket; NaN for none): a close
// guess, such as the fibre's stress at the last iteration, converges in
// a step or two.
func (r *RambergOsgood) StressFrom(eps, guess float64) (s, et float64) {
	a := math.Abs(eps)
	if a >= r.Strain(r.Fu) {
		return math.Copysign(r.Fu, eps), 0
	}
	lo, hi := 0.0, math.Min(r.Fu, r.E*a)
	x := hi
	if g := math.Abs(guess); g > lo && g < hi && math.Signbit(guess) == math.Signbit(eps) {
		x = g
	}
	for range 100 {
		f := r.Strain(x) - a
		if math.Abs(f) <= 1e-14*math.Max(a, 1e-12) {
			break
		}
		if f > 0 {
			hi = x
		} else {
			lo = x
		}
		nx := x - f/r.Compliance(x)
		if !(nx > lo && nx < hi) {
			nx = 0.5 * (lo + hi)
		}
		if nx == x {
			break
		}
		x = nx
	}
	return math.Copysign(x, eps), 1 / r.Compliance(x)
}

// roN is the number of intervals of roTable.
const roN = 1024

// roTable is a Ramberg-Osgood law tabulated at roN + 1 stresses evenly
// spaced from 0 to Fu (their strains exact, Strain), read back by
// interpolation: the stress of a strain is piecewise linear between the
// nodes and its tangent that of the interval, so the fibres' law stays
// consistent with its tangent for Newton's method, within Fu/roN of the
// law's stress.
type roTable struct {
	law RambergOsgood
	ds  float64
	eps [roN + 1]float64
}

// build tabulates r, unless it is the law already tabulated.
func (t *roTable) build(r RambergOsgood) {
	if t.law == r && t.ds > 0 {
		return
	}
	t.law, t.ds = r, r.Fu/roN
	for i := range t.eps {
		t.eps[i] = r.Strain(float64(i) * t.ds)
	}
}

// stress is the tabulated stress at strain eps and its tangent (0 beyond
// the strain at Fu).
func (t *roTable) stress(eps float64) (s, et float64) {
	a := math.Abs(eps)
	if !(a < t.eps[roN]) {
		return math.Copysign(t.law.Fu, eps), 0
	}
	lo, hi := 0, roN
	for hi-lo > 1 {
		mid := (lo + hi) / 2
		if t.eps[mid] <= a {
			lo = mid
		} else {
			hi = mid
		}
	}
	et = t.ds / (t.eps[hi] - t.eps[lo])
	return math.Copysign(float64(lo)*t.ds+(a-t.eps[lo])*et, eps), et
}

// sectionRO is bcWork.section for fibres that follow the Ramberg-Osgood
// law w.ro: the stress of strain e0 + z k less the fibre's initial strain
// (its residual stress) and the tangent modulus of the law.
func (w *bcWork) sectionRO(g int, e0, k float64) (n, m, kee, kek, kkk float64) {
	pl := &w.pl
	ep := pl.ep[g*pl.nf : (g+1)*pl.nf]
	fa, fz := pl.fa[:len(ep)], pl.fz[:len(ep)]
	floor := w.e * 1e-6 // keeps the tangent solvable past fu
	for i := range ep {
		s, et := w.roTab.stress(e0 + fz[i]*k - ep[i])
		et = math.Max(et, floor)
		a := fa[i]
		az := a * fz[i]
		n += s * a
		m += s * az
		kee += et * a
		kek += et * az
		kkk += et * az * fz[i]
	}
	return
}
