package report

import (
	"strings"
	"testing"
)

func TestNiceTicks(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		min, max float64
		want     string // labelled ticks
	}{
		{0, 2808, "0 500 1000 1500 2000 2500"},
		{0, 52, "0 10 20 30 40 50"},
		{-0.02, 1, "0 0.2 0.4 0.6 0.8 1"},
		{0, 0.0095, "0 0.002 0.004 0.006 0.008"},
		{1.9, 5.1, "2 2.5 3 3.5 4 4.5 5"},
		{200, 600, "200 300 400 500 600"},
		{0.6, 12.2, "2.5 5 7.5 10"},
	} {
		var got []string
		for _, tk := range (niceTicks{}).Ticks(c.min, c.max) {
			if tk.Label != "" {
				got = append(got, tk.Label)
			}
		}
		if g := strings.Join(got, " "); g != c.want {
			t.Errorf("ticks on [%v, %v]: %q, want %q", c.min, c.max, g, c.want)
		}
	}
	if ticks := (niceTicks{}).Ticks(1, 1); ticks != nil {
		t.Errorf("empty range gave %v", ticks)
	}
}

func TestDecadeTicks(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		min, max float64
		want     string
	}{
		{100, 1e6, "100 1 000 10 000 100 000 1 000 000"},
		{3000, 20000, "5 000 10 000 20 000"},
		{1e6, 1e8, "1 000 000 1e7 1e8"},
		{13000, 34000, "20 000 30 000"}, // a short run: every multiple
	} {
		var got []string
		for _, tk := range (decadeTicks{}).Ticks(c.min, c.max) {
			if tk.Label != "" {
				got = append(got, tk.Label)
			}
		}
		if g := strings.Join(got, " "); g != c.want {
			t.Errorf("ticks on [%v, %v]: %q, want %q", c.min, c.max, g, c.want)
		}
	}
}
