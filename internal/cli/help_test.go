package cli

import (
	"strings"
	"testing"

	"strutrisk/internal/shardstate"
)

// TestHelpTexts: every help text is there, ends its last line, and the
// merge help names the shard state file as package shardstate writes it.
func TestHelpTexts(t *testing.T) {
	for name, s := range map[string]string{"usage": Usage, "run": RunHelp, "check": CheckHelp, "merge": MergeHelp, "model-factor": ModelFactorHelp, "new": NewHelp} {
		if len(s) < 100 || !strings.HasSuffix(s, "\n") {
			t.Errorf("%s: %d bytes, ends %q: want a help text ending its line", name, len(s), s[max(0, len(s)-10):])
		}
	}
	if !strings.Contains(MergeHelp, "Each DIR holds a "+shardstate.FileName+".") {
		t.Errorf("merge help does not name %s:\n%s", shardstate.FileName, MergeHelp)
	}
	for _, cmd := range []string{"run", "merge", "check", "new", "help keys", "model-factor", "--version"} {
		if !strings.Contains(Usage, "strutrisk "+cmd) {
			t.Errorf("usage does not list strutrisk %s", cmd)
		}
	}
}
