package analysis

import (
	"runtime"
	"testing"
)

// TestSettingsWorkersResolved checks that the command's default of every
// core (workers 0) reaches the steps above sampling as the number of
// cores: the inventory's members, its joint sample and its first-order
// system share out work by Settings.Workers, and ran on one core when it
// was left 0 (a 2,000-member inventory took twice the time on two cores).
func TestSettingsWorkersResolved(t *testing.T) {
	l := mustLoad(t, good)
	for _, c := range []struct{ given, want int }{{0, runtime.NumCPU()}, {-1, runtime.NumCPU()}, {1, 1}, {3, 3}} {
		if got := l.Settings(c.given).Workers; got != c.want {
			t.Errorf("Settings(%d).Workers = %d, want %d", c.given, got, c.want)
		}
	}
}
