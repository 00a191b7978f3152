package column

// channelDrawn returns a channel of depth h (web along y), flange width b
// (along x from the back of the web), flange thickness tf and web
// thickness tw, the back of the web on x = 0 and the flanges towards +x.
// Root and toe radii are neglected.
//
// With the midline dimensions b' = b - tw/2 and h' = h - tf, the shear
// centre lies on the axis of symmetry at e = 3 b'^2 tf / (6 b' tf + h' tw)
// behind the web midline, and the warping constant is
//
//	Iw = tf b'^3 h'^2 / 12 (3 b' tf + 2 h' tw) / (6 b' tf + h' tw)
//
// (thin-walled channel; Timoshenko & Gere, Theory of Elastic Stability,
// 2nd ed., 8.3; Young & Budynas, Roark's Formulas for Stress and Strain,
// Table 10.2; from memory). St Venant constant by the thin-wall sum
// (2 b' tf^3 + h' tw^3)/3.
func channelDrawn(h, b, tf, tw float64) drawn {
	var d drawn
	d.rect(0, tw, 0, h)
	d.rect(tw, b, 0, tf)
	d.rect(tw, b, h-tf, h)
	d.vertex(0, 0)
	d.vertex(b, 0)
	d.vertex(b, h)
	d.vertex(0, h)
	bm, hm := b-tw/2, h-tf
	den := 6*bm*tf + hm*tw
	e := 3 * bm * bm * tf / den
	d.xs, d.ys = tw/2-e, h/2
	d.it = (2*bm*tf*tf*tf + hm*tw*tw*tw) / 3
	d.iw = tf * bm * bm * bm * hm * hm / 12 * (3*bm*tf + 2*hm*tw) / den
	return d
}
