package cli

import _ "embed"

// The help texts of the commands, as printed above their flags (the
// command appends the flags and the caution). They are the files in
// help/, byte for byte.
var (
	// Usage is strutrisk's own help: the commands and the exit statuses.
	//go:embed help/usage.txt
	Usage string
	// RunHelp heads `strutrisk run --help`.
	//go:embed help/run.txt
	RunHelp string
	// CheckHelp heads `strutrisk check --help`.
	//go:embed help/check.txt
	CheckHelp string
	// MergeHelp heads `strutrisk merge --help`; it names the shard state
	// file (shardstate.FileName).
	//go:embed help/merge.txt
	MergeHelp string
	// ModelFactorHelp heads `strutrisk model-factor --help`.
	//go:embed help/model-factor.txt
	ModelFactorHelp string
	// NewHelp is `strutrisk new --help` without the caution.
	//go:embed help/new.txt
	NewHelp string
)
