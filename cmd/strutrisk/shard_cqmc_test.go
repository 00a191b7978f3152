package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestShardConditionalQMC checks that conditional QMC, whose replicates
// are fixed, splits into shards and merges to the single run's files byte
// for byte, with a budget it spends and with a target CoV that stops it
// before.
func TestShardConditionalQMC(t *testing.T) {
	t.Parallel() // sets no hook: runs beside the other slow tests
	dir := t.TempDir()
	text, err := os.ReadFile("../../studies/bench/reference-strut.toml")
	if err != nil {
		t.Fatal(err)
	}
	for i, c := range []struct{ samples, cov string }{
		{"1_000_000", "0.0001"}, // the budget is spent
		{"4_000_000", "0.003"},  // stops at about 1e5 evaluations
	} {
		s := strings.Replace(string(text), `method = "monte-carlo"`, `method = "conditional-qmc"`, 1)
		s = strings.Replace(s, "samples = 10_000_000", "samples = "+c.samples, 1)
		s = strings.Replace(s, "target_cov = 0.0001", "target_cov = "+c.cov, 1)
		if strings.Count(s, "conditional-qmc") != 1 || !strings.Contains(s, "samples = "+c.samples) {
			t.Fatal("the reference study's [analysis] lines moved: update the test")
		}
		study := writeStudy(t, s)
		d := filepath.Join(dir, itoa(i))
		single := filepath.Join(d, "single")
		if code, _, errs := invoke(t, "run", study, "--out", single); code != exitOK {
			t.Fatalf("single run: exit %d: %s", code, errs)
		}
		for _, n := range []int{3, 7} {
			if diff := sameFolders(t, single, shardAndMerge(t, study, d, n)); diff != "" {
				t.Errorf("samples %s, target_cov %s, %d shards: %s", c.samples, c.cov, n, diff)
			}
		}
	}
}
