package report

import (
	"strings"
	"testing"
)

func TestMarkdownDemo(t *testing.T) {
	t.Parallel()
	md := Markdown(demoBundle())
	for _, s := range []string{
		"# Bay 3 mezzanine column, added plant load",
		"## Result", "## Inputs", "## Deterministic check at nominal values", "## Sensitivity",
		"## Sweep and variants", "## Updating from measurements", "## Method and diagnostics",
		"## Reproducibility", "## Cautions",
		"| probability of failure pf | 1.84e-3 |",
		"| 95% interval of β | 2.89 to 2.92 |",
		"**Target NOT met.**",
		"| material.yield | lognormal | characteristic 275 MPa, fractile 0.05, cov 0.07 | 310 | 0.070 | MPa |",
		"| loads.imposed | 160 kN | 290 kN | 520 | 250 | 270 | 3.61 | 2.21 |",
		"| loads.imposed | 0.410 | 0.370 to 0.450 | 0.490 | 0.450 to 0.540 |",
		"| loads.imposed | 402 kN | 0.440 |",
		"| seed | 20261201 |",
		Caution,
	} {
		if !strings.Contains(md, s) {
			t.Errorf("Markdown lacks %q", s)
		}
	}
	if strings.Contains(md, "NaN") || strings.Contains(md, "<svg") {
		t.Error("Markdown holds NaN or SVG")
	}
}
