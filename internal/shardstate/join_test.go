package shardstate

import (
	"strings"
	"testing"
)

func states(idx ...int) ([]*State, []string) {
	var sts []*State
	var dirs []string
	for _, k := range idx {
		sts = append(sts, &State{ToolVersion: "v", StudySHA256: "h", Shard: k, Shards: 4})
		dirs = append(dirs, "d"+string(rune('0'+k)))
	}
	return sts, dirs
}

// TestJoinReportsByIndex checks that missing, doubled and foreign shards
// are named by their index.
func TestJoinReportsByIndex(t *testing.T) {
	sts, dirs := states(0, 1, 1)
	foreign := &State{ToolVersion: "v", StudySHA256: "other", Shard: 3, Shards: 4}
	sts, dirs = append(sts, foreign), append(dirs, "dx")
	_, err := Join(sts, dirs)
	if err == nil {
		t.Fatal("accepted")
	}
	for _, want := range []string{"shard 1 is given twice", "missing shards 2, 3 (of 0..3)", "dx (shard 3) ran another study"} {
		if !strings.Contains(err.Error(), want) {
			t.Errorf("%q does not say %q", err, want)
		}
	}
	sts, dirs = states(3, 2, 0, 1)
	if _, err := Join(sts, dirs); err != nil {
		t.Errorf("a full set was refused: %v", err)
	}
}

// TestEncodeStable checks that a state encodes to the same bytes twice and
// reads back.
func TestEncodeStable(t *testing.T) {
	st := &State{ToolVersion: "v", Shard: 1, Shards: 2}
	a, err := Encode(st)
	if err != nil {
		t.Fatal(err)
	}
	b, _ := Encode(st)
	if string(a) != string(b) {
		t.Error("two encodings differ")
	}
}
