package analysis

// Observer is told how a run goes: the step that begins and the case of a
// sweep or variant under way. Its methods are called from the goroutine
// that called Run. Sampling progress within a step reaches the caller
// through sim.Settings.Progress, which the caller sets.
type Observer interface {
	// Stage names the step that begins now ("main run", "FORM", "Sobol
	// indices"...).
	Stage(name string)
	// StartCase names case k (from 1) of n, described by what; its
	// Stage follows.
	StartCase(k, n int, what string)
}

// quiet is the observer of a run nobody watches.
type quiet struct{}

func (quiet) Stage(string)               {}
func (quiet) StartCase(int, int, string) {}
