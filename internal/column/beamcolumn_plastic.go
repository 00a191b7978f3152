package column

import "math"

// bcPlastic is the state of the ultimate (spread of plasticity) analysis.
//
// Each element has two Gauss points; each Gauss point is a fibre section
// with its own axial strain e0 (condensed: the section axial force equals
// the applied load, N = -P) and curvature kappa = w”. A fibre's strain is
// e0 + z kappa and its stress E (strain - plastic strain), clipped to
// +-fy (elastic-perfectly-plastic); the residual stress enters as an
// initial plastic strain -sr/E. Equilibrium of the member (virtual work of
// the second-order theory of moderate rotations, constant axial force):
//
//	sum_gp w M B  -  P G (y0 + w)  -  P e (d_0 - d_L)  +  springs  =  0,
//
// solved by Newton's method, under load control while the tangent
// stiffness stays positive definite and then with the load P as an
// unknown and one lateral displacement prescribed (displacement control),
// which passes the peak.
type bcPlastic struct {
	fa, fz, fr []float64 // fibre area, distance from the axis, residual stress
	nf, ngp    int

	ep, epA     []float64 // plastic strain per Gauss point and fibre: committed, snapshot
	e0, e0t     []float64 // axial strain per Gauss point: committed, trial
	e0A         []float64 // snapshot
	wc, wt, wA  []float64 // nodal displacements: committed, trial, snapshot
	wBest       []float64 // displacements at the largest load found
	p, pt, pA   float64   // load: committed, trial, snapshot
	pBest       float64
	rg, ek, kee []float64 // per Gauss point: axial residual, Kek/Kee, Kee
	kt          []float64 // tangent band
	r, gv, bv   []float64 // residual, dR/dP, and solve vectors
	yd          []float64 // initial bow as nodal degrees of freedom

	sa, saz, sazz float64 // sums over the fibres of a, a z, a z^2

	ctrl int     // controlled degree of freedom
	ny   float64 // squash load of the fibres
}

// Gauss points of the 2-point rule on [0, 1] (e.g. Abramowitz & Stegun,
// Table 25.4) and the second derivatives of the Hermite shape functions.
var bcGauss = [2]float64{0.5 - 0.5/1.7320508075688772, 0.5 + 0.5/1.7320508075688772}

// bcB returns h^2 N”(xi) of the Hermite cubic element scaled so that
// kappa = B . [w1, t1, w2, t2] with B[0], B[2] divided by h^2 and B[1], B[3]
// by h.
func bcB(xi, h float64) [4]float64 {
	return [4]float64{(-6 + 12*xi) / (h * h), (-4 + 6*xi) / h, (6 - 12*xi) / (h * h), (-2 + 6*xi) / h}
}

