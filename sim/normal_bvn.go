package sim

import "math"

// Gauss-Legendre nodes (negative half) and weights of 6, 12 and 20
// points on [-1, 1]; the rule is symmetric.
var (
	legendreX = [3][]float64{
		{-0.9324695142031522, -0.6612093864662647, -0.2386191860831970},
		{-0.9815606342467191, -0.9041172563704750, -0.7699026741943050, -0.5873179542866171, -0.3678314989981802, -0.1252334085114692},
		{-0.9931285991850949, -0.9639719272779138, -0.9122344282513259, -0.8391169718222188, -0.7463319064601508, -0.6360536807265150, -0.5108670019508271, -0.3737060887154196, -0.2277858511416451, -0.07652652113349733},
	}
	legendreW = [3][]float64{
		{0.1713244923791705, 0.3607615730481384, 0.4679139345726904},
		{0.04717533638651177, 0.1069393259953183, 0.1600783285433464, 0.2031674267230659, 0.2334925365383547, 0.2491470458134029},
		{0.01761400713915212, 0.04060142980038694, 0.06267204833410906, 0.08327674157670475, 0.1019301198172404, 0.1181945319615184, 0.1316886384491766, 0.1420961093183821, 0.1491729864726037, 0.1527533871307259},
	}
)

// bvnUpper returns P(X > h, Y > k) for standard normals X and Y with
// correlation r, to an absolute error Genz gives as about 1e-15 (checked
// here to within formJoint2's own accuracy, 1e-11 of the larger limit's
// tail; absolute, not relative: use formJoint2 where a tiny probability
// must keep its digits), by Genz's method (A.
// Genz, "Numerical computation of rectangular bivariate and trivariate
// normal and t probabilities", Statistics and Computing 14, 2004,
// 251-260; from memory): for |r| < 0.925 Gauss-Legendre quadrature of
// Plackett's integral over asin r of the density,
//
//	P = Phi(-h) Phi(-k) + 1/(2 pi) ∫_0^asin r exp(-(h^2 + k^2 - 2 h k sin t) / (2 cos^2 t)) dt,
//
// for |r| >= 0.925 Drezner and Wesolowsky's expansion about |r| = 1 with
// a Gauss-Legendre correction. It costs a few dozen exponentials.
func bvnUpper(h, k, r float64) float64 {
	ng := 2
	switch a := math.Abs(r); {
	case a < 0.3:
		ng = 0
	case a < 0.75:
		ng = 1
	}
	xs, ws := legendreX[ng], legendreW[ng]
	hk := h * k
	if math.Abs(r) < 0.925 {
		hs := (h*h + k*k) / 2
		asr := math.Asin(r)
		var bvn float64
		for i, x := range xs {
			sn := math.Sin(asr * (x + 1) / 2)
			bvn += ws[i] * math.Exp((sn*hk-hs)/(1-sn*sn))
			sn = math.Sin(asr * (-x + 1) / 2)
			bvn += ws[i] * math.Exp((sn*hk-hs)/(1-sn*sn))
		}
		return bvn*asr/(4*math.Pi) + formTail(h)*formTail(k)
	}
	if r < 0 {
		k, hk = -k, -hk
	}
	var bvn float64
	if math.Abs(r) < 1 {
		as := (1 - r) * (1 + r)
		a := math.Sqrt(as)
		bs := (h - k) * (h - k)
		c := (4 - hk) / 8
		d := (12 - hk) / 16
		bvn = a * math.Exp(-(bs/as+hk)/2) * (1 - c*(bs-as)*(1-d*bs/5)/3 + c*d*as*as/5)
		if hk > -160 {
			b := math.Sqrt(bs)
			bvn -= math.Exp(-hk/2) * math.Sqrt(2*math.Pi) * formTail(b/a) * b * (1 - c*bs*(1-d*bs/5)/3)
		}
		a /= 2
		for i, x := range xs {
			xs2 := (a * (x + 1)) * (a * (x + 1))
			rs := math.Sqrt(1 - xs2)
			bvn += a * ws[i] * (math.Exp(-bs/(2*xs2)-hk/(1+rs))/rs - math.Exp(-(bs/xs2+hk)/2)*(1+c*xs2*(1+d*xs2)))
			xs2 = as * (-x + 1) * (-x + 1) / 4
			rs = math.Sqrt(1 - xs2)
			bvn += a * ws[i] * math.Exp(-(bs/xs2+hk)/2) * (math.Exp(-hk*xs2/(2*(1+rs)*(1+rs)))/rs - (1 + c*xs2*(1+d*xs2)))
		}
		bvn = -bvn / (2 * math.Pi)
	}
	if r > 0 {
		return bvn + formTail(math.Max(h, k))
	}
	return -bvn + math.Max(0, formTail(h)-formTail(k))
}
