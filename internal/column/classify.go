package column

import "math"

// ElementKind is the kind of a compression part of EN 1993-1-1 Table 5.2.
type ElementKind int

// The element kinds.
const (
	Internal ElementKind = iota // internal compression part (both edges supported)
	Outstand                    // outstand flange (one edge supported)
	Tube                        // wall of a circular hollow section
	Leg                         // leg of an angle, h/t (class 3 limit only)
	LegPair                     // both legs of an angle, (b + h)/2t (class 3 limit only)
)

// String returns "internal", "outstand", "tube", "leg" or "legs".
func (k ElementKind) String() string {
	switch k {
	case Internal:
		return "internal"
	case Outstand:
		return "outstand"
	case Tube:
		return "tube"
	case Leg:
		return "leg"
	case LegPair:
		return "legs"
	}
	return "kind(?)"
}

// Element is one compression part of a section and its class.
type Element struct {
	// Name says which part it is: "web", "flange", "wall (depth)",
	// "wall (width)" or "wall".
	Name string
	Kind ElementKind
	// C and T are the part's width c and thickness t (mm); for a tube C is
	// the outside diameter d. Ratio is c/t (d/t).
	C, T, Ratio float64
	// Limits are the class 1, 2 and 3 limits of Ratio at the section's eps.
	Limits [3]float64
	// Class is 1 to 4; Rho the reduction factor of EN 1993-1-5 4.4 for
	// class 4 (1 otherwise, and for a tube, which that clause does not
	// cover).
	Class int
	Rho   float64
}

// Classification is the class of a section in pure compression.
type Classification struct {
	// Elements are the section's compression parts (N of them; a solid
	// or custom section has none; an angle has its two legs and the pair).
	Elements [3]Element
	N        int
	// Class is the governing class, 1 to 4; 0 for a custom section, whose
	// class strutrisk cannot know.
	Class int
	// Eps is sqrt(235/fy).
	Eps float64
}

// Classify returns the section properties (after the thickness loss) and
// the class of the section in pure compression at the yield strength fy
// (MPa), per EN 1993-1-1:2005 Table 5.2 with eps = sqrt(235/fy):
//   - internal parts (I web, RHS walls): 33, 38, 42 eps;
//   - outstand flanges of an I section: 9, 10, 14 eps;
//   - CHS: d/t against 50, 70, 90 eps^2;
//   - solid sections: class 1; custom sections: not classified (Class 0).
//
// Widths c: the web of an I section between the root radii, d - 2tf - 2r;
// its flange outstands (b - tw - 2r)/2; the walls of an RHS their flat
// width between the corners, b - 2 max(ro, t), but never less than the
// b - 3t that EN 1993-1-1 Table 5.2 and EN 1993-1-5 4.4(2) give for
// hollow sections (a cold-formed corner, 2t to 3t, would otherwise make
// the code's check less severe).
//
// For class 4 the returned Props carry the effective area AEff and the
// effective elastic moduli WEff of the effective section of EN 1993-1-5
// 4.4 in uniform compression: each internal part keeps rho c in two
// halves at its supported edges, each outstand rho c at its root (Tables
// 4.1 and 4.2, psi = 1). WEff is that section's second moment about its
// own centroid (the section stays doubly symmetric) over its extreme-fibre
// distance: a conservative simplification, since the effective widths
// under bending (psi < 1) are larger. A class 4 CHS keeps its gross
// properties: its local buckling is shell buckling (EN 1993-1-6), which
// strutrisk does not model; the caller must refuse it or be told so.
//
// Classify does not allocate. Invalid dimensions or fy return an error.
func (s Section) Classify(fy float64) (Props, Classification, error) {
	p, err := s.Properties()
	if err != nil {
		return Props{}, Classification{}, err
	}
	return s.ClassifyProps(p, fy)
}

// ClassifyProps is Classify for a caller that already holds the gross
// properties p of s (from s.Properties): a sampler whose section is fixed
// while the yield strength varies classifies each sample without
// computing the section again. p must be the properties of s.
func (s Section) ClassifyProps(p Props, fy float64) (Props, Classification, error) {
	var cl Classification
	p.AEff, p.WEff = 0, [2]float64{}
	if !positive(fy) {
		return Props{}, cl, ErrYield
	}
	r, _ := s.Reduced() // checked by Properties
	cl.Eps = math.Sqrt(235 / fy)
	switch r.Shape {
	case ShapeI:
		cw := r.Depth - 2*r.Flange - 2*r.Root
		cf := (r.Width - r.Web - 2*r.Root) / 2
		cl.add(&Element{Name: "web", Kind: Internal, C: cw, T: r.Web})
		cl.add(&Element{Name: "flange", Kind: Outstand, C: cf, T: r.Flange})
	case ShapeRHS:
		corner := math.Min(math.Max(r.Radius, r.Thickness), 1.5*r.Thickness)
		cl.add(&Element{Name: "wall (depth)", Kind: Internal, C: r.Depth - 2*corner, T: r.Thickness})
		cl.add(&Element{Name: "wall (width)", Kind: Internal, C: r.Width - 2*corner, T: r.Thickness})
	case ShapeCHS:
		cl.add(&Element{Name: "wall", Kind: Tube, C: r.Diameter, T: r.Thickness})
	case ShapeRect, ShapeRound:
		cl.Class = 1
	case ShapeCustom:
		customEffective(r, &p, &cl)
		return p, cl, nil
	case ShapeAngle, ShapeChannel, ShapeTee:
		classifyOpen(r, &cl)
		if cl.Class == 4 && r.Shape == ShapeAngle {
			// EN 1993-1-5 4.4(2) takes an angle's legs as outstands of
			// width h: a class 4 angle (by either rule) reduces each leg
			// by the rho of its h/t, 1 while lp <= 0.748.
			for i := range 2 {
				e := &cl.Elements[i]
				e.Rho = PlateRho(e.Ratio, cl.Eps, true)
			}
		}
		if cl.Class == 4 {
			effectiveOpen(r, &p, &cl)
		}
		return p, cl, nil
	}
	if cl.Class == 4 && r.Shape != ShapeCHS {
		effective(r, &p, &cl)
	}
	return p, cl, nil
}

