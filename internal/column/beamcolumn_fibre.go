package column

import (
	"fmt"
	"math"
)

// Fibre sections of the ultimate beam-column limit. A section is cut into
// rectangular cells (annular sectors for a CHS, chord strips for a round
// bar), each a fibre of area a at distance z from the centroidal axis of
// bending, carrying an initial residual stress. The plates of an I or RHS
// are cut finely in the direction that matters for the axis (through the
// depth for the major axis, across the width for the minor axis) and in
// two layers through their thickness where the layers sit at different
// distances from the axis or carry different residual stresses.
//
// Residual stress patterns (compression negative). Each plate's pattern is
// shifted by its own area-weighted mean so that every plate is
// self-equilibrated on the discrete fibres.
//
//   - Hot-rolled I or H: the linear ECCS pattern (ECCS Technical Committee
//     8, Ultimate Limit State Calculation of Sway Frames with Rigid Joints,
//     Publication 33, 1984; from memory): flanges vary linearly from
//     compression sr at the tips to tension sr at the web, the web from
//     tension sr at the flanges to compression sr at mid-depth, with
//     sr = 0.5 fy for h/b <= 1.2 and 0.3 fy for h/b > 1.2.
//   - Welded I or box: tension blocks at fy along the welds (a band of 0.1
//     of the plate width either side of each weld line, or at each plate
//     end for the webs) balanced by uniform compression over the rest of
//     the plate (about 0.25 fy): a simplified block pattern of the kind
//     used for welded sections in the ECCS recommendations (from memory;
//     common practice, not a quoted distribution).
//   - Cold-formed RHS or CHS: through-thickness bending stresses only,
//     linear from tension 0.5 fy at the outer surface to compression
//     0.5 fy at the inner surface of every wall (two layers at +-0.25 fy).
//     The membrane residual stresses of cold-formed tubes are small and the
//     bending ones dominate (from memory, e.g. Key & Hancock, Thin-Walled
//     Structures 16, 1993); the 0.5 fy amplitude is a modelling choice,
//     not a quoted value. The strength enhancement of the corners is not
//     modelled.

// Residual stress amplitudes (fractions of fy), see above.
const (
	bcHotRolledStocky = 0.5  // h/b <= 1.2
	bcHotRolledDeep   = 0.3  // h/b > 1.2
	bcWeldBand        = 0.1  // tension band width / plate width, each side of a weld
	bcColdFormed      = 0.5  // surface value of the through-thickness pattern
	bcStockyRatio     = 1.2  // h/b limit of the hot-rolled pattern
	bcFilletCentroid  = 0.22 // centroid of a root fillet from its corner, per radius: (10-3 pi)/(12-3 pi) = 0.2234
)

// bcPlate is a rectangle u0..u1 (depth direction) by v0..v1 (width
// direction) cut into nu by nv cells.
type bcPlate struct {
	u0, u1, v0, v1 float64
	nu, nv         int
	kind           int // residual pattern selector, see residual
}

// Plate kinds for the residual stress patterns.
const (
	bcFlangeI   = iota // I flange: v across the width, centred on the web
	bcWebI             // I web: u along the depth
	bcFlangeBox        // RHS flange (top/bottom wall)
	bcWebBox           // RHS web (side wall)
	bcFillet           // root fillet of an I section: no residual stress
)

