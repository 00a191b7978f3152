package column

import (
	"errors"
	"math"
	"testing"
)

// TestClass4BeamColumn: the first-yield beam-column on a class 4 section
// resists N with A_eff and M with W_eff, as the closed-form first yield
// does (P/A_eff + P e0/(1 - P/PE)/W_eff = fy, the Perry-Robertson
// equation of Ayrton & Perry on the effective section; the finite
// elements converge to it for a pinned member with a half-sine bow), and
// the ultimate beam-column refuses the section (its fibres cannot buckle
// locally).
func TestClass4BeamColumn(t *testing.T) {
	ro, ri := RHSCornerRadii(4, ColdFormed)
	sec := Section{Shape: ShapeRHS, Depth: 400, Width: 400, Thickness: 4, Radius: ro, InnerRadius: ri}
	p, _, err := sec.Classify(355)
	if err != nil || p.AEff == 0 {
		t.Fatalf("A_eff %g, %v", p.AEff, err)
	}
	m := Member{Props: p, E: 210000, Fy: 355, Length: 8000, K: [2]float64{1, 1}, Bow: 8}
	want, err := FirstYield(&m, Major)
	if err != nil {
		t.Fatal(err)
	}
	got, err := BeamColumn(&m, sec, Major, &BeamOptions{Elements: 80})
	if err != nil {
		t.Fatal(err)
	}
	if d := math.Abs(got.N/want.N - 1); d > 2e-3 {
		t.Errorf("beam-column first yield %.1f kN, closed form %.1f kN (%.2g)", got.N/1e3, want.N/1e3, d)
	}
	if want.N > p.AEff*m.Fy {
		t.Errorf("first yield %.1f kN above A_eff fy %.1f kN", want.N/1e3, p.AEff*m.Fy/1e3)
	}
	if _, err := BeamColumn(&m, sec, Major, &BeamOptions{Limit: UltimateLimit}); !errors.Is(err, errBeamClass4) {
		t.Errorf("ultimate beam-column on class 4: %v, want a refusal", err)
	}
}

// TestCustomEffective: a custom section's stated effective area makes it
// class 4 with WEff = W (A_eff/A)^2 (the conservative simplification of
// customEffective); without one it stays unclassified and fully effective.
func TestCustomEffective(t *testing.T) {
	s := Section{Shape: ShapeCustom, Area: 4000, IMajor: 3e7, IMinor: 1e7, CMajor: 150, CMinor: 100, EffArea: 3000}
	p, cl, err := s.Classify(355)
	if err != nil {
		t.Fatal(err)
	}
	f := 0.75 * 0.75
	if cl.Class != 4 || p.AEff != 3000 || math.Abs(p.WEff[Major]-2e5*f) > 1e-6 || math.Abs(p.WEff[Minor]-1e5*f) > 1e-6 {
		t.Errorf("class %d, A_eff %g, W_eff %v; want 4, 3000, [%g %g]", cl.Class, p.AEff, p.WEff, 2e5*f, 1e5*f)
	}
	s.EffArea = 0
	if p, cl, _ := s.Classify(355); cl.Class != 0 || p.AEff != 0 {
		t.Errorf("no effective area: class %d, A_eff %g; want 0, 0", cl.Class, p.AEff)
	}
}