// add classifies e and appends it to cl, updating the governing class.
func (cl *Classification) add(e *Element) {
	e.Ratio = e.C / e.T
	switch e.Kind {
	case Internal:
		e.Limits = [3]float64{33 * cl.Eps, 38 * cl.Eps, 42 * cl.Eps}
	case Outstand:
		e.Limits = [3]float64{9 * cl.Eps, 10 * cl.Eps, 14 * cl.Eps}
	case Tube:
		e2 := cl.Eps * cl.Eps
		e.Limits = [3]float64{50 * e2, 70 * e2, 90 * e2}
	case Leg: // Table 5.2 gives angles a class 3 limit only
		e.Limits = [3]float64{0, 0, 15 * cl.Eps}
	case LegPair:
		e.Limits = [3]float64{0, 0, 11.5 * cl.Eps}
	}
	e.Class, e.Rho = 4, 1
	for i, lim := range e.Limits {
		if e.Ratio <= lim {
			e.Class = i + 1
			break
		}
	}
	if e.Class == 4 && e.Kind != Tube && e.Kind != LegPair {
		e.Rho = PlateRho(e.Ratio, cl.Eps, e.Kind != Internal)
	}
	cl.Elements[cl.N] = *e
	cl.N++
	cl.Class = max(cl.Class, e.Class)
}

// effective sets p.AEff and p.WEff from the reduction factors of cl's
// elements (r is the reduced section). x is the bending that stresses the
// depth, y the width.
func effective(r Section, p *Props, cl *Classification) {
	var da, dix, diy float64 // area and second moments lost
	cx, cy := r.Depth/2, r.Width/2
	var ix, iy float64
	switch r.Shape {
	case ShapeI:
		_, ix, iy = iSection(r.Depth, r.Width, r.Flange, r.Web, r.Root)
		w, f := cl.Elements[0], cl.Elements[1]
		lw := (1 - w.Rho) * w.C // centred on the web
		da += lw * w.T
		dix += w.T * lw * lw * lw / 12
		diy += lw * w.T * w.T * w.T / 12
		lf := (1 - f.Rho) * f.C // at each of the four tips
		da += 4 * lf * f.T
		dx := r.Depth/2 - f.T/2
		dy := r.Width/2 - lf/2
		dix += 4 * (lf*f.T*f.T*f.T/12 + lf*f.T*dx*dx)
		diy += 4 * (f.T*lf*lf*lf/12 + f.T*lf*dy*dy)
		cy -= lf
	case ShapeRHS:
		_, ix, iy = rhsSection(r.Depth, r.Width, r.Thickness, r.Radius, r.InnerRadius)
		d, w := cl.Elements[0], cl.Elements[1]
		t := r.Thickness
		ld := (1 - d.Rho) * d.C // side walls, centred on the x axis
		lb := (1 - w.Rho) * w.C // top and bottom walls, centred on the y axis
		da += 2 * (ld + lb) * t
		dx := r.Depth/2 - t/2
		dy := r.Width/2 - t/2
		dix += 2 * (t*ld*ld*ld/12 + lb*t*t*t/12 + lb*t*dx*dx)
		diy += 2 * (t*lb*lb*lb/12 + ld*t*t*t/12 + ld*t*dy*dy)
	}
	p.AEff = p.A - da
	wx, wy := (ix-dix)/cx, (iy-diy)/cy
	if iy > ix { // Properties put the width-bending axis first
		wx, wy = wy, wx
	}
	p.WEff = [2]float64{wx, wy}
}

// Reduced reports whether a part of the section has a reduction factor
// rho below 1 (EN 1993-1-5 4.4): a class 4 section can still be fully
// effective when its slenderest part is just past the class 3 limit (an
// angle by the (b + h)/2t rule of EN 1993-1-1 Table 5.2).
func (cl *Classification) Reduced() bool {
	for _, e := range cl.Elements[:cl.N] {
		if e.Rho < 1 {
			return true
		}
	}
	return false
}

// customEffective gives a custom section with a stated effective area
// EffArea below its area class 4: AEff = EffArea and, as a conservative
// simplification, WEff = W (AEff/A)^2 about each axis (an effective
// section keeps at least the share AEff/A of its modulus when its
// reduced parts lie at its edges, as for an RHS, and about (AEff/A)^2 for
// the minor axis of an I whose flange tips go; the square covers both).
// Without an effective area a custom section stays unclassified.
func customEffective(r Section, p *Props, cl *Classification) {
	if !(r.EffArea > 0 && r.EffArea < p.A) {
		return
	}
	cl.Class = 4
	f := r.EffArea / p.A
	p.AEff = r.EffArea
	p.WEff = [2]float64{p.W[Major] * f * f, p.W[Minor] * f * f}
}
