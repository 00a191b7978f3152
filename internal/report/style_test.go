package report

import (
	"fmt"
	"image/color"
	"strings"
	"testing"
)

// hexOf writes c as the SVG writer does (#RRGGBB).
func hexOf(c color.Color) string {
	r, g, b, _ := c.RGBA()
	return fmt.Sprintf("#%02X%02X%02X", r>>8, g>>8, b>>8)
}

// TestModelStylesDistinct: every capacity model has its own colour.
func TestModelStylesDistinct(t *testing.T) {
	t.Parallel()
	seen := map[string]string{}
	for m, s := range modelStyles {
		h := hexOf(s.Color)
		if other, ok := seen[h]; ok {
			t.Errorf("models %s and %s share the colour %s", m, other, h)
		}
		seen[h] = m
	}
	if hexOf(otherStyle.Color) == hexOf(modelStyle("curve").Color) {
		t.Error("an unknown model looks like the curve model")
	}
}

// TestOneStylePerModel: a model is drawn in its colour in the slenderness,
// sweep and variants pictures whatever its place among the series (the
// EN curve last among three series, first among the curves).
func TestOneStylePerModel(t *testing.T) {
	t.Parallel()
	b := demoBundle()
	want := hexOf(modelStyle("curve").Color)
	for i := range b.Slenderness.Curves {
		b.Slenderness.Curves[i].Model = []string{"curve", "perry-robertson"}[i%2]
	}
	// A secant series first and a Perry-Robertson one second: by their
	// place they would be blue and orange.
	b.Series[0].Model = "secant"
	b.Series[1].Model = "perry-robertson"
	svgOf := func(f *figure) string {
		if f == nil {
			t.Fatal("picture missing")
		}
		out, err := f.render("svg")
		if err != nil {
			t.Fatal(err)
		}
		return string(out)
	}
	if s := svgOf(slendernessFigure(b)); !strings.Contains(s, "stroke:"+want) {
		t.Errorf("slenderness: no line in the curve model's colour %s", want)
	}
	s := svgOf(sweepFigure(b))
	if strings.Contains(s, want) {
		t.Errorf("sweep: the curve model's colour %s drawn without a curve-model series", want)
	}
	if sec := hexOf(modelStyle("secant").Color); !strings.Contains(s, "stroke:"+sec) {
		t.Errorf("sweep: no line in the secant model's colour %s", sec)
	}
	// The variants picture is drawn when there is no sweep.
	b.Series = nil
	b.StudyModel = "perry-robertson"
	b.VariantModels = map[string]string{"as built": "perry-robertson", "bow L/500": "perry-robertson"}
	s = svgOf(variantsFigure(b))
	if strings.Contains(s, want) {
		t.Errorf("variants: the curve model's colour %s drawn for Perry-Robertson variants", want)
	}
	if !strings.Contains(s, hexOf(modelStyle("perry-robertson").Color)) {
		t.Errorf("variants: no point in Perry-Robertson's colour")
	}
	if g := seriesGlyphs([]string{"a", "a", "b"}); g[0] == g[1] || g[0] != g[2] {
		t.Errorf("series of one model are not told apart by their glyphs: %v", g)
	}
}
