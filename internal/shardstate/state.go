package shardstate

import (
	"bytes"
	"compress/gzip"
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"fmt"
	"io"
	"os"
	"path/filepath"

	"strutrisk/sim"
)

// FileName is the name of the state file in a shard's output folder.
const FileName = "shard-state.json.gz"

// Format and FormatVersion identify the file.
const (
	Format        = "strutrisk-shard-state"
	FormatVersion = 3
)

// Settings are the sampling settings a shard ran with; the merge runs
// with the same.
type Settings struct {
	Method    string  `json:"method"`
	Samples   int64   `json:"samples"`
	Seed      uint64  `json:"seed"`
	TargetCoV float64 `json:"target_cov"`
}

// State is the content of a state file.
type State struct {
	Format        string `json:"format"`
	FormatVersion int    `json:"format_version"`
	ToolVersion   string `json:"tool_version"`
	// Study is the study file's path as the shard was given it (the
	// results name it so), StudyAbs its absolute path when the shard ran
	// and StudySHA256 the hash of its bytes.
	Study       string `json:"study"`
	StudyAbs    string `json:"study_abs"`
	StudySHA256 string `json:"study_sha256"`
	// InventorySHA256 is the hash of the bytes of the study's inventory
	// file, absent for a study without one.
	InventorySHA256 string   `json:"inventory_sha256,omitempty"`
	Shard           int      `json:"shard"`
	Shards          int      `json:"shards"`
	Settings        Settings `json:"settings"`
	// Runs are the sampling runs of the shard, by key.
	Runs []*sim.ShardRun `json:"runs"`
	// Notes are the results of the steps above sampling the shard ran
	// (sim.Shard.Note), by key: each inventory member it owns, the
	// blocks it owns of an inventory's joint sample, the study's FORM.
	Notes map[string]json.RawMessage `json:"notes,omitempty"`
}

// HashFile returns the hex SHA-256 of the file at path.
func HashFile(path string) (string, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return "", err
	}
	h := sha256.Sum256(data)
	return hex.EncodeToString(h[:]), nil
}

// Encode returns the bytes of the state file of st.
func Encode(st *State) ([]byte, error) {
	st.Format, st.FormatVersion = Format, FormatVersion
	data, err := json.Marshal(st)
	if err != nil {
		return nil, err
	}
	var buf bytes.Buffer
	zw := gzip.NewWriter(&buf) // no name, no time: same state, same bytes
	if _, err := zw.Write(data); err != nil {
		return nil, err
	}
	if err := zw.Close(); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// Read reads the state file in folder dir.
func Read(dir string) (*State, error) {
	f, err := os.Open(filepath.Join(dir, FileName))
	if err != nil {
		return nil, fmt.Errorf("%s: no shard state (%s): was it written by strutrisk run --shard?", dir, FileName)
	}
	defer f.Close()
	zr, err := gzip.NewReader(f)
	if err != nil {
		return nil, fmt.Errorf("%s: %s is not a shard state: %v", dir, FileName, err)
	}
	data, err := io.ReadAll(zr)
	if err != nil {
		return nil, fmt.Errorf("%s: %s is damaged: %v", dir, FileName, err)
	}
	var st State
	if err := json.Unmarshal(data, &st); err != nil {
		return nil, fmt.Errorf("%s: %s is damaged: %v", dir, FileName, err)
	}
	if st.Format != Format || st.FormatVersion != FormatVersion {
		return nil, fmt.Errorf("%s: %s has format %q version %d; this strutrisk reads %q version %d", dir, FileName, st.Format, st.FormatVersion, Format, FormatVersion)
	}
	return &st, nil
}
