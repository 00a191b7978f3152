package shardstate

import (
	"encoding/json"
	"fmt"
	"strings"

	"strutrisk/sim"
)

// Problem is what is wrong with the set of shards given to a merge.
type Problem struct {
	Msgs []string
}

func (p *Problem) Error() string { return strings.Join(p.Msgs, "; ") }

// Join checks that states are the shards 0..N-1 of one run, each once,
// all of the same study, tool version and settings as the first, and
// returns the replay of their runs. dirs name the states in messages.
func Join(states []*State, dirs []string) (*sim.Shard, error) {
	if len(states) == 0 {
		return nil, &Problem{Msgs: []string{"no shard given"}}
	}
	first := states[0]
	var msgs []string
	seen := map[int]string{}
	for i, st := range states {
		where := fmt.Sprintf("%s (shard %d)", dirs[i], st.Shard)
		switch {
		case st.Shards != first.Shards:
			msgs = append(msgs, fmt.Sprintf("%s is one of %d shards, %s one of %d: another split", where, st.Shards, dirs[0], first.Shards))
			continue
		case st.StudySHA256 != first.StudySHA256:
			msgs = append(msgs, fmt.Sprintf("%s ran another study (or the study file changed): %s, not %s", where, st.Study, first.Study))
			continue
		case st.InventorySHA256 != first.InventorySHA256:
			msgs = append(msgs, fmt.Sprintf("%s ran another inventory file (or it changed between shards) than %s", where, dirs[0]))
			continue
		case st.ToolVersion != first.ToolVersion:
			msgs = append(msgs, fmt.Sprintf("%s ran strutrisk %s, %s ran %s", where, st.ToolVersion, dirs[0], first.ToolVersion))
			continue
		case st.Settings != first.Settings:
			msgs = append(msgs, fmt.Sprintf("%s ran with other settings (%+v, not %+v)", where, st.Settings, first.Settings))
			continue
		case st.Shard < 0 || st.Shard >= st.Shards:
			msgs = append(msgs, fmt.Sprintf("%s: shard index out of 0..%d", where, st.Shards-1))
			continue
		}
		if d, ok := seen[st.Shard]; ok {
			msgs = append(msgs, fmt.Sprintf("shard %d is given twice: %s and %s", st.Shard, d, dirs[i]))
			continue
		}
		seen[st.Shard] = dirs[i]
	}
	var missing []string
	for k := 0; k < first.Shards; k++ {
		if _, ok := seen[k]; !ok {
			missing = append(missing, fmt.Sprint(k))
		}
	}
	if len(missing) > 0 {
		msgs = append(msgs, fmt.Sprintf("missing shard%s %s (of 0..%d)", plural(len(missing)), strings.Join(missing, ", "), first.Shards-1))
	}
	if len(msgs) > 0 {
		return nil, &Problem{Msgs: msgs}
	}
	runs := make([][]*sim.ShardRun, len(states))
	notes := make([]map[string]json.RawMessage, len(states))
	for i, st := range states {
		runs[i], notes[i] = st.Runs, st.Notes
	}
	rep, err := sim.NewReplay(sim.CombineRuns(runs))
	if err != nil {
		return nil, &Problem{Msgs: []string{err.Error()}}
	}
	all, err := sim.CombineNotes(notes)
	if err != nil {
		return nil, &Problem{Msgs: []string{err.Error()}}
	}
	rep.SetNotes(all)
	return rep, nil
}

func plural(n int) string {
	if n == 1 {
		return ""
	}
	return "s"
}
