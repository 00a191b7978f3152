package shardstate

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestOpen: the shards of one run open with the first state, the replay
// and the study they ran; a folder without a state, a set that is not
// one split ("nothing merged") and a study changed since are refused.
func TestOpen(t *testing.T) {
	dir := t.TempDir()
	study := filepath.Join(dir, "s.toml")
	os.WriteFile(study, []byte("title = \"x\"\n"), 0o644)
	id, err := Identify(study, "")
	if err != nil {
		t.Fatal(err)
	}
	var dirs []string
	for k := range 2 {
		d := filepath.Join(dir, "shard"+string(rune('0'+k)))
		os.Mkdir(d, 0o755)
		data, err := Encode(&State{ToolVersion: "v", Study: id.Path, StudyAbs: id.Abs, StudySHA256: id.SHA256, Shard: k, Shards: 2})
		if err != nil {
			t.Fatal(err)
		}
		os.WriteFile(filepath.Join(d, FileName), data, 0o644)
		dirs = append(dirs, d)
	}
	first, replay, path, err := Open(dirs, "")
	if err != nil || first.Shard != 0 || replay == nil || path != study {
		t.Fatalf("Open: %+v, %v, %q, %v; want shard 0, a replay and %s", first, replay, path, err, study)
	}
	for _, c := range []struct {
		name string
		dirs []string
		want string
	}{
		{"no state", []string{dir}, "no shard state"},
		{"a shard missing", dirs[:1], "nothing merged: missing shard 1 (of 0..1)"},
	} {
		if _, _, _, err := Open(c.dirs, ""); err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: %v, want %q", c.name, err, c.want)
		}
	}
	os.WriteFile(study, []byte("title = \"changed\"\n"), 0o644)
	if _, _, _, err := Open(dirs, ""); err == nil || !strings.Contains(err.Error(), "not the study the shards ran") || strings.Contains(err.Error(), "nothing merged") {
		t.Errorf("changed study: %v", err)
	}
}