// ultimate returns the peak load of the fibre model about axis a.
func (w *bcWork) ultimate(m *Member, sec Section, a Axis, o *BeamOptions, tr *Trace) (float64, string, error) {
	switch sec.Shape {
	case ShapeCustom:
		return 0, "", errBeamCustom
	case ShapeAngle, ShapeChannel, ShapeTee:
		return 0, "", errBeamOpen
	}
	rs, err := sec.Reduced()
	if err != nil {
		return 0, "", err
	}
	pl := &w.pl
	c, err := pl.fibres(rs, a, o.Residual, o.Fibres, m.Fy)
	if err != nil {
		return 0, "", err
	}
	pl.nf = len(pl.fa)
	var area, first, ii float64
	for k := range pl.fa {
		area += pl.fa[k]
		first += pl.fa[k] * pl.fz[k]
		ii += pl.fa[k] * pl.fz[k] * pl.fz[k]
	}
	pl.sa, pl.saz, pl.sazz = area, first, ii
	pl.ny = area * m.Fy
	w.useRO = o.Law.N > 0
	if w.useRO {
		w.ro = RambergOsgood{E: m.E, Fy: m.Fy, Fu: o.Law.Fu, N: o.Law.N}
		if err := w.ro.Validate(); err != nil {
			return 0, "", err
		}
		pl.ny = area * w.ro.Fu
	}

	// Elastic pre-analysis on the fibre properties: control point and
	// the deflection scale of first yield.
	w.setup(m, a, o, m.E*ii, area, ii/c)
	if !w.imperfect {
		b := w.l * 1e-6
		for i := range w.y0v {
			s, cs := math.Sincos(math.Pi * float64(i) / float64(w.nel))
			w.y0v[i], w.y0s[i] = b*s, b*math.Pi/w.l*cs
		}
		w.y0v[w.nel] = 0
		w.setupLoad()
		w.imperfect = true
	}
	nfy, _ := w.firstYield()
	w.elastic(nfy * (1 - 1e-9))
	node := w.widest()
	pl.ctrl = 2 * node
	wfy := nfy * w.v[pl.ctrl]
	if wfy == 0 || math.IsNaN(wfy) {
		wfy = w.l * 1e-6
	}

	w.plasticInit()
	n, ok := w.path(nfy, wfy, tr)
	if !ok {
		return 0, "", errBeamNoPeak
	}
	if tr != nil {
		tr.At = w.l * float64(node) / float64(w.nel)
		for i := 0; i < w.nn; i++ {
			tr.X = append(tr.X, w.l*float64(i)/float64(w.nel))
			tr.Bow = append(tr.Bow, w.y0v[i])
			tr.Shape = append(tr.Shape, w.y0v[i]+pl.wBest[2*i])
		}
	}
	return n, GovernsUltimate, nil
}

// setupLoad rebuilds f0 from the bow and eccentricity.
func (w *bcWork) setupLoad() {
	clear(w.f0)
	for el := 0; el < w.nel; el++ {
		d := w.f0[2*el : 2*el+4]
		y := [4]float64{w.y0v[el], w.y0s[el], w.y0v[el+1], w.y0s[el+1]}
		for r := 0; r < 4; r++ {
			d[r] += w.ge[4*r]*y[0] + w.ge[4*r+1]*y[1] + w.ge[4*r+2]*y[2] + w.ge[4*r+3]*y[3]
		}
	}
	w.f0[1] += w.ecc
	w.f0[w.ndof-1] -= w.ecc
	w.setupBending()
	for i, f := range w.fx {
		w.f0[i] += f
	}
}

// plasticInit sizes and resets the plastic state: no load, no
// displacement, residual stresses as initial plastic strains.
func (w *bcWork) plasticInit() {
	pl := &w.pl
	pl.ngp = 2 * w.nel
	nfib := pl.ngp * pl.nf
	pl.ep = bcGrow(pl.ep, nfib)
	pl.epA = bcGrow(pl.epA, nfib)
	if w.useRO {
		w.roTab.build(w.ro)
	}
	for g := 0; g < pl.ngp; g++ {
		for k := 0; k < pl.nf; k++ {
			pl.ep[g*pl.nf+k] = -pl.fr[k] / w.e
		}
	}
	for _, s := range []*[]float64{&pl.e0, &pl.e0t, &pl.e0A, &pl.rg, &pl.ek, &pl.kee} {
		*s = bcGrow(*s, pl.ngp)
		clear(*s)
	}
	for _, s := range []*[]float64{&pl.wc, &pl.wt, &pl.wA, &pl.wBest, &pl.r, &pl.gv, &pl.bv, &pl.yd} {
		*s = bcGrow(*s, w.ndof)
		clear(*s)
	}
	pl.kt = bcGrow(pl.kt, bcBand*w.ndof)
	for i := 0; i < w.nn; i++ {
		pl.yd[2*i], pl.yd[2*i+1] = w.y0v[i], w.y0s[i]
	}
	pl.p, pl.pt, pl.pA, pl.pBest = 0, 0, 0, 0
}

