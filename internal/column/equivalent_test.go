package column

import (
	"math"
	"testing"
)

// en1993Chi is the reduction factor of EN 1993-1-1:2005 6.3.1.2,
// eq. (6.49), written out from the standard: Phi = 0.5 [1 + alpha (lam -
// 0.2) + lam^2], chi = 1/(Phi + sqrt(Phi^2 - lam^2)) <= 1.
func en1993Chi(lam, alpha float64) float64 {
	phi := 0.5 * (1 + alpha*(lam-0.2) + lam*lam)
	return math.Min(1, 1/(phi+math.Sqrt(phi*phi-lam*lam)))
}

// The equivalent bow makes first yield reproduce chi of the EN 1993-1-1
// curves a0 to d (alpha of Table 6.1) over relative slenderness 0.2 to 2,
// for a pinned member and for a cantilever of half its length (the bow is
// taken in the buckling mode, on the equivalent member K L).
func TestEquivalentBowReproducesEN1993(t *testing.T) {
	alphas := map[string]float64{"a0": 0.13, "a": 0.21, "b": 0.34, "c": 0.49, "d": 0.76} // EN 1993-1-1 Table 6.1
	for name, alpha := range alphas {
		for i := 0; i <= 180; i++ {
			lam := 0.2 + 0.01*float64(i)
			for _, k := range []float64{1, 2} {
				m := bcTestMember(1, 0, 0)
				// Length for the relative slenderness lam about the minor axis.
				m.Length = lam * math.Pi * math.Sqrt(m.E/m.Fy) * m.Props.R[Minor] / k
				m.K = [2]float64{k, k}
				m.Bow = EquivalentBow(m, Minor, alpha)
				res, err := PerryRobertson(m, Minor)
				if err != nil {
					t.Fatal(err)
				}
				want := en1993Chi(lam, alpha)
				if got := res.N / (m.Props.A * m.Fy); math.Abs(got-want) > 1e-12 {
					t.Errorf("curve %s, lam %.2f, K %g: chi %.15f, EN 1993-1-1 eq. (6.49) %.15f", name, lam, k, got, want)
				}
			}
		}
	}
}

func TestEquivalentBowValues(t *testing.T) {
	m := bcTestMember(1, 0, 0)
	lamOf := func(l float64) float64 { m.Length = l; return RelativeSlenderness(m, Minor) }
	// Below lam = 0.2 there is no bow (EN 1993-1-1 6.3.1.2(4): chi = 1).
	if lamOf(400) >= 0.2 {
		t.Fatal("test member not stocky")
	}
	if e := EquivalentBow(m, Minor, 0.49); e != 0 {
		t.Errorf("stocky: e0 = %g, want 0", e)
	}
	// e0 = alpha (lam - 0.2) W/A, written out.
	lam := lamOf(5000)
	want := 0.34 * (lam - 0.2) * m.Props.W[Minor] / m.Props.A
	if e := EquivalentBow(m, Minor, 0.34); math.Abs(e-want) > 1e-12*want {
		t.Errorf("e0 = %g, want %g", e, want)
	}
	if e := EquivalentBow(m, Minor, math.NaN()); e != 0 {
		t.Errorf("NaN alpha: e0 = %g, want 0", e)
	}
}

// In the modes that twist the section the equivalent bow reproduces the
// curve of EN 1993-1-1:2005 6.3.1.4 (eq. (6.49) with lam_T = sqrt(A fy /
// N_cr) and the minor axis's alpha), as Twisting's curve model gives it:
// short equal and unequal angles, whose flexural-torsional load governs.
func TestEquivalentTwistingBow(t *testing.T) {
	for _, s := range []Section{
		{Shape: ShapeAngle, Depth: 100, Width: 100, Thickness: 10, Root: 12},
		{Shape: ShapeAngle, Depth: 150, Width: 90, Thickness: 10, Root: 12},
	} {
		p, err := s.Properties()
		if err != nil {
			t.Fatal(err)
		}
		for _, l := range []float64{400, 600, 900, 1500} {
			for _, alpha := range []float64{0.34, 0.49} {
				m := Member{Props: p, E: 210000, Fy: 355, Length: l, K: [2]float64{1, 1}, Alpha: [2]float64{alpha, alpha}}
				ncr, _ := TwistingLoad(&m)
				want := p.EffectiveArea() * 355 * en1993Chi(math.Sqrt(p.EffectiveArea()*355/ncr), alpha)
				m.Bow = EquivalentTwistingBow(&m, alpha)
				got, err := Twisting(&m, GovernsFirstYield)
				if err != nil {
					t.Fatal(err)
				}
				if math.Abs(got.N-want) > 1e-9*want {
					t.Errorf("%v, L %g, alpha %g: first yield with the equivalent bow %.9g, eq. (6.49) with lam_T %.9g", s, l, alpha, got.N, want)
				}
			}
		}
	}
}
