package study

import (
	"context"
	"strings"
	"testing"

	"strutrisk/sim"
)

// TestSimSettingsByModel checks that SimSettings puts the FORM settings of
// the study's own capacity model into the settings it is given, replacing
// any it inherits (a variant on another model than its study), and keeps
// every other setting: the numerical beam-column at its ultimate load
// takes the larger finite-difference step (its capacity carries noise,
// see reserve_noise_test.go), a closed-form model the defaults.
func TestSimSettingsByModel(t *testing.T) {
	firstYield := strings.Replace(beamUltimate, "limit = \"ultimate\"\nresidual_stress = \"hot-rolled\"\n", "limit = \"first-yield\"\n", 1)
	perry := strings.Replace(firstYield, "model = \"beam-column\"\nlimit = \"first-yield\"\n", "model = \"perry-robertson\"\n", 1)
	for _, c := range []struct {
		name, text, model string
		step              float64 // 0: nil FORM settings
	}{
		{"beam-column ultimate", beamUltimate, "beam-column", numericalStep},
		{"beam-column first yield", firstYield, "beam-column", 0},
		{"perry-robertson", perry, "perry-robertson", 0},
	} {
		md, err := Build(parse(t, c.text))
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if md.Study.Model.String() != c.model {
			t.Fatalf("%s: the study text builds model %q", c.name, md.Study.Model)
		}
		in := sim.Settings{Method: sim.Importance, Samples: 1234, Seed: 9, FORM: &sim.FORMSettings{Step: 0.5}}
		got := md.SimSettings(in)
		if got.Method != in.Method || got.Samples != in.Samples || got.Seed != in.Seed {
			t.Errorf("%s: settings %+v changed beyond FORM, from %+v", c.name, got, in)
		}
		switch {
		case c.step == 0 && got.FORM != nil:
			t.Errorf("%s: FORM settings %+v, want nil (the defaults)", c.name, got.FORM)
		case c.step != 0 && (got.FORM == nil || got.FORM.Step != c.step):
			t.Errorf("%s: FORM settings %+v, want step %g", c.name, got.FORM, c.step)
		}
	}
}

// TestSimSettingsReachRun checks that the study's FORM settings reach the
// FORM analysis inside sim.Run: on the noisy ultimate beam-column, Run's
// form method gives the design point of sim.FORM with Model.FORMSettings,
// bit for bit.
func TestSimSettingsReachRun(t *testing.T) {
	md, err := Build(parse(t, beamUltimate))
	if err != nil {
		t.Fatal(err)
	}
	want, err := sim.FORM(md.Sim, md.FORMSettings())
	if err != nil {
		t.Fatal(err)
	}
	s := md.SimSettings(sim.Settings{Method: sim.FORMMethod, Workers: 1, AuxSamples: -1})
	res, err := sim.Run(context.Background(), md.Sim, &s)
	if err != nil {
		t.Fatal(err)
	}
	if res.FORM == nil || res.FORM.Beta != want.Beta || res.FORM.Evaluations != want.Evaluations {
		t.Errorf("Run's FORM %+v, want beta %v after %d evaluations", res.FORM, want.Beta, want.Evaluations)
	}
}