// fibres builds the fibre section of s (already reduced) for bending about
// axis a: it fills pl.fa, pl.fz, pl.fr and returns the extreme-fibre
// distance c used to scale the elastic pre-analysis.
func (pl *bcPlastic) fibres(s Section, a Axis, res Residual, nf int, fy float64) (float64, error) {
	if nf == 0 {
		nf = DefaultBeamFibres
	}
	if nf < 8 {
		nf = 8
	}
	// Bending that stresses the depth (z = u) is the major axis when it
	// has the larger second moment (ties: the depth), as in Properties.
	var iu, iv float64
	switch s.Shape {
	case ShapeI:
		hw := s.Depth - 2*s.Flange
		iu = (s.Width*s.Depth*s.Depth*s.Depth - (s.Width-s.Web)*hw*hw*hw) / 12
		iv = (2*s.Flange*s.Width*s.Width*s.Width + hw*s.Web*s.Web*s.Web) / 12
	case ShapeRHS:
		di, bi := s.Depth-2*s.Thickness, s.Width-2*s.Thickness
		iu = (s.Width*s.Depth*s.Depth*s.Depth - bi*di*di*di) / 12
		iv = (s.Depth*s.Width*s.Width*s.Width - di*bi*bi*bi) / 12
	case ShapeRect:
		iu, iv = s.Width*s.Depth*s.Depth*s.Depth, s.Depth*s.Width*s.Width*s.Width
	case ShapeCHS, ShapeRound:
		iu, iv = 1, 1
	default:
		return 0, errBeamCustom
	}
	depth := (a == Major) == (iu >= iv)

	pl.fa, pl.fz, pl.fr = pl.fa[:0], pl.fz[:0], pl.fr[:0]
	switch s.Shape {
	case ShapeI:
		return pl.iFibres(s, depth, res, nf, fy)
	case ShapeRHS:
		return pl.rhsFibres(s, depth, res, nf, fy)
	case ShapeCHS:
		return pl.chsFibres(s, res, nf, fy)
	case ShapeRect:
		if res != ResidualNone {
			return 0, fmt.Errorf("column: residual stress %q is not defined for a solid rectangular section; use \"none\"", res)
		}
		h, b := s.Depth, s.Width
		if !depth {
			h, b = b, h
		}
		dz := h / float64(nf)
		for k := 0; k < nf; k++ {
			z := h * ((float64(k)+0.5)/float64(nf) - 0.5)
			if z != 0 {
				z = math.Copysign(math.Sqrt(z*z+dz*dz/12), z)
			}
			pl.add(dz*b, z, 0)
		}
		return h / 2, nil
	case ShapeRound:
		if res != ResidualNone {
			return 0, fmt.Errorf("column: residual stress %q is not defined for a solid round bar; use \"none\"", res)
		}
		r := s.Diameter / 2
		// Chord strips: area and first moment of a circle between u1 and u2.
		area := func(u float64) float64 { return u*math.Sqrt(r*r-u*u) + r*r*math.Asin(u/r) }
		// Second moment of the strip: int 2 u^2 sqrt(r^2 - u^2) du.
		second := func(u float64) float64 {
			q := math.Sqrt(r*r - u*u)
			return (u*q*(2*u*u-r*r) + r*r*r*r*math.Asin(u/r)) / 4
		}
		for k := 0; k < nf; k++ {
			u1 := r * (2*float64(k)/float64(nf) - 1)
			u2 := r * (2*float64(k+1)/float64(nf) - 1)
			ak := area(u2) - area(u1)
			z := math.Sqrt((second(u2) - second(u1)) / ak)
			if u1+u2 < 0 {
				z = -z
			} else if u1+u2 == 0 {
				z = 0
			}
			pl.add(ak, z, 0)
		}
		return r, nil
	}
	return 0, errBeamCustom
}

func (pl *bcPlastic) add(a, z, r float64) {
	pl.fa = append(pl.fa, a)
	pl.fz = append(pl.fz, z)
	pl.fr = append(pl.fr, r)
}

