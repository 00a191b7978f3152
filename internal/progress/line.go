// Package progress draws the one-line progress report of a run: the step
// under way, how far its sampling is and an estimate of the time left.
// Whether to draw at all (a terminal, not --json) is the caller's choice.
package progress

import (
	"fmt"
	"io"
	"strings"
	"sync"
	"time"

	"strutrisk/sim"
)

// Line draws a one-line progress report on a writer, when on and only
// once a run has lasted about a second: the step under way (main run,
// FORM, Sobol indices, reserve confirmation, case k of n...), the phase
// of the method within it when it has several (the surrogate's FORM,
// learning and classification), how far its sampling is, and an estimate
// of the time left. It is the
// analysis.Observer of a run and, through Update, the
// sim.Settings.Progress of its sampling.
type Line struct {
	// TargetCoV is the run's target CoV of pf: sampling stops when it is
	// reached, which bounds the time left.
	TargetCoV float64
	// OnStage, when set (by tests), is called as each step begins, once
	// the step is named.
	OnStage func(name string)

	w       io.Writer
	on      bool
	start   time.Time
	mu      sync.Mutex
	drawn   bool
	last    time.Time
	current string
	// name is the step under way, as Stage last named it, since
	// phaseStart.
	name       string
	phaseStart time.Time
	// caseK of caseN is the case under way, begun at caseStart;
	// caseTimes are the times the cases before it took.
	caseK, caseN int
	caseStart    time.Time
	caseTimes    []time.Duration
	now          func() time.Time
}

// New returns a report on w; it stays quiet unless on.
func New(w io.Writer, on bool) *Line {
	p := &Line{w: w, on: on, now: time.Now}
	p.start, p.phaseStart = p.now(), p.now()
	return p
}

// Update is the sim.Settings.Progress of every sampling run.
func (p *Line) Update(s sim.Progress) {
	if !p.on {
		return
	}
	p.mu.Lock()
	defer p.mu.Unlock()
	now := p.now()
	if now.Sub(p.start) < time.Second || now.Sub(p.last) < 100*time.Millisecond {
		return
	}
	p.last = now
	left, ok := phaseLeft(s, p.TargetCoV, now.Sub(p.phaseStart))
	if p.caseN > 0 {
		left, ok = p.casesLeft(now, left, ok)
	}
	p.draw("\r" + progressLine(p.name, s, left, ok))
}

// Stage names the step that begins now ("main run", "FORM", "Sobol
// indices"...).
func (p *Line) Stage(name string) {
	p.mu.Lock()
	p.name, p.phaseStart = name, p.now()
	p.mu.Unlock()
	if p.OnStage != nil {
		p.OnStage(name)
	}
	p.mu.Lock()
	defer p.mu.Unlock()
	if !p.on || p.now().Sub(p.start) < time.Second {
		return
	}
	line := "\r" + Clip(name, 72) + "..."
	if p.caseN > 0 {
		if left, ok := p.casesLeft(p.now(), 0, false); ok {
			line += "  " + leftText(left)
		}
	}
	p.draw(line)
}

// StartCase names case k (from 1) of n, described by what.
func (p *Line) StartCase(k, n int, what string) {
	p.mu.Lock()
	now := p.now()
	if p.caseN > 0 {
		p.caseTimes = append(p.caseTimes, now.Sub(p.caseStart))
	}
	p.caseK, p.caseN, p.caseStart = k, n, now
	p.mu.Unlock()
	p.Stage(fmt.Sprintf("case %d of %d: %s", k, n, what))
}

// recentCases is how many of the last cases casesLeft averages: cases
// follow each other variant by variant, and a variant's cases take
// alike, while two variants' may differ a hundredfold.
const recentCases = 5

// casesLeft estimates the time left for all cases: the mean time of the
// last cases finished for each one not begun, and for the case under way
// the estimate of its own sampling (inCase, when known) or that mean less
// the time it has run.
func (p *Line) casesLeft(now time.Time, inCase time.Duration, known bool) (time.Duration, bool) {
	if len(p.caseTimes) == 0 {
		return inCase, known
	}
	last := p.caseTimes[max(0, len(p.caseTimes)-recentCases):]
	var mean time.Duration
	for _, d := range last {
		mean += d
	}
	mean /= time.Duration(len(last))
	if !known {
		inCase = max(0, mean-now.Sub(p.caseStart))
	}
	return inCase + mean*time.Duration(p.caseN-p.caseK), true
}

