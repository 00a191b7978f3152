package analysis

import (
	"math/rand/v2"
	"reflect"
	"strings"
	"testing"
)

// planSystem loads text with members and links the members' shared
// inputs, as runSystem does.
func planSystem(t *testing.T, text, members string) ([]systemMember, int) {
	t.Helper()
	l := loadInventory(t, text, members)
	sys := make([]systemMember, len(l.Study.Inventory.Members))
	for i := range sys {
		md, err := memberModel(l.Study, i)
		if err != nil {
			t.Fatal(err)
		}
		sys[i].m = md.Sim
	}
	n, err := linkShared(l.Study.Inventory, sys)
	if err != nil {
		t.Fatal(err)
	}
	return sys, n
}

// TestSystemPlanSameAsTransform checks that the joint sample's slots
// (a shared normal's value transformed once a sample for every member
// taking it through the same marginal) give the counts, bit for bit, of
// every member transforming its own point (sim.Transform.ToX, the
// definition), and that a member with correlated inputs goes through its
// transformation.
func TestSystemPlanSameAsTransform(t *testing.T) {
	correlated := strings.Replace(benchInventory, `shared = { "material.yield" = "batch", "loads.imposed" = "floor", "loads.snow" = "all", "capacity.model_factor" = "all" }`,
		`shared = { "loads.snow" = "all", "capacity.model_factor" = "all" }`, 1) +
		"[[correlation]]\npair = [\"material.yield\", \"loads.dead\"]\nrho = 0.3\n"
	// The generated members without their batch and floor.
	var ungrouped strings.Builder
	for _, line := range strings.SplitAfter(generatedMembers(24), "\n") {
		if f := strings.Split(line, ", "); len(f) > 3 {
			ungrouped.WriteString(strings.Join(append(f[:1], f[3:]...), ", "))
		}
	}
	cases := []struct {
		name, text, members string
		slots               int // 20 batches and 10 floors of the first 24 members, 1 snow and its companion, 1 model factor
		correlated          bool
	}{
		{"four shared inputs", benchInventory, generatedMembers(24), 20 + 2*10 + 2 + 1, false},
		{"correlated own inputs", correlated, ungrouped.String(), 0, true},
	}
	for _, c := range cases {
		sys, nShared := planSystem(t, c.text, c.members)
		p := newSystemPlan(sys, nShared)
		if len(p.slots) != c.slots || (p.src[0] == nil) != c.correlated {
			t.Errorf("%s: %d slots, member 0 through its transformation %v; want %d, %v", c.name, len(p.slots), p.src[0] == nil, c.slots, c.correlated)
		}
		got := p.worker().block(5, 3, 2000)
		general := newSystemPlan(sys, nShared)
		general.src = make([][]int, len(sys))
		want := general.worker().block(5, 3, 2000)
		if !reflect.DeepEqual(got, want) {
			t.Errorf("%s: counts %+v with slots, %+v through each member's transformation", c.name, got, want)
		}
		if got.failures == 0 || got.failures == got.n {
			t.Errorf("%s: %d of %d samples fail: the comparison tells nothing", c.name, got.failures, got.n)
		}
	}
}

// TestSystemPointNoAlloc checks that a member's point in the joint
// sample allocates nothing.
func TestSystemPointNoAlloc(t *testing.T) {
	sys, nShared := planSystem(t, benchInventory, generatedMembers(4))
	w := newSystemPlan(sys, nShared).worker()
	r := rand.New(rand.NewPCG(1, 2))
	if a := testing.AllocsPerRun(100, func() { w.point(1, r) }); a != 0 {
		t.Errorf("%v allocations a point", a)
	}
}
