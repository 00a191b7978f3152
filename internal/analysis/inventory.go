package analysis

import (
	"context"
	"fmt"
	"math"
	"sort"

	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// inventoryRun is the result of a study's inventory (inventory.go).
type inventoryRun struct {
	doc      *report.Inventory
	columns  []string
	shared   []string
	against  string
	units    map[string]string
	warnings []string
}

// MemberSeed is the seed of member i of an inventory run with seed: each
// member draws its own stream, a function of (seed, i) only, so members
// can be run in any order or on other machines. A member equal to an
// earlier row of the file (the same keys set to the same values) draws
// with that row's seed: it is the same study, with the same estimate.
func MemberSeed(seed uint64, i int) uint64 {
	// SplitMix64's finaliser (Steele, Lea & Flood 2014) of seed and i.
	z := seed + uint64(i+1)*0x9e3779b97f4a7c15
	z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9
	z = (z ^ (z >> 27)) * 0x94d049bb133111eb
	return z ^ (z >> 31)
}

// runInventory runs every member of the study's inventory as a study of
// its own, with the settings of the main run but its own seed; main is
// the study's own FORM result, nil when none.
func runInventory(ctx context.Context, l *Loaded, s *sim.Settings, main *sim.FORMResult, obs Observer) *inventoryRun {
	inv := l.Study.Inventory
	if inv == nil {
		return nil
	}
	ir := &inventoryRun{doc: &report.Inventory{File: inv.File}, columns: inv.Columns, shared: sharedKeys(inv), against: inv.PlotAgainst, units: inv.Units}
	settings := caseSettings(s)
	fs := memberFORM(s.FORM, main)
	sys := make([]systemMember, 0, len(inv.Members))
	same := newSameMembers(inv)
	outs := runMembers(ctx, l.Study, &settings, obs, func(i int, ms *sim.Settings) memberOutcome {
		if ms.Shard.Replays() { // a merge's from the shards (inventory_shard.go)
			return memberResult(l.Study, i, ms.Shard)
		}
		return memberRun(ctx, l.Study, i, ms, fs, same)
	})
	cut := len(outs) < len(inv.Members)
	names, warns := make([]string, len(outs)), make([][]string, len(outs))
	for i, o := range outs {
		cut = cut || o.mr.Error == "interrupted"
		names[i], warns[i] = inv.Members[i].Name, o.warns
		ir.doc.Members = append(ir.doc.Members, o.mr)
		if o.md != nil {
			sys = append(sys, systemMember{m: o.md.Sim, form: o.form})
		}
	}
	addCodeChecks(ir.doc.Members, outs) // inventory_check.go
	ir.warnings = append(ir.warnings, groupMemberWarnings(names, warns, len(inv.Members))...)
	if cut && ctx.Err() != nil {
		ir.warnings = append(ir.warnings, "inventory: interrupted; the members not run are missing")
	}
	if len(sys) == len(inv.Members) && ctx.Err() == nil {
		obs.Stage("inventory system (joint sampling)")
		if err := ir.runSystem(ctx, l, sys, s); err != nil {
			ir.warnings = append(ir.warnings, "inventory: no system probability: "+err.Error())
		}
	} else if ctx.Err() == nil {
		ir.warnings = append(ir.warnings, "inventory: no system probability: a member was not run")
	}
	sortMembers(ir.doc.Members)
	return ir
}

// runMember runs member i of st's inventory with settings s; it also
// returns the member's warnings.
func runMember(ctx context.Context, st *study.Study, i int, s *sim.Settings, fs *sim.FORMSettings) (report.Member, *study.Model, []string) {
	o := memberRun(ctx, st, i, s, fs, nil)
	return o.mr, o.md, o.warns
}

// memberRun is runMember, giving the member's FORM result too. The
// member draws with the seed of the first row of the file equal to it
// (sameMembers.seedRow); same, when not nil, holds the estimates and
// reserve factors of the member studies run before, shared by equal rows.
func memberRun(ctx context.Context, st *study.Study, i int, s *sim.Settings, fs *sim.FORMSettings, same *sameMembers) memberOutcome {
	m := st.Inventory.Members[i]
	mr := report.Member{Name: m.Name, Line: m.Line, Cells: m.Cells}
	fail := func(err error) memberOutcome {
		mr.Error = err.Error()
		mr.Pf, mr.Beta = math.NaN(), report.Index(math.NaN())
		return memberOutcome{mr: mr, warns: []string{"not run: " + err.Error()}}
	}
	ms, err := st.Member(i)
	if err != nil {
		return fail(err)
	}
	md, err := study.Build(ms)
	if err != nil {
		return fail(fmt.Errorf("member.section: %v", err))
	}
	nom, err := md.Nominal()
	if err != nil {
		return fail(err)
	}
	if len(md.Sim.Vars) == 0 {
		return fail(fmt.Errorf("nothing in it is uncertain"))
	}
	warns := append([]string(nil), ms.Warnings...)
	warns = append(append(warns, md.Plausibility(nom)...), md.Adequacy(nom)...)
	mr.GoverningAxis, mr.Mode = nom.Axis.String(), nom.CapacityMode.String()
	settings := md.SimSettings(*s)
	settings.AutoCrudeLimit = memberCrudeLimit
	key := memberKey(&m)
	settings.Seed = MemberSeed(s.Seed, same.seedRow(st.Inventory, i, key))
	res, err := same.estimateOf(key, func() (*sim.Result, error) { return sim.Run(ctx, md.Sim, &settings) })
	if err != nil {
		return fail(err)
	}
	if res.Incomplete {
		return fail(fmt.Errorf("interrupted"))
	}
	mr.Pf, mr.PfCI = res.Pf, [2]float64{res.PfCI[0], res.PfCI[1]}
	mr.Beta = report.Index(res.Beta)
	mr.BetaCI = [2]report.Index{report.Index(res.BetaCI[0]), report.Index(res.BetaCI[1])}
	mr.Status = res.Status.String()
	if !res.Status.Trusted() {
		warns = append(warns, "the estimate cannot be trusted: "+res.StatusReason)
	}
	if ms.HasTarget {
		mr.Verdict = memberVerdict(ms, res)
		f, w := same.reserveOf(ctx, key, func() (*float64, string) {
			return memberReserve(ctx, md, ms.Target, fs, settings.FORM, res)
		})
		if mr.ReserveFactor = f; w != "" {
			warns = append(warns, w)
		}
	}
	return memberOutcome{mr: mr, md: md, warns: warns, form: res.FORM}
}

// memberCrudeLimit is the most samples auto spends on plain Monte Carlo
// for an inventory member (sim.Settings.AutoCrudeLimit; 5e6 for a study),
// beyond which it samples around the member's FORM design points: a
// member is one of hundreds. On twenty members of the 2,000-member
// benchmark file with pf from 1e-3 to 0.1, importance sampling reached
// the CoV of 5 % in 2,200 to 3,400 evaluations (FORM's included), plain
// Monte Carlo in 9,400 to 575,000, each pf within the 95 % interval of
// plain Monte Carlo's.
// A member whose pf is above about 0.016 still takes plain Monte Carlo.
const memberCrudeLimit = 25_000

// memberFORM are the FORM settings of a member's reserve factor: those of
// the run, searching a further design point only where one evaluation
// shows one likely (sim.FORMSettings.Screen), as an inventory has many
// members; and when the study itself has one design point (main, not
// nil, is its FORM result), one point only.
func memberFORM(fs *sim.FORMSettings, main *sim.FORMResult) *sim.FORMSettings {
	var f sim.FORMSettings
	if fs != nil {
		f = *fs
	}
	f.Screen = true
	if main != nil && main.Converged && len(main.Points) == 1 {
		f.MaxPoints = 1
	}
	return &f
}

// memberVerdict is the verdict of a member's estimate against the
// study's target by the rule of the result document: "met", "not met" or
// "undecided" (an interval that straddles the target, or an estimate
// that cannot be trusted), as the main result's target.verdict; "" when
// the study has no target.
func memberVerdict(ms *study.Study, res *sim.Result) string {
	t, b := ms.Target, report.Index(res.Beta)
	trusted := res.Status.Trusted()
	d := &report.Document{TargetBeta: &t, Beta: &b, Trusted: &trusted,
		BetaCI: report.Indices(res.BetaCI[0], res.BetaCI[1])}
	return report.TargetVerdict(d).String()
}

// sortMembers sorts members by beta, lowest first; members without a
// result go last, in the order of the file.
func sortMembers(ms []report.Member) {
	key := func(m report.Member) float64 {
		if m.Error != "" {
			return math.Inf(1)
		}
		b := float64(m.Beta)
		if math.IsNaN(b) {
			return math.Inf(-1) // every sample failed: beta -inf
		}
		return b
	}
	sort.SliceStable(ms, func(i, j int) bool { return key(ms[i]) < key(ms[j]) })
}

// fill puts the inventory into the document and the bundle.
func (ir *inventoryRun) fill(d *report.Document, b *report.Bundle) {
	if ir == nil {
		return
	}
	if d != nil {
		d.Inventory = ir.doc
	}
	if b != nil {
		b.InventoryColumns = ir.columns
		b.InventoryShared = ir.shared
		b.InventoryAgainst = ir.against
		b.InventoryUnits = ir.units
	}
}

// sharedKeys are the key paths of the inventory's shared inputs and the
// columns that group the members sharing them.
func sharedKeys(inv *study.Inventory) []string {
	var keys []string
	for _, s := range inv.Shared {
		keys = append(keys, s.Key)
		if s.By != "all" {
			keys = append(keys, s.By)
		}
	}
	return keys
}
