package study

import "strutrisk/sim"

// numericalStep is the relative finite-difference step of FORM for a
// capacity model whose result carries numerical noise: the beam-column at
// its ultimate load, about 1e-5 of the capacity from the path of the
// nonlinear solution (sim.FORMSettings.Step says why 1e-2).
const numericalStep = 1e-2

// FORMSettings returns the FORM settings that suit the study's capacity
// model: a larger finite-difference step for the ultimate beam-column,
// whose capacity is noisy, else nil (the defaults of sim.FORM).
func (md *Model) FORMSettings() *sim.FORMSettings {
	if md.Study.Model == "beam-column" && md.Study.Limit == "ultimate" {
		return &sim.FORMSettings{Step: numericalStep}
	}
	return nil
}

// SimSettings returns s with the settings that belong to the study's
// capacity model put in: Settings.FORM from FORMSettings, so that the
// form method, auto and importance sampling all search with the step the
// model needs. Every sim.Run of a study's model takes its settings from
// here.
func (md *Model) SimSettings(s sim.Settings) sim.Settings {
	s.FORM = md.FORMSettings()
	return s
}
