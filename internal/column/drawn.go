package column

import "math"

// drawn is a section in its drawing axes: x along the width, y along the
// depth, origin anywhere. Parts are added by their integrals about the
// origin; principal turns them into Props.
type drawn struct {
	a, sx, sy     float64 // area and first moments (int x dA, int y dA)
	sxx, syy, sxy float64 // int y^2 dA, int x^2 dA, int x y dA
	xs, ys        float64 // shear centre
	it, iw        float64 // St Venant torsion and warping constants
	pts           [6][2]float64
	npts          int // outline vertices in pts
}

// rect adds the rectangle [x1, x2] x [y1, y2].
func (d *drawn) rect(x1, x2, y1, y2 float64) {
	w, h := x2-x1, y2-y1
	d.a += w * h
	d.sx += h * (x2*x2 - x1*x1) / 2
	d.sy += w * (y2*y2 - y1*y1) / 2
	d.sxx += w * (y2*y2*y2 - y1*y1*y1) / 3
	d.syy += h * (x2*x2*x2 - x1*x1*x1) / 3
	d.sxy += (x2*x2 - x1*x1) * (y2*y2 - y1*y1) / 4
}

// filletXY is the product of inertia int p q dA of a root fillet of unit
// radius about the corner it fills, p and q measured from the two faces:
// the square's 1/4 less the quarter disc's pi/4 - 2/3 + 1/8.
var filletXY = 19.0/24 - math.Pi/4

// fillet adds a root fillet of radius r in the corner (x0, y0) whose faces
// run towards +x and +y (the material lies at x > x0, y > y0).
func (d *drawn) fillet(x0, y0, r float64) {
	if r <= 0 {
		return
	}
	af := filletA * r * r
	c := filletC * r
	io := filletI * r * r * r * r
	pxy := filletXY*r*r*r*r - af*c*c // about its own centroid
	xf, yf := x0+c, y0+c
	d.a += af
	d.sx += af * xf
	d.sy += af * yf
	d.sxx += io + af*yf*yf
	d.syy += io + af*xf*xf
	d.sxy += pxy + af*xf*yf
}

// vertex records an outline vertex that may be an extreme fibre.
func (d *drawn) vertex(x, y float64) {
	d.pts[d.npts] = [2]float64{x, y}
	d.npts++
}

// principal returns the properties about the principal axes through the
// centroid. The major axis u is the one with the larger second moment
// (a tie keeps the x axis, parallel to the width); S and CSide are
// measured in the principal axes.
func (d *drawn) principal() Props {
	var p Props
	a := d.a
	xc, yc := d.sx/a, d.sy/a
	ixx := d.sxx - a*yc*yc
	iyy := d.syy - a*xc*xc
	ixy := d.sxy - a*xc*yc
	th := 0.5 * math.Atan2(-2*ixy, ixx-iyy)
	sin, cos := math.Sincos(th)
	if ixy == 0 { // exact axes for symmetric shapes
		if ixx >= iyy {
			sin, cos = 0, 1
		} else {
			sin, cos = 1, 0
		}
	}
	iu := ixx*cos*cos + iyy*sin*sin - 2*ixy*sin*cos
	iv := ixx*sin*sin + iyy*cos*cos + 2*ixy*sin*cos
	p.A = a
	p.I = [2]float64{iu, iv}
	p.Angle = th
	if ixy == 0 {
		p.Angle = math.Atan2(sin, cos)
	}
	// u = x cos + y sin, v = -x sin + y cos, from the centroid. Bending
	// about u stresses in proportion to v.
	uv := func(x, y float64) (u, v float64) {
		x, y = x-xc, y-yc
		return x*cos + y*sin, -x*sin + y*cos
	}
	for i := 0; i < d.npts; i++ {
		u, v := uv(d.pts[i][0], d.pts[i][1])
		p.CSide[Major][0] = math.Max(p.CSide[Major][0], v)
		p.CSide[Major][1] = math.Max(p.CSide[Major][1], -v)
		p.CSide[Minor][0] = math.Max(p.CSide[Minor][0], u)
		p.CSide[Minor][1] = math.Max(p.CSide[Minor][1], -u)
	}
	su, sv := uv(d.xs, d.ys)
	tiny := 1e-12 * math.Sqrt((iu+iv)/a)
	if math.Abs(su) <= tiny {
		su = 0
	}
	if math.Abs(sv) <= tiny {
		sv = 0
	}
	p.S = [2]float64{su, sv}
	p.It, p.Iw = d.it, d.iw
	p.finish()
	return p
}

// finish sets R, C (the worse side), W from A, I and CSide.
func (p *Props) finish() {
	for k := range 2 {
		p.C[k] = math.Max(p.CSide[k][0], p.CSide[k][1])
		p.R[k] = math.Sqrt(p.I[k] / p.A)
		p.W[k] = p.I[k] / p.C[k]
	}
}
