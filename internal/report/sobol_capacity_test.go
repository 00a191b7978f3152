package report

import (
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestHTMLShowsBothSobolSets: with indices of the margin in the document and
// of the capacity in the bundle, the report draws and tabulates both, each
// caption naming its output, and leaves the capacity set out without them.
func TestHTMLShowsBothSobolSets(t *testing.T) {
	b := demoBundle()
	b.SobolOutput = "margin g = capacity - demand"
	b.SobolCapacity = []sim.SobolIndex{
		{Variable: "material.yield", First: 0.62, Total: 0.66, FirstCI: [2]float64{0.58, 0.66}, TotalCI: [2]float64{0.62, 0.70}},
		{Variable: "material.modulus", First: 0.30, Total: 0.35, FirstCI: [2]float64{0.26, 0.34}, TotalCI: [2]float64{0.31, 0.39}},
		{Variable: "loads.dead", FirstCI: [2]float64{0, 0}, TotalCI: [2]float64{0, 0}},
	}
	html, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	s := string(html)
	for _, want := range []string{
		`<figure id="fig-sobol">`,
		`<figure id="fig-sobol-capacity">`,
		"Sobol indices of margin g = capacity - demand (shares",
		"Sobol indices of the capacity (shares",
		`<h3 id="sobol-capacity">`,
		"<td>material.modulus</td><td class=\"n\">0.300</td>",
	} {
		if !strings.Contains(s, want) {
			t.Errorf("report.html lacks %q", want)
		}
	}
	if i, j := strings.Index(s, `id="fig-sobol"`), strings.Index(s, `id="fig-sobol-capacity"`); i < 0 || j < i {
		t.Errorf("the capacity set should follow the margin set (at %d and %d)", i, j)
	}
	if md := Markdown(b); !strings.Contains(md, "### Sobol indices of the capacity") {
		t.Errorf("summary.md lacks the capacity set")
	}

	b.SobolCapacity = nil
	html, err = HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	if strings.Contains(string(html), "sobol-capacity") {
		t.Errorf("report.html mentions the capacity set without indices")
	}
}
