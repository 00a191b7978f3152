package main

import (
	"math"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
)

// classStudy is a cold-formed SHS 400x400x4 in S355 (the case,
// fixture.SHS400).
const classStudy = fixture.SHS400

// TestCheckShowsClass: check gives the class of each wall with the EN
// 1993-1-1 Table 5.2 limits (42 eps = 34.2 for S355) and the effective
// area; the JSON gives nominal.section_class and nominal.effective_area
// (A_eff of EN 1993-1-5 4.4: 2734 mm2, worked in internal/study's
// TestClass4EndToEnd).
func TestCheckShowsClass(t *testing.T) {
	d, raw := ctCheckJSON(t, classStudy)
	if d.Nominal.SectionClass != 4 || math.Abs(d.Nominal.EffectiveArea-2734.45) > 0.01 {
		t.Errorf("section_class %d, effective_area %.2f; want 4, 2734.45", d.Nominal.SectionClass, d.Nominal.EffectiveArea)
	}
	if nom, _ := raw["nominal"].(map[string]any); nom["section_class"] == nil || nom["effective_area"] == nil {
		t.Errorf("nominal lacks section_class or effective_area: %v", raw["nominal"])
	}
	code, out, errs := invoke(t, "check", writeStudy(t, classStudy))
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, want := range []string{
		"section class 4 in compression (EN 1993-1-1 Table 5.2, eps = 0.814)",
		"wall (depth)  internal  c/t   97.0  limits 26.8 / 30.9 / 34.2  class 4, rho 0.426",
		"effective area A_eff = 2734 mm2, 43.4 % of A",
		"capacity.curve: not given; EN 1993-1-1 Table 6.2 gives \"c\"",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("check output lacks %q:\n%s", want, out)
		}
	}
	// A stocky hot-finished tube is class 1 and fully effective.
	stocky := strings.Replace(classStudy, "thickness = 4", "thickness = 16\nfabrication = \"hot-finished\"", 1)
	d, _ = ctCheckJSON(t, stocky)
	if d.Nominal.SectionClass != 1 || len(d.Warnings) != 0 {
		t.Errorf("SHS 400x400x16: class %d, warnings %q; want 1 and none", d.Nominal.SectionClass, d.Warnings)
	}
}
