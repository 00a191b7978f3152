package shardstate

import (
	"fmt"

	"strutrisk/sim"
)

// Open reads the state of each folder of dirs, checks that they are the
// shards of one run (Join) and finds the study to merge them with
// (Locate; study is the one given, "" none). It returns the first state,
// whose settings and inventory the merge takes, the replay of the shards'
// runs and the study's path. An error says why nothing can be merged.
func Open(dirs []string, study string) (*State, *sim.Shard, string, error) {
	states, err := ReadAll(dirs)
	if err != nil {
		return nil, nil, "", err
	}
	replay, err := Join(states, dirs)
	if err != nil {
		return nil, nil, "", fmt.Errorf("nothing merged: %w", err)
	}
	path, err := states[0].Locate(study)
	if err != nil {
		return nil, nil, "", err
	}
	return states[0], replay, path, nil
}
