package report

import (
	"strings"
	"testing"

	"strutrisk/sim"
)

// A band narrower than its line is still drawn, one a series, and the
// legend and caption say that it may be hidden behind the line.
func TestSweepNarrowBands(t *testing.T) {
	t.Parallel()
	series := func(name string, shift float64) Series {
		s := Series{Name: name}
		for i, beta := range []float64{4.5, 4, 3.5, 3} {
			beta -= shift
			// A precise estimate: a band of ±0.005 in β.
			pf, lo, hi := sim.PfFromBeta(beta), sim.PfFromBeta(beta+0.005), sim.PfFromBeta(beta-0.005)
			s.Points = append(s.Points, Point{Value: 1000 * float64(i+1), Pf: pf, Beta: Index(beta), PfCI: [2]float64{lo, hi}})
		}
		return s
	}
	b := &Bundle{Doc: &Document{}, Series: []Series{series("a", 0), series("b", 0.5)}, SweepLabel: "member length (mm)"}
	f := sweepFigure(b)
	if f == nil {
		t.Fatal("no picture")
	}
	svg, err := f.render("svg")
	if err != nil {
		t.Fatal(err)
	}
	if n := strings.Count(string(svg), "fill-opacity"); n != 3 {
		t.Errorf("%d translucent fills in the picture, want 3: a band for each of the 2 series and the legend's swatch", n)
	}
	for _, s := range bandLegend {
		if !strings.Contains(string(svg), s) {
			t.Errorf("legend lacks %q", s)
		}
	}
	if !strings.Contains(f.Caption, "narrower than the line") {
		t.Errorf("caption %q does not say a band may be hidden behind its line", f.Caption)
	}
}

// A case whose estimate the engine does not trust is no point of its
// curve: no line or band joins it, it is drawn apart as a grey ring
// marked "?", and the legend and caption say so.
func TestSweepMarksUntrustedCases(t *testing.T) {
	t.Parallel()
	pt := func(x, beta float64, doubtful bool) Point {
		pf := sim.PfFromBeta(beta)
		return Point{Value: x, Pf: pf, Beta: Index(beta), Doubtful: doubtful,
			PfCI: [2]float64{sim.PfFromBeta(beta + 0.1), sim.PfFromBeta(beta - 0.1)}}
	}
	tests := []struct {
		name      string
		points    []Point
		runs      [][]float64 // x of each run of trusted points
		doubtX    []float64   // x of the untrusted cases
		wantBands int
	}{
		{"all trusted", []Point{pt(1, 4, false), pt(2, 3.5, false), pt(3, 3, false)}, [][]float64{{1, 2, 3}}, nil, 1},
		{"one in the middle", []Point{pt(1, 4, false), pt(2, 3.5, false), pt(3, 3, true), pt(4, 2.5, false), pt(5, 2, false)},
			[][]float64{{1, 2}, {4, 5}}, []float64{3}, 2},
		{"first and last", []Point{pt(1, 4, true), pt(2, 3.5, false), pt(3, 3, false), pt(4, 2.5, true)},
			[][]float64{{2, 3}}, []float64{1, 4}, 1},
		{"alone between two", []Point{pt(1, 4, true), pt(2, 3.5, false), pt(3, 3, true)},
			[][]float64{{2}}, []float64{1, 3}, 0},
		{"none trusted", []Point{pt(1, 4, true), pt(2, 3.5, true)}, nil, []float64{1, 2}, 0},
	}
	for _, tt := range tests {
		c := newSweepCurve(tt.points)
		if len(c.beta) != len(tt.runs) || len(c.pf) != len(tt.runs) {
			t.Errorf("%s: %d runs of β and %d of pf, want %d", tt.name, len(c.beta), len(c.pf), len(tt.runs))
			continue
		}
		for k, want := range tt.runs {
			for j, x := range want {
				if j >= len(c.beta[k]) || c.beta[k][j].X != x || c.pf[k][j].X != x {
					t.Errorf("%s: run %d is %v, want the points at x = %v", tt.name, k, c.beta[k], want)
					break
				}
			}
		}
		if len(c.doubtBeta) != len(tt.doubtX) || len(c.doubtPf) != len(tt.doubtX) {
			t.Errorf("%s: %d untrusted marks in β, %d in pf, want %d", tt.name, len(c.doubtBeta), len(c.doubtPf), len(tt.doubtX))
			continue
		}
		for j, x := range tt.doubtX {
			if c.doubtBeta[j].X != x || c.doubtPf[j].X != x {
				t.Errorf("%s: untrusted mark %d at x = %g, want %g", tt.name, j, c.doubtBeta[j].X, x)
			}
		}
		if n := len(c.bands()); n != tt.wantBands {
			t.Errorf("%s: %d bands, want %d (one per run of two points or more)", tt.name, n, tt.wantBands)
		}
	}

	series := Series{Name: "study", Points: []Point{pt(1000, 4, false), pt(2000, 3.5, false), pt(3000, 3, true), pt(4000, 2.5, false)}}
	b := &Bundle{Doc: &Document{}, Series: []Series{series}, SweepLabel: "member length (mm)"}
	f := sweepFigure(b)
	if f == nil {
		t.Fatal("no picture")
	}
	svg, err := f.render("svg")
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(svg), doubtLegend) {
		t.Errorf("legend lacks %q", doubtLegend)
	}
	// One "?" beside the case in each panel.
	if n := strings.Count(string(svg), ">?<"); n != 2 {
		t.Errorf("%d marks ? in the picture, want 2 (the untrusted case in the β and the pf panel)", n)
	}
	if !strings.Contains(f.Caption, "does not trust") {
		t.Errorf("caption %q does not say what the grey rings are", f.Caption)
	}
	// Without an untrusted case, neither legend nor caption speak of one.
	series.Points[2].Doubtful = false
	f = sweepFigure(&Bundle{Doc: &Document{}, Series: []Series{series}, SweepLabel: "member length (mm)"})
	svg, _ = f.render("svg")
	if strings.Contains(string(svg), doubtLegend) || strings.Contains(f.Caption, "does not trust") {
		t.Error("a sweep with every case trusted speaks of untrusted cases")
	}
}
