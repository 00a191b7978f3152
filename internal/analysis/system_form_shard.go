package analysis

import (
	"context"
	"fmt"

	"strutrisk/sim"
)

// formNoteKey is the shard note (a formNote, shard_form.go) of member
// i's FORM result for the first-order system.
func formNoteKey(i int) string { return fmt.Sprintf("inventory/form/%d", i) }

// shardForms returns the members' FORM results of a split or merged run:
// a shard runs FORM on the members it owns and notes them (the others
// are nil); a merge recalls each, running FORM itself on a member no
// shard noted. Outside sharding it is memberForms.
func shardForms(ctx context.Context, sys []systemMember, fs *sim.FORMSettings, s *sim.Settings) ([]*sim.FORMResult, error) {
	sh := s.Shard
	if !sh.Splits() && !sh.Replays() {
		return memberForms(ctx, sys, fs, s.Workers), nil
	}
	todo := make([]bool, len(sys))
	out := make([]*sim.FORMResult, len(sys))
	for i := range sys {
		if sh.Splits() {
			todo[i] = sh.Owns(i)
			continue
		}
		var n formNote
		ok, err := sh.Recall(formNoteKey(i), &n)
		if err != nil {
			return nil, err
		}
		if ok {
			out[i], _ = n.result() // a noted error: no result, as here
		} else {
			todo[i] = true
		}
	}
	run := memberFormsOf(ctx, sys, fs, s.Workers, todo)
	for i, r := range run {
		if !todo[i] {
			continue
		}
		out[i] = r
		if sh.Splits() && r != nil {
			if err := sh.Note(formNoteKey(i), noteOfFORM(r, nil)); err != nil {
				return nil, err
			}
		}
	}
	return out, nil
}
