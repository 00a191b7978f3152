package main

import (
	"context"
	"errors"
	"flag"
	"fmt"
	"io"
	"strings"

	"strutrisk/internal/analysis"
	"strutrisk/internal/cli"
	"strutrisk/internal/outdir"
	"strutrisk/internal/report"
	"strutrisk/sim"
)

// baseContext is the context a run starts from; tests replace it.
var baseContext = context.Background

// runOptions are the flags of run.
type runOptions struct {
	out           string
	json          bool
	requireTarget bool
	ov            analysis.Overrides // --method, --samples, --workers, --seed
	seed          uint64
	shard         string
	shardCount    int
	set           map[string]bool
}

func runCmd(args []string, stdout, stderr io.Writer) int {
	o, path, code := parseRun(args, stdout, stderr)
	if o == nil {
		return code
	}
	l, code := load(path, stderr)
	if code != exitOK {
		return code
	}
	settings, code := runSettings(o, l, stderr)
	if code != exitOK {
		return code
	}
	if o.set["shard"] || o.set["shard-count"] {
		return runShardCmd(o, path, l, settings, stderr)
	}
	return runAndWrite(o, path, l, settings, stdout, stderr)
}

// runAndWrite runs the study of l with settings and writes its folder.
func runAndWrite(o *runOptions, path string, l *analysis.Loaded, settings sim.Settings, stdout, stderr io.Writer) int {
	st := l.Study
	folder, err := l.PrepareOutput(path, o.out)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInput
	}
	defer folder.Close()

	bar, ctx, sigs, stop := startRun(stderr, !o.json)
	defer stop()
	settings.Progress = bar.Update
	bar.TargetCoV = settings.TargetCoV
	r, err := analysis.Run(ctx, l, &settings, bar)
	bar.Done()
	if errors.Is(err, sim.ErrUnsuited) {
		fmt.Fprintf(stderr, "strutrisk: %s: %v: choose another --method (auto picks one that fits)\n", st.File, err)
		return exitInput
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %s: %v\n", st.File, err)
		return exitInternal
	}
	r.MarkInterrupted(ctx, sigs.Name(), sigs.During())
	b := r.Bundle()
	if code := writeRun(o, b, st.Output.Formats, folder, stdout, stderr); code != exitOK {
		return code
	}
	return runStatus(o, r, b, sigs, folder.Path, stderr)
}

// parseRun reads run's flags and its study file. A nil options means
// stop with the status returned (help asked for, or a bad flag).
func parseRun(args []string, stdout, stderr io.Writer) (*runOptions, string, int) {
	o := &runOptions{}
	fs := flag.NewFlagSet("run", flag.ContinueOnError)
	outputFlags(fs, o)
	fs.Uint64Var(&o.seed, "seed", 0, "seed of every random stream (`N`; default: [analysis] seed)")
	fs.Int64Var(&o.ov.Samples, "samples", 0, "at most `N` model evaluations (default: [analysis] samples)")
	fs.StringVar((*string)(&o.ov.Method), "method", "", "estimator `M`: "+strings.Join(sim.MethodNames(), ", "))
	fs.IntVar(&o.ov.Workers, "workers", 0, "number of worker goroutines `N` (default: all cores; at most 16 per core, at least 64); results do not depend on it")
	fs.StringVar(&o.shard, "shard", "", "run part `K/N` (K from 0) of the sampling and write its state for strutrisk merge; \"env\" takes K and N from the scheduler (SLURM_ARRAY_TASK_ID and SLURM_ARRAY_TASK_COUNT, or JOB_COMPLETION_INDEX with --shard-count or STRUTRISK_SHARD_COUNT)")
	fs.IntVar(&o.shardCount, "shard-count", 0, "number of shards `N` when the index comes from JOB_COMPLETION_INDEX (Kubernetes Indexed Jobs); implies --shard env")
	pos, help, err := cli.ParseArgs(fs, args)
	if help {
		fmt.Fprint(stdout, helpText(cli.RunHelp, fs))
		return nil, "", exitOK
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk run: %v (strutrisk run --help)\n", err)
		return nil, "", exitInput
	}
	if len(pos) != 1 {
		fmt.Fprintf(stderr, "strutrisk run: give one study file (strutrisk run --help)\n")
		return nil, "", exitInput
	}
	o.set = cli.Set(fs)
	if err := o.ov.CheckFlags(o.set); err != nil {
		fmt.Fprintf(stderr, "strutrisk run: %v\n", err)
		return nil, "", exitInput
	}
	if o.set["seed"] {
		o.ov.Seed = &o.seed
	}
	return o, pos[0], exitOK
}

// runSettings are the study's settings with the flags given over them;
// a study run cannot take is refused with a non-zero status.
func runSettings(o *runOptions, l *analysis.Loaded, stderr io.Writer) (sim.Settings, int) {
	settings, note, err := l.RunSettings(o.ov)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return sim.Settings{}, exitInput
	}
	st := l.Study
	if o.requireTarget && !st.HasTarget {
		fmt.Fprintf(stderr, "strutrisk: %s: --require-target given but the study has no [target] beta\n", st.File)
		return sim.Settings{}, exitInput
	}
	if note != "" {
		fmt.Fprintf(stderr, "strutrisk: %s: %s\n", st.File, note)
	}
	return settings, exitOK
}

// writeRun writes the files of the run into its folder and prints the
// summary (summary.txt byte for byte) or, with --json, the document.
func writeRun(o *runOptions, b *report.Bundle, formats []string, folder *outdir.Folder, stdout, stderr io.Writer) int {
	dir := folder.Path
	files, werr := report.RunFiles(b, formats)
	var paths []string
	if werr == nil {
		paths, werr = folder.Commit(files)
	}
	if o.json {
		if code := printJSON(b.Doc, stdout, stderr); code != exitOK {
			return code
		}
	} else {
		// Where the files went is not part of the summary: standard error.
		fmt.Fprint(stdout, report.SummaryText(b))
		fmt.Fprint(stderr, report.FilesText(dir, paths))
	}
	if werr != nil {
		// The results are on standard output; say they are nowhere else.
		fmt.Fprintf(stderr, "strutrisk: the results were not written to %s: %v; what is on standard output is all there is of this run\n", dir, werr)
		return exitInternal
	}
	return exitOK
}

// runStatus is the exit status of a run whose files are written: that of
// the signal that interrupted it, else exitTarget when --require-target
// is given and the target is not shown to be met.
func runStatus(o *runOptions, r *analysis.Result, b *report.Bundle, sigs *cli.Interrupt, dir string, stderr io.Writer) int {
	if r.Incomplete != "" {
		fmt.Fprintf(stderr, "strutrisk: %s; the results in %s are marked \"complete\": false\n", r.Incomplete, dir)
		return interruptedStatus(sigs)
	}
	if why := r.TargetShortfall(b.Doc); o.requireTarget && why != "" {
		fmt.Fprintf(stderr, "strutrisk: %s\n", why)
		return exitTarget
	}
	return exitOK
}
