package analysis

import (
	"context"
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// maxSystemEvaluations caps the member evaluations of the joint sample.
const maxSystemEvaluations = 200_000_000

// runSystem estimates the series system of the members (in the order of
// the file, as ir.doc.Members still is) by sampling them jointly: each
// shared input one draw per group and sample, every other input one per
// member.
func (ir *inventoryRun) runSystem(ctx context.Context, l *Loaded, sys []systemMember, s *sim.Settings) error {
	nShared, err := linkShared(l.Study.Inventory, sys)
	if err != nil {
		return err
	}
	// The run's budget and CoV (the study's, or --samples over it), as
	// every member takes them.
	maxN := max(s.Samples, 1000)
	maxN = min(maxN, max(10_000, maxSystemEvaluations/int64(len(sys))))
	c, err := jointSample(ctx, sys, nShared, maxN, s.TargetCoV, MemberSeed(s.Seed, -1), s) // split or merged: inventory_shard.go
	if ctx.Err() != nil {
		return fmt.Errorf("interrupted")
	}
	if err != nil {
		return err
	}
	if !s.Shard.Splits() {
		ir.doc.System = ir.systemDoc(c, nShared, s.TargetCoV)
	}
	return ir.addFormSystem(ctx, sys, nShared, s)
}

// linkShared gives each member of sys its transformation and, for each
// of its variables, the index of the shared normal it takes (-1: its
// own), and returns the number of shared normals.
func linkShared(inv *study.Inventory, sys []systemMember) (int, error) {
	by := map[string]string{}
	si := sharedIndex{}
	for i := range sys {
		t, err := sim.NewTransform(sys[i].m)
		if err != nil {
			return 0, fmt.Errorf("member %q: %v", inv.Members[i].Name, err)
		}
		for _, v := range t.Vars() {
			if j := sharedOf(inv.Shared, v.Name); j >= 0 {
				by[v.Name] = inv.Shared[j].By
			}
		}
		if err := checkSharedCorrelation(t, by); err != nil {
			return 0, fmt.Errorf("member %q: %v", inv.Members[i].Name, err)
		}
		groups := inv.Group(i)
		sys[i].t = t
		sys[i].shared = make([]int, t.Dim())
		for k, v := range t.Vars() {
			sys[i].shared[k] = -1
			if j := sharedOf(inv.Shared, v.Name); j >= 0 {
				sys[i].shared[k] = si.of(v.Name, groups[j])
			}
		}
	}
	return len(si), nil
}

// sharedOf returns the index of the shared input that variable name
// belongs to, -1 for none: the key itself or one of its sub-variables
// (a shared load's companion, loads.imposed.companion or
// loads.imposed.companion.snow, is shared the same way, each its own
// normal). The longest matching key wins.
func sharedOf(shared []study.SharedInput, name string) int {
	at := -1
	for j, sh := range shared {
		if (name == sh.Key || strings.HasPrefix(name, sh.Key+".")) && (at < 0 || len(sh.Key) > len(shared[at].Key)) {
			at = j
		}
	}
	return at
}

// systemDoc describes the joint sample's counts c, and gives each member
// its share of the system failure.
func (ir *inventoryRun) systemDoc(c *systemCounts, nShared int, targetCoV float64) *report.System {
	pf := float64(c.failures) / float64(c.n)
	lo, hi := sim.WilsonInterval(c.failures, c.n, 0.95)
	d := &report.System{
		Pf: pf, PfCI: [2]float64{lo, hi}, Beta: report.Index(sim.BetaFromPf(pf)),
		Samples: c.n, PfCoV: finitePtr(c.cov()),
		Method: fmt.Sprintf("joint sampling: %d samples of every member, each of the %d shared variables drawn once a sample, every other input once a member", c.n, nShared),
	}
	ind := 1.0
	for i := range ir.doc.Members {
		m := &ir.doc.Members[i]
		d.ExpectedFailures += m.Pf
		ind *= 1 - m.Pf
		if c.failures > 0 {
			sh := float64(c.members[i]) / float64(c.failures)
			m.Share = &sh
		}
	}
	d.PfIfIndependent = 1 - ind
	switch {
	case c.failures == 0:
		d.Status = "no failures"
		ir.warnings = append(ir.warnings, fmt.Sprintf("inventory: no member failed in %d joint samples: the system pf is below %.2g (95 %% bound) and cannot be estimated better by joint sampling", c.n, hi))
	case c.failures < 100:
		d.Status = "few failures"
		ir.warnings = append(ir.warnings, fmt.Sprintf("inventory: the system pf rests on %d failing samples (cov %.2g)", c.failures, c.cov()))
	case c.cov() <= targetCoV:
		d.Status = "converged"
	default:
		d.Status = "budget reached"
		ir.warnings = append(ir.warnings, fmt.Sprintf("inventory: the system pf reached a cov of %.2g in %d joint samples, above analysis.target_cov %.2g", c.cov(), c.n, targetCoV))
	}
	if math.IsNaN(pf) {
		d.Status = "no samples"
	}
	return d
}
