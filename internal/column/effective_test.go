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
