package column

import (
	"math"
	"sync"
)

// bcWork is the reusable workspace of one beam-column evaluation.
type bcWork struct {
	// Mesh and member of the current axis.
	nel, nn, ndof int
	l, h          float64 // analysis length and element length
	ei, area, wel float64 // elastic properties
	e, fy         float64 // modulus and yield strength
	ka, kb        float64 // end springs (N mm/rad), +Inf fixed
	ecc           float64 // signed end eccentricity
	imperfect     bool    // some bow or eccentricity is present

	ke, ge   [16]float64 // element bending stiffness and geometric matrix per unit N
	kb0, gb0 []float64   // assembled band of K (with springs and constraints) and G
	band     []float64   // K - N G, then its factors
	f0       []float64   // load vector per unit N: G y0 plus the end moments of the eccentricity
	fx       []float64   // load vector per unit N of the bending (BeamOptions.Bending)
	bma, bmb float64     // end moments of the bending per unit N (mm), at x = 0 and x = l
	bq       float64     // lateral load of the bending per unit N (1/mm)
	v        []float64   // deflection per unit N
	y0v, y0s []float64   // initial bow at the nodes: offsets and slopes
	sp, sq   []float64   // spline workspace

	pl bcPlastic // ultimate limit state

	ro    RambergOsgood // the fibres' law when useRO (BeamOptions.Law)
	useRO bool
	roTab roTable // ro tabulated
}

var bcPool = sync.Pool{New: func() any { return new(bcWork) }}

func bcGet() *bcWork  { return bcPool.Get().(*bcWork) }
func bcPut(w *bcWork) { bcPool.Put(w) }

// bcGrow returns s with length n, reusing its storage when it can.
func bcGrow(s []float64, n int) []float64 {
	if cap(s) < n {
		return make([]float64, n)
	}
	return s[:n]
}

// axis evaluates one axis with the chosen limit.
func (w *bcWork) axis(m *Member, sec Section, a Axis, o *BeamOptions, tr *Trace) (float64, string, error) {
	if o.Limit == UltimateLimit {
		return w.ultimate(m, sec, a, o, tr)
	}
	area, mod := m.Props.A, bcModulus(m, a)
	if m.Props.AEff > 0 { // class 4: the effective section resists N and M
		area, mod = m.Props.AEff, m.Props.EffectiveModulus(a)
	}
	w.setup(m, a, o, bcSecond(m, a)*m.E, area, mod)
	n, gov := w.firstYield()
	if tr != nil {
		w.traceElastic(n, tr)
	}
	return n, gov, nil
}

// setup builds the mesh, element matrices, bow and load vector for axis a
// with bending stiffness ei, area and elastic modulus wel.
func (w *bcWork) setup(m *Member, a Axis, o *BeamOptions, ei, area, wel float64) {
	nel := o.Elements
	if nel == 0 {
		nel = DefaultBeamElements
	}
	if nel < 2 {
		nel = 2
	}
	nel += nel % 2
	w.nel, w.nn, w.ndof = nel, nel+1, 2*(nel+1)
	w.ka, w.kb = o.Springs[a][0], o.Springs[a][1]
	w.l = m.Length
	if w.ka == 0 && w.kb == 0 {
		w.l = m.K[a] * m.Length
	}
	w.h = w.l / float64(nel)
	w.ei, w.area, w.wel, w.e, w.fy = ei, area, wel, m.E, m.Fy

	// Element matrices of the Hermite cubic beam element (e.g. Przemieniecki,
	// Theory of Matrix Structural Analysis, ch. 5 and §15 for the geometric
	// stiffness of a constant axial force).
	h := w.h
	c := ei / (h * h * h)
	w.ke = [16]float64{
		12 * c, 6 * h * c, -12 * c, 6 * h * c,
		6 * h * c, 4 * h * h * c, -6 * h * c, 2 * h * h * c,
		-12 * c, -6 * h * c, 12 * c, -6 * h * c,
		6 * h * c, 2 * h * h * c, -6 * h * c, 4 * h * h * c,
	}
	g := 1 / (30 * h)
	w.ge = [16]float64{
		36 * g, 3 * h * g, -36 * g, 3 * h * g,
		3 * h * g, 4 * h * h * g, -3 * h * g, -h * h * g,
		-36 * g, -3 * h * g, 36 * g, -3 * h * g,
		3 * h * g, -h * h * g, -3 * h * g, 4 * h * h * g,
	}

	n := w.ndof
	w.kb0 = bcGrow(w.kb0, bcBand*n)
	w.gb0 = bcGrow(w.gb0, bcBand*n)
	w.band = bcGrow(w.band, bcBand*n)
	w.f0 = bcGrow(w.f0, n)
	w.v = bcGrow(w.v, n)
	w.y0v = bcGrow(w.y0v, w.nn)
	w.y0s = bcGrow(w.y0s, w.nn)
	clear(w.kb0)
	clear(w.gb0)
	for el := 0; el < nel; el++ {
		bcAdd4(w.kb0, 2*el, &w.ke, 1)
		bcAdd4(w.gb0, 2*el, &w.ge, 1)
	}
	if !math.IsInf(w.ka, 1) {
		w.kb0[bcBand*1] += w.ka
	}
	if !math.IsInf(w.kb, 1) {
		w.kb0[bcBand*(n-1)] += w.kb
	}
	for _, d := range w.fixed() {
		if d >= 0 {
			bcConstrain(w.kb0, n, d)
			bcConstrain(w.gb0, n, d)
			w.gb0[bcBand*d] = 0
		}
	}

	// Initial bow and its direction, which the eccentricity follows.
	sign := w.bow(m, a, o)
	w.ecc = sign * math.Abs(m.Ecc)
	w.bma, w.bmb, w.bq = 0, 0, 0
	if b := &o.Bending; o.Load > 0 && b.Axis == a && !b.Zero() {
		w.bma, w.bmb, w.bq = b.Bottom/o.Load, b.Top/o.Load, b.Lateral/o.Load
	}
	w.imperfect = w.ecc != 0 || w.bma != 0 || w.bmb != 0 || w.bq != 0
	for i := range w.y0v {
		if w.y0v[i] != 0 {
			w.imperfect = true
			break
		}
	}
	w.setupLoad()
}

