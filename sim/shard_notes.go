package sim

import (
	"bytes"
	"encoding/json"
	"fmt"
	"maps"
	"slices"
)

// Splits reports whether s splits a run (Count > 0): work items are then
// shared out by Owns; a replay (Count 0) splits nothing.
func (s *Shard) Splits() bool { return s != nil && s.Count > 0 }

// Replays reports whether s replays the records of a split run.
func (s *Shard) Replays() bool { return s != nil && s.Count == 0 }

// Owns reports whether work item i (an inventory member, a block of a
// caller's own sampling) is this shard's: i mod Count = Index.
func (s *Shard) Owns(i int) bool { return s.Splits() && i%s.Count == s.Index }

// Note records, under key, the result v of a step above sampling that
// the caller ran in this shard (an inventory member, a FORM result), as
// JSON: give v fields that read back exactly (Bits for floats). A replay
// finds it again with Recall. Noting a key twice keeps the last value.
func (s *Shard) Note(key string, v any) error {
	data, err := json.Marshal(v)
	if err != nil {
		return fmt.Errorf("sim: shard note %s: %v", key, err)
	}
	s.mu.Lock()
	defer s.mu.Unlock()
	if s.notes == nil {
		s.notes = map[string]json.RawMessage{}
	}
	s.notes[key] = data
	return nil
}

// Recall reads the note of key into v; it reports false when there is
// none.
func (s *Shard) Recall(key string, v any) (bool, error) {
	s.mu.Lock()
	data, ok := s.notes[key]
	s.mu.Unlock()
	if !ok {
		return false, nil
	}
	if err := json.Unmarshal(data, v); err != nil {
		return true, fmt.Errorf("sim: shard note %s: %v", key, err)
	}
	return true, nil
}

// Notes returns the notes of s by key (a copy of the map).
func (s *Shard) Notes() map[string]json.RawMessage {
	s.mu.Lock()
	defer s.mu.Unlock()
	return maps.Clone(s.notes)
}

// CombineNotes joins the notes of the shards of a split run. A key noted
// by more than one shard must hold the same bytes in each (a result every
// shard computed alike); a key whose notes differ is an error naming it.
func CombineNotes(shards []map[string]json.RawMessage) (map[string]json.RawMessage, error) {
	out := map[string]json.RawMessage{}
	var differ []string
	for _, notes := range shards {
		for _, k := range slices.Sorted(maps.Keys(notes)) {
			v := notes[k]
			if old, ok := out[k]; ok && !bytes.Equal(old, v) {
				differ = append(differ, k)
				continue
			}
			out[k] = v
		}
	}
	if len(differ) > 0 {
		slices.Sort(differ)
		differ = slices.Compact(differ)
		return nil, fmt.Errorf("sim: the shards disagree on %v: they did not run alike", differ)
	}
	return out, nil
}

// SetNotes gives a replay the combined notes of the shards.
func (s *Shard) SetNotes(notes map[string]json.RawMessage) {
	s.mu.Lock()
	defer s.mu.Unlock()
	s.notes = maps.Clone(notes)
}