// iFibres cuts an I section into two flanges, a web and four root fillets.
func (pl *bcPlastic) iFibres(s Section, depth bool, res Residual, nf int, fy float64) (float64, error) {
	if res == ResidualColdFormed {
		return 0, fmt.Errorf("column: residual stress \"cold-formed\" is for hollow sections; use \"hot-rolled\" or \"welded\" for an I section")
	}
	h, b, tf, tw, r := s.Depth, s.Width, s.Flange, s.Web, s.Root
	hw := h - 2*tf
	n := nf
	if r > 0 {
		n -= 4
	}
	var plates [3]bcPlate
	var c float64
	if depth {
		nfl := max(2, n*2/3/4)
		nweb := max(2, n-4*nfl)
		plates[0] = bcPlate{hw / 2, h / 2, -b / 2, b / 2, 2, nfl, bcFlangeI}
		plates[1] = bcPlate{-h / 2, -hw / 2, -b / 2, b / 2, 2, nfl, bcFlangeI}
		plates[2] = bcPlate{-hw / 2, hw / 2, -tw / 2, tw / 2, nweb, 1, bcWebI}
		c = h / 2
	} else {
		nfl := max(2, n*7/10/2)
		nweb := max(1, (n-2*nfl)/2)
		plates[0] = bcPlate{hw / 2, h / 2, -b / 2, b / 2, 1, nfl, bcFlangeI}
		plates[1] = bcPlate{-h / 2, -hw / 2, -b / 2, b / 2, 1, nfl, bcFlangeI}
		plates[2] = bcPlate{-hw / 2, hw / 2, -tw / 2, tw / 2, nweb, 2, bcWebI}
		c = b / 2
	}
	sr := bcHotRolledDeep * fy
	if h/b <= bcStockyRatio {
		sr = bcHotRolledStocky * fy
	}
	for _, p := range plates {
		pl.plate(p, depth, func(u, v float64) float64 {
			switch res {
			case ResidualHotRolled:
				if p.kind == bcFlangeI {
					return sr * (1 - 4*math.Abs(v)/b)
				}
				return sr * (-1 + 4*math.Abs(u)/hw)
			case ResidualWelded:
				if p.kind == bcFlangeI && math.Abs(v) <= bcWeldBand*b {
					return fy
				}
				if p.kind == bcWebI && math.Abs(u) >= hw/2-bcWeldBand*hw {
					return fy
				}
			}
			return 0
		}, res == ResidualWelded)
	}
	if r > 0 {
		af := (1 - math.Pi/4) * r * r
		for _, su := range [2]float64{-1, 1} {
			for _, sv := range [2]float64{-1, 1} {
				u := su * (hw/2 - bcFilletCentroid*r)
				v := sv * (tw/2 + bcFilletCentroid*r)
				z := u
				if !depth {
					z = v
				}
				pl.add(af, z, 0)
			}
		}
	}
	return c, nil
}

// rhsFibres cuts a rectangular hollow section into two flanges across the
// full width and two webs between them, then rounds the corners
// (rhsCorners).
func (pl *bcPlastic) rhsFibres(s Section, depth bool, res Residual, nf int, fy float64) (float64, error) {
	if res == ResidualHotRolled {
		return 0, fmt.Errorf("column: residual stress \"hot-rolled\" is the pattern of I sections; for a hollow section use \"none\" (hot-finished), \"welded\" or \"cold-formed\"")
	}
	d, b, t := s.Depth, s.Width, s.Thickness
	np := max(2, nf/8)
	plates := [4]bcPlate{
		{d/2 - t, d / 2, -b / 2, b / 2, 2, np, bcFlangeBox},
		{-d / 2, -d/2 + t, -b / 2, b / 2, 2, np, bcFlangeBox},
		{-d/2 + t, d/2 - t, b/2 - t, b / 2, np, 2, bcWebBox},
		{-d/2 + t, d/2 - t, -b / 2, -b/2 + t, np, 2, bcWebBox},
	}
	for _, p := range plates {
		pl.plate(p, depth, func(u, v float64) float64 {
			switch res {
			case ResidualColdFormed:
				// Outward distance from the wall's mid-plane.
				var out float64
				if p.kind == bcFlangeBox {
					out = math.Abs(u) - (d/2 - t/2)
				} else {
					out = math.Abs(v) - (b/2 - t/2)
				}
				return bcColdFormed * fy * 2 * out / t
			case ResidualWelded:
				if p.kind == bcFlangeBox && math.Abs(v) >= b/2-bcWeldBand*b {
					return fy
				}
				if p.kind == bcWebBox && math.Abs(u) >= d/2-t-bcWeldBand*d {
					return fy
				}
			}
			return 0
		}, res == ResidualWelded)
	}
	pl.rhsCorners(s, depth)
	if depth {
		return d / 2, nil
	}
	return b / 2, nil
}