// section evaluates Gauss point g at axial strain e0 and curvature k from
// the committed plastic strains: axial force, moment and tangents. The
// tangents start from the elastic section (sums over all fibres) and drop
// the yielded fibres to the small stiffness that keeps the equations
// solvable.
func (w *bcWork) section(g int, e0, k float64) (n, m, kee, kek, kkk float64) {
	if w.useRO {
		return w.sectionRO(g, e0, k)
	}
	pl := &w.pl
	ep := pl.ep[g*pl.nf : (g+1)*pl.nf]
	fa, fz := pl.fa[:len(ep)], pl.fz[:len(ep)]
	e, fy := w.e, w.fy
	var ya, yaz, yazz float64 // yielded fibres
	for i := range ep {
		s := e * (e0 + fz[i]*k - ep[i])
		a := fa[i]
		if s > fy || s < -fy {
			s = math.Copysign(fy, s)
			az := a * fz[i]
			ya += a
			yaz += az
			yazz += az * fz[i]
		}
		n += s * a
		m += s * a * fz[i]
	}
	drop := e * (1 - 1e-6)
	kee = e*pl.sa - drop*ya
	kek = e*pl.saz - drop*yaz
	kkk = e*pl.sazz - drop*yazz
	return
}

// commit stores the trial state as the committed one.
func (w *bcWork) commit() {
	pl := &w.pl
	h := w.h
	for el := 0; el < w.nel; el++ {
		d := pl.wt[2*el : 2*el+4]
		for q, xi := range bcGauss {
			b := bcB(xi, h)
			k := b[0]*d[0] + b[1]*d[1] + b[2]*d[2] + b[3]*d[3]
			g := 2*el + q
			e0 := pl.e0t[g]
			ep := pl.ep[g*pl.nf : (g+1)*pl.nf]
			if w.useRO {
				continue // a non-linear elastic law has no plastic strain
			}
			for i := range ep {
				eps := e0 + pl.fz[i]*k
				s := w.e * (eps - ep[i])
				if s > w.fy {
					ep[i] = eps - w.fy/w.e
				} else if s < -w.fy {
					ep[i] = eps + w.fy/w.e
				}
			}
		}
	}
	copy(pl.wc, pl.wt)
	copy(pl.e0, pl.e0t)
	pl.p = pl.pt
}

// snapshot saves the committed state; restore brings it back.
func (w *bcWork) snapshot() {
	pl := &w.pl
	copy(pl.epA, pl.ep)
	copy(pl.e0A, pl.e0)
	copy(pl.wA, pl.wc)
	pl.pA = pl.p
}

func (w *bcWork) restore() {
	pl := &w.pl
	copy(pl.ep, pl.epA)
	copy(pl.e0, pl.e0A)
	copy(pl.wc, pl.wA)
	pl.p = pl.pA
}

