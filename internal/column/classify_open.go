package column

// classifyOpen adds the compression parts of an angle, a channel or a tee
// to cl (EN 1993-1-1:2005 Table 5.2, pure compression):
//   - angle: each leg h/t and b/t against 15 eps and the pair (b + h)/2t
//     against 11.5 eps, the table's class 3 limits (it gives no class 1 or
//     2 limits for angles: a stocky angle is class 3);
//   - channel: the web an internal part, c = h - 2 tf; each flange an
//     outstand, c = b - tw;
//   - tee: each flange half an outstand, c = (b - tw)/2; the stem an
//     outstand too, c = h - tf (common practice: Table 5.2's outstand
//     limits for a tee's stem in compression).
//
// Root and toe radii are neglected (the widths are on the safe side).
func classifyOpen(r Section, cl *Classification) {
	switch r.Shape {
	case ShapeAngle:
		t := r.Thickness
		cl.add(&Element{Name: "leg (depth)", Kind: Leg, C: r.Depth, T: t})
		cl.add(&Element{Name: "leg (width)", Kind: Leg, C: r.Width, T: t})
		cl.add(&Element{Name: "legs", Kind: LegPair, C: (r.Depth + r.Width) / 2, T: t})
	case ShapeChannel:
		cl.add(&Element{Name: "web", Kind: Internal, C: r.Depth - 2*r.Flange, T: r.Web})
		cl.add(&Element{Name: "flange", Kind: Outstand, C: r.Width - r.Web, T: r.Flange})
	case ShapeTee:
		cl.add(&Element{Name: "flange", Kind: Outstand, C: (r.Width - r.Web) / 2, T: r.Flange})
		cl.add(&Element{Name: "stem", Kind: Outstand, C: r.Depth - r.Flange, T: r.Web})
	}
}

// effectiveOpen sets p.AEff and p.WEff of a class 4 angle, channel or tee
// from the reduction factors rho of its parts (EN 1993-1-5:2006 4.4,
// Tables 4.1 and 4.2 with psi = 1): an outstand keeps rho of its width
// next to its supported edge, an internal part rho in two halves at its
// edges. An angle's leg keeps rho of its outstand h - t (rho from h/t,
// on the safe side). WEff is the effective section's second moment about
// its own principal axes over its extreme-fibre distance, as for the I
// and RHS sections; the shift of the effective centroid (EN 1993-1-1
// 6.2.2.5(4), an added moment N e_N) is not modelled.
func effectiveOpen(r Section, p *Props, cl *Classification) {
	var d drawn
	switch r.Shape {
	case ShapeAngle:
		t := r.Thickness
		h := t + cl.Elements[0].Rho*(r.Depth-t)
		b := t + cl.Elements[1].Rho*(r.Width-t)
		d = angleDrawn(h, b, t, min(r.Root, h-t, b-t))
	case ShapeChannel:
		w, f := cl.Elements[0], cl.Elements[1]
		h, tf, tw := r.Depth, r.Flange, r.Web
		keep := w.Rho * w.C / 2
		d.rect(0, tw, 0, tf+keep)
		d.rect(0, tw, h-tf-keep, h)
		b := tw + f.Rho*f.C
		d.rect(tw, b, 0, tf)
		d.rect(tw, b, h-tf, h)
		d.vertex(0, 0)
		d.vertex(b, 0)
		d.vertex(b, h)
		d.vertex(0, h)
	case ShapeTee:
		f, s := cl.Elements[0], cl.Elements[1]
		h, tf, tw := r.Depth, r.Flange, r.Web
		half := tw/2 + f.Rho*f.C
		y0 := h - tf - s.Rho*s.C
		d.rect(-half, half, h-tf, h)
		d.rect(-tw/2, tw/2, y0, h-tf)
		d.vertex(-half, h)
		d.vertex(half, h)
		d.vertex(-tw/2, y0)
		d.vertex(tw/2, y0)
	}
	e := d.principal()
	p.AEff = e.A
	p.WEff = e.W
}
