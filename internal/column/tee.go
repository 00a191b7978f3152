package column

// teeDrawn returns a tee of overall depth h (along y), flange width b
// (along x, centred on x = 0), flange thickness tf and web (stem)
// thickness tw, the flange at the top. Root and toe radii are neglected.
//
// Shear centre at the intersection of the flange and web midlines
// (0, h - tf/2), where the thin-walled sectorial area vanishes
// (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., 5.4). St
// Venant constant by the thin-wall sum (b tf^3 + h' tw^3)/3 with the web
// midline length h' = h - tf/2; warping constant
// tf^3 b^3/144 + tw^3 h'^3/36, the thickness correction of the
// thin-walled value zero (Galambos, Guide to Stability Design Criteria for
// Metal Structures; from memory).
func teeDrawn(h, b, tf, tw float64) drawn {
	var d drawn
	d.rect(-b/2, b/2, h-tf, h)
	d.rect(-tw/2, tw/2, 0, h-tf)
	d.vertex(-b/2, h)
	d.vertex(b/2, h)
	d.vertex(-b/2, h-tf)
	d.vertex(b/2, h-tf)
	d.vertex(-tw/2, 0)
	d.vertex(tw/2, 0)
	d.xs, d.ys = 0, h-tf/2
	hm := h - tf/2
	d.it = (b*tf*tf*tf + hm*tw*tw*tw) / 3
	d.iw = tf*tf*tf*b*b*b/144 + tw*tw*tw*hm*hm*hm/36
	return d
}
