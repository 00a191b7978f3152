package main

import (
	"flag"
	"fmt"
	"io"

	"strutrisk/internal/cli"
	"strutrisk/internal/shardstate"
)

// mergeCmd is strutrisk merge.
func mergeCmd(args []string, stdout, stderr io.Writer) int {
	o := &runOptions{}
	var studyPath string
	fs := flag.NewFlagSet("merge", flag.ContinueOnError)
	outputFlags(fs, o)
	fs.StringVar(&studyPath, "study", "", "the study `FILE` (default: the path the shards read)")
	fs.IntVar(&o.ov.Workers, "workers", 0, "number of worker goroutines `N` (default: all cores); results do not depend on it")
	dirs, help, err := cli.ParseArgs(fs, args)
	if help {
		fmt.Fprint(stdout, cli.MergeHelp+cli.FlagHelp(fs))
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
	first, replay, studyPath, err := shardstate.Open(dirs, studyPath)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk merge: %v\n", err)
		return exitInput
	}
	l, code := load(studyPath, stderr)
	if code != exitOK {
		return code
	}
	if err := first.CheckInventory(l.Study.InventoryPath()); err != nil {
		fmt.Fprintf(stderr, "strutrisk merge: nothing merged: %v\n", err)
		return exitInput
	}
	settings := l.Settings(o.ov.Workers)
	first.Settings.Apply(&settings)
	settings.Shard = replay
	return runAndWrite(o, studyPath, l, settings, stdout, stderr)
}
