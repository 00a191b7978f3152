package column

import "math"

// Bending is the bending of a member about one axis beside its axial
// load (N, mm): the end moments Top and Bottom (N mm) and a uniform
// lateral load Lateral (N/mm). End moments of the same sign bend the
// member to the same side (single curvature); a positive lateral load
// bends it to the side of positive end moments. Every action of a load
// factor study is multiplied by the factor together with the axial load.
type Bending struct {
	Axis        Axis
	Top, Bottom float64
	Lateral     float64
}

// Zero reports whether the bending has no moment and no lateral load.
func (b *Bending) Zero() bool { return b.Top == 0 && b.Bottom == 0 && b.Lateral == 0 }

// sinc returns sin(t)/t, 1 at t = 0.
func sinc(t float64) float64 {
	if math.Abs(t) < 1e-4 {
		t2 := t * t
		return 1 - t2/6*(1-t2/20)
	}
	return math.Sin(t) / t
}

// bmoment is the elastic second-order bending moment along a pinned
// member of length l under an axial compression with k = sqrt(N/EI): end
// moments ma (at x = 0) and mb (at x = l), a uniform lateral load q and
// the amplified moment of a half-sine bow, bow sin(pi x/l).
type bmoment struct {
	k, l, ma, mb, q, bow float64
}

// at returns the moment at x. The terms are the closed forms of
// Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., art. 1.5
// (uniform lateral load, M = (q/k^2)[cos k(x - l/2)/cos(kl/2) - 1]) and
// art. 1.6 to 1.7 (end couples, M = [ma sin k(l - x) + mb sin kx]/sin kl)
// (article numbers from memory), each rewritten with sin(t)/t so that it
// stays exact as k tends to 0 (no axial load: the first-order moments).
func (b *bmoment) at(x float64) float64 {
	k, l := b.k, b.l
	kl := k * l
	sl := sinc(kl)
	m := b.ma*(l-x)/l*sinc(k*(l-x))/sl + b.mb*x/l*sinc(k*x)/sl
	if b.q != 0 {
		m += b.q * x * (l - x) / 2 * sinc(k*x/2) * sinc(k*(l-x)/2) / math.Cos(kl/2)
	}
	if b.bow != 0 {
		m += b.bow * math.Sin(math.Pi*x/l)
	}
	return m
}

// stationary returns the position of the interior stationary point of the
// end-moment and lateral-load part of the moment (M = A cos kx + B sin kx
// - q/k^2 has one in [0, pi/k)), and whether there is one inside (0, l).
func (b *bmoment) stationary() (float64, bool) {
	k, l := b.k, b.l
	var x float64
	if k*l < 1e-7 { // first order: M0' = (mb - ma)/l + q (l - 2x)/2
		if b.q == 0 {
			return 0, false
		}
		x = l/2 + (b.mb-b.ma)/(b.q*l)
	} else {
		kl := k * l
		// A k^2 and B k^2, free of 1/k^2.
		a := b.ma*k*k + b.q
		bb := (b.mb-b.ma*math.Cos(kl))*k/(l*sinc(kl)) + b.q*math.Tan(kl/2)
		if a == 0 && bb == 0 {
			return 0, false
		}
		th := math.Atan2(bb, a)
		if th < 0 {
			th += math.Pi
		}
		x = th / k
	}
	return x, x > 0 && x < l
}

// max returns the largest |M(x)| over the member and its position. Without
// a bow it is exact: the larger of the end moments and the moment at the
// stationary point. With one, the moment is maximised numerically (golden
// section about the best of 33 points, to about 1e-9 of l in x).
func (b *bmoment) max() (float64, float64) {
	best, at := math.Abs(b.ma), 0.0
	if v := math.Abs(b.mb); v > best {
		best, at = v, b.l
	}
	if b.bow == 0 {
		if x, ok := b.stationary(); ok {
			if v := math.Abs(b.at(x)); v > best {
				best, at = v, x
			}
		}
		return best, at
	}
	const n = 32
	h := b.l / n
	ib := 0
	for i := 1; i < n; i++ {
		if v := math.Abs(b.at(float64(i) * h)); v > best {
			best, at, ib = v, float64(i)*h, i
		}
	}
	if ib == 0 {
		return best, at
	}
	x, v := b.golden(float64(ib-1)*h, float64(ib+1)*h)
	if v > best {
		best, at = v, x
	}
	return best, at
}

// golden maximises |M| on [lo, hi] by golden-section search.
func (b *bmoment) golden(lo, hi float64) (float64, float64) {
	const r = 0.6180339887498949
	x1, x2 := hi-r*(hi-lo), lo+r*(hi-lo)
	f1, f2 := math.Abs(b.at(x1)), math.Abs(b.at(x2))
	for hi-lo > 1e-9*b.l {
		if f1 > f2 {
			hi, x2, f2 = x2, x1, f1
			x1 = hi - r*(hi-lo)
			f1 = math.Abs(b.at(x1))
		} else {
			lo, x1, f1 = x1, x2, f2
			x2 = lo + r*(hi-lo)
			f2 = math.Abs(b.at(x2))
		}
	}
	if f1 > f2 {
		return x1, f1
	}
	return x2, f2
}

// SecondOrderMoment returns the largest bending moment |M| (N mm) along a
// pinned elastic member of length l (mm) and bending stiffness ei
// (N mm^2) under an axial compression n (N) with end moments ma and mb
// (N mm; the same sign is single curvature) and a uniform lateral load q
// (N/mm), and where along the member it acts (mm from the end of ma). The
// moment is exact within linear-elastic second-order theory (Timoshenko &
// Gere, Theory of Elastic Stability, 2nd ed., ch. 1: for unequal end
// moments M_max = mb sqrt(m^2 - 2 m cos kl + 1)/sin kl with m = ma/mb and
// k = sqrt(n/ei) when the maximum lies inside the span; for a uniform load
// M_max = (q/k^2)(sec(kl/2) - 1)). A tension or zero n takes the
// first-order moments. n must stay below the Euler load pi^2 ei/l^2.
func SecondOrderMoment(n, ei, l, ma, mb, q float64) (float64, float64) {
	b := bmoment{l: l, ma: ma, mb: mb, q: q}
	if n > 0 {
		b.k = math.Sqrt(n / ei)
	}
	return b.max()
}
