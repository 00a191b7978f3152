package study

import (
	"math"
	"strings"
	"testing"
)

func TestSweepValues(t *testing.T) {
	for _, c := range []struct {
		name, text string
		label      string
		values     []float64
		rel        bool
	}{
		{"list", "[sweep]\nparameter = \"member.length\"\nvalues = [\"2 m\", 2500, \"3.5 m\"]\n",
			"member.length (mm)", []float64{2000, 2500, 3500}, false},
		{"linear", "[sweep]\nparameter = \"member.length\"\nfrom = \"1 m\"\nto = \"2 m\"\nsteps = 5\n",
			"member.length (mm)", []float64{1000, 1250, 1500, 1750, 2000}, false},
		{"log", "[sweep]\nparameter = \"loads.dead\"\nfrom = \"10 kN\"\nto = \"1 MN\"\nsteps = 3\nscale = \"log\"\n",
			"loads.dead (N)", []float64{1e4, 1e5, 1e6}, false},
		{"L/n", "[sweep]\nparameter = \"imperfection.bow\"\nvalues = [\"L/1000\", \"L/500\"]\n",
			"imperfection.bow (fraction of L)", []float64{0.001, 0.002}, true},
		{"L/n range", "[sweep]\nparameter = \"imperfection.bow\"\nfrom = \"L/1000\"\nto = \"L/250\"\nsteps = 4\n",
			"imperfection.bow (fraction of L)", []float64{0.001, 0.002, 0.003, 0.004}, true},
		{"plain", "[sweep]\nparameter = \"member.k\"\nvalues = [0.7, 1.0]\n",
			"member.k", []float64{0.7, 1}, false},
	} {
		t.Run(c.name, func(t *testing.T) {
			text := strings.Replace(base, `ends = "pinned-pinned"`, "k = 1", 1)
			st := parse(t, text+c.text)
			sw := st.Sweep
			if sw.Label() != c.label {
				t.Errorf("label %q, want %q", sw.Label(), c.label)
			}
			if len(sw.Values) != len(c.values) {
				t.Fatalf("%d values, want %d", len(sw.Values), len(c.values))
			}
			for i, q := range sw.Values {
				if !near(q.Value, c.values[i], 1e-12) || q.Relative != c.rel {
					t.Errorf("value %d = %v (relative %v), want %v (%v)", i, q.Value, q.Relative, c.values[i], c.rel)
				}
			}
		})
	}
}

// TestDerive checks that each case reads as the study file with the keys
// set: quantities, a distribution's parameter, keys that are not
// quantities, removed keys; the swept value wins over a variant's.
func TestDerive(t *testing.T) {
	text := strings.Replace(base, "dead = 300000", "dead = { dist = \"normal\", mean = \"300 kN\", cov = 0.1 }", 1) + `[sweep]
parameter = "loads.dead.mean"
values = ["200 kN", "400 kN"]
[[variant]]
name = "curve"
set = { "capacity.model" = "curve", "capacity.curve" = "c", "imperfection.bow" = "unset" }
[[variant]]
name = "heavier"
set = { "loads.dead.mean" = "1 MN", "imperfection.bow" = "L/500", "member.length" = "2 m" }
`
	st := parse(t, text)
	if len(st.Warnings) != 0 {
		t.Errorf("warnings %q", st.Warnings)
	}
	mean := func(s *Study) float64 { return s.Loads[0].Dist.Mean() }
	d, err := st.Derive(-1, 1)
	if err != nil || !near(mean(d), 4e5, 1e-12) || d.Sweep != nil || len(d.Variants) != 0 {
		t.Fatalf("Derive(-1, 1): mean %v, %v", mean(d), err)
	}
	if d.File != st.File || d.SHA256 != st.SHA256 {
		t.Errorf("derived file %q %q", d.File, d.SHA256)
	}
	d, err = st.Derive(0, -1)
	if err != nil || d.Model.String() != "curve" || d.Bow != nil || d.Alpha[0].Value != 0.49 || !near(mean(d), 3e5, 1e-12) {
		t.Fatalf("Derive(0, -1) = model %q bow %v, %v", d.Model, d.Bow, err)
	}
	d, err = st.Derive(1, -1)
	if err != nil || !near(mean(d), 1e6, 1e-12) || d.Length.Value != 2000 || !near(d.Bow.Value, 4, 1e-12) {
		t.Fatalf("Derive(1, -1): mean %v, length %v, bow %v, %v", mean(d), d.Length.Value, d.Bow.Value, err)
	}
	d, err = st.Derive(1, 0)
	if err != nil || !near(mean(d), 2e5, 1e-12) || d.Length.Value != 2000 {
		t.Fatalf("Derive(1, 0): mean %v, %v", mean(d), err)
	}
	// The study itself is untouched.
	if !near(mean(st), 3e5, 1e-12) || st.Model.String() != "perry-robertson" {
		t.Errorf("the study changed: mean %v, model %q", mean(st), st.Model)
	}
	if _, err := st.Derive(2, 0); err == nil {
		t.Error("Derive(2, 0): no error for a variant that does not exist")
	}
}

