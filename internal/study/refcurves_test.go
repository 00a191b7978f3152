package study

import (
	"math"
	"strings"
	"testing"
)

// TestReferenceCurves checks the comparison curves of the slenderness
// picture: the EN 1993-1-1 curve "b" at relative slenderness 1, 2 and 3
// gives chi = 0.597023, 0.209461, 0.099432 (EN 1993-1-1:2005 eq. 6.49 with
// alpha = 0.34 of Table 6.1), and the secant curve with a vanishing
// eccentricity tends to the Euler/squash envelope (common practice: the
// perfect member buckles at min(1, 1/lam^2)).
func TestReferenceCurves(t *testing.T) {
	text := strings.Replace(base, `bow = "L/1000"`, `bow = "L/1000"`+"\neccentricity = \"0.001 mm\"", 1)
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	curves := md.ReferenceCurves(3, 3)
	byName := map[string]RefCurve{}
	for _, c := range curves {
		byName[c.Name] = c
	}
	cb, ok := byName["EN 1993-1-1 curve b (reference)"]
	if !ok {
		t.Fatalf("no curve b among %d curves", len(curves))
	}
	want := []float64{0.597023, 0.209461, 0.099432}
	for i := range want {
		if !near(cb.X[i], float64(i+1), 1e-9) || math.Abs(cb.Y[i]-want[i]) > 5e-7 {
			t.Errorf("curve b point %d: (%.6f, %.6f), want (%d, %.6f)", i, cb.X[i], cb.Y[i], i+1, want[i])
		}
	}
	var sec *RefCurve
	for i := range curves {
		if strings.HasPrefix(curves[i].Name, "secant") {
			sec = &curves[i]
		}
	}
	if sec == nil {
		t.Fatal("no secant curve")
	}
	for i, l := range sec.X {
		env := math.Min(1, 1/(l*l))
		if math.Abs(sec.Y[i]-env) > 0.01 {
			t.Errorf("secant at lam %.3f: %.5f, want about %.5f", l, sec.Y[i], env)
		}
	}
	for _, c := range curves {
		if strings.HasPrefix(c.Name, "perry-robertson") {
			t.Errorf("the study's own model is listed again as %q", c.Name)
		}
	}
}
