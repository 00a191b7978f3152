package analysis

import (
	"os"
	"path/filepath"
	"testing"

	"strutrisk/internal/fixture"
)

// writeStudy writes a study file into a fresh folder and returns its path.
func writeStudy(t *testing.T, text string) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), "study.toml")
	if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

// mustLoad loads the study text or stops the test.
func mustLoad(t *testing.T, text string) *Loaded {
	t.Helper()
	l, err := Load(writeStudy(t, text))
	if err != nil {
		t.Fatalf("load: %v", err)
	}
	return l
}

// good is fixture.Good.
const good = fixture.Good

// stocky is fixture.Stocky.
const stocky = fixture.Stocky

// beamGood is fixture.BeamGood.
var beamGood = fixture.BeamGood
