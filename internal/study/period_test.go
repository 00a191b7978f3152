package study

import (
	"math"
	"strings"
	"testing"

	"strutrisk/sim"
)

// periodStudy is base with its loads replaced and a target of the given
// reference period ("" for none).
func periodStudy(loads, ref string) string {
	s := strings.Replace(base, "[loads]\ndead = 300000\n", "[loads]\ndead = 300000\n"+loads, 1)
	if ref != "" {
		s += "[target]\nbeta = 3.8\nreference_period = \"" + ref + "\"\n"
	}
	return s
}

// TestLoadPeriodConversion: maxima over the load's period become maxima
// over the reference period. A Gumbel by max-stability (Gumbel 1958,
// Statistics of Extremes: the same scale, location + scale ln n); a
// lognormal by F^n, checked against the CDF of the distribution as
// written raised to n.
func TestLoadPeriodConversion(t *testing.T) {
	st := parse(t, periodStudy(`imposed = { dist = "gumbel", location = 100000, scale = 20000, period = "1 year" }
wind = { dist = "lognormal", mean = 50000, cov = 0.3, period = "1 year" }
snow = { dist = "gumbel", location = 100000, scale = 20000, period = "100 years" }
crane = { dist = "normal", mean = 40000, sd = 4000, period = "50 years" }
`, "50 years"))
	for _, c := range []struct {
		path   string
		period string
		n      float64
	}{
		{"loads.imposed", "1 year", 50}, {"loads.wind", "1 year", 50}, {"loads.snow", "100 years", 0.5}, {"loads.crane", "50 years", 0},
	} {
		q := find(st, c.path)
		if q.Period != c.period || q.MaximaN != c.n {
			t.Errorf("%s: period %q n %g, want %q %g", c.path, q.Period, q.MaximaN, c.period, c.n)
			continue
		}
		if c.n == 0 {
			if q.Written != nil {
				t.Errorf("%s: converted with n = 1", c.path)
			}
			continue
		}
		for _, x := range []float64{50000, 100000, 150000, 250000} {
			want := math.Pow(q.Written.CDF(x), c.n)
			if got := q.Dist.CDF(x); math.Abs(got-want) > 1e-12 {
				t.Errorf("%s: CDF(%g) %.15g, F^n %.15g", c.path, x, got, want)
			}
		}
	}
	// The exact form of a Gumbel: location 100 kN + 20 kN ln 50.
	if g, ok := find(st, "loads.imposed").Dist.(sim.Gumbel); !ok || math.Abs(g.Quantile(math.Exp(-1))-(100000+20000*math.Log(50))) > 1e-6 {
		t.Errorf("loads.imposed: %v, want gumbel(location %g)", find(st, "loads.imposed").Dist, 100000+20000*math.Log(50))
	}
	if !hasWarning(st, "loads.snow.period", "n = 0.5 < 1") {
		t.Errorf("no warning on the gumbel converted to a shorter period: %q", st.Warnings)
	}
}

// TestLoadPeriodCharacteristic: the 98 % fractile of annual maxima (EN
// 1990 4.1.2, from memory) of a load with its own period. Given as 1-year
// maxima and converted to 50 years, it is the 98 % fractile of the
// distribution as written; not converted (no reference period), a load
// of 10-year maxima gives F^-1(0.98^10).
func TestLoadPeriodCharacteristic(t *testing.T) {
	for _, c := range []struct {
		name, loads, ref string
		want             func(d sim.Dist) float64
	}{
		{"converted", `imposed = { dist = "lognormal", mean = 100000, cov = 0.3, period = "1 year" }`, "50 years",
			func(d sim.Dist) float64 { return d.Quantile(0.98) }},
		{"own period", `imposed = { dist = "lognormal", mean = 100000, cov = 0.3, period = "10 years" }`, "",
			func(d sim.Dist) float64 { return d.Quantile(math.Pow(0.98, 10)) }},
	} {
		st := parse(t, periodStudy(c.loads+"\n", c.ref))
		md, err := Build(st)
		if err != nil {
			t.Fatal(err)
		}
		q := find(st, "loads.imposed")
		written := q.Dist
		if q.Written != nil {
			written = q.Written
		}
		i := -1
		for j, v := range md.Sim.Vars {
			if v.Name == q.Path {
				i = j
			}
		}
		ch := md.Characteristic(i)
		if w := c.want(written); math.Abs(ch.Value/w-1) > 1e-9 {
			t.Errorf("%s: characteristic %.9g (%s), want %.9g", c.name, ch.Value, ch.Basis, w)
		}
	}
}

// TestLoadPeriodProblems: bad periods are refused with the key and its
// line; a point-in-time load against a reference period is warned about.
func TestLoadPeriodProblems(t *testing.T) {
	for _, c := range []struct {
		name, text, want string
	}{
		{"misspelt key", periodStudy(`imposed = { dist = "gumbel", mean = 100000, cov = 0.3, perod = "1 year" }`+"\n", "50 years"),
			`t.toml:15: loads.imposed: perod: unknown parameter; did you mean "period"?`},
		{"misspelt value", periodStudy(`imposed = { dist = "gumbel", mean = 100000, cov = 0.3, period = "point in time" }`+"\n", "50 years"),
			`t.toml:15: loads.imposed: period: "point in time" is not a period; did you mean "point-in-time"?`},
		{"not a duration", periodStudy(`imposed = { dist = "gumbel", mean = 100000, cov = 0.3, period = "annual" }`+"\n", "50 years"),
			`t.toml:15: loads.imposed: period: "annual" is not a duration`},
		{"not a load", strings.Replace(base, "yield = 355", `yield = { dist = "lognormal", mean = 380, cov = 0.07, period = "1 year" }`, 1),
			`t.toml:10: material.yield: period applies only to a load in [loads]`},
		{"permanent", strings.Replace(base, "dead = 300000", `dead = { dist = "normal", mean = 300000, cov = 0.1, period = "1 year" }`, 1),
			`t.toml:14: loads.dead: period: loads.dead is a permanent load`},
		{"longer, not gumbel", periodStudy(`imposed = { dist = "lognormal", mean = 100000, cov = 0.3, period = "100 years" }`+"\n", "50 years"),
			`t.toml:15: loads.imposed: period = 100 years is longer than the reference period of 50 years`},
	} {
		_, err := Parse("t.toml", []byte(c.text))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: %v\nwant %q", c.name, err, c.want)
		}
	}
	st := parse(t, periodStudy(`imposed = { dist = "gumbel", mean = 100000, cov = 0.3, period = "point-in-time" }`+"\n", "50 years"))
	if !hasWarning(st, "loads.imposed.period (line 15)", "not the maximum over the reference period of 50 years") {
		t.Errorf("no point-in-time warning: %q", st.Warnings)
	}
	if q := find(st, "loads.imposed"); q.MaximaN != 0 || q.Period != PointInTime {
		t.Errorf("point-in-time load: period %q n %g", q.Period, q.MaximaN)
	}
}

func hasWarning(st *Study, parts ...string) bool {
	for _, w := range st.Warnings {
		all := true
		for _, p := range parts {
			all = all && strings.Contains(w, p)
		}
		if all {
			return true
		}
	}
	return false
}
