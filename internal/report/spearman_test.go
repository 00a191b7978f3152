package report

import (
	"strings"
	"testing"
)

func TestByRankCorrelation(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		in   []KV
		want string // keys in order
	}{
		{[]KV{{"a", "+0.520"}, {"b", "-0.610"}, {"c", "-0.300"}}, "b a c"},
		{[]KV{{"a", "0.1"}, {"b", "n/a"}, {"c", "-0.9"}, {"d", "0.1"}}, "c a d b"}, // ties keep order, a non-number goes last
		{[]KV{{"a", "−0.7"}, {"b", "0.2"}}, "a b"},                                 // a minus sign as typeset
		{nil, ""},
	} {
		var got []string
		for _, kv := range byRankCorrelation(c.in) {
			got = append(got, kv.Key)
		}
		if g := strings.Join(got, " "); g != c.want {
			t.Errorf("byRankCorrelation(%v) = %q, want %q", c.in, g, c.want)
		}
	}
	in := []KV{{"a", "0.1"}, {"b", "0.9"}}
	byRankCorrelation(in)
	if in[0].Key != "a" {
		t.Error("byRankCorrelation changed its argument")
	}
}

// The HTML and the Markdown list the rank correlations largest first.
func TestSpearmanTableOrder(t *testing.T) {
	t.Parallel()
	b := demoBundle()
	b.Spearman = []KV{{"material.yield", "+0.520"}, {"loads.imposed", "-0.610"}, {"imperfection.bow", "-0.300"}}
	html, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	md := Markdown(b)
	for name, s := range map[string]string{"HTML": string(html), "Markdown": md} {
		at := strings.Index(s, "Rank correlation with the margin")
		if at < 0 {
			t.Errorf("%s has no rank correlation table", name)
			continue
		}
		sec := s[at:]
		i, j, k := strings.Index(sec, "loads.imposed"), strings.Index(sec, "material.yield"), strings.Index(sec, "imperfection.bow")
		if i < 0 || j < 0 || k < 0 || !(i < j && j < k) {
			t.Errorf("%s rank correlation table not sorted by |ρ| (positions %d %d %d)", name, i, j, k)
		}
	}
}
