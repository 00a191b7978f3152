package report

import (
	"strings"
	"testing"
)

// TestRankInputs: FORM importance ranks when its design point converged;
// an unconverged one gives way to the Sobol indices, and the measure is
// always named. (Invented weights: the order is the check.)
func TestRankInputs(t *testing.T) {
	t.Parallel()
	form := &FORM{Importance: map[string]float64{"loads.imposed": 0.6, "material.yield": 0.3, "imperfection.bow": 0.1}}
	sobol := []Sobol{{Variable: "loads.imposed", Total: 0.2}, {Variable: "material.yield", Total: 0.5}, {Variable: "imperfection.bow", Total: 0.3}}
	no := false
	unconverged := *form
	unconverged.Converged = &no
	for _, c := range []struct {
		name    string
		d       *Document
		measure string
		first   string
		note    []string
	}{
		{"FORM", &Document{FORM: form, Sobol: sobol}, measureFORM, "loads.imposed", []string{"The rankings answer different questions", "FORM importance α² answers", "hence its different order"}},
		{"FORM not converged", &Document{FORM: &unconverged, Sobol: sobol}, measureSobol, "material.yield", []string{"The total Sobol index answers"}},
		{"tornado only", &Document{Tornado: []Tornado{{Variable: "a", Low: 0, High: 1}, {Variable: "b", Low: 3, High: 0}}}, measureTornado, "b", []string{"The tornado answers how far"}},
	} {
		r := RankInputs(c.d, 2)
		if r.Measure != c.measure || len(r.Inputs) != 2 || r.Inputs[0].Name != c.first {
			t.Errorf("%s: ranking %+v, want %s first by %s", c.name, r, c.first, c.measure)
		}
		if !strings.HasSuffix(r.Text(), "[by "+c.measure+"]") {
			t.Errorf("%s: text %q does not name its measure", c.name, r.Text())
		}
		note := RankingNote(c.d)
		for _, w := range c.note {
			if !strings.Contains(note, w) {
				t.Errorf("%s: note %q lacks %q", c.name, note, w)
			}
		}
		if strings.Count(note, ". ") > 0 || !strings.HasSuffix(note, ".") {
			t.Errorf("%s: note %q is not one sentence", c.name, note)
		}
	}
	if r := RankInputs(&Document{}, 3); r.Text() != "" || RankingNote(&Document{}) != "" {
		t.Errorf("an empty document ranks something: %+v", r)
	}
}

func TestWrapText(t *testing.T) {
	t.Parallel()
	got := WrapText("one two three four five", 9)
	if strings.Join(got, "|") != "one two|three|four five" {
		t.Errorf("WrapText = %q", got)
	}
}
