package shardstate

import (
	"crypto/sha256"
	"encoding/hex"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/sim"
)

// A state recorded for a study names it as given, absolutely and by the
// SHA-256 of its bytes, carries the settings the merge applies again, and
// finds its study where it was given, else where it ran, and refuses a
// study whose content changed.
func TestRecordAndLocate(t *testing.T) {
	dir := t.TempDir()
	study := filepath.Join(dir, "s.toml")
	text := []byte("title = \"x\"\n")
	if err := os.WriteFile(study, text, 0o644); err != nil {
		t.Fatal(err)
	}
	sum := sha256.Sum256(text)
	id, err := Identify(study, "")
	if err != nil || id.Abs != study || id.SHA256 != hex.EncodeToString(sum[:]) {
		t.Fatalf("Identify: %+v, %v", id, err)
	}
	s := &sim.Settings{Method: sim.LatinHypercube, Samples: 5000, Seed: 9, TargetCoV: 0.05, Shard: &sim.Shard{Index: 1, Count: 3}}
	st := Record("9.9.9", id, s)
	if st.Shard != 1 || st.Shards != 3 || st.ToolVersion != "9.9.9" || st.Study != study {
		t.Errorf("Record: %+v", st)
	}
	var back sim.Settings
	st.Settings.Apply(&back)
	if back.Method != s.Method || back.Samples != s.Samples || back.Seed != s.Seed || back.TargetCoV != s.TargetCoV {
		t.Errorf("settings applied %+v, want those recorded from %+v", back, s)
	}

	if p, err := st.Locate(""); err != nil || p != study {
		t.Errorf("Locate: %q, %v; want the path given", p, err)
	}
	st.Study = "elsewhere/s.toml"
	if p, err := st.Locate(""); err != nil || p != study {
		t.Errorf("Locate with the given path gone: %q, %v; want the absolute path", p, err)
	}
	other := filepath.Join(dir, "t.toml")
	os.WriteFile(other, []byte("title = \"y\"\n"), 0o644)
	if _, err := st.Locate(other); err == nil || !strings.Contains(err.Error(), "give it with --study") {
		t.Errorf("Locate of another study: %v, want it refused", err)
	}
	os.WriteFile(study, []byte("title = \"changed\"\n"), 0o644)
	if _, err := st.Locate(""); err == nil || !strings.Contains(err.Error(), "not the study the shards ran") {
		t.Errorf("Locate of a changed study: %v, want it refused", err)
	}
}

// ReadAll reads each folder's state in order and stops at the first that
// has none, naming it.
func TestReadAll(t *testing.T) {
	dir := t.TempDir()
	var dirs []string
	for k := range 2 {
		d := filepath.Join(dir, string(rune('a'+k)))
		os.Mkdir(d, 0o755)
		data, err := Encode(&State{Shard: k, Shards: 2})
		if err != nil {
			t.Fatal(err)
		}
		os.WriteFile(filepath.Join(d, FileName), data, 0o644)
		dirs = append(dirs, d)
	}
	states, err := ReadAll(dirs)
	if err != nil || len(states) != 2 || states[0].Shard != 0 || states[1].Shard != 1 {
		t.Fatalf("ReadAll: %v, %v", states, err)
	}
	if _, err := ReadAll(append(dirs, dir)); err == nil || !strings.Contains(err.Error(), "no shard state") {
		t.Errorf("a folder without a state: %v", err)
	}
}
