package study

import (
	"strconv"
	"strings"
	"testing"
)

// TestNormaliseSweptWarning: under normalise = "design" a swept or
// variant load key is warned of, naming the key and its line; its CoV,
// or a study without normalisation, is not.
func TestNormaliseSweptWarning(t *testing.T) {
	loads := `dead = { dist = "normal", mean = 100000, cov = 0.1 }
imposed = { dist = "gumbel", mean = 50000, cov = 0.3, period = "1 year" }`
	n := strings.Count(stockyStudy(loads, "normalise = \"design\""), "\n")
	for _, c := range []struct {
		name, check, add string
		want             []string // "" for no warning
	}{
		{"swept mean", "normalise = \"design\"", "[sweep]\nparameter = \"loads.imposed.mean\"\nvalues = [30000, 60000]\n",
			[]string{"sweep.parameter (line " + itoa(n+2) + "): loads.imposed.mean sets a load", "only the loads' spread and their proportion can change"}},
		{"swept axis, load_ratio", "normalise = \"design\"\nload_ratio = 0.5",
			"[[sweep.axis]]\nparameter = \"member.length\"\nvalues = [500, 600]\n[[sweep.axis]]\nparameter = \"loads.dead\"\nvalues = [100000, 200000]\n",
			[]string{"sweep.axis[1].parameter (line " + itoa(n+6) + "): loads.dead sets a load", "code_check.load_ratio fixes their proportion"}},
		{"variant", "normalise = \"design\"", "[[variant]]\nname = \"heavy\"\nset = { \"loads.dead.mean\" = 150000 }\n",
			[]string{`variant "heavy" (line ` + itoa(n+3) + "): loads.dead.mean sets a load"}},
		{"swept cov", "normalise = \"design\"", "[sweep]\nparameter = \"loads.imposed.cov\"\nvalues = [0.2, 0.4]\n", nil},
		{"no normalisation", "", "[sweep]\nparameter = \"loads.imposed.mean\"\nvalues = [30000, 60000]\n", nil},
	} {
		t.Run(c.name, func(t *testing.T) {
			st := parse(t, stockyStudy(loads, c.check)+c.add)
			var got []string
			for _, w := range st.Warnings {
				if strings.Contains(w, "sets a load") {
					got = append(got, w)
				}
			}
			if len(c.want) == 0 {
				if len(got) > 0 {
					t.Errorf("warnings %q, want none", got)
				}
				return
			}
			if len(got) != 1 {
				t.Fatalf("warnings %q, want one", got)
			}
			for _, w := range c.want {
				if !strings.Contains(got[0], w) {
					t.Errorf("warning %q\nwant %q in it", got[0], w)
				}
			}
		})
	}
}

// TestNormaliseCancelsLoadLevel is why the warning is given: with
// load_ratio, two cases that differ only in a load's mean have the same
// normalised loads.
func TestNormaliseCancelsLoadLevel(t *testing.T) {
	st := parse(t, stockyStudy(`dead = { dist = "normal", mean = 100000, cov = 0.1 }
imposed = { dist = "gumbel", mean = 50000, cov = 0.3, period = "1 year" }`, "normalise = \"design\"\nload_ratio = 0.5")+
		"[sweep]\nparameter = \"loads.dead.mean\"\nvalues = [100000, 200000]\n")
	a, err := st.Derive(-1, 0)
	if err != nil {
		t.Fatal(err)
	}
	b, err := st.Derive(-1, 1)
	if err != nil {
		t.Fatal(err)
	}
	for i := range a.Loads {
		ma, mb := a.Loads[i].Dist.Mean(), b.Loads[i].Dist.Mean()
		if !near(ma, mb, 1e-12) {
			t.Errorf("load %s: mean %g at the first value, %g at the second; want equal", a.Loads[i].Path, ma, mb)
		}
	}
}

func itoa(n int) string { return strconv.Itoa(n) }
