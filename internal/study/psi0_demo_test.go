package study

import (
	"math"
	"os"
	"strings"
	"testing"
)

// TestStoreDemoPsi0: the demo of a column under stock and snow takes each
// load's own combination factor, EN 1990 Table A1.1 (from memory):
// storage (category E) psi_0 = 1.0, snow below 1000 m 0.5. By EN 1990
// expression 6.10, each variable load tried as the leading one, the
// design load is the larger of
//
//	1.35 G_k + 1.5 Q_snow + 1.5 x 1.0 Q_stock  (snow leading)
//	1.35 G_k + 1.5 Q_stock + 1.5 x 0.5 Q_snow  (stock leading)
//
// computed here by hand from the check's characteristic values; each
// Turkstra companion's characteristic value is psi_0 Q_k of its load.
func TestStoreDemoPsi0(t *testing.T) {
	data, err := os.ReadFile("../../studies/store-two-loads.toml")
	if err != nil {
		t.Fatal(err)
	}
	st, err := Parse("store-two-loads.toml", data)
	if err != nil {
		t.Fatal(err)
	}
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	cc, err := md.CodeCheck()
	if err != nil {
		t.Fatal(err)
	}
	qk := map[string]float64{}
	for _, in := range cc.Inputs {
		qk[in.Path] = in.Value
	}
	g, snow, stock := qk["loads.dead"], qk["loads.snow"], qk["loads.stock"]
	if !(g > 0 && snow > 0 && stock > 0) {
		t.Fatalf("characteristic values %v", qk)
	}
	snowLeads := 1.35*g + 1.5*snow + 1.5*1.0*stock
	stockLeads := 1.35*g + 1.5*stock + 1.5*0.5*snow
	want := math.Max(snowLeads, stockLeads)
	if math.Abs(cc.DesignLoad-want) > 1e-9*want || cc.Combination.Leading != "loads.snow" {
		t.Errorf("N_Ed %.6g N leading %s, want %.6g N leading loads.snow (stock leading %.6g N)", cc.DesignLoad, cc.Combination.Leading, want, stockLeads)
	}
	if rule := cc.Rule(); strings.Contains(rule, "x 0.7") || !strings.Contains(rule, "loads.snow 0.5, loads.stock 1") {
		t.Errorf("rule %q does not give each load's psi_0", rule)
	}
	for i, v := range md.Sim.Vars {
		var w float64
		switch v.Name {
		case "loads.snow.companion":
			w = 0.5 * snow
		case "loads.stock.companion":
			w = 1.0 * stock
		default:
			continue
		}
		if c := md.Characteristic(i).Value; math.Abs(c-w) > 1e-9*w {
			t.Errorf("%s: characteristic %.6g N, want psi_0 Q_k = %.6g N", v.Name, c, w)
		}
	}
}
