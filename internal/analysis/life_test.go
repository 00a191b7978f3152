package analysis

import (
	"context"
	"encoding/json"
	"strings"
	"testing"

	"strutrisk/internal/assess"
	"strutrisk/internal/report"
	"strutrisk/sim"
)

// lifeStudy is good with annual maxima of the imposed load and a
// corroding section (a rect loses thickness on every face).
const lifeStudy = `title = "corroding strut"
[member]
length = 2000
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = 100
width = 50
thickness_loss = 1
[material]
modulus = 200000
yield = { dist = "lognormal", mean = 250, cov = 0.1 }
[imperfection]
bow = 2
[loads]
dead = { dist = "normal", mean = "200 kN", cov = 0.1 }
imposed = { dist = "gumbel", mean = "100 kN", cov = 0.3, period = "1 year" }
[target]
beta = 3.8
reference_period = "50 years"
[life]
years = 30
corrosion_rate = "0.2 mm"
corrosion_exponent = 0.8
samples = 5000
[analysis]
method = "form"
seed = 5
[sensitivity]
tornado = false
sobol = false
`

// TestLifeDocument: a run of a study with [life] writes the contract's
// life points and life_end, the first year whose annual beta is below
// the annual target (beta 3.8 over 50 years to one year by
// Phi(beta_1)^50 = Phi(beta_50), EN 1990 Annex C), and the same numbers
// with one worker or two.
func TestLifeDocument(t *testing.T) {
	var first []byte
	for _, workers := range []int{1, 2} {
		l := mustLoad(t, lifeStudy)
		s := l.Settings(workers)
		r, err := Run(context.Background(), l, &s, nil)
		if err != nil {
			t.Fatal(err)
		}
		d := r.Document()
		if len(d.Life) != 30 || d.LifeBasis == nil {
			t.Fatalf("life %d points, basis %v", len(d.Life), d.LifeBasis)
		}
		target := assess.BetaOverYears(3.8, 1.0/50)
		if tb := d.LifeBasis.TargetBeta; tb == nil || *tb != target {
			t.Fatalf("annual target %v, want %g", tb, target)
		}
		if d.LifeEnd == nil {
			t.Fatalf("no life_end: annual beta %v to %v against %g", d.Life[0].Beta, d.Life[29].Beta, target)
		}
		for _, p := range d.Life {
			below := float64(p.Beta) < target
			if below != (p.Year >= *d.LifeEnd) {
				t.Errorf("year %d: annual beta %g, target %g, life_end %d", p.Year, p.Beta, target, *d.LifeEnd)
			}
			if p.BetaCumulative > p.Beta+1e-12 || sim.BetaFromPf(p.PfCumulative) != float64(p.BetaCumulative) {
				t.Errorf("year %d: cumulative beta %g above the annual %g or not of pf %g", p.Year, p.BetaCumulative, p.Beta, p.PfCumulative)
			}
		}
		if !strings.Contains(report.SummaryText(r.Bundle()), "remaining life") {
			t.Errorf("the summary has no remaining life")
		}
		out, _ := json.Marshal(d.Life)
		if first == nil {
			first = out
		} else if string(out) != string(first) {
			t.Errorf("two workers give other life numbers than one")
		}
	}
}

// TestLifeCheckText: check shows the loss law and the nominal loss now
// and at the horizon: 1 mm + 0.2 mm x 30^0.8 = 4.04 mm.
func TestLifeCheckText(t *testing.T) {
	txt := mustLoad(t, lifeStudy).CheckText()
	for _, w := range []string{"Remaining life under corrosion", "d(t) = r t^b", "1.00 mm now, 4.04 mm in year 30", "annual maxima of loads.imposed", "annual target beta 4.6"} {
		if !strings.Contains(txt, w) {
			t.Errorf("check lacks %q:\n%s", w, txt)
		}
	}
}

// TestLifeSeed: the run's seed (--seed sets it over analysis.seed) drives
// the remaining life too: another seed, other numbers; the same, the same.
func TestLifeSeed(t *testing.T) {
	pf := func(seed uint64) float64 {
		l := mustLoad(t, lifeStudy)
		s := l.Settings(1)
		s.Seed = seed
		r, err := Run(context.Background(), l, &s, nil)
		if err != nil {
			t.Fatal(err)
		}
		return r.Document().Life[29].PfCumulative
	}
	if a, b := pf(5), pf(6); a == b {
		t.Errorf("seeds 5 and 6 give the same cumulative pf %g", a)
	}
	if a, b := pf(6), pf(6); a != b {
		t.Errorf("seed 6 twice: %g and %g", a, b)
	}
}
