package study

import (
	"math"
	"strings"
	"testing"
)

// TestCharacteristicOfCompanion: in a Turkstra case a companion stands
// for its load while another leads; EN 1990 6.10 represents it by its
// combination value psi_0 Q_k, Q_k the 98 % fractile of the load's annual
// maxima (EN 1990 4.1.2(7), from memory). Its characteristic value is
// that, whatever its own distribution describes (an ordinary day's value,
// not a maximum over the reference period: its 0.98^50 fractile was
// taken before, and the demo store-two-loads reported a partial factor of
// 4.5 for it). Q_k in closed form for a Gumbel of annual maxima with mean
// m and standard deviation s: scale b = s sqrt(6)/pi, location u = m -
// 0.5772 b (Euler-Mascheroni constant), x_p = u - b ln(-ln p) (the Gumbel
// quantile of the type I largest distribution: E. J. Gumbel, Statistics
// of Extremes, 1958, from memory). The conversion to 50-year maxima
// leaves it unchanged.
func TestCharacteristicOfCompanion(t *testing.T) {
	text := `[member]
length = 3000
ends = "pinned-pinned"
[member.section]
shape = "CHS"
diameter = 168.3
thickness = 8
[material]
modulus = 205000
yield = { dist = "lognormal", mean = 380, cov = 0.07 }
[imperfection]
bow = "L/1000"
[loads]
dead = { dist = "normal", mean = 300000, cov = 0.07 }
stock = { dist = "gumbel", mean = 120000, cov = 0.25, period = "1 year", companion = { dist = "gamma", mean = 60000, cov = 0.6 } }
snow = { dist = "gumbel", mean = 70000, cov = 0.4, period = "1 year", companion = { dist = "gamma", mean = 15000, cov = 1.0 } }
[combination]
rule = "turkstra"
[target]
beta = 3.8
reference_period = "50 years"
`
	qk := func(m, cov float64) float64 {
		b := m * cov * math.Sqrt(6) / math.Pi
		u := m - 0.5772156649015329*b
		return u - b*math.Log(-math.Log(0.98))
	}
	for _, c := range []struct {
		psi  string
		want float64
	}{
		{"", 0.7}, // EN 1990 Table A1.1, the default of code_check.psi_0
		{"[code_check]\npsi_0 = 0.5\n", 0.5},
	} {
		md, err := Build(parse(t, text+c.psi))
		if err != nil {
			t.Fatal(err)
		}
		want := map[string]float64{
			"loads.stock":           qk(120000, 0.25),
			"loads.snow":            qk(70000, 0.4),
			"loads.stock.companion": c.want * qk(120000, 0.25),
			"loads.snow.companion":  c.want * qk(70000, 0.4),
		}
		for i, v := range md.Sim.Vars {
			w, ok := want[v.Name]
			if !ok {
				continue
			}
			delete(want, v.Name)
			ch := md.Characteristic(i)
			if math.Abs(ch.Value-w) > 1e-6*w {
				t.Errorf("psi_0 %g: %s: characteristic %.6g (%s), want %.6g", c.want, v.Name, ch.Value, ch.Basis, w)
			}
			if strings.HasSuffix(v.Name, ".companion") && !strings.Contains(ch.Basis, "psi_0 Q_k of "+strings.TrimSuffix(v.Name, ".companion")) {
				t.Errorf("%s: basis %q does not name the combination value of its load", v.Name, ch.Basis)
			}
		}
		if len(want) > 0 {
			t.Errorf("inputs missing from the model: %v", want)
		}
	}
}