// rhsCorners rounds the square corners of the plates of rhsFibres: a
// fibre of negative area takes away each outer corner spandrel (radius
// Radius) and one of positive area adds each inner spandrel (radius
// InnerRadius), at the spandrel's radius of gyration about the axis so
// that the area and the second moment equal those of Properties. They
// carry no residual stress, so each pattern stays self-equilibrated.
func (pl *bcPlastic) rhsCorners(s Section, depth bool) {
	d, b, t := s.Depth, s.Width, s.Thickness
	h := d
	if !depth {
		h = b
	}
	for _, c := range [2]struct{ r, half, sign float64 }{
		{s.Radius, h / 2, -1},
		{s.InnerRadius, h/2 - t, 1},
	} {
		if c.r <= 0 {
			continue
		}
		a := filletA * c.r * c.r
		dz := c.half - filletC*c.r
		z := math.Sqrt(dz*dz + filletI*c.r*c.r*c.r*c.r/a)
		for _, zz := range [4]float64{z, z, -z, -z} {
			pl.add(c.sign*a, zz, 0)
		}
	}
}

// chsFibres cuts a circular hollow section into sectors in two layers,
// each layer's fibres at the layer's radius of gyration so that the second
// moment is exact (the sum of cos^2 over equally spaced angles is n/2).
func (pl *bcPlastic) chsFibres(s Section, res Residual, nf int, fy float64) (float64, error) {
	if res == ResidualHotRolled || res == ResidualWelded {
		return 0, fmt.Errorf("column: residual stress %q is not defined for a circular hollow section; use \"none\" or \"cold-formed\"", res)
	}
	ro, t := s.Diameter/2, s.Thickness
	rm, ri := ro-t/2, ro-t
	nt := max(4, nf/2)
	// The inner layer is the smaller: shift the +-sr pair by its mean
	// so that the two layers balance.
	ai, ao := math.Pi*(rm*rm-ri*ri), math.Pi*(ro*ro-rm*rm)
	mean := bcColdFormed * fy / 2 * (ao - ai) / (ao + ai)
	for layer, rr := range [2][2]float64{{ri, rm}, {rm, ro}} {
		rg := math.Sqrt((rr[0]*rr[0] + rr[1]*rr[1]) / 2)
		a := math.Pi * (rr[1]*rr[1] - rr[0]*rr[0]) / float64(nt)
		sr := 0.0
		if res == ResidualColdFormed {
			sr = bcColdFormed*fy/2 - mean
			if layer == 0 {
				sr = -bcColdFormed*fy/2 - mean
			}
		}
		for k := 0; k < nt; k++ {
			pl.add(a, rg*math.Cos(2*math.Pi*(float64(k)+0.5)/float64(nt)), sr)
		}
	}
	return ro, nil
}

// plate adds the cells of p with residual stress rs(u, v) at their
// centres, shifted to zero mean over the plate; with blocks the stress-free
// cells take the balancing uniform stress instead (tension blocks).
func (pl *bcPlastic) plate(p bcPlate, depth bool, rs func(u, v float64) float64, blocks bool) {
	first := len(pl.fa)
	du, dv := (p.u1-p.u0)/float64(p.nu), (p.v1-p.v0)/float64(p.nv)
	for i := 0; i < p.nu; i++ {
		u := p.u0 + (float64(i)+0.5)*du
		for j := 0; j < p.nv; j++ {
			v := p.v0 + (float64(j)+0.5)*dv
			z, dz := u, du
			if !depth {
				z, dz = v, dv
			}
			if z != 0 {
				// The cell's radius of gyration about the axis keeps the
				// second moment of the plate exact.
				z = math.Copysign(math.Sqrt(z*z+dz*dz/12), z)
			}
			pl.add(du*dv, z, rs(u, v))
		}
	}
	var sum, area, free float64
	for k := first; k < len(pl.fa); k++ {
		sum += pl.fa[k] * pl.fr[k]
		area += pl.fa[k]
		if pl.fr[k] == 0 {
			free += pl.fa[k]
		}
	}
	for k := first; k < len(pl.fa); k++ {
		switch {
		case blocks && free > 0:
			if pl.fr[k] == 0 {
				pl.fr[k] = -sum / free
			}
		default:
			pl.fr[k] -= sum / area
		}
	}
}
