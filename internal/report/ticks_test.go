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
		{0, 2808, "0|500|1 000|1 500|2 000|2 500"},
		{0, 52, "0|10|20|30|40|50"},
		{-0.02, 1, "0|0.2|0.4|0.6|0.8|1"},
		{0, 0.0095, "0|0.002|0.004|0.006|0.008"},
		{1.9, 5.1, "2|2.5|3|3.5|4|4.5|5"},
		{200, 600, "200|300|400|500|600"},
		{0.6, 12.2, "2.5|5|7.5|10"},
		// A swept member length in mm: grouped like the count axes.
		{1200, 12300, "2 000|4 000|6 000|8 000|10 000|12 000"},
		{-25000, 5000, "-25 000|-20 000|-15 000|-10 000|-5 000|0|5 000"},
		{1000, 1001, "1 000|1 000.2|1 000.4|1 000.6|1 000.8|1 001"},
	} {
		var got []string
		for _, tk := range (niceTicks{}).Ticks(c.min, c.max) {
			if tk.Label != "" {
				got = append(got, tk.Label)
			}
		}
		if g := strings.Join(got, "|"); g != c.want {
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

func TestGroupThousands(t *testing.T) {
	t.Parallel()
	for _, c := range []struct{ in, want string }{
		{"0", "0"}, {"999", "999"}, {"1000", "1 000"}, {"12000", "12 000"},
		{"-1500.5", "-1 500.5"}, {"1234567.25", "1 234 567.25"}, {"0.0001", "0.0001"},
		{"n/a", "n/a"},
	} {
		if got := groupThousands(c.in); got != c.want {
			t.Errorf("groupThousands(%q) = %q, want %q", c.in, got, c.want)
		}
	}
}
