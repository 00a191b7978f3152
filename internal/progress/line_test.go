package progress

import (
	"strings"
	"testing"
	"time"

	"strutrisk/sim"
)

// TestPhaseLeft: the time left of a sampling run is the time per
// evaluation so far times the evaluations to go, to the budget or, when
// a target CoV is set, to the count at which the CoV reaches it
// (CoV ~ 1/sqrt(n), common practice for crude sampling).
func TestPhaseLeft(t *testing.T) {
	for _, c := range []struct {
		name    string
		s       sim.Progress
		target  float64
		elapsed time.Duration
		want    time.Duration
		ok      bool
	}{
		{"a quarter of the budget in 10 s", sim.Progress{Done: 250, Total: 1000}, 0, 10 * time.Second, 30 * time.Second, true},
		{"target CoV before the budget", sim.Progress{Done: 1000, Total: 1e6, Pf: 1e-2, CoV: 0.2}, 0.1, 10 * time.Second, 30 * time.Second, true},
		{"budget before the target CoV", sim.Progress{Done: 1000, Total: 2000, Pf: 1e-2, CoV: 0.2}, 0.1, 10 * time.Second, 10 * time.Second, true},
		{"target reached", sim.Progress{Done: 1000, Total: 1e6, Pf: 1e-2, CoV: 0.05}, 0.1, 10 * time.Second, 0, true},
		{"a phase ends by its own rule, not the CoV", sim.Progress{Done: 250, Total: 1000, Pf: 1e-2, CoV: 0.05, Phase: "learning"}, 0.1, 10 * time.Second, 30 * time.Second, true},
		{"too early", sim.Progress{Done: 10, Total: 1000}, 0, 100 * time.Millisecond, 0, false},
	} {
		got, ok := phaseLeft(c.s, c.target, c.elapsed)
		if ok != c.ok || (ok && (got-c.want).Abs() > time.Millisecond) {
			t.Errorf("%s: %v, %v; want %v, %v", c.name, got, ok, c.want, c.ok)
		}
	}
}

// TestProgressLine: the line names the step, how far it is and the time
// left.
func TestProgressLine(t *testing.T) {
	line := progressLine("case 3 of 12: variant \"b\" at member.length = 11.07 m", sim.Progress{Done: 50_000, Total: 100_000, Pf: 1.2e-3, CoV: 0.08}, 75*time.Second, true)
	for _, want := range []string{"case 3 of 12", "member.length = 11.07 m", "50%", "50.0k evaluations", "pf 0.0012", "about 75 s left"} {
		if !strings.Contains(line, want) {
			t.Errorf("line %q lacks %q", line, want)
		}
	}
}

// TestCasesLeft: with cases, the time left covers the cases to come at
// the mean time of the last ones finished.
func TestCasesLeft(t *testing.T) {
	t0 := time.Unix(0, 0)
	clock := t0
	p := &Line{now: func() time.Time { return clock }}
	// Five quick cases of 1 s, then five of 10 s; the eleventh begins.
	for k := 1; k <= 11; k++ {
		p.StartCase(k, 14, "x")
		if k <= 5 {
			clock = clock.Add(time.Second)
		} else {
			clock = clock.Add(10 * time.Second)
		}
	}
	now := t0.Add(55*time.Second + 4*time.Second) // 4 s into case 11
	// Its own estimate 6 s, then 3 cases at the recent mean of 10 s.
	got, ok := p.casesLeft(now, 6*time.Second, true)
	if !ok || got != 36*time.Second {
		t.Errorf("casesLeft = %v, %v; want 36s", got, ok)
	}
	// Without its own estimate the case under way takes the mean.
	got, _ = p.casesLeft(now, 0, false)
	if got != 36*time.Second {
		t.Errorf("casesLeft without the case's estimate = %v, want 36s", got)
	}
}

// TestClip: a name longer than the room keeps its first runes and ends in
// an ellipsis, counted in runes, not bytes.
func TestClip(t *testing.T) {
	for _, c := range []struct {
		s    string
		n    int
		want string
	}{
		{"main run", 8, "main run"},
		{"main run", 5, "main…"},
		{"σ_Rd ≥ 1", 4, "σ_R…"},
	} {
		if got := Clip(c.s, c.n); got != c.want {
			t.Errorf("Clip(%q, %d) = %q, want %q", c.s, c.n, got, c.want)
		}
	}
}

// TestProgressLinePhase: a method's own phase (the surrogate's learning)
// follows the step's name on the line.
func TestProgressLinePhase(t *testing.T) {
	line := progressLine("reserve confirmation (sampling run 1 of at most 3)", sim.Progress{Done: 300, Total: 600, Phase: "learning, least U 0.42 of 2"}, 0, false)
	for _, want := range []string{"reserve confirmation (sampling run 1 of at most 3)  learning, least U 0.42 of 2  [", "50%", "300 evaluations"} {
		if !strings.Contains(line, want) {
			t.Errorf("line %q lacks %q", line, want)
		}
	}
}
