package sim

import (
	"math"
	"testing"
)

func TestSpearman(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		name string
		x, y []float64
		want float64
	}{
		// A strictly increasing transform keeps ranks: rho = 1 (definition).
		{"monotone", []float64{0.1, 2, -3, 4, 5.5}, []float64{math.Exp(0.1), math.Exp(2), math.Exp(-3), math.Exp(4), math.Exp(5.5)}, 1},
		{"decreasing", []float64{1, 2, 3, 4}, []float64{-1, -8, -27, -64}, -1},
		// Ties take average ranks: x ranks (1, 2.5, 2.5, 4), y ranks (1, 2, 3, 4);
		// Pearson of those is 4.5/sqrt(4.5*5) = 0.9486833 (hand computation).
		{"ties", []float64{1, 2, 2, 3}, []float64{10, 20, 30, 40}, 3 / math.Sqrt(10)},
		// Identical tied vectors correlate perfectly.
		{"same ties", []float64{1, 1, 2, 2, 3}, []float64{1, 1, 2, 2, 3}, 1},
		// Textbook-style example: ranks d = (0, -1, 1, 0, 0), sum d^2 = 2, n = 5,
		// rho = 1 - 6*2/(5*24) = 0.9 (Spearman's formula without ties).
		{"formula", []float64{1, 2, 3, 4, 5}, []float64{1, 3, 2, 4, 5}, 0.9},
		{"constant", []float64{1, 1, 1}, []float64{1, 2, 3}, math.NaN()},
		{"short", []float64{1}, []float64{2}, math.NaN()},
		{"nan", []float64{1, math.NaN(), 3}, []float64{1, 2, 3}, math.NaN()},
	} {
		got := Spearman(c.x, c.y)
		if math.IsNaN(c.want) {
			if !math.IsNaN(got) {
				t.Errorf("%s: got %v, want NaN", c.name, got)
			}
			continue
		}
		if math.Abs(got-c.want) > 1e-12 {
			t.Errorf("%s: got %v, want %v", c.name, got, c.want)
		}
	}
}

func TestSpearmanTable(t *testing.T) {
	t.Parallel()
	s := &Samples{Names: []string{"a", "b", "g"}, Rows: [][]float64{{1, 5, 10}, {2, 4, 20}, {3, 3, 30}, {4, 1, 40}}}
	got, err := SpearmanTable(s, "g")
	if err != nil {
		t.Fatal(err)
	}
	if len(got) != 2 || got[0].Name != "a" || got[0].Rho != 1 || got[1].Name != "b" || got[1].Rho != -1 {
		t.Errorf("got %+v", got)
	}
	if _, err := SpearmanTable(s, "capacity"); err == nil {
		t.Error("missing column: no error")
	}
	if _, err := SpearmanTable(nil, "g"); err == nil {
		t.Error("nil table: no error")
	}
}
