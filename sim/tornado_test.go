package sim

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// linearRS is g = R - S, with R ~ N(300, 30) and S ~ N(200, 20) and a
// third input U ~ U(0, 1) that enters only the output "r" = R + 10 U.
func linearRS() *Model {
	return &Model{
		Vars: []Variable{
			{Name: "S", Dist: sensNormal{200, 20}},
			{Name: "U", Dist: sensUniform{0, 1}},
			{Name: "R", Dist: sensNormal{300, 30}},
		},
		Outputs: []string{"r"},
		G: func(x, out []float64) float64 {
			if out != nil {
				out[0] = x[2] + 10*x[1]
			}
			return x[2] - x[0]
		},
	}
}

func TestTornadoLinear(t *testing.T) {
	t.Parallel()
	// Known swings: the 5% and 95% fractiles of N(mu, s) are mu -/+ 1.644854 s
	// (z_0.95 = 1.6448536269514722, standard normal table); U(0, 1) has them
	// at 0.05 and 0.95.
	z := distuv.UnitNormal.Quantile(0.95)
	if math.Abs(z-1.6448536269514722) > 1e-12 {
		t.Fatalf("z_0.95 = %v", z)
	}
	base, rows, err := Tornado(linearRS(), &TornadoSettings{Output: -1})
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(base-100) > 1e-9 {
		t.Errorf("base g = %v, want 100 (300 - 200 at the medians)", base)
	}
	want := []TornadoRow{
		{Variable: "R", LowValue: 300 - 30*z, HighValue: 300 + 30*z, Low: 100 - 30*z, High: 100 + 30*z},
		{Variable: "S", LowValue: 200 - 20*z, HighValue: 200 + 20*z, Low: 100 + 20*z, High: 100 - 20*z},
		{Variable: "U", LowValue: 0.05, HighValue: 0.95, Low: 100, High: 100},
	}
	if len(rows) != len(want) {
		t.Fatalf("%d rows, want %d", len(rows), len(want))
	}
	for i, w := range want {
		r := rows[i]
		if r.Variable != w.Variable {
			t.Fatalf("row %d is %s, want %s (sorted by swing)", i, r.Variable, w.Variable)
		}
		for _, c := range [][2]float64{{r.LowValue, w.LowValue}, {r.HighValue, w.HighValue}, {r.Low, w.Low}, {r.High, w.High}} {
			if math.Abs(c[0]-c[1]) > 1e-9 {
				t.Errorf("%s: got %+v, want %+v", r.Variable, r, w)
				break
			}
		}
		if !math.IsNaN(r.LowBeta) || !math.IsNaN(r.HighBeta) {
			t.Errorf("%s: betas %v %v without FORM, want NaN", r.Variable, r.LowBeta, r.HighBeta)
		}
	}

	// The named output r = R + 10 U: U now swings by 10 * 0.9 = 9.
	base, rows, err = Tornado(linearRS(), &TornadoSettings{Low: 0.1, High: 0.9, Output: 0})
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(base-305) > 1e-9 {
		t.Errorf("base r = %v, want 305", base)
	}
	z9 := distuv.UnitNormal.Quantile(0.9)
	if rows[0].Variable != "R" || math.Abs(rows[0].Swing()-60*z9) > 1e-9 {
		t.Errorf("first row %+v, want R with swing %v", rows[0], 60*z9)
	}
	if rows[1].Variable != "U" || math.Abs(rows[1].Swing()-8) > 1e-9 {
		t.Errorf("second row %+v, want U with swing 8", rows[1])
	}
	if rows[2].Variable != "S" || rows[2].Swing() != 0 {
		t.Errorf("third row %+v, want S with no swing", rows[2])
	}
}

func TestTornadoFORM(t *testing.T) {
	t.Parallel()
	// With R fixed at r, g = r - S with S ~ N(200, 20) has beta = (r - 200)/20
	// exactly (Cornell 1969; linear limit state of normal variables).
	m := linearRS()
	if _, err := FORM(m, nil); err != nil {
		t.Skipf("FORM not available: %v", err)
	}
	_, rows, err := Tornado(m, &TornadoSettings{Output: -1, FORM: true})
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rows {
		if r.Variable != "R" {
			continue
		}
		for _, c := range [][2]float64{{r.LowBeta, (r.LowValue - 200) / 20}, {r.HighBeta, (r.HighValue - 200) / 20}} {
			if math.Abs(c[0]-c[1]) > 1e-4 {
				t.Errorf("R fixed: beta %v, want %v", c[0], c[1])
			}
		}
	}
}