// fixed returns the constrained degrees of freedom (-1 for none): the
// lateral displacement at both ends and the rotation at a fixed end.
func (w *bcWork) fixed() [4]int {
	d := [4]int{0, w.ndof - 2, -1, -1}
	if math.IsInf(w.ka, 1) {
		d[2] = 1
	}
	if math.IsInf(w.kb, 1) {
		d[3] = w.ndof - 1
	}
	return d
}

// bow fills y0v and y0s with the initial bow and returns its direction
// (+1 or -1). A sway imperfection adds the half-sine bow SwayBow in the
// direction of the bow.
func (w *bcWork) bow(m *Member, a Axis, o *BeamOptions) float64 {
	sign, b := 1.0, math.Abs(m.Bow)
	if len(o.Profile) >= 2 {
		sign, b = w.spline(o.Profile), 0 // the half-sine adds to the measured shape
	} else {
		clear(w.y0v)
		clear(w.y0s)
	}
	b = sign * (b + SwayBow(m, a))
	if b == 0 {
		return sign
	}
	for i := range w.y0v {
		s, c := math.Sincos(math.Pi * float64(i) / float64(w.nel))
		w.y0v[i] += b * s
		w.y0s[i] += b * math.Pi / w.l * c
	}
	w.y0v[w.nel] = 0 // sin(pi) is not exactly zero in floating point
	return sign
}

// spline interpolates the measured offsets p (equal spacing over the
// analysis length, chord removed) by a natural cubic spline (e.g. Burden &
// Faires, Numerical Analysis, §3.5) at the nodes, and returns the sign of
// the largest offset.
func (w *bcWork) spline(p []float64) float64 {
	np := len(p)
	w.sp = bcGrow(w.sp, np)
	w.sq = bcGrow(w.sq, 2*np)
	y := w.sp // offsets from the chord
	sign, big := 1.0, 0.0
	for i := range p {
		t := float64(i) / float64(np-1)
		y[i] = p[i] - (p[0] + (p[np-1]-p[0])*t)
		if math.Abs(y[i]) > big {
			big = math.Abs(y[i])
			sign = math.Copysign(1, y[i])
		}
	}
	hs := w.l / float64(np-1)
	mm, cp := w.sq[:np], w.sq[np:] // second derivatives, Thomas workspace
	mm[0], mm[np-1] = 0, 0
	// Thomas algorithm for M[i-1] + 4 M[i] + M[i+1] = 6 (y[i+1] - 2y[i] + y[i-1]) / hs^2.
	for i := 1; i < np-1; i++ {
		rhs := 6 * (y[i+1] - 2*y[i] + y[i-1]) / (hs * hs)
		den := 4.0
		if i > 1 {
			den -= cp[i-1]
			rhs -= mm[i-1]
		}
		cp[i] = 1 / den
		mm[i] = rhs / den
	}
	for i := np - 3; i >= 1; i-- {
		mm[i] -= cp[i] * mm[i+1]
	}
	for k := range w.y0v {
		x := w.l * float64(k) / float64(w.nel)
		i := int(x / hs)
		if i > np-2 {
			i = np - 2
		}
		a, b := float64(i+1)*hs-x, x-float64(i)*hs
		ca := y[i]/hs - mm[i]*hs/6
		cb := y[i+1]/hs - mm[i+1]*hs/6
		w.y0v[k] = mm[i]*a*a*a/(6*hs) + mm[i+1]*b*b*b/(6*hs) + ca*a + cb*b
		w.y0s[k] = -mm[i]*a*a/(2*hs) + mm[i+1]*b*b/(2*hs) - ca + cb
	}
	return sign
}

