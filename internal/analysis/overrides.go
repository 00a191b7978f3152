package analysis

import (
	"fmt"

	"strutrisk/sim"
)

// Overrides are settings given over a study's [analysis] table, as the
// run command's flags give them; a zero field keeps the study's.
type Overrides struct {
	// Method is the estimator ("" the study's).
	Method sim.Method
	// Samples is the budget of model evaluations (0 the study's).
	Samples int64
	// Seed, when not nil, seeds every random stream.
	Seed *uint64
	// Workers is the number of worker goroutines (0 every core).
	Workers int
}

// RunSettings are the settings of a run of the study of l: its own
// (Settings) with o given over them. note, when not empty, tells the user
// how long the run may take. A study that has nothing uncertain cannot be
// run: the error says what to do.
func (l *Loaded) RunSettings(o Overrides) (s sim.Settings, note string, err error) {
	if len(l.Model.Sim.Vars) == 0 {
		return sim.Settings{}, "", fmt.Errorf("%s: nothing in the study is uncertain: give at least one quantity a distribution, or use `strutrisk check` for the deterministic picture", l.Study.File)
	}
	s = l.Settings(o.Workers)
	if o.Method != "" {
		s.Method = o.Method
	}
	if o.Samples != 0 {
		s.Samples = o.Samples
	}
	if o.Seed != nil {
		s.Seed = *o.Seed
	}
	return s, BeamTimeNote(l, &s), nil
}
