package column

// angleDrawn returns an angle with legs h (along y, the depth) and b (along
// x, the width) of thickness t, heel at the origin, and a root fillet of
// radius r (toe radii are neglected: they remove a few mm^2 at the toes).
//
// Shear centre at the intersection of the leg midlines (t/2, t/2), where
// the thin-walled sectorial area vanishes (Timoshenko & Gere, Theory of
// Elastic Stability, 2nd ed., 5.4 and 8.3). St Venant constant by the
// thin-wall sum of b t^3/3 over the midline lengths h - t/2 and b - t/2;
// warping constant (t^3/36)(h'^3 + b'^3), h' = h - t/2, b' = b - t/2, the
// thickness correction of the thin-walled value zero (Galambos, Guide to
// Stability Design Criteria for Metal Structures; from memory).
func angleDrawn(h, b, t, r float64) drawn {
	var d drawn
	d.rect(0, t, 0, h)
	d.rect(t, b, 0, t)
	d.fillet(t, t, r)
	d.vertex(0, 0)
	d.vertex(b, 0)
	d.vertex(b, t)
	d.vertex(t, h)
	d.vertex(0, h)
	d.xs, d.ys = t/2, t/2
	hm, bm := h-t/2, b-t/2
	d.it = (hm + bm) * t * t * t / 3
	d.iw = t * t * t / 36 * (hm*hm*hm + bm*bm*bm)
	return d
}
