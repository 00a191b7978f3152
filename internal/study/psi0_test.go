package study

import (
	"math"
	"strings"
	"testing"
)

// psi0Study is a column under a permanent load and two variable loads,
// each given its characteristic value so that the design load is known by
// hand.
const psi0Study = `units = "kN-m"
[member]
length = 3
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = "100 mm"
width = "100 mm"
[material]
modulus = "210 GPa"
yield = { dist = "lognormal", mean = "300 MPa", cov = 0.07 }
[capacity]
model = "curve"
[loads]
dead  = { dist = "normal", mean = 300, cov = 0.07 }
stock = { dist = "gumbel", mean = 150, cov = 0.25 }
snow  = { dist = "gumbel", mean = 100, cov = 0.4 }
[code_check]
characteristic = { "loads.stock" = 197.8, "loads.snow" = 142.6 }
`

// TestPsi0ByLoad: code_check.psi_0 as a table gives each named load its
// own combination factor (EN 1990:2002 Table A1.1: storage 1.0, snow 0.5
// below 1000 m): N_Ed = 1.35 * 300 + 1.5 * 142.6 + 1.5 * 1.0 * 197.8 =
// 915.6 kN with snow leading, against 851.43 kN with 0.7 for both (stock
// leading, 405 + 296.7 + 1.05 * 142.6), by hand. A name that is not a
// load, or a factor outside 0 to 1, is an error naming the key.
func TestPsi0ByLoad(t *testing.T) {
	for _, c := range []struct {
		psi     string
		want    float64 // kN
		leading string
	}{
		{"", 851.43, "loads.stock"},
		{"psi_0 = 0.7", 851.43, "loads.stock"},
		{"psi_0 = { stock = 1.0, snow = 0.5 }", 915.6, "loads.snow"},
		{`psi_0 = { "loads.stock" = 1 }`, 405 + 1.5*142.6 + 1.5*197.8, "loads.snow"},
	} {
		md, err := Build(parse(t, psi0Study+c.psi+"\n"))
		if err != nil {
			t.Fatal(err)
		}
		cc, err := md.CodeCheck()
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(cc.DesignLoad/1e3-c.want) > 1e-6*c.want || cc.Combination.Leading != c.leading {
			t.Errorf("%q: N_Ed %.6g kN leading %s, want %.6g kN leading %s", c.psi, cc.DesignLoad/1e3, cc.Combination.Leading, c.want, c.leading)
		}
	}
	for _, c := range []struct{ psi, want string }{
		{"psi_0 = { wind = 0.6 }", `code_check.psi_0.wind: "wind" is not a load of [loads]`},
		{"psi_0 = { snow = 1.2 }", "code_check.psi_0.snow: psi_0 = 1.2 is outside 0 to 1"},
		{`psi_0 = { snow = "half" }`, "code_check.psi_0.snow: must be a number from 0 to 1"},
	} {
		_, err := Parse("t.toml", []byte(psi0Study+c.psi+"\n"))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: error %v, want %q", c.psi, err, c.want)
		}
	}
}

// TestPsi0ByLoadCompanion: a Turkstra companion's characteristic value is
// the combination value psi_0 Q_k of the load it stands for (EN 1990 6.10),
// with that load's own psi_0 when code_check.psi_0 names it.
func TestPsi0ByLoadCompanion(t *testing.T) {
	text := strings.Replace(psi0Study, `snow  = { dist = "gumbel", mean = 100, cov = 0.4 }`,
		`snow  = { dist = "gumbel", mean = 100, cov = 0.4, companion = { dist = "gamma", mean = 20, cov = 1.0 } }`, 1)
	for _, c := range []struct {
		psi  string
		want float64
	}{
		{"", 0.7},
		{"psi_0 = { snow = 0.5 }", 0.5},
		{"psi_0 = { stock = 1.0 }", 0.7},
	} {
		md, err := Build(parse(t, text+c.psi+"\n"))
		if err != nil {
			t.Fatal(err)
		}
		var qk, comp float64
		for i, v := range md.Sim.Vars {
			switch v.Name {
			case "loads.snow":
				qk = md.Characteristic(i).Value
			case "loads.snow.companion":
				comp = md.Characteristic(i).Value
			}
		}
		if !(qk > 0) || math.Abs(comp-c.want*qk) > 1e-9*qk {
			t.Errorf("%q: companion %g N, want %g x Q_k %g N", c.psi, comp, c.want, qk)
		}
	}
}
