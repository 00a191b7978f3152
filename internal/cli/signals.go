package cli

import (
	"context"
	"fmt"
	"io"
	"os"
	"os/signal"
	"sync"
	"syscall"
)

// Interrupt records the signal that stopped a run.
type Interrupt struct {
	mu  sync.Mutex
	sig os.Signal
	// phase is the step under way when it came.
	phase string
}

// Watch returns a context derived from parent that SIGINT and SIGTERM
// cancel, the record of which came, and a function that removes the
// handlers; phase names the step under way. The first signal is told on
// stderr; after it the handlers are removed, so a second one stops the
// process at once.
func Watch(parent context.Context, stderr io.Writer, phase func() string) (context.Context, *Interrupt, func()) {
	ctx, cancel := context.WithCancel(parent)
	in := &Interrupt{}
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
			fmt.Fprintf(stderr, "\nstrutrisk: %s: stopping; what has finished will be written (a second signal stops at once, writing nothing)\n", in.Name())
			cancel()
		case <-done:
		}
	}()
	stop := func() {
		signal.Stop(ch)
		close(done)
		cancel()
	}
	return ctx, in, stop
}

// Name is the signal that came, "SIGINT" when the run was cancelled
// otherwise (as a test does).
func (in *Interrupt) Name() string {
	in.mu.Lock()
	defer in.mu.Unlock()
	if in.sig == syscall.SIGTERM {
		return "SIGTERM"
	}
	return "SIGINT"
}

// Terminated says whether SIGTERM stopped the run (else SIGINT or a
// cancelled parent).
func (in *Interrupt) Terminated() bool {
	return in.Name() == "SIGTERM"
}

// During is the step under way when the signal came ("" if none came).
func (in *Interrupt) During() string {
	in.mu.Lock()
	defer in.mu.Unlock()
	return in.phase
}