func TestTornadoErrors(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		name string
		m    *Model
		s    TornadoSettings
	}{
		{"nil model", nil, TornadoSettings{Output: -1}},
		{"low above high", linearRS(), TornadoSettings{Low: 0.9, High: 0.1, Output: -1}},
		{"high is 1", linearRS(), TornadoSettings{Low: 0.1, High: 1, Output: -1}},
		{"output out of range", linearRS(), TornadoSettings{Output: 1}},
		{"no outputs", &Model{Vars: linearRS().Vars, G: linearRS().G}, TornadoSettings{}},
	} {
		if _, _, err := Tornado(c.m, &c.s); err == nil {
			t.Errorf("%s: no error", c.name)
		} else if c.m == nil && !errors.Is(err, errNoModel) {
			t.Errorf("%s: error %v", c.name, err)
		}
	}
}

func TestFixVariable(t *testing.T) {
	m := linearRS()
	m.Corr = []Correlation{{A: "S", B: "R", Rho: 0.5}, {A: "S", B: "U", Rho: 0.1}}
	m.Linear = &Linear{Index: 0, Split: func(x []float64) (float64, float64) { return x[2], 1 }}
	r := FixVariable(m, 2, 330)
	if len(r.Vars) != 2 || r.Vars[0].Name != "S" || r.Vars[1].Name != "U" {
		t.Fatalf("vars %+v", r.Vars)
	}
	if len(r.Corr) != 1 || r.Corr[0].B != "U" {
		t.Errorf("correlations %+v, want only S-U", r.Corr)
	}
	out := make([]float64, 1)
	if g := r.G([]float64{200, 0.5}, out); g != 130 || out[0] != 335 {
		t.Errorf("g = %v, r = %v, want 130 and 335", g, out[0])
	}
	if r.Linear == nil || r.Linear.Index != 0 {
		t.Fatalf("linear %+v", r.Linear)
	}
	if h, c := r.Linear.Split([]float64{0, 0.5}); h != 330 || c != 1 {
		t.Errorf("split = %v, %v, want 330, 1", h, c)
	}
	if FixVariable(m, 0, 1).Linear != nil {
		t.Error("fixing the linear input kept Linear")
	}
	x := []float64{200, 0.5}
	allocs := testing.AllocsPerRun(100, func() { r.G(x, out) })
	if allocs != 0 {
		t.Errorf("reduced G allocates %v times per call", allocs)
	}
}

// TestTornadoMagnitude checks the bar of a variable that acts by its
// magnitude, e = N(0, 1) in g = 10 - |e| - S: both fractiles lower g by the
// same amount, so |High - Low| is 0, yet the bar must run from the base
// to that value. The 95 % fractile of the standard normal is 1.6448536
// (any normal table), and S = N(0, 0.4) swings by 2 x 0.4 x 1.6448536.
func TestTornadoMagnitude(t *testing.T) {
	t.Parallel()
	m := &Model{
		Vars: []Variable{
			{Name: "S", Dist: mustDist(NewNormal(0, 0.4))},
			{Name: "e", Dist: mustDist(NewNormal(0, 1))},
		},
		G: func(x, out []float64) float64 { return 10 - math.Abs(x[1]) - x[0] },
	}
	base, rows, err := Tornado(m, &TornadoSettings{Low: 0.05, High: 0.95, Output: -1})
	if err != nil {
		t.Fatal(err)
	}
	const z95 = 1.6448536
	if math.Abs(base-10) > 1e-9 {
		t.Errorf("base %v, want 10", base)
	}
	if rows[0].Variable != "e" || math.Abs(rows[0].Swing()-z95) > 1e-6 {
		t.Errorf("first row %+v (swing %v), want e with swing %v", rows[0], rows[0].Swing(), z95)
	}
	if rows[1].Variable != "S" || math.Abs(rows[1].Swing()-0.8*z95) > 1e-6 {
		t.Errorf("second row %+v (swing %v), want S with swing %v", rows[1], rows[1].Swing(), 0.8*z95)
	}
}
