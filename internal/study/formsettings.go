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
