package analysis

import (
	"context"
	"fmt"
	"math"

	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// An inventory split into shards: member i is run whole, with its own
// seed (MemberSeed), by the shard that owns i (sim.Shard.Owns), which
// notes its result; the joint sample of the system is split by its
// blocks, each noted by the shard that owns it. The merge takes both
// from the notes and so writes what one machine writes.

func memberNoteKey(i int) string { return fmt.Sprintf("inventory/member/%d", i) }

func systemNoteKey(b int) string { return fmt.Sprintf("inventory/system/block/%d", b) }

// memberNote is a member's result as its shard notes it.
type memberNote struct {
	Pf            sim.Bits    `json:"pf"`
	PfCI          [2]sim.Bits `json:"pf_ci"`
	Beta          sim.Bits    `json:"beta"`
	BetaCI        [2]sim.Bits `json:"beta_ci"`
	Status        string      `json:"status"`
	Verdict       string      `json:"verdict,omitempty"`
	ReserveFactor *sim.Bits   `json:"reserve_factor,omitempty"`
	GoverningAxis string      `json:"governing_axis"`
	Mode          string      `json:"mode"`
	Error         string      `json:"error,omitempty"`
	Warnings      []string    `json:"warnings,omitempty"`
}

func noteOfMember(m *report.Member, warns []string) *memberNote {
	n := &memberNote{Pf: sim.Bits(m.Pf), PfCI: [2]sim.Bits{sim.Bits(m.PfCI[0]), sim.Bits(m.PfCI[1])},
		Beta: sim.Bits(m.Beta), BetaCI: [2]sim.Bits{sim.Bits(m.BetaCI[0]), sim.Bits(m.BetaCI[1])},
		Status: m.Status, Verdict: m.Verdict, GoverningAxis: m.GoverningAxis, Mode: m.Mode, Error: m.Error, Warnings: warns}
	if m.ReserveFactor != nil {
		r := sim.Bits(*m.ReserveFactor)
		n.ReserveFactor = &r
	}
	return n
}

// member fills m's results from n.
func (n *memberNote) member(m *report.Member) {
	m.Pf, m.PfCI = float64(n.Pf), [2]float64{float64(n.PfCI[0]), float64(n.PfCI[1])}
	m.Beta, m.BetaCI = report.Index(n.Beta), [2]report.Index{report.Index(n.BetaCI[0]), report.Index(n.BetaCI[1])}
	m.Status, m.Verdict, m.GoverningAxis, m.Mode, m.Error = n.Status, n.Verdict, n.GoverningAxis, n.Mode, n.Error
	if n.ReserveFactor != nil {
		r := float64(*n.ReserveFactor)
		m.ReserveFactor = &r
	}
}

// memberResult is the outcome of member i in a merge: the result the
// member's shard noted, and its model, built again for the joint sample.
func memberResult(st *study.Study, i int, sh *sim.Shard) memberOutcome {
	m := st.Inventory.Members[i]
	mr := report.Member{Name: m.Name, Line: m.Line, Cells: m.Cells}
	var n memberNote
	ok, err := sh.Recall(memberNoteKey(i), &n)
	switch {
	case err != nil:
		n = memberNote{Error: err.Error()}
	case !ok:
		n = memberNote{Error: "no shard ran it"}
	}
	if !ok || err != nil {
		nan := sim.Bits(math.NaN())
		n.Pf, n.Beta, n.Warnings = nan, nan, []string{"not run: " + n.Error}
	}
	n.member(&mr)
	if n.Error != "" {
		return memberOutcome{mr: mr, warns: n.Warnings}
	}
	// Its FORM for the first-order system is noted apart
	// (system_form_shard.go).
	o := memberOutcome{mr: mr, warns: n.Warnings}
	md, err := memberModel(st, i)
	if err != nil {
		o.warns = append(o.warns, "not in the system: "+err.Error())
		return o
	}
	o.md = md
	return o
}

// memberModel builds the model of member i of st's inventory.
func memberModel(st *study.Study, i int) (*study.Model, error) {
	ms, err := st.Member(i)
	if err != nil {
		return nil, err
	}
	return study.Build(ms)
}

// shardInventory runs the inventory members this shard owns, each whole
// (several at a time, as runInventory does), and this shard's blocks of
// the joint sample, noting them; main is the study's FORM result (nil
// when none), as runInventory takes it.
func shardInventory(ctx context.Context, l *Loaded, s *sim.Settings, main *sim.FORMResult, obs Observer) error {
	inv := l.Study.Inventory
	settings := caseSettings(s)
	settings.Shard = nil // a member is run whole by the shard that owns it
	fs := memberFORM(s.FORM, main)
	same := newSameMembers(inv)
	outs := runMembers(ctx, l.Study, &settings, obs, func(i int, ms *sim.Settings) memberOutcome {
		if s.Shard.Owns(i) {
			return memberRun(ctx, l.Study, i, ms, fs, same)
		}
		// Another shard's: only its model, for the joint sample.
		if md, err := memberModel(l.Study, i); err == nil && len(md.Sim.Vars) > 0 {
			return memberOutcome{md: md}
		}
		return memberOutcome{}
	})
	if ctx.Err() != nil {
		return ctx.Err()
	}
	sys := make([]systemMember, 0, len(inv.Members))
	for i, o := range outs {
		if s.Shard.Owns(i) {
			if err := s.Shard.Note(memberNoteKey(i), noteOfMember(&o.mr, o.warns)); err != nil {
				return err
			}
		}
		if o.md != nil {
			sys = append(sys, systemMember{m: o.md.Sim, form: o.form}) // its FORM for the first-order system
		}
	}
	if len(sys) < len(inv.Members) {
		return nil // no system: the merge says why
	}
	obs.Stage("inventory system (joint sampling), this shard's blocks")
	ir := &inventoryRun{doc: &report.Inventory{}}
	if err := ir.runSystem(ctx, l, sys, s); err != nil && ctx.Err() == nil {
		return fmt.Errorf("inventory system: %v", err)
	}
	return ctx.Err()
}

// systemNote is one block of the joint sample as its shard notes it;
// Members are pairs of member index and failing samples, for the members
// that failed in the block.
type systemNote struct {
	N        int64   `json:"n"`
	Failures int64   `json:"failures"`
	Failing  int64   `json:"failing"`
	Members  []int64 `json:"members,omitempty"`
}

// jointSample is sampleSystem for a run that may be split: a shard
// evaluates and notes its blocks that a merge can need (the counts it
// returns are of its blocks only); a merge adds the noted blocks as
// sampleSystem adds them, stopping where it stops.
func jointSample(ctx context.Context, ms []systemMember, nShared int, maxN int64, targetCoV float64, seed uint64, s *sim.Settings) (*systemCounts, error) {
	sh := s.Shard
	switch {
	case sh.Splits():
		return shardSystemBlocks(ctx, ms, nShared, maxN, targetCoV, seed, s)
	case sh.Replays():
		return replaySystem(ms, maxN, targetCoV, sh)
	}
	return sampleSystem(ctx, ms, nShared, maxN, targetCoV, seed, s.Workers), nil
}

// shardSystemBlocks evaluates and notes the shard's blocks of the joint
// sample of maxN samples that a merge can need. The first looks of
// sampleSystem, as far as a shard's share of the blocks goes, every
// shard draws whole (as every shard of a sampling run draws block 0): the
// same counts in every shard, so each finds where a single run stops if
// it stops there, and notes only its blocks up to that look (a system
// resolved after one block costs each shard one block, not its share of
// the budget); else each draws and notes its blocks of the whole budget,
// at most twice its share.
func shardSystemBlocks(ctx context.Context, ms []systemMember, nShared int, maxN int64, targetCoV float64, seed uint64, s *sim.Settings) (*systemCounts, error) {
	blocks := int((maxN + systemBlock - 1) / systemBlock)
	share := (blocks + s.Shard.Count - 1) / s.Shard.Count
	p := newSystemPlan(ms, nShared)
	drawn := map[int]*systemCounts{}
	seen := &systemCounts{members: make([]int64, len(ms))}
	end := blocks
	for b0 := 0; nextLook(b0) <= min(share, blocks); b0 = nextLook(b0) {
		b1 := nextLook(b0)
		res := drawBlocks(ctx, p, blockRange(b0, b1), maxN, seed, s.Workers)
		if ctx.Err() != nil {
			return seen, ctx.Err()
		}
		for j, c := range res {
			drawn[b0+j] = c
			seen.add(c)
		}
		if resolved(seen, targetCoV, b1) {
			end = b1
			break
		}
	}
	var todo []int
	for b := range end {
		if _, ok := drawn[b]; !ok && s.Shard.Owns(b) {
			todo = append(todo, b)
		}
	}
	res := drawBlocks(ctx, p, todo, maxN, seed, s.Workers)
	if ctx.Err() != nil {
		return seen, ctx.Err()
	}
	for j, c := range res {
		drawn[todo[j]] = c
	}
	total := &systemCounts{members: make([]int64, len(ms))}
	for b := range end {
		if !s.Shard.Owns(b) {
			continue
		}
		c := drawn[b]
		n := systemNote{N: c.n, Failures: c.failures, Failing: c.failing}
		for i, k := range c.members {
			if k != 0 {
				n.Members = append(n.Members, int64(i), k)
			}
		}
		if err := s.Shard.Note(systemNoteKey(b), n); err != nil {
			return total, err
		}
		total.add(c)
	}
	return total, nil
}

// replaySystem adds the noted blocks of the joint sample in the batches
// of sampleSystem, stopping at the first look where the counts are
// resolved, as sampleSystem does.
func replaySystem(ms []systemMember, maxN int64, targetCoV float64, sh *sim.Shard) (*systemCounts, error) {
	total := &systemCounts{members: make([]int64, len(ms))}
	blocks := int((maxN + systemBlock - 1) / systemBlock)
	for b0 := 0; b0 < blocks; b0 = nextLook(b0) {
		b1 := min(nextLook(b0), blocks)
		for b := b0; b < b1; b++ {
			var n systemNote
			ok, err := sh.Recall(systemNoteKey(b), &n)
			if !ok || err != nil {
				return nil, fmt.Errorf("block %d of the joint sample is in no shard's state (%v)", b, err)
			}
			c := &systemCounts{n: n.N, failures: n.Failures, failing: n.Failing, members: make([]int64, len(ms))}
			for k := 0; k+1 < len(n.Members); k += 2 {
				if n.Members[k] < 0 || n.Members[k] >= int64(len(ms)) {
					return nil, fmt.Errorf("block %d of the joint sample names member %d of %d", b, n.Members[k], len(ms))
				}
				c.members[n.Members[k]] = n.Members[k+1]
			}
			total.add(c)
		}
		if resolved(total, targetCoV, b1) {
			break
		}
	}
	return total, nil
}
