package report

import (
	"strings"
	"testing"
)

// TestFORMShowsNoInterval: a FORM estimate carries a zero-width interval
// in the document; the summary and the HTML do not show it as a sampling
// interval, and a sampled estimate still shows its own.
func TestFORMShowsNoInterval(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		method string
		ci     []float64
		want   bool
	}{
		{"form", []float64{1e-4, 1e-4}, false},
		{"monte-carlo", []float64{0.9e-4, 1.1e-4}, true},
	} {
		b := &Bundle{Doc: &Document{Title: "t", Method: c.method, Pf: ptr(1e-4), PfCI: c.ci, PfCoV: ptr(0.0), Beta: ptr(Index(3.719)), BetaCI: []Index{3.7, 3.74}}}
		sum := SummaryText(b)
		html, err := HTML(b)
		if err != nil {
			t.Fatal(err)
		}
		for name, tc := range map[string]struct{ text, ci string }{
			"summary": {sum, "[" + PfText(c.ci[0]) + ", " + PfText(c.ci[1]) + "]"},
			"HTML":    {string(html), intervalText(c.ci, prob)},
		} {
			if got := strings.Contains(tc.text, tc.ci); got != c.want {
				t.Errorf("%s: %s shows interval %q: %v, want %v", c.method, name, tc.ci, got, c.want)
			}
		}
		if strings.Contains(sum, "cov of pf") != c.want {
			t.Errorf("%s: summary CoV shown %v, want %v:\n%s", c.method, !c.want, c.want, sum)
		}
	}
}
