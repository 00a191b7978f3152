package shardstate

import (
	"fmt"
	"path/filepath"

	"strutrisk/sim"
)

// StudyID identifies the study file of a split run: its path as given,
// its absolute path and the hash of its bytes; Inventory is the hash of
// the bytes of its inventory's CSV file, "" when it has none (see
// InventoryHash), as members are split between shards.
type StudyID struct {
	Path, Abs, SHA256 string
	Inventory         string
}

// Identify reads the study file at path, and its inventory file at
// inventory ("" when it has none), for its StudyID.
func Identify(path, inventory string) (StudyID, error) {
	abs, err := filepath.Abs(path)
	if err != nil {
		return StudyID{}, err
	}
	hash, err := HashFile(abs)
	if err != nil {
		return StudyID{}, err
	}
	inv, err := InventoryHash(inventory)
	if err != nil {
		return StudyID{}, err
	}
	return StudyID{Path: path, Abs: abs, SHA256: hash, Inventory: inv}, nil
}

// Record is the state of a shard of the study id, run by the tool version
// tool with settings s, whose Shard holds what it recorded.
func Record(tool string, id StudyID, s *sim.Settings) *State {
	return &State{ToolVersion: tool, Study: id.Path, StudyAbs: id.Abs, StudySHA256: id.SHA256, InventorySHA256: id.Inventory,
		Shard: s.Shard.Index, Shards: s.Shard.Count, Settings: SettingsOf(s), Runs: s.Shard.Runs(), Notes: s.Shard.Notes()}
}

// SettingsOf are the sampling settings of s that a shard records.
func SettingsOf(s *sim.Settings) Settings {
	return Settings{Method: string(s.Method), Samples: s.Samples, Seed: s.Seed, TargetCoV: s.TargetCoV}
}

// Apply gives s the sampling settings the shards ran with.
func (st Settings) Apply(s *sim.Settings) {
	s.Method = sim.Method(st.Method)
	s.Samples, s.Seed, s.TargetCoV = st.Samples, st.Seed, st.TargetCoV
}

// ReadAll reads the state file of each folder of dirs, in order.
func ReadAll(dirs []string) ([]*State, error) {
	states := make([]*State, 0, len(dirs))
	for _, d := range dirs {
		st, err := Read(d)
		if err != nil {
			return nil, err
		}
		states = append(states, st)
	}
	return states, nil
}

// Locate returns the study file to merge the shards of st with: given,
// when not "", else the path the shard was given, when that file is
// unchanged (so that the results name it the same), else the absolute
// path it ran from. The file must have the content the shard ran.
func (st *State) Locate(given string) (string, error) {
	path := given
	if path == "" {
		path = st.Study
		if h, err := HashFile(path); err != nil || h != st.StudySHA256 {
			path = st.StudyAbs
		}
	}
	if h, err := HashFile(path); err != nil || h != st.StudySHA256 {
		return "", fmt.Errorf("%s is not the study the shards ran (missing or changed since): give it with --study", path)
	}
	return path, nil
}

// InventoryHash returns the hex SHA-256 of the inventory file read from
// path ("" for a study without one: path ""). A shard records it and a
// merge compares it, as the members a shard ran came from that file.
func InventoryHash(path string) (string, error) {
	if path == "" {
		return "", nil
	}
	return HashFile(path)
}

// CheckInventory says whether the inventory file at path (the merge's
// study's, "" when none) is the one the shards of st ran.
func (st *State) CheckInventory(path string) error {
	h, err := InventoryHash(path)
	if err != nil {
		return err
	}
	if h != st.InventorySHA256 {
		return fmt.Errorf("the inventory file %s is not the one the shards ran (changed since): run the shards again", path)
	}
	return nil
}
