package report

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
)

// zipBundle is a zipped sweep of two keys over the given lengths, the bow
// L/1000 at the first point growing by L/1000 a point, for the study and
// one variant (0.5 lower), beta falling with both keys.
func zipBundle(lengths []float64) *Bundle {
	c := &CaseTable{StudyName: "perry-robertson", Zipped: true,
		Keys:   []string{"member.length (mm)", "imperfection.bow (fraction of L)"},
		Params: []string{"member.length", "imperfection.bow"},
		Names:  []string{"study (perry-robertson)", "thinner wall"}, Models: []string{"perry-robertson", "perry-robertson"}}
	for i, l := range lengths {
		c.Points = append(c.Points, []float64{l, 0.001 * float64(i+1)})
	}
	for s := 0; s < 2; s++ {
		line := make([]*Point, len(c.Points))
		for i, p := range c.Points {
			beta := 6 - (p[0]-3000)/1000 - 400*p[1] - 0.5*float64(s)
			pf := 0.5 * math.Erfc(beta/math.Sqrt2)
			line[i] = &Point{Value: p[0], Pf: pf, Beta: Index(beta), PfCI: [2]float64{0.9 * pf, 1.1 * pf}}
		}
		c.Grid = append(c.Grid, line)
	}
	target := 3.8
	return &Bundle{Cases: c, Doc: &Document{TargetBeta: &target}, SweepLabel: strings.Join(c.Keys, ", ")}
}

// TestZipPositions: the points of a zipped sweep lie at the first key's
// values when these run one way at spacings within a factor of 3, else
// one step a point in the order of the sweep.
func TestZipPositions(t *testing.T) {
	for _, tt := range []struct {
		name    string
		lengths []float64
		onFirst bool
	}{
		{"even, rising", []float64{3000, 4000, 5000, 6000}, true},
		{"even, falling", []float64{6000, 5000, 4000}, true},
		{"spacings within 3", []float64{3000, 4000, 6000, 7000}, true},
		{"spacings beyond 3 (log-spaced)", []float64{1000, 2000, 4000, 8000}, false},
		{"back and forth", []float64{3000, 5000, 4000, 6000}, false},
		{"a value twice", []float64{3000, 4000, 4000, 5000}, false},
	} {
		c := zipBundle(tt.lengths).Cases
		xs, onFirst := zipPositions(c)
		if onFirst != tt.onFirst {
			t.Errorf("%s: on the first key %v, want %v", tt.name, onFirst, tt.onFirst)
			continue
		}
		for i, x := range xs {
			want := float64(i)
			if onFirst {
				want = tt.lengths[i]
			}
			if x != want {
				t.Errorf("%s: point %d at %g, want %g", tt.name, i, x, want)
			}
		}
	}
}

// TestZipFigure: a zipped sweep is drawn as sweep.png, one curve per
// series, each labelled point carrying every key's value (L/n for the
// bow) and λ when known; a long sweep labels at most maxZipLabels
// points; a grid or a one-point sweep has no such picture.
func TestZipFigure(t *testing.T) {
	b := zipBundle([]float64{3000, 4000, 5000, 6000})
	b.Cases.Lambda = []float64{0.8, 1.1, 1.4, 1.7}
	b.SweepLambdaAxis = "minor"
	f := sweepFigure(b)
	if f == nil || f.Name != "sweep" || len(f.Plots) != 2 {
		t.Fatalf("picture %v, want sweep with the β and pf panels", f)
	}
	ticks := zipTicks(b.Cases, []float64{3000, 4000, 5000, 6000}, zipRows(b))
	if got, want := ticks[1].Label, "4000\nL/500\nλ 1.10"; got != want {
		t.Errorf("second point labelled %q, want %q", got, want)
	}
	if !strings.Contains(f.Caption, "at their values of member.length (mm)") || !strings.Contains(f.Caption, "then imperfection.bow (fraction of L), then λ") {
		t.Errorf("caption %q does not say where the points lie and what is under them", f.Caption)
	}
	if f.H <= 9*vg.Centimeter {
		t.Errorf("height %v leaves no room for the rows under the axis", f.H)
	}
	svg, err := f.render("svg")
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range []string{"study (perry-robertson)", "thinner wall", "L/250"} {
		if !strings.Contains(string(svg), s) {
			t.Errorf("picture lacks %q", s)
		}
	}

	long := make([]float64, 30)
	for i := range long {
		long[i] = 3000 + 100*float64(i)
	}
	b = zipBundle(long)
	labelled := 0
	for _, tk := range zipTicks(b.Cases, long, zipRows(b)) {
		if tk.Label != "" {
			labelled++
		}
	}
	if labelled > maxZipLabels || labelled < maxZipLabels/2 {
		t.Errorf("%d of 30 points labelled, want at most %d and at least half of it", labelled, maxZipLabels)
	}
	if f := sweepFigure(b); f == nil || !strings.Contains(f.Caption, "every point is in cases.csv") {
		t.Error("a long zipped sweep's caption does not say that not every point is labelled")
	}

	b = zipBundle([]float64{3000, 4000})
	b.Cases.Zipped = false // every combination would be a grid
	if f := sweepFigure(b); f != nil {
		t.Error("a grid of several keys drawn as a zipped sweep")
	}
	if f := sweepFigure(zipBundle([]float64{3000})); f != nil {
		t.Error("a zipped sweep of one point drawn as a curve")
	}
}

// TestZipFigureMarksUntrusted: an untrusted case of a zipped sweep is
// marked as in the one-key picture.
func TestZipFigureMarksUntrusted(t *testing.T) {
	b := zipBundle([]float64{3000, 4000, 5000, 6000})
	b.Cases.Grid[1][2].Doubtful = true
	f := sweepFigure(b)
	if f == nil {
		t.Fatal("no picture")
	}
	svg, err := f.render("svg")
	if err != nil {
		t.Fatal(err)
	}
	if n := strings.Count(string(svg), ">?<"); n != 2 || !strings.Contains(f.Caption, "does not trust") {
		t.Errorf("%d marks ? (want 2), caption %q", n, f.Caption)
	}
}
