package main

import (
	"context"
	"fmt"
	"io"
	"os"
	"os/signal"
	"sync"
	"syscall"
)

// Exit statuses of an interrupted run follow the shell's convention,
// 128 plus the signal's number.
const (
	exitInterrupted = 130 // SIGINT (Ctrl-C)
	exitTerminated  = 143 // SIGTERM
)

// interrupt records the signal that stopped a run.
type interrupt struct {
	mu  sync.Mutex
	sig os.Signal
	// phase is the step under way when it came.
	phase string
}

// signalHook, when set (by tests), is called once the signal handlers are
// in place, with the run's context.
var signalHook func(ctx context.Context)

// withSignals returns a context derived from parent that SIGINT and
// SIGTERM cancel, the record of which came, and a function that removes
// the handlers; phase names the step under way. The first signal is told on stderr; after it the
// handlers are removed, so a second one stops the process at once.
func withSignals(parent context.Context, stderr io.Writer, phase func() string) (context.Context, *interrupt, func()) {
	ctx, cancel := context.WithCancel(parent)
	in := &interrupt{}
	ch := make(chan os.Signal, 2)
	signal.Notify(ch, os.Interrupt, syscall.SIGTERM)
	done := make(chan struct{})
	go func() {
		select {
		case s := <-ch:
			signal.Stop(ch)
			in.mu.Lock()
			in.sig, in.phase = s, phase()
			in.mu.Unlock()
			fmt.Fprintf(stderr, "\nstrutrisk: %s: stopping; what has finished will be written (a second signal stops at once, writing nothing)\n", in.name())
			cancel()
		case <-done:
		}
	}()
	stop := func() {
		signal.Stop(ch)
		close(done)
		cancel()
	}
	if signalHook != nil {
		signalHook(ctx)
	}
	return ctx, in, stop
}

// name is the signal that came, "SIGINT" when the run was cancelled
// otherwise (as a test does).
func (in *interrupt) name() string {
	in.mu.Lock()
	defer in.mu.Unlock()
	if in.sig == syscall.SIGTERM {
		return "SIGTERM"
	}
	return "SIGINT"
}

// code is the exit status of a run stopped by the signal that came.
func (in *interrupt) code() int {
	if in.name() == "SIGTERM" {
		return exitTerminated
	}
	return exitInterrupted
}

// during is the step under way when the signal came ("" if none came).
func (in *interrupt) during() string {
	in.mu.Lock()
	defer in.mu.Unlock()
	return in.phase
}
