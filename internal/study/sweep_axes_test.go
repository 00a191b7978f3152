package study

import (
	"fmt"
	"strings"
	"testing"
)

// twoAxes sweeps the length over three values and the bow over two.
const twoAxes = `[sweep]
%s
[[sweep.axis]]
parameter = "member.length"
values = ["2 m", "3 m", "4 m"]
[[sweep.axis]]
parameter = "imperfection.bow"
from = "L/1000"
to = "L/500"
steps = %d
`

// TestSweepAxesPoints checks the swept points of several keys: every
// combination, the last axis fastest, for a grid; the values in step for
// zip; a single axis is the plain sweep.
func TestSweepAxesPoints(t *testing.T) {
	for _, c := range []struct {
		name, combine string
		steps         int
		want          [][2]float64 // length (mm), bow (fraction of L)
	}{
		{"grid by default", "", 2, [][2]float64{{2000, 0.001}, {2000, 0.002}, {3000, 0.001}, {3000, 0.002}, {4000, 0.001}, {4000, 0.002}}},
		{"grid", `combine = "grid"`, 2, [][2]float64{{2000, 0.001}, {2000, 0.002}, {3000, 0.001}, {3000, 0.002}, {4000, 0.001}, {4000, 0.002}}},
		{"zip", `combine = "zip"`, 3, [][2]float64{{2000, 0.001}, {3000, 0.0015}, {4000, 0.002}}},
	} {
		t.Run(c.name, func(t *testing.T) {
			st := parse(t, base+fmt.Sprintf(twoAxes, c.combine, c.steps))
			if st.Sweep != nil || st.Grid == nil || len(st.SweptAxes()) != 2 {
				t.Fatalf("sweep %v, grid %v", st.Sweep, st.Grid)
			}
			if st.SweptPoints() != len(c.want) || st.Cases() != len(c.want) {
				t.Fatalf("%d points, %d cases, want %d", st.SweptPoints(), st.Cases(), len(c.want))
			}
			for i, w := range c.want {
				got := st.PointValues(i)
				if !near(got[0], w[0], 1e-12) || !near(got[1], w[1], 1e-12) {
					t.Errorf("point %d = %v, want %v", i, got, w)
				}
				// Each case reads as the study with both keys set.
				d, err := st.Derive(-1, i)
				if err != nil {
					t.Fatalf("Derive(-1, %d): %v", i, err)
				}
				if !near(d.Length.Value, w[0], 1e-12) || !near(d.Bow.Value, w[1]*w[0], 1e-9) {
					t.Errorf("case %d: length %v, bow %v mm, want %v, %v", i, d.Length.Value, d.Bow.Value, w[0], w[1]*w[0])
				}
			}
		})
	}
	st := parse(t, base+"[[sweep.axis]]\nparameter = \"member.length\"\nvalues = [\"2 m\", \"3 m\"]\n")
	if st.Grid != nil || st.Sweep == nil || st.Sweep.Parameter != "member.length" || len(st.Sweep.Values) != 2 {
		t.Errorf("one axis: sweep %v, grid %v; want the plain sweep", st.Sweep, st.Grid)
	}
}

// TestCaseList checks the one list of cases: the study at every swept
// point, then each variant at the study's values and at every point,
// named as the file writes them.
func TestCaseList(t *testing.T) {
	st := parse(t, base+fmt.Sprintf(twoAxes, `combine = "zip"`, 3)+
		"[[variant]]\nname = \"thick\"\nset = { \"member.section.thickness\" = 10 }\n")
	list := st.CaseList()
	if len(list) != st.Cases() || len(list) != 7 {
		t.Fatalf("%d cases, Cases() %d, want 7", len(list), st.Cases())
	}
	want := []Case{
		{-1, 0, `member.length = 2 m, imperfection.bow = L/1000`},
		{-1, 1, `member.length = 3 m, imperfection.bow = L/666.6666666666666`},
		{-1, 2, `member.length = 4 m, imperfection.bow = L/500`},
		{0, -1, `variant "thick"`},
		{0, 0, `variant "thick" at member.length = 2 m, imperfection.bow = L/1000`},
	}
	for i, w := range want {
		if list[i] != w {
			t.Errorf("case %d = %+v, want %+v", i, list[i], w)
		}
	}
	d, err := st.Derive(list[6].Variant, list[6].Point)
	if err != nil || find(d, "member.section.thickness").Value != 10 || d.Length.Value != 4000 {
		t.Errorf("last case: %v", err)
	}
}

