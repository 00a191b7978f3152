package report

import (
	"encoding/json"
	"math"
	"os"
	"strings"
	"testing"

	"strutrisk/sim"
)

// lifeBundle is demoBundle with a remaining life of 30 years whose annual
// beta falls linearly from 4.6 to 3.1 and crosses the annual target 4.2
// (ISO 2394 normal cost, medium consequences, from memory) in year 9.
func lifeBundle() *Bundle {
	b := demoBundle()
	d := b.Doc
	cumLog := 0.0
	for y := 1; y <= 30; y++ {
		beta := 4.6 - 1.5*float64(y-1)/29
		pf := sim.PfFromBeta(beta)
		cumLog += math.Log1p(-pf)
		cpf := -math.Expm1(cumLog) * 0.8 // dependent years: below the independent product
		d.Life = append(d.Life, LifePoint{Year: y, Beta: Index(beta), Pf: pf, PfCumulative: cpf,
			BetaCumulative: Index(sim.BetaFromPf(cpf)), PfCoV: 0.02, PfCumulativeCoV: 0.02})
	}
	end, target := 9, 4.2
	d.LifeEnd = &end
	d.LifeBasis = &LifeBasis{Years: 30, Step: 1, LossLaw: "d(t) = 0.04 mm × t^0.6 from every face, added to member.section.thickness_loss",
		LossEnd: 2.1, CapacityNow: 1.9e6, CapacityEnd: 1.6e6, Method: "conditional sampling over the years", Paths: 20000,
		Loads:      []LifeLoad{{Load: "loads.imposed", Annual: "gumbel(location 2e+05, scale 3e+04)", Basis: "annual maxima as written"}},
		TargetBeta: &target, TargetSource: "target.beta 3.8 over 50 years, to 1 year", Criterion: LifeCriterion,
		EndRange: []int{9, 9}, Resolved: true}
	return b
}

// TestLifeJSON: the contract's field names, life_end absent at the
// horizon.
func TestLifeJSON(t *testing.T) {
	b := lifeBundle()
	out, err := json.Marshal(b.Doc)
	if err != nil {
		t.Fatal(err)
	}
	var m map[string]any
	if err := json.Unmarshal(out, &m); err != nil {
		t.Fatal(err)
	}
	life, ok := m["life"].([]any)
	if !ok || len(life) != 30 {
		t.Fatalf("life: %v", m["life"])
	}
	p := life[0].(map[string]any)
	for _, k := range []string{"year", "beta", "pf_cumulative", "beta_cumulative"} {
		if _, ok := p[k]; !ok {
			t.Errorf("a life point lacks %s: %v", k, p)
		}
	}
	if m["life_end"] != 9.0 {
		t.Errorf("life_end %v, want 9", m["life_end"])
	}
	b.Doc.LifeEnd = nil
	out, _ = json.Marshal(b.Doc)
	if strings.Contains(string(out), "life_end") {
		t.Errorf("life_end written at the horizon")
	}
}

// TestLifeVerdicts: the sentence for each outcome; no verdict when the
// sampling error leaves the year in doubt.
func TestLifeVerdicts(t *testing.T) {
	b := lifeBundle()
	d := b.Doc
	for _, c := range []struct {
		name string
		edit func()
		want string
	}{
		{"crossing", func() {}, "falls below the annual target β = 4.20 in year 9: the remaining life is 8 years"},
		{"bracket", func() { d.LifeBasis.EndRange = []int{8, 10} }, "in year 9 (sampling error: year 8 to 10): the remaining life is 8 years"},
		{"horizon", func() { d.LifeEnd = nil; d.LifeBasis.EndRange = nil }, "stays above the annual target β = 4.20 up to the horizon of 30 years"},
		{"unresolved", func() { d.LifeEnd = nil; d.LifeBasis.Resolved = false; d.LifeBasis.EndRange = []int{7, 0} },
			"Not resolved: sampling error puts the year the annual β falls below the target β = 4.20 between year 7 and beyond the horizon"},
		{"no target", func() { d.LifeBasis.TargetBeta = nil }, "no target to hold it against"},
	} {
		c.edit()
		if got := LifeVerdict(d); !strings.Contains(got, c.want) {
			t.Errorf("%s: %q, want %q", c.name, got, c.want)
		}
	}
}

// TestLifeSections: the remaining life has its section in the HTML and
// Markdown reports, a line in summary.txt and its picture.
func TestLifeSections(t *testing.T) {
	b := lifeBundle()
	page, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	h := string(page)
	for _, w := range []string{`<section id="life">`, "remaining life is 8 years", "annual maxima of loads.imposed", `id="fig-life"`, "<td class=\"n\">9</td>"} {
		if !strings.Contains(h, w) {
			t.Errorf("the HTML lacks %q", w)
		}
	}
	if md := Markdown(b); !strings.Contains(md, "## Remaining life under corrosion") || !strings.Contains(md, "| 30 |") {
		t.Errorf("summary.md lacks the remaining life")
	}
	if txt := SummaryText(b); !strings.Contains(txt, "remaining life     The annual beta falls below") {
		t.Errorf("summary.txt lacks the remaining life:\n%s", txt)
	}
	f := lifeFigure(b)
	if f == nil {
		t.Fatal("no life picture")
	}
	png, err := f.render("png")
	if err != nil || len(png) == 0 {
		t.Fatalf("life picture: %v", err)
	}
	if dir := os.Getenv("STRUTRISK_PICTURES"); dir != "" {
		_ = os.WriteFile(dir+"/life.png", png, 0o644)
	}
}