// increment solves for the trial state from the committed state, with
// the load at target (load control) or the controlled displacement at
// target (displacement control). It returns false if Newton's method does
// not converge (or, under load control, the tangent stiffness is not
// positive definite), and the number of iterations.
func (w *bcWork) increment(target float64, load bool) (bool, int) {
	pl := &w.pl
	copy(pl.wt, pl.wc)
	copy(pl.e0t, pl.e0)
	pl.pt = pl.p
	if load {
		pl.pt = target
	}
	stall, damp := 0, 1.0
	lastP, lastW := math.Inf(1), math.Inf(1)
	n, h := w.ndof, w.h
	fix := w.fixed()
	wh := 0.5 * h // Gauss weight
	tolP := 1e-9 * pl.ny
	tolW := 1e-9 * w.l
	const maxIter = 16
	maxDe := 4 * w.fy / w.e
	for it := 1; it <= maxIter; it++ {
		clear(pl.kt)
		clear(pl.r)
		clear(pl.gv)
		for el := 0; el < w.nel; el++ {
			d := pl.wt[2*el : 2*el+4]
			r := pl.r[2*el : 2*el+4]
			gv := pl.gv[2*el : 2*el+4]
			for q, xi := range bcGauss {
				b := bcB(xi, h)
				k := b[0]*d[0] + b[1]*d[1] + b[2]*d[2] + b[3]*d[3]
				g := 2*el + q
				sn, sm, kee, kek, kkk := w.section(g, pl.e0t[g], k)
				rg := sn + pl.pt
				ek := kek / kee
				eit := kkk - kek*ek
				pl.rg[g], pl.ek[g], pl.kee[g] = rg, ek, kee
				mm := wh * (sm - ek*rg)
				dm := -wh * ek
				var ke [16]float64
				for i := 0; i < 4; i++ {
					r[i] += mm * b[i]
					gv[i] += dm * b[i]
					for j := 0; j <= i; j++ {
						ke[4*i+j] = b[i] * b[j]
					}
				}
				bcAddLower(pl.kt, 2*el, &ke, wh*eit)
			}
			// Second-order term of the axial load on the bowed, deflected member.
			y := [4]float64{pl.yd[2*el] + d[0], pl.yd[2*el+1] + d[1], pl.yd[2*el+2] + d[2], pl.yd[2*el+3] + d[3]}
			for i := 0; i < 4; i++ {
				gy := w.ge[4*i]*y[0] + w.ge[4*i+1]*y[1] + w.ge[4*i+2]*y[2] + w.ge[4*i+3]*y[3]
				r[i] -= pl.pt * gy
				gv[i] -= gy
			}
			bcAdd4(pl.kt, 2*el, &w.ge, -pl.pt)
		}
		pl.r[1] -= pl.pt * w.ecc
		pl.r[n-1] += pl.pt * w.ecc
		pl.gv[1] -= w.ecc
		pl.gv[n-1] += w.ecc
		for i, f := range w.fx { // end moments and lateral load (BeamOptions.Bending)
			pl.r[i] -= pl.pt * f
			pl.gv[i] -= f
		}
		if !math.IsInf(w.ka, 1) {
			pl.r[1] += w.ka * pl.wt[1]
			pl.kt[bcBand*1] += w.ka
		}
		if !math.IsInf(w.kb, 1) {
			pl.r[n-1] += w.kb * pl.wt[n-1]
			pl.kt[bcBand*(n-1)] += w.kb
		}
		for _, c := range fix {
			if c >= 0 {
				bcConstrain(pl.kt, n, c)
				pl.r[c], pl.gv[c] = 0, 0
			}
		}
		if neg, ok := bcFactor(pl.kt, n); !ok || load && neg > 0 {
			return false, it
		}
		for i := range pl.r {
			pl.r[i] = -pl.r[i]
		}
		copy(pl.bv, pl.gv)
		bcSolve(pl.kt, n, pl.r)  // a
		bcSolve(pl.kt, n, pl.bv) // b
		c := pl.ctrl
		dp := 0.0
		if !load {
			if pl.bv[c] == 0 {
				return false, it
			}
			dp = (pl.r[c] - (target - pl.wt[c])) / pl.bv[c]
			// No state carries more than the squash load or a tension:
			// a predictor beyond either is cut back half way.
			if pl.pt+dp > pl.ny {
				dp = 0.5 * (pl.ny - pl.pt)
			} else if pl.pt+dp < 0 {
				dp = -0.5 * pl.pt
			}
		}
		// The step, damped once Newton's method cycles between yield
		// states, overwrites pl.r.
		dw := 0.0
		for i := range pl.wt {
			d := damp * (pl.r[i] - dp*pl.bv[i])
			pl.r[i] = d
			pl.wt[i] += d
			dw = math.Max(dw, math.Abs(d))
		}
		dp *= damp
		pl.pt += dp
		rmax := 0.0
		for el := 0; el < w.nel; el++ {
			d := pl.r[2*el : 2*el+4]
			for q, xi := range bcGauss {
				b := bcB(xi, h)
				dk := b[0]*d[0] + b[1]*d[1] + b[2]*d[2] + b[3]*d[3]
				g := 2*el + q
				de := -(damp*pl.rg[g] + pl.ek[g]*pl.kee[g]*dk + dp) / pl.kee[g]
				// A fully yielded trial section has an almost zero tangent;
				// keep Newton's axial strain step within a few yield strains.
				de = math.Max(-maxDe, math.Min(maxDe, de))
				pl.e0t[g] += de
				rmax = math.Max(rmax, math.Abs(pl.rg[g]))
			}
		}
		if math.IsNaN(pl.pt) || math.IsNaN(dw) {
			return false, it
		}
		if math.Abs(dp) <= tolP && dw <= tolW && rmax <= tolP && it > 1 {
			return true, it
		}
		// Newton's method on the piecewise linear fibre law can cycle
		// between yield states: give up when it stops making progress.
		if (load || math.Abs(dp) > 0.7*lastP) && dw > 0.7*lastW {
			stall++
			switch {
			case stall >= 6:
				return false, it
			case stall >= 3 && it >= 6:
				damp = 0.5
			}
		} else {
			stall, damp = 0, 1
		}
		lastP, lastW = math.Abs(dp), dw
	}
	return false, maxIter
}

