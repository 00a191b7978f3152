package study

import "strutrisk/sim"

// FORMSettings returns the FORM settings that suit the study's capacity
// model: the finite-difference step of its Traits.FORMStep (the ultimate
// beam-column's capacity is noisy) and, as each evaluation is then a
// numerical analysis, further design points searched only where one is
// likely (sim.FORMSettings.Screen: a column's resistance against its load
// has one failure region, and each needless search cost 50 to 100
// analyses); else nil (the defaults of sim.FORM).
func (md *Model) FORMSettings() *sim.FORMSettings {
	if step := md.Study.ModelTraits().FORMStep; step > 0 {
		return &sim.FORMSettings{Step: step, Screen: true}
	}
	return nil
}

// expensive reports whether each evaluation of the study's capacity is a
// numerical analysis (Traits.Expensive), which sim.Model.Expensive tells
// the estimators.
func (md *Model) expensive() bool {
	return md.Study.ModelTraits().Expensive
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
