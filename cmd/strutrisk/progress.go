package main

import (
	"fmt"
	"io"
	"os"
	"strings"
	"sync"
	"time"

	"strutrisk/sim"
)

// progress draws a one-line progress bar on standard error, only when it
// is a terminal and only once a run has lasted about a second.
type progress struct {
	w       io.Writer
	on      bool
	start   time.Time
	mu      sync.Mutex
	drawn   bool
	last    time.Time
	current string
	// name is the step under way, as stage last named it.
	name string
}

// newProgress returns a bar on w; it stays quiet unless allowed and w is
// a terminal.
func newProgress(w io.Writer, allowed bool) *progress {
	p := &progress{w: w, start: time.Now()}
	if f, ok := w.(*os.File); ok && allowed {
		if fi, err := f.Stat(); err == nil && fi.Mode()&os.ModeCharDevice != 0 {
			p.on = true
		}
	}
	return p
}

func (p *progress) update(s sim.Progress) {
	if !p.on {
		return
	}
	p.mu.Lock()
	defer p.mu.Unlock()
	now := time.Now()
	if now.Sub(p.start) < time.Second || now.Sub(p.last) < 100*time.Millisecond {
		return
	}
	p.last = now
	frac := 0.0
	if s.Total > 0 {
		frac = min(1, float64(s.Done)/float64(s.Total))
	}
	const width = 30
	n := int(frac * width)
	line := fmt.Sprintf("\r[%s%s] %3.0f%%  %d evaluations", strings.Repeat("#", n), strings.Repeat(".", width-n), 100*frac, s.Done)
	if s.Pf > 0 {
		line += fmt.Sprintf("  pf %.3g (cov %.2f)", s.Pf, s.CoV)
	}
	p.draw(line)
}

// stage names a step after sampling (FORM, sensitivities).
func (p *progress) stage(name string) {
	p.mu.Lock()
	defer p.mu.Unlock()
	p.name = name
	if !p.on || time.Since(p.start) < time.Second {
		return
	}
	p.draw("\r" + name + "...")
}

func (p *progress) draw(line string) {
	pad := ""
	if len(p.current) > len(line) {
		pad = strings.Repeat(" ", len(p.current)-len(line))
	}
	fmt.Fprint(p.w, line+pad)
	p.current = line
	p.drawn = true
}

// phase is the step last named by stage ("" during the main run).
func (p *progress) phase() string {
	p.mu.Lock()
	defer p.mu.Unlock()
	return p.name
}

// done clears the bar.
func (p *progress) done() {
	p.mu.Lock()
	defer p.mu.Unlock()
	if p.drawn {
		fmt.Fprint(p.w, "\r"+strings.Repeat(" ", len(p.current))+"\r")
		p.drawn = false
	}
}