// elastic factorises K - n G and solves for the deflection per unit load
// v. It returns false if n is at or above the elastic critical load.
func (w *bcWork) elastic(n float64) bool {
	for i := range w.band {
		w.band[i] = w.kb0[i] - n*w.gb0[i]
	}
	neg, ok := bcFactor(w.band, w.ndof)
	if !ok || neg > 0 {
		return false
	}
	copy(w.v, w.f0)
	for _, d := range w.fixed() {
		if d >= 0 {
			w.v[d] = 0
		}
	}
	bcSolve(w.band, w.ndof, w.v)
	return true
}

// endMoments returns the end moments per unit load (in the sign of the
// bending moment M = N (e + y) + ...) from the first and last element rows:
// the spring or fixing moments at the ends.
func (w *bcWork) endMoments(n float64) (a0, b0 float64) {
	v := w.v
	j := w.ndof - 4
	for c := 0; c < 4; c++ {
		a0 += (w.ke[4+c] - n*w.ge[4+c]) * v[c]
		b0 += (w.ke[12+c] - n*w.ge[12+c]) * v[j+c]
	}
	return a0 - w.f0[1], -(b0 - w.f0[w.ndof-1])
}

// moment returns max |M(x)|/N over the member for the deflection per unit
// load in v, and the node nearest to it. Between nodes the offset is the
// Hermite cubic of the nodal offsets and slopes, maximised in the two
// elements beside the largest nodal value.
func (w *bcWork) moment(n float64) (float64, int) {
	a0, b0 := w.endMoments(n)
	best, at := -1.0, 0
	for i := 0; i < w.nn; i++ {
		t := float64(i) / float64(w.nel)
		m := math.Abs(w.ecc + w.y0v[i] + n*w.v[2*i] + a0*(1-t) + b0*t + w.primary(t))
		if m > best {
			best, at = m, i
		}
	}
	for el := at - 1; el <= at; el++ {
		if el < 0 || el >= w.nel {
			continue
		}
		if m := w.elementMax(el, n, a0, b0); m > best {
			best = m
		}
	}
	return best, at
}

// elementMax returns the largest |M|/N at the interior stationary points of
// element el.
func (w *bcWork) elementMax(el int, n, a0, b0 float64) float64 {
	h := w.h
	y1 := w.y0v[el] + n*w.v[2*el]
	s1 := w.y0s[el] + n*w.v[2*el+1]
	y2 := w.y0v[el+1] + n*w.v[2*el+2]
	s2 := w.y0s[el+1] + n*w.v[2*el+3]
	lin := (b0 - a0 + w.bmb - w.bma) * h / w.l
	x1 := float64(el) * h // the primary moment of the lateral load is quadratic
	c0 := s1*h + lin + w.bq*h*(w.l-2*x1)/2
	c1 := -6*y1 - 4*h*s1 + 6*y2 - 2*h*s2 - w.bq*h*h
	c2 := 6*y1 + 3*h*s1 - 6*y2 + 3*h*s2
	best := 0.0
	eval := func(xi float64) {
		if !(xi > 0 && xi < 1) {
			return
		}
		x2, x3 := xi*xi, xi*xi*xi
		y := y1*(1-3*x2+2*x3) + s1*h*(xi-2*x2+x3) + y2*(3*x2-2*x3) + s2*h*(x3-x2)
		t := (float64(el) + xi) / float64(w.nel)
		if m := math.Abs(w.ecc + y + a0*(1-t) + b0*t + w.primary(t)); m > best {
			best = m
		}
	}
	if math.Abs(c2) < 1e-300 {
		if c1 != 0 {
			eval(-c0 / c1)
		}
		return best
	}
	d := c1*c1 - 4*c2*c0
	if d < 0 {
		return best
	}
	sq := math.Sqrt(d)
	q := -0.5 * (c1 + math.Copysign(sq, c1))
	eval(q / c2)
	if q != 0 {
		eval(c0 / q)
	}
	return best
}

