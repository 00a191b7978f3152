package report

import (
	"math"
	"strings"
	"testing"
)

func TestSummaryTextVerdict(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		name   string
		beta   float64
		ci     []Index
		target float64
		want   string
	}{
		{"met", 4.1, []Index{4.0, 4.2}, 3.8, "target beta        3.80: met"},
		{"not met", 2.9, []Index{2.89, 2.92}, 3.8, "3.80: NOT met"},
		{"straddles", 3.81, []Index{3.7, 3.95}, 3.8, "undecided at this sample size"},
		{"straddles below", 3.75, []Index{3.7, 3.85}, 3.8, "undecided at this sample size"},
		{"no interval", 3.9, nil, 3.8, "3.80: met"},
	} {
		b := &Bundle{Doc: &Document{Title: "t", Beta: ptr(Index(c.beta)), BetaCI: c.ci, TargetBeta: ptr(c.target)}}
		if got := SummaryText(b); !strings.Contains(got, c.want) {
			t.Errorf("%s: summary lacks %q:\n%s", c.name, c.want, got)
		}
	}
}

func TestSummaryTextDemo(t *testing.T) {
	t.Parallel()
	got := SummaryText(demoBundle())
	for _, s := range []string{
		"failure prob. pf   1.84e-3   95 % interval [1.76e-3, 1.93e-3]",
		"reliability beta   2.90   95 % interval [2.89, 2.92]",
		"NOT met",
		"reserve factor     0.810",
		"monte-carlo, 1000000 evaluations, cov of pf 0.023, seed 20261201",
		// FORM importance ranks first: 0.44, 0.31, then a tie at 0.12 broken by name.
		"loads.imposed (0.44), material.yield (0.31), imperfection.bow (0.12)  [by FORM importance alpha^2]",
		"nominal capacity   1402.0 kN (the minor axis)",
		CautionText,
	} {
		if !strings.Contains(got, s) {
			t.Errorf("summary lacks %q:\n%s", s, got)
		}
	}
}

func TestSummaryTextSparse(t *testing.T) {
	t.Parallel()
	// A check-only document with a non-finite value never prints NaN.
	b := &Bundle{Doc: &Document{Nominal: &Nominal{Capacity: math.NaN(), Axis: "minor"}}}
	got := SummaryText(b)
	if strings.Contains(got, "NaN") || !strings.Contains(got, "n/a") || !strings.Contains(got, CautionText) {
		t.Errorf("summary:\n%s", got)
	}
	if got := SummaryText(nil); !strings.Contains(got, CautionText) {
		t.Errorf("nil bundle: %q", got)
	}
	// Without FORM, Sobol total indices rank the inputs; without them, the
	// tornado swings.
	d := &Document{Sobol: []Sobol{{Variable: "a", Total: 0.2}, {Variable: "b", Total: 0.7}}}
	if got := SummaryText(&Bundle{Doc: d}); !strings.Contains(got, "b (0.7), a (0.2)  [by total Sobol index of the margin]") {
		t.Errorf("sobol ranking:\n%s", got)
	}
	d = &Document{Tornado: []Tornado{{Variable: "a", Low: 1, High: 2}, {Variable: "b", Low: 5, High: 1}}}
	if got := SummaryText(&Bundle{Doc: d}); !strings.Contains(got, "b (0.8), a (0.2)  [by share of the tornado swings of the margin]") {
		t.Errorf("tornado ranking:\n%s", got)
	}
}
