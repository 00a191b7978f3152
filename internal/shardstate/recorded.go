package shardstate

import (
	"fmt"
	"path/filepath"
)

// Recorded says what the shard of st recorded in its state file in the
// folder dir, for the user of `run --shard`.
func (st *State) Recorded(dir string) string {
	return fmt.Sprintf("shard %d of %d: %d sampling run%s and %d other result%s recorded in %s", st.Shard, st.Shards, len(st.Runs), plural(len(st.Runs)), len(st.Notes), plural(len(st.Notes)), filepath.Join(dir, FileName))
}