// phaseLeft estimates the time a sampling run needs to finish after
// running for elapsed: its evaluations go on to the budget s.Total or,
// sooner, to the number at which the CoV of pf reaches targetCoV (the
// CoV falls as one over the square root of the evaluations). A method
// that names its phase (the surrogate) stops by a rule of its own (its
// model settles), which the CoV does not foretell: only s.Total bounds
// it. ok is false before there is enough to go on.
func phaseLeft(s sim.Progress, targetCoV float64, elapsed time.Duration) (left time.Duration, ok bool) {
	if s.Done <= 0 || s.Total <= 0 || elapsed < 500*time.Millisecond {
		return 0, false
	}
	end := float64(s.Total)
	if targetCoV > 0 && s.Pf > 0 && s.CoV > 0 && s.Phase == "" {
		end = min(end, float64(s.Done)*(s.CoV/targetCoV)*(s.CoV/targetCoV))
	}
	rest := max(0, end-float64(s.Done))
	return time.Duration(float64(elapsed) * rest / float64(s.Done)), true
}

// progressLine is the report of a sampling run in the step name, with
// the method's own phase when it reports one.
func progressLine(name string, s sim.Progress, left time.Duration, known bool) string {
	frac := 0.0
	if s.Total > 0 {
		frac = min(1, float64(s.Done)/float64(s.Total))
	}
	const width = 20
	n := int(frac * width)
	var b strings.Builder
	if name != "" {
		b.WriteString(Clip(name, 72) + "  ")
	}
	if s.Phase != "" {
		b.WriteString(Clip(s.Phase, 48) + "  ")
	}
	fmt.Fprintf(&b, "[%s%s] %3.0f%%  %s evaluations", strings.Repeat("#", n), strings.Repeat(".", width-n), 100*frac, countText(s.Done))
	if s.Pf > 0 {
		fmt.Fprintf(&b, "  pf %.3g (cov %.2f)", s.Pf, s.CoV)
	}
	if known {
		b.WriteString("  " + leftText(left))
	}
	return b.String()
}

// leftText says how much time is left, roughly.
func leftText(d time.Duration) string {
	switch {
	case d < 2*time.Second:
		return "about a second left"
	case d < 90*time.Second:
		return fmt.Sprintf("about %.0f s left", d.Seconds())
	case d < 90*time.Minute:
		return fmt.Sprintf("about %.0f min left", d.Minutes())
	}
	return fmt.Sprintf("about %.1f h left", d.Hours())
}

// countText writes a count briefly: 950, 12.3k, 4.51M.
func countText(n int64) string {
	switch {
	case n < 10_000:
		return fmt.Sprint(n)
	case n < 1_000_000:
		return fmt.Sprintf("%.1fk", float64(n)/1e3)
	}
	return fmt.Sprintf("%.3gM", float64(n)/1e6)
}

// Clip shortens s to at most n runes, its last one an ellipsis when cut.
func Clip(s string, n int) string {
	r := []rune(s)
	if len(r) <= n {
		return s
	}
	return string(r[:n-1]) + "…"
}

// Phase is the step last named by Stage.
func (p *Line) Phase() string {
	p.mu.Lock()
	defer p.mu.Unlock()
	return p.name
}

func (p *Line) draw(line string) {
	pad := ""
	if n, m := len([]rune(p.current)), len([]rune(line)); n > m {
		pad = strings.Repeat(" ", n-m)
	}
	fmt.Fprint(p.w, line+pad)
	p.current = line
	p.drawn = true
}

// Done clears the line.
func (p *Line) Done() {
	p.mu.Lock()
	defer p.mu.Unlock()
	if p.drawn {
		fmt.Fprint(p.w, "\r"+strings.Repeat(" ", len([]rune(p.current)))+"\r")
		p.drawn = false
	}
}