// TestSweepAxesErrors checks that a wrong sweep of several keys names the
// key and its line.
func TestSweepAxesErrors(t *testing.T) {
	n := strings.Count(base, "\n")
	long := "[[sweep.axis]]\nparameter = \"member.length\"\nfrom = \"1 m\"\nto = \"5 m\"\nsteps = 200\n" +
		"[[sweep.axis]]\nparameter = \"imperfection.bow\"\nfrom = \"L/1000\"\nto = \"L/200\"\nsteps = 200\n"
	for _, c := range []struct{ name, add, want string }{
		{"zip lengths", fmt.Sprintf(twoAxes, `combine = "zip"`, 2),
			`sweep.axis[1].steps: combine = "zip" takes the axes' values in step: sweep.axis[1] has 2 values, sweep.axis[0] has 3`},
		{"too many", long,
			"sweep.axis: the grid of the swept keys has more than the 10000 cases a study may run (200 x 200 values)"},
		{"too many with a variant", "[[sweep.axis]]\nparameter = \"member.length\"\nfrom = \"1 m\"\nto = \"5 m\"\nsteps = 100\n" +
			"[[sweep.axis]]\nparameter = \"imperfection.bow\"\nfrom = \"L/1000\"\nto = \"L/200\"\nsteps = 60\n" +
			"[[variant]]\nname = \"thick\"\nset = { \"member.section.thickness\" = 10 }\n",
			"sweep: 12001 cases (the study and 1 variants, at 6000 swept points) are more than the 10000"},
		{"same key twice", "[[sweep.axis]]\nparameter = \"member.length\"\nvalues = [2000]\n[[sweep.axis]]\nparameter = \"member.length\"\nvalues = [3000]\n",
			`sweep.axis[1].parameter: "member.length" is swept in sweep.axis[0] already`},
		{"parameter beside axes", "[sweep]\nparameter = \"member.length\"\n[[sweep.axis]]\nparameter = \"member.length\"\nvalues = [2000]\n",
			"sweep.parameter: with [[sweep.axis]] tables, parameter belongs in each axis table"},
		{"combine one key", "[sweep]\nparameter = \"member.length\"\nvalues = [2000]\ncombine = \"zip\"\n",
			"sweep.combine: combine joins several [[sweep.axis]] tables"},
		{"bad combine", fmt.Sprintf(twoAxes, `combine = "cross"`, 2), "sweep.combine"},
		{"unknown key", "[[sweep.axis]]\nparameter = \"member.length\"\nvalues = [2000]\nstep = 3\n", "sweep.axis[0].step: unknown key"},
		{"bad value", "[[sweep.axis]]\nparameter = \"member.length\"\nvalues = [2000]\n[[sweep.axis]]\nparameter = \"imperfection.bow\"\nvalues = [\"L/500\", \"3 mm\"]\n",
			"sweep.axis[1].values[1]: the swept values mix L/n and values with a unit"},
		{"case problem", "[[sweep.axis]]\nparameter = \"imperfection.bow\"\nvalues = [\"L/500\"]\n[[sweep.axis]]\nparameter = \"member.length\"\nvalues = [2000, 0]\n",
			"sweep.axis[1].values[1]: a length must be positive"},
	} {
		t.Run(c.name, func(t *testing.T) {
			_, err := Parse("t.toml", []byte(base+c.add))
			if err == nil || !strings.Contains(err.Error(), c.want) {
				t.Fatalf("error %v\nwant %q", err, c.want)
			}
			for _, pr := range err.(*Error).Problems {
				if pr.Line <= n {
					t.Errorf("problem %q at line %d, want after line %d", pr, pr.Line, n)
				}
			}
		})
	}
}
