package main

import (
	"flag"
	"fmt"
	"io"

	"strutrisk/internal/shardstate"
)

const mergeHelp = `Usage: strutrisk merge DIR... [flags]

Joins the shards of a split run (strutrisk run STUDY --shard K/N, one
output folder DIR per shard) into the results one machine would have
written: results.json, summary.txt, the CSV files and the report, equal
bit for bit but for the timings. Each DIR holds a ` + shardstate.FileName + `.
The shards must be 0..N-1 of one split, each given once, of the same
study file and inventory file (unchanged), tool version and settings; otherwise nothing is
merged and the exit status is 2. The study is read from where the shards
read it, unless --study names it (it must have the same content). Steps
that follow from the merged estimate (FORM, sensitivities, reserve
factor) run here.

Flags:
`

// mergeCmd is strutrisk merge.
func mergeCmd(args []string, stdout, stderr io.Writer) int {
	o := &runOptions{}
	var studyPath string
	fs := flag.NewFlagSet("merge", flag.ContinueOnError)
	outputFlags(fs, o)
	fs.StringVar(&studyPath, "study", "", "the study `FILE` (default: the path the shards read)")
	fs.IntVar(&o.workers, "workers", 0, "number of worker goroutines `N` (default: all cores); results do not depend on it")
	dirs, help, err := parseArgs(fs, args)
	if help {
		fmt.Fprint(stdout, mergeHelp+flagHelp(fs))
		return exitOK
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk merge: %v (strutrisk merge --help)\n", err)
		return exitInput
	}
	if len(dirs) == 0 {
		fmt.Fprintf(stderr, "strutrisk merge: give the output folders of the shards (strutrisk merge --help)\n")
		return exitInput
	}
	o.set = map[string]bool{}
	states, err := shardstate.ReadAll(dirs)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk merge: %v\n", err)
		return exitInput
	}
	replay, err := shardstate.Join(states, dirs)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk merge: nothing merged: %v\n", err)
		return exitInput
	}
	if studyPath, err = states[0].Locate(studyPath); err != nil {
		fmt.Fprintf(stderr, "strutrisk merge: %v\n", err)
		return exitInput
	}
	l, code := load(studyPath, stderr)
	if code != exitOK {
		return code
	}
	if err := states[0].CheckInventory(inventoryPath(l.Study)); err != nil {
		fmt.Fprintf(stderr, "strutrisk merge: nothing merged: %v\n", err)
		return exitInput
	}
	settings := l.Settings(o.workers)
	states[0].Settings.Apply(&settings)
	settings.Shard = replay
	return runAndWrite(o, studyPath, l, settings, stdout, stderr)
}