// TestCaseErrors checks that problems of a case are reported at the key
// that causes them, with its line, or name the case.
func TestCaseErrors(t *testing.T) {
	n := strings.Count(base, "\n")
	for _, c := range []struct{ add, want string }{
		{"[sweep]\nparameter = \"member.length\"\nvalues = [\"2 m\", 0]\n",
			"sweep.values[1]: a length must be positive"},
		{"[sweep]\nparameter = \"imperfection.bow\"\nvalues = [\"L/500\", \"3 mm\"]\n",
			"sweep.values[1]: the swept values mix L/n and values with a unit"},
		{"[sweep]\nparameter = \"member.length\"\nvalues = [1000]\nfrom = 1\n",
			"sweep.values: give values, or from, to and steps, not both"},
		{"[sweep]\nparameter = \"member.length\"\nfrom = 1000\nsteps = 3\n",
			"sweep.to: missing: a sweep by range needs from, to and steps"},
		{"[sweep]\nparameter = \"loads.dead.mean\"\nvalues = [1]\n",
			`"loads.dead.mean" is not a quantity of this study`},
		{"[[variant]]\nname = \"secant\"\nset = { \"capacity.model\" = \"secant\" }\n",
			`imperfection.eccentricity: with the values of variant "secant": missing: model secant needs a load eccentricity`},
		{"[[variant]]\nname = \"a\"\nset = { \"imperfection.bow\" = \"L/500\" }\n[[variant]]\nname = \"a\"\nset = { \"imperfection.bow\" = \"L/400\" }\n",
			`variant[1].name: two variants are named "a"`},
		{"[[variant]]\nname = \"a\"\nset = {}\n", "variant[0].set: the variant sets nothing"},
		{"[[variant]]\nname = \"a\"\nset = { \"member.length\" = { dist = \"normal\", mean = 3000, sd = -1 } }\n",
			"variant[0].set.member.length: sd = -1 mm must be positive"},
	} {
		_, err := Parse("t.toml", []byte(base+c.add))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q:\nerror %v\nwant %q", c.add, err, c.want)
			continue
		}
		// Every problem has the line of a key written after the base, or
		// (a key the variant makes necessary) of the table to add it to.
		for _, pr := range err.(*Error).Problems {
			if pr.Line <= n && !strings.HasPrefix(pr.Key, "imperfection.eccentricity") || pr.Line == 0 {
				t.Errorf("%q: problem %q at line %d, want after line %d", c.add, pr, pr.Line, n)
			}
		}
	}
}

// TestSweepRangeEnds checks that a range ends exactly at to, and that a
// study in kN-m reads from and to in its units.
func TestSweepRangeEnds(t *testing.T) {
	text := "units = \"kN-m\"\n" + strings.Replace(strings.Replace(base, "length = 3000", "length = 3", 1), "dead = 300000", "dead = 300", 1)
	text = strings.Replace(text, "diameter = 168.3\nthickness = 8", "diameter = \"168.3 mm\"\nthickness = \"8 mm\"", 1)
	text = strings.Replace(text, "modulus = 205000\nyield = 355", "modulus = \"205 GPa\"\nyield = \"355 MPa\"", 1)
	st := parse(t, text+"[sweep]\nparameter = \"member.length\"\nfrom = 0.3\nto = 0.7\nsteps = 3\n")
	v := st.Sweep.Values
	if v[0].Value != 300 || v[2].Value != 700 || !near(v[1].Value, 500, 1e-12) {
		t.Errorf("values %v %v %v, want 300 500 700 mm", v[0].Value, v[1].Value, v[2].Value)
	}
	d, err := st.Derive(-1, 1)
	if err != nil || math.Abs(d.Length.Value-500) > 1e-9 {
		t.Errorf("derived length %v, %v", d.Length.Value, err)
	}
}
