package column

import (
	"math"
	"testing"
)

// Angles, channels and tees in pure compression against EN 1993-1-1:2005
// Table 5.2 (angles: h/t <= 15 eps and (b + h)/2t <= 11.5 eps for class 3;
// outstands 9/10/14 eps; internal parts 33/38/42 eps), and their
// effective areas against EN 1993-1-5:2006 4.4 worked by hand: outstand
// rho = (lp - 0.188)/lp^2 (eq. 4.3), internal rho = (lp - 0.22)/lp^2
// (eq. 4.2), lp = (c/t) / (28.4 eps sqrt(k_sigma)), k_sigma 0.43 and 4.
func TestClassifyOpen(t *testing.T) {
	rhoOut := func(ct, eps float64) float64 {
		lp := ct / (28.4 * eps * math.Sqrt(0.43))
		if lp <= 0.748 {
			return 1
		}
		return (lp - 0.188) / (lp * lp)
	}
	rhoIn := func(ct, eps float64) float64 {
		lp := ct / (28.4 * eps * 2)
		if lp <= 0.673 {
			return 1
		}
		return (lp - 0.22) / (lp * lp)
	}
	eps355 := math.Sqrt(235.0 / 355)
	tests := []struct {
		name  string
		sec   Section
		fy    float64
		class int
		aEff  float64 // 0: the gross area
	}{
		// h/t 10 <= 15 eps; (b + h)/2t = 10 <= 11.5 eps = 10.63 at S275
		{"L100x100x10 S275", Section{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10}, 275, 3, 0},
		// (b + h)/2t = 10 > 11.5 eps = 9.36 at S355: class 4, but each leg's
		// lp = 10 / 15.15 = 0.66 <= 0.748: rho 1, A_eff = A.
		{"L100x100x10 S355", Section{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10}, 355, 4, 0},
		// h/t 16.7 > 15 eps = 12.2: both legs keep t + rho (h - t).
		{"L200x200x12 S355", Section{Shape: ShapeAngle, Depth: 200, Width: 200, Thickness: 12}, 355,
			4, 12 * (2*(12+rhoOut(200.0/12, eps355)*188) - 12)},
		// web c/t = (400 - 20)/6 = 63.3 > 42 eps; flange (100 - 6)/10 = 9.4 <= 14 eps
		{"channel 400x100 S355", Section{Shape: ShapeChannel, Depth: 400, Width: 100, Flange: 10, Web: 6}, 355,
			4, 2*100*10 + 6*380*rhoIn(380.0/6, eps355)},
		// stem c/t = (200 - 10)/8 = 23.75 > 14 eps; flange (150 - 8)/2/10 = 7.1 <= 9 eps: class 1
		{"tee 200x150 S355", Section{Shape: ShapeTee, Depth: 200, Width: 150, Flange: 10, Web: 8}, 355,
			4, 150*10 + 8*190*rhoOut(190.0/8, eps355)},
		// stem (100 - 10)/8 = 11.25: between 10 and 14 eps, class 3
		{"tee 100x100 S235", Section{Shape: ShapeTee, Depth: 100, Width: 100, Flange: 10, Web: 8}, 235, 3, 0},
	}
	for _, tt := range tests {
		p, cl, err := tt.sec.Classify(tt.fy)
		if err != nil {
			t.Fatalf("%s: %v", tt.name, err)
		}
		want := tt.aEff
		if want == 0 {
			want = p.A
		}
		if cl.Class != tt.class || math.Abs(p.EffectiveArea()-want) > 1e-9*want {
			t.Errorf("%s: class %d, A_eff %.6g; want class %d, A_eff %.6g (elements %+v)", tt.name, cl.Class, p.EffectiveArea(), tt.class, want, cl.Elements[:cl.N])
		}
		if cl.Class == 4 && !(p.WEff[Major] > 0 && p.WEff[Minor] > 0 && p.WEff[Minor] <= p.W[Minor]*(1+1e-12)) {
			t.Errorf("%s: W_eff %v against W %v", tt.name, p.WEff, p.W)
		}
	}
}
