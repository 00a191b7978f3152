package report

import (
	"math"
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestTornadoSameSideBars: when both fractiles of an input move the result
// the same way, its two bars must not cover each other and each keeps its
// own label. The rows are invented in the shape of the retrofit demo
// (imposed load fixed at either fractile raises β above 3.68).
func TestTornadoSameSideBars(t *testing.T) {
	t.Parallel()
	rows := []Tornado{
		{Variable: "loads.imposed", LowValue: 219e3, HighValue: 562e3, Low: 5.97, High: 3.72},
		{Variable: "material.yield", LowValue: 259, HighValue: 326, Low: 3.38, High: 4.18},
		{Variable: "imperfection.bow", LowValue: -4, HighValue: 4, Low: 3.1, High: 3.1},
	}
	label := func(r Tornado, x float64) string { return sig(x, 3) }
	sorted, bars, same := tornadoLayout(rows, 3.68, 1, label)
	if len(sorted) != 3 || sorted[2].Variable != "loads.imposed" {
		t.Fatalf("rows not sorted by swing: %v", sorted)
	}
	// The bow's swing runs from the base to its farther end, 0.58, below the yield's 0.80.
	if sorted[0].Variable != "imperfection.bow" {
		t.Errorf("smallest swing first: got %s, want imperfection.bow", sorted[0].Variable)
	}
	if strings.Join(same, ",") != "imperfection.bow,loads.imposed" {
		t.Errorf("same-way rows %v, want the bow and the imposed load", same)
	}
	byRow := map[string][]tornadoBar{}
	for _, b := range bars {
		byRow[sorted[b.Row].Variable] = append(byRow[sorted[b.Row].Variable], b)
	}
	for _, name := range same {
		b := byRow[name]
		if len(b) != 2 {
			t.Fatalf("%s: %d bars", name, len(b))
		}
		lo, hi := b[0], b[1]
		if !lo.Low || hi.Low {
			t.Fatalf("%s: bars out of order", name)
		}
		if lo.Y0 < hi.Y1 {
			t.Errorf("%s: the low bar [%g, %g] overlaps the high bar [%g, %g]", name, lo.Y0, lo.Y1, hi.Y0, hi.Y1)
		}
		if lo.LabelY == hi.LabelY || lo.Label == hi.Label {
			t.Errorf("%s: labels %q at %g and %q at %g would merge", name, lo.Label, lo.LabelY, hi.Label, hi.LabelY)
		}
	}
	for _, b := range byRow["material.yield"] {
		if b.Split || math.Abs(b.Y1-b.Y0-2*tornadoHalf) > 1e-12 {
			t.Errorf("material.yield: a two-sided bar is drawn at height %g, want the full %g", b.Y1-b.Y0, 2*tornadoHalf)
		}
	}
	if y := byRow["material.yield"]; !y[0].Left || y[1].Left {
		t.Errorf("material.yield: low yield lowers β, so its label goes left; got left %v, %v", y[0].Left, y[1].Left)
	}
}

// TestTornadoBetaCaption: the caption of tornado-beta says why a fractile
// can move β the "wrong" way, and names each such row with its reason.
func TestTornadoBetaCaption(t *testing.T) {
	t.Parallel()
	b := demoBundle()
	b.ByMagnitude = []string{"imperfection.bow"}
	b.Doc.FORM.DesignPoint["loads.imposed"] = 640e3
	b.TornadoBeta = []sim.TornadoRow{
		{Variable: "loads.imposed", LowValue: 160e3, HighValue: 290e3, LowBeta: 3.61, HighBeta: 3.0},
		{Variable: "material.yield", LowValue: 282, HighValue: 345, LowBeta: 2.41, HighBeta: 3.32},
		{Variable: "imperfection.bow", LowValue: -9, HighValue: 9, LowBeta: 2.62, HighBeta: 2.62},
	}
	f := tornadoBetaFigure(b)
	if f == nil {
		t.Fatal("no picture")
	}
	for _, want := range []string{
		"removes its scatter", "acts by its magnitude", "beyond both fractiles",
		"loads.imposed (design-point value 640 kN, beyond both fractiles)",
		"imperfection.bow (acts by its magnitude)",
	} {
		if !strings.Contains(f.Caption, want) {
			t.Errorf("caption lacks %q:\n%s", want, f.Caption)
		}
	}
	if strings.Contains(f.Caption, "material.yield") {
		t.Errorf("caption names material.yield, whose fractiles move β opposite ways")
	}
	if _, err := f.render("png"); err != nil {
		t.Fatal(err)
	}
}
