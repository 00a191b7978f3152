package assess

import (
	"math"
	"testing"
)

// TestDesignLoad: EN 1990:2002 expression 6.10 with the recommended
// factors of Table A1.2(B) (gamma_G 1.35, gamma_Q 1.5) and psi_0 = 0.7
// (Table A1.1, imposed loads), computed by hand:
//
//	G 100, Q1 50, Q2 80: Q2 leading 1.35*100 + 1.5*80 + 1.5*0.7*50 = 307.5
//	                     Q1 leading 1.35*100 + 1.5*50 + 1.5*0.7*80 = 294
//
// so Q2 leads. A favourable permanent load takes 1.0 (gamma_G,inf), a
// favourable variable load 0.
func TestDesignLoad(t *testing.T) {
	f := LoadFactors{GammaG: GammaG, GammaQ: GammaQ, Psi0: Psi0}
	for _, c := range []struct {
		name    string
		loads   []Load
		want    float64
		leading string
		factors []float64
	}{
		{"one permanent, one variable", []Load{{"dead", 100, true}, {"imposed", 50, false}}, 1.35*100 + 1.5*50, "imposed", []float64{1.35, 1.5}},
		{"two variable loads", []Load{{"dead", 100, true}, {"q1", 50, false}, {"q2", 80, false}}, 307.5, "q2", []float64{1.35, 1.05, 1.5}},
		{"favourable loads", []Load{{"dead", 100, true}, {"uplift", -20, true}, {"q", 40, false}, {"suction", -10, false}},
			135 - 20 + 60, "q", []float64{1.35, 1, 1.5, 0}},
		{"permanent only", []Load{{"dead", 100, true}}, 135, "", []float64{1.35}},
	} {
		got, err := DesignLoad(c.loads, f)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(got.Design-c.want) > 1e-9 || got.Leading != c.leading {
			t.Errorf("%s: design %g leading %q, want %g %q", c.name, got.Design, got.Leading, c.want, c.leading)
		}
		for i, w := range c.factors {
			if math.Abs(got.Factors[i]-w) > 1e-12 {
				t.Errorf("%s: %s factor %g, want %g", c.name, c.loads[i].Name, got.Factors[i], w)
			}
		}
	}
	if _, err := DesignLoad([]Load{{"q", 1, false}}, LoadFactors{GammaG: 1.35, GammaQ: 0.9, Psi0: 0.7}); err == nil {
		t.Error("gamma_Q below 1 accepted")
	}
}

// TestDesignLoadPsi0ByLoad: each accompanying load takes its own psi_0
// (EN 1990:2002 Table A1.1: storage, category E, 1.0; snow below 1000 m
// 0.5), computed by hand with gamma_G 1.35, gamma_Q 1.5:
//
//	G 300, stock 197.8, snow 142.6
//	stock leading: 1.35*300 + 1.5*197.8 + 1.5*0.5*142.6 = 808.65
//	snow leading:  1.35*300 + 1.5*142.6 + 1.5*1.0*197.8 = 915.6
//
// so snow leads, where one psi_0 = 0.7 for both gave stock leading,
// 405 + 296.7 + 149.73 = 851.43. A psi_0 outside 0 to 1 is refused.
func TestDesignLoadPsi0ByLoad(t *testing.T) {
	loads := []Load{{"dead", 300, true}, {"stock", 197.8, false}, {"snow", 142.6, false}}
	f := LoadFactors{GammaG: GammaG, GammaQ: GammaQ, Psi0: Psi0}
	one, err := DesignLoad(loads, f)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(one.Design-851.43) > 1e-9 || one.Leading != "stock" {
		t.Errorf("one psi_0: design %g leading %q, want 851.43 stock", one.Design, one.Leading)
	}
	f.Psi0By = map[string]float64{"stock": 1.0, "snow": 0.5}
	own, err := DesignLoad(loads, f)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(own.Design-915.6) > 1e-9 || own.Leading != "snow" {
		t.Errorf("psi_0 by load: design %g leading %q, want 915.6 snow", own.Design, own.Leading)
	}
	if w := []float64{1.35, 1.5, 1.5}; own.Factors[1] != w[1] || own.Factors[2] != w[2] {
		t.Errorf("factors %v, want %v", own.Factors, w)
	}
	f.Psi0By["snow"] = 1.5
	if _, err := DesignLoad(loads, f); err == nil {
		t.Error("psi_0 1.5 accepted")
	}
}