// bcAddLower adds s times the lower triangle of e at d0..d0+3 of the band.
func bcAddLower(a []float64, d0 int, e *[16]float64, s float64) {
	for r := 0; r < 4; r++ {
		row := a[bcBand*(d0+r):]
		for c := 0; c <= r; c++ {
			row[r-c] += s * e[4*r+c]
		}
	}
}

// path follows the equilibrium path from the unloaded state and returns
// the peak load. It starts under load control (first target nfy/2, where
// nfy is the elastic first-yield load) while Newton's method converges
// with a positive definite tangent; when load steps fail down to a small
// fraction of the load it continues under displacement control of the
// lateral deflection (first step a quarter of the last load step's
// deflection, or wfy/4) until the load falls, and then refines the peak.
func (w *bcWork) path(nfy, wfy float64, tr *Trace) (float64, bool) {
	pl := &w.pl
	c := pl.ctrl
	sgn := math.Copysign(1, wfy)
	limit := 0.1 * w.l // lateral deflection at which the search gives up
	record := func(p, d float64) {
		if tr != nil {
			tr.Load = append(tr.Load, p)
			tr.Deflection = append(tr.Deflection, d)
		}
	}
	record(0, 0)
	w.snapshot()
	load := true
	dP := 0.5 * nfy
	var step, minStep, xT, pT float64
	peaked := false
	flat, failed, stuck := 0, false, false
	for range 120 {
		var ok bool
		var it int
		if load {
			ok, it = w.increment(math.Min(pl.p+dP, (1-1e-9)*pl.ny), true)
			if !ok {
				dP /= 2
				if dP < 0.02*pl.p || dP < 1e-6*pl.ny {
					load = false
					// Near a bifurcation (a small imperfection) the deflection
					// grows from almost nothing: start no smaller than L/10^5.
					step = math.Max(0.25*math.Abs(pl.wc[c]-pl.wA[c]), 0.05*math.Abs(pl.wc[c]))
					step = math.Max(step, 1e-5*w.l)
					minStep = 1e-3 * step
				}
				continue
			}
		} else {
			x := sgn * pl.wc[c]
			ok, it = w.increment(sgn*(x+step), false)
			if !ok {
				step /= 2
				failed = true
				if step < minStep {
					stuck = true
					break
				}
				continue
			}
			if pl.pt < pl.p {
				xT, pT = sgn*pl.wt[c], pl.pt
				peaked = true
				break
			}
		}
		gain := pl.pt - pl.p
		w.snapshot()
		w.commit()
		copy(pl.wBest, pl.wc)
		pl.pBest = pl.p
		record(pl.p, pl.wc[c])
		if sgn*pl.wc[c] > limit || pl.p >= (1-1e-7)*pl.ny {
			break
		}
		// A plateau (the squash load of a near-perfect stocky member is
		// approached from below without a peak) ends the search.
		if !load && gain <= 1e-8*pl.p {
			if flat++; flat >= 3 {
				break
			}
		} else {
			flat = 0
		}
		switch {
		case load && it <= 4:
			dP = math.Min(1.5*dP, 0.25*pl.ny)
		case !load && it <= 8 && !failed:
			step *= 2
		case !load && it > 12:
			step /= 2
		}
		failed = false
	}
	if pl.pBest == 0 {
		return 0, false
	}
	if stuck {
		// Displacement control cannot follow a path that turns sharply
		// (a nearly perfect stocky member approaching the squash load):
		// creep up on the limit under load control instead.
		top := (1 - 1e-9) * pl.ny
		for k, dP := 0, 0.01*pl.p; k < 40 && dP > 1e-4*pl.p && pl.p < top; k++ {
			if ok, _ := w.increment(math.Min(pl.p+dP, top), true); !ok {
				dP /= 2
				continue
			}
			w.commit()
			copy(pl.wBest, pl.wc)
			pl.pBest = pl.p
			record(pl.p, pl.wc[c])
		}
	}
	if !peaked {
		return pl.pBest, true
	}
	// The peak lies between the snapshot A and the trial point T; S (the
	// best point) was reached from A in one increment. Refine by
	// successive parabolic interpolation, each trial one increment from A.
	x1, p1 := sgn*pl.wA[c], pl.pA
	x2, p2 := sgn*pl.wc[c], pl.p
	x3, p3 := xT, pT
	w.restore()
	eval := func(x float64) (float64, bool) {
		ok, _ := w.increment(sgn*x, false)
		if !ok {
			return 0, false
		}
		record(pl.pt, pl.wt[c])
		if pl.pt > pl.pBest {
			pl.pBest = pl.pt
			copy(pl.wBest, pl.wt)
		}
		return pl.pt, true
	}
	for k := 0; k < 12; k++ {
		num := (x2-x1)*(x2-x1)*(p2-p3) - (x2-x3)*(x2-x3)*(p2-p1)
		den := (x2-x1)*(p2-p3) - (x2-x3)*(p2-p1)
		x := x2
		if den != 0 {
			x = x2 - 0.5*num/den
		}
		span := x3 - x1
		if !(x > x1+0.01*span && x < x3-0.01*span) || math.Abs(x-x2) < 1e-3*span {
			if x3-x2 > x2-x1 {
				x = x2 + 0.38*(x3-x2)
			} else {
				x = x2 - 0.38*(x2-x1)
			}
		}
		p, ok := eval(x)
		if !ok {
			p = math.Inf(-1)
		}
		old := p2
		if x > x2 {
			if p >= p2 {
				x1, p1, x2, p2 = x2, p2, x, p
			} else {
				x3, p3 = x, p
			}
		} else {
			if p >= p2 {
				x3, p3, x2, p2 = x2, p2, x, p
			} else {
				x1, p1 = x, p
			}
		}
		if k >= 2 && math.Abs(p2-old) <= 1e-6*p2 {
			break
		}
	}
	if tr != nil {
		w.tracePost(sgn, x3, tr)
	}
	return pl.pBest, true
}

// tracePost adds a few points beyond the peak to the trace.
func (w *bcWork) tracePost(sgn, x3 float64, tr *Trace) {
	pl := &w.pl
	c := pl.ctrl
	x0 := sgn * pl.wA[c]
	d := math.Max(x3-x0, 1e-9*w.l)
	for k := 1; k <= 6; k++ {
		ok, _ := w.increment(sgn*(x0+d*float64(k)/2), false)
		if !ok {
			return
		}
		w.commit()
		tr.Load = append(tr.Load, pl.p)
		tr.Deflection = append(tr.Deflection, pl.wc[c])
	}
}