// firstYield returns the elastic second-order load at which the extreme
// fibre reaches fy. It solves
//
//	U(N) = W (fy - N/A) / (|M|max/N) - N = 0,
//
// which is a quadratic in N for a single buckling mode (the Ayrton-Perry
// form) and is continued by U = -N above the critical load, by Brent's
// method on [0, A fy].
func (w *bcWork) firstYield() (float64, string) {
	ny := w.area * w.fy
	if !w.imperfect {
		ncr := w.critical()
		if ncr < ny {
			return ncr, GovernsElasticBuckling
		}
		return ny, GovernsSquash
	}
	u := func(n float64) float64 {
		if !w.elastic(n) {
			return -n
		}
		q, _ := w.moment(n)
		if q == 0 {
			return ny - n
		}
		return w.wel*(w.fy-n/w.area)/q - n
	}
	n := brent(u, 0, ny, u(0), -ny, 1e-13*ny)
	return n, GovernsFirstYield
}

// critical returns the elastic critical load by bisection on the number of
// negative pivots of K - N G (a Sturm sequence count).
func (w *bcWork) critical() float64 {
	lo, hi := 0.0, 4.5*math.Pi*math.Pi*w.ei/(w.l*w.l)
	for w.elastic(hi) {
		lo, hi = hi, 2*hi
	}
	for range 200 {
		mid := 0.5 * (lo + hi)
		if mid <= lo || mid >= hi {
			break
		}
		if w.elastic(mid) {
			lo = mid
		} else {
			hi = mid
		}
		if hi-lo <= 1e-14*hi {
			break
		}
	}
	return 0.5 * (lo + hi)
}

// traceElastic records the elastic path up to the first-yield load n and
// the shape at it.
func (w *bcWork) traceElastic(n float64, tr *Trace) {
	const steps = 24
	w.elastic(n * (1 - 1e-12))
	at := w.widest()
	tr.At = w.l * float64(at) / float64(w.nel)
	for k := 0; k <= steps; k++ {
		p := n * float64(k) / steps
		if k == steps {
			p = n * (1 - 1e-12)
		}
		if !w.elastic(p) {
			break
		}
		tr.Load = append(tr.Load, p)
		tr.Deflection = append(tr.Deflection, p*w.v[2*at])
	}
	w.elastic(n * (1 - 1e-12))
	for i := 0; i < w.nn; i++ {
		tr.X = append(tr.X, w.l*float64(i)/float64(w.nel))
		tr.Bow = append(tr.Bow, w.y0v[i])
		tr.Shape = append(tr.Shape, w.y0v[i]+n*w.v[2*i])
	}
}

// widest returns the node of largest |v|.
func (w *bcWork) widest() int {
	at, big := w.nel/2, -1.0
	for i := 0; i < w.nn; i++ {
		if a := math.Abs(w.v[2*i]); a > big {
			at, big = i, a
		}
	}
	return at
}

// primary returns the first-order moment per unit load of the bending's
// end moments and lateral load on the simply supported member, at the
// fraction t of the analysis length.
func (w *bcWork) primary(t float64) float64 {
	x := t * w.l
	return w.bma*(1-t) + w.bmb*t + w.bq*x*(w.l-x)/2
}

// setupBending fills fx with the nodal loads per unit load of the
// bending: the end moments on the end rotations (in the sign of the
// eccentricity's) and the consistent nodal loads of the uniform lateral
// load, q h/2 and +-q h^2/12 per element (e.g. Przemieniecki, Theory of
// Matrix Structural Analysis, ch. 5).
func (w *bcWork) setupBending() {
	w.fx = bcGrow(w.fx, w.ndof)
	clear(w.fx)
	w.fx[1] += w.bma
	w.fx[w.ndof-1] -= w.bmb
	if q := w.bq; q != 0 {
		h := w.h
		for el := 0; el < w.nel; el++ {
			d := w.fx[2*el : 2*el+4]
			d[0] += q * h / 2
			d[1] += q * h * h / 12
			d[2] += q * h / 2
			d[3] -= q * h * h / 12
		}
	}
}
