package main

import (
	"context"
	"io"

	"strutrisk/internal/cli"
	"strutrisk/internal/progress"
)

// Exit statuses of an interrupted run follow the shell's convention,
// 128 plus the signal's number.
const (
	exitInterrupted = 130 // SIGINT (Ctrl-C)
	exitTerminated  = 143 // SIGTERM
)

// Hooks of the tests: signalHook, when set, is called once the signal
// handlers are in place, with the run's context; stageHook as each step
// of a run begins.
var (
	signalHook func(ctx context.Context)
	stageHook  func(name string)
)

// startRun draws the progress line on stderr when allowed and it is a
// terminal, and returns the run's context, which SIGINT and SIGTERM
// cancel (cli.Watch), the record of the signal and the function that
// removes the handlers.
func startRun(stderr io.Writer, allowed bool) (*progress.Line, context.Context, *cli.Interrupt, func()) {
	bar := progress.New(stderr, drawsProgress(stderr, allowed))
	bar.OnStage = stageHook
	ctx, sigs, stop := cli.Watch(baseContext(), stderr, bar.Phase)
	if signalHook != nil {
		signalHook(ctx)
	}
	return bar, ctx, sigs, stop
}

// interruptedStatus is the exit status of a run that sigs stopped.
func interruptedStatus(sigs *cli.Interrupt) int {
	if sigs.Terminated() {
		return exitTerminated
	}
	return exitInterrupted
}

// drawsProgress says whether the progress line is drawn on w: only when
// allowed (not --json) and w is a terminal.
func drawsProgress(w io.Writer, allowed bool) bool {
	return allowed && cli.IsTerminal(w)
}
