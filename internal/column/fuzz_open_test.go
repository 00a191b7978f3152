package column

import (
	"math"
	"testing"
)

// FuzzOpenSection feeds arbitrary dimensions to the angle, channel and tee:
// Properties, Classify and the capacity models must never panic, and
// properties they accept are finite (a degenerate section, a zero leg or
// a tee without web, is an error instead).
func FuzzOpenSection(f *testing.F) {
	f.Add(uint8(ShapeAngle), 100.0, 100.0, 10.0, 0.0, 12.0, 0.0, 600.0)
	f.Add(uint8(ShapeAngle), 100.0, 100.0, 0.0, 0.0, 0.0, 0.0, 600.0)
	f.Add(uint8(ShapeTee), 12.0, 150.0, 12.0, 8.0, 0.0, 0.0, 1000.0)
	f.Add(uint8(ShapeChannel), 200.0, 75.0, 11.5, 8.5, 0.0, 1.0, 700.0)
	f.Add(uint8(ShapeTee), 150.0, 150.0, 12.0, 0.0, 0.0, 0.0, 1e-300)
	f.Fuzz(func(t *testing.T, shape uint8, h, b, tf, tw, r, loss, l float64) {
		s := Section{Shape: ShapeAngle + Shape(shape%3), Depth: h, Width: b, ThicknessLoss: loss}
		if s.Shape == ShapeAngle {
			s.Thickness, s.Root = tf, r
		} else {
			s.Flange, s.Web = tf, tw
		}
		p, err := s.Properties()
		if err != nil {
			return
		}
		for _, x := range []float64{p.A, p.I[0], p.I[1], p.C[0], p.C[1], p.S[0], p.S[1], p.It, p.Iw} {
			if math.IsNaN(x) || math.IsInf(x, 0) {
				t.Fatalf("%+v: properties %+v", s, p)
			}
		}
		if _, _, err := s.Classify(355); err != nil {
			return
		}
		m := Member{Props: p, E: 210000, Fy: 355, Length: l, K: [2]float64{1, 1}, Bow: l / 1000, Alpha: [2]float64{0.34, 0.49}}
		if res, err := FirstYield(&m, Both); err == nil && !(res.N >= 0) {
			t.Fatalf("%+v L %g: first-yield capacity %v", s, l, res.N)
		}
		if res, err := Curve(&m, Both); err == nil && !(res.N >= 0) {
			t.Fatalf("%+v L %g: curve capacity %v", s, l, res.N)
		}
	})
}
