package analysis

import (
	"math"
	"strings"
	"testing"
)

// twoLoadsStudy is a column under two variable loads combined by
// Turkstra's rule, each with a companion, every random input shared by all
// the members ("all"), heavy enough that a joint sample fails often.
const twoLoadsStudy = `title = "two variable loads, all shared"
units = "kN-m"

[member]
length = "4.2 m"
ends   = "pinned-pinned"

[member.section]
shape  = "I"
depth  = "203.2 mm"
width  = "203.6 mm"
flange = "11.0 mm"
web    = "7.2 mm"
root   = "10.2 mm"
fabrication = "hot-rolled"

[material]
modulus = { dist = "lognormal", mean = "210 GPa", cov = 0.03 }
yield   = { dist = "lognormal", mean = "300 MPa", cov = 0.07 }

[capacity]
model = "perry-robertson"
imperfection = "equivalent"
model_factor = { dist = "lognormal", mean = 1.0, cov = 0.08 }

[loads]
dead  = { dist = "normal", mean = "700 kN", cov = 0.07 }
stock = { dist = "gumbel", mean = "300 kN", cov = 0.25, period = "1 year", companion = { dist = "gamma", mean = "150 kN", cov = 0.6 } }
snow  = { dist = "gumbel", mean = "150 kN", cov = 0.4, period = "1 year", companion = { dist = "gamma", mean = "60 kN", cov = 1.0 } }

[combination]
rule = "turkstra"

[analysis]
method     = "monte-carlo"
samples    = 200_000
target_cov = 0.05
seed       = 7

[sensitivity]
tornado = false
sobol   = false

[inventory]
file = "members.csv"
shared = { "material.modulus" = "all", "material.yield" = "all", "capacity.model_factor" = "all", "loads.dead" = "all", "loads.stock" = "all", "loads.snow" = "all" }
`

// TestSystemSharesCompanions checks that a shared load's companion is
// shared too: identical members sharing every input are one member drawn
// n times, so in every joint sample either all fail or none (each
// member's share of the system failures is exactly 1), and the system's
// first-order pf is that of one member alone. Were the companions (the stock's
// while the snow leads and the other way round) drawn per member, the
// members would fail apart: shares below 1, a system pf above a member's.
func TestSystemSharesCompanions(t *testing.T) {
	inv := runSystemStudy(t, twoLoadsStudy, "name\nA\nB\nC\n", 2)
	sys := inv.System
	if sys.Pf <= 0 {
		t.Fatalf("no joint failure (pf %g): the check needs some", sys.Pf)
	}
	for _, m := range inv.Members {
		if m.Share == nil || *m.Share != 1 {
			t.Errorf("member %s: share of the system failures %v, want 1 (all shared)", m.Name, deref(m.Share))
		}
	}
	if sys.FormPf == nil {
		t.Fatalf("no first-order system pf: %s", sys.FormMethod)
	}
	one := runSystemStudy(t, twoLoadsStudy, "name\nA\n", 2).System
	if one.FormPf == nil {
		t.Fatalf("no first-order pf of the one member: %s", one.FormMethod)
	}
	if math.Abs(*sys.FormPf-*one.FormPf) > 0.01**one.FormPf {
		t.Errorf("first-order system pf %.5g, want the one member's %.5g (all shared); %s", *sys.FormPf, *one.FormPf, strings.TrimSpace(sys.FormMethod))
	}
}

func deref(p *float64) float64 {
	if p == nil {
		return math.NaN()
	}
	return *p
}
