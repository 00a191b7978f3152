package study

import (
	"math"
	"strings"
	"strutrisk/internal/column"
	"testing"
)

// TestReferenceCurves checks the comparison curves of the slenderness
// picture: the CHS of the base study is cold-formed by default, so EN
// 1993-1-1:2005 Table 6.2 gives curve "c", which at relative slenderness
// 1, 2 and 3 gives chi = 0.539939, 0.196184, 0.095092 (eq. 6.49 with
// alpha = 0.49 of Table 6.1), and the secant curve with a vanishing
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
	cb, ok := byName["EN 1993-1-1 curve c, both axes"]
	if !ok {
		t.Fatalf("no curve c among %v", curves)
	}
	if cb.Model != "curve" || !strings.Contains(cb.Note, "cold-formed") {
		t.Errorf("curve c: model %q, note %q", cb.Model, cb.Note)
	}
	want := []float64{0.539939, 0.196184, 0.095092}
	for i := range want {
		if !near(cb.X[i], float64(i+1), 1e-9) || math.Abs(cb.Y[i]-want[i]) > 5e-7 {
			t.Errorf("curve c point %d: (%.6f, %.6f), want (%d, %.6f)", i, cb.X[i], cb.Y[i], i+1, want[i])
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
	own := 0
	for _, c := range curves {
		if c.Model == "perry-robertson" {
			own++
			if c.Name != "study: perry-robertson, both axes" {
				t.Errorf("the study's own model is listed as %q", c.Name)
			}
		}
	}
	// A CHS is the same about both axes: each curve is drawn once.
	if own != 1 {
		t.Errorf("the study's own curve is drawn %d times, want once for both axes of a CHS", own)
	}
}

// TestReferenceCurvePerAxis: the reference buckling curve is chosen per
// axis from the section. An I section with tf <= 40 mm takes curve b about
// y-y and c about z-z, rolled with h/b <= 1.2 or welded alike (EN
// 1993-1-1:2005 Table 6.2); a study with model "curve" keeps its own
// curves; a custom section, which the table does not cover, takes b as a
// reference.
func TestReferenceCurvePerAxis(t *testing.T) {
	ish := strings.Replace(base, "shape = \"CHS\"\ndiameter = 168.3\nthickness = 8", "shape = \"I\"\ndepth = 254.1\nwidth = 254.6\nflange = 14.2\nweb = 8.6", 1)
	own := strings.Replace(base, "[loads]", "[capacity]\nmodel = \"curve\"\ncurve = { major = \"a\", minor = \"d\" }\n[loads]", 1)
	custom := strings.Replace(base, "shape = \"CHS\"\ndiameter = 168.3\nthickness = 8", "shape = \"custom\"\narea = 4000\ni_major = 2e7\ni_minor = 8e6\nc_major = 100\nc_minor = 80", 1)
	for _, c := range []struct {
		name, text   string
		major, minor string
	}{
		{"I section", ish, "b", "c"},
		{"the study's curves", own, "a", "d"},
		{"custom section", custom, "b", "b"},
	} {
		md, err := Build(parse(t, c.text))
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		for a, want := range []string{c.major, c.minor} {
			got, row, alpha := md.ReferenceCurve(column.Axis(a))
			wantAlpha, _ := column.CurveAlpha(want)
			if got != want || alpha != wantAlpha || row == "" {
				t.Errorf("%s, %v axis: curve %q (alpha %g, %s), want %q", c.name, column.Axis(a), got, alpha, row, want)
			}
		}
	}
	md, err := Build(parse(t, ish))
	if err != nil {
		t.Fatal(err)
	}
	names := map[string]bool{}
	for _, c := range md.ReferenceCurves(5, 3) {
		names[c.Name] = true
	}
	for _, want := range []string{"EN 1993-1-1 curve b, major axis", "EN 1993-1-1 curve c, minor axis", "study: perry-robertson, minor axis"} {
		if !names[want] {
			t.Errorf("no curve %q among %v", want, names)
		}
	}
}
