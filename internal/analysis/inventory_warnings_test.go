package analysis

import (
	"reflect"
	"strings"
	"testing"
)

// TestGroupMemberWarnings: a warning several members share is given once
// with their number and first names; one member's own keeps its name.
func TestGroupMemberWarnings(t *testing.T) {
	for _, c := range []struct {
		name  string
		names []string
		warns [][]string
		total int
		want  []string
	}{
		{"one member", []string{"A"}, [][]string{{"w"}}, 1, []string{`member "A": w`}},
		{"own warnings", []string{"A", "B"}, [][]string{{"a"}, {"b"}}, 2, []string{`member "A": a`, `member "B": b`}},
		{"shared by all", []string{"A", "B", "C", "D", "E"}, [][]string{{"w", "a"}, {"w"}, {"w"}, {"w"}, {"w", "e"}}, 5,
			[]string{`all 5 members ("A", "B", "C", ...): w`, `member "A": a`, `member "E": e`}},
		{"shared by some", []string{"A", "B", "C"}, [][]string{{"w"}, nil, {"w"}}, 3, []string{`2 members ("A", "C"): w`}},
		{"interrupted", []string{"A", "B"}, [][]string{{"w"}, {"w"}}, 4, []string{`2 members ("A", "B"): w`}},
		{"said twice", []string{"A", "B"}, [][]string{{"w", "w"}, nil}, 2, []string{`member "A": w`}},
	} {
		if got := groupMemberWarnings(c.names, c.warns, c.total); !reflect.DeepEqual(got, c.want) {
			t.Errorf("%s: got %q, want %q", c.name, got, c.want)
		}
	}
}

// TestInventoryWarningOnce: the study's own warning (the snow load has no
// companion, so it takes its reference-period maximum in the other case)
// applies to every member and is given once for all of them.
func TestInventoryWarningOnce(t *testing.T) {
	text := strings.Replace(twoLoadsStudy, `, companion = { dist = "gamma", mean = "60 kN", cov = 1.0 }`, "", 1)
	text = strings.Replace(text, "samples    = 200_000", "samples    = 20_000", 1)
	l := loadInventory(t, text, "name\nA\nB\nC\nD\n")
	l.Study.Sensitivity.Tornado, l.Study.Sensitivity.Sobol = false, false
	s := l.Settings(1)
	r, err := Run(t.Context(), l, &s, nil)
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	for _, w := range r.warnings {
		if strings.Contains(w, "no companion") && strings.Contains(w, "member") {
			got = append(got, w)
		}
	}
	if len(got) != 1 || !strings.HasPrefix(got[0], `all 4 members ("A", "B", "C", ...): `) {
		t.Errorf("the missing companion's warning for the members: %q, want it once for all 4", got)
	}
}
