package study

import (
	"context"
	"encoding/json"
	"math"
	"os"
	"regexp"
	"testing"

	"strutrisk/sim"
)

// beamReference is a long run of the ultimate beam-column demo, stored
// with how it was made (testdata/beam-column-reference.json).
type beamReference struct {
	Study       string     `json:"study"`
	Variant     string     `json:"variant"`
	Method      string     `json:"method"`
	Budget      int64      `json:"budget"`
	TargetCoV   float64    `json:"target_cov"`
	Seed        uint64     `json:"seed"`
	Evaluations int64      `json:"evaluations"`
	Pf          float64    `json:"pf"`
	PfCI        [2]float64 `json:"pf_ci"`
	PfCoV       float64    `json:"pf_cov"`
	Note        string     `json:"note"`
}

// beamVariant builds the study's model as the named variant of the demo,
// with its loads as written: the stored reference was run before the demo
// normalised its loads (code_check.normalise), so the test turns that off.
func beamVariant(t *testing.T, file, variant string) *Model {
	t.Helper()
	data, err := os.ReadFile("../../studies/" + file)
	if err != nil {
		t.Fatal(err)
	}
	text := regexp.MustCompile(`(?m)^(normalise\s*=\s*)"design"`).ReplaceAllString(string(data), `$1"none"`)
	text = regexp.MustCompile(`(?m)^load_ratio\s*=.*$`).ReplaceAllString(text, "")
	st, err := Parse(file, []byte(text))
	if err != nil {
		t.Fatal(err)
	}
	for i, v := range st.Variants {
		if v.Name != variant {
			continue
		}
		d, err := st.Derive(i, -1)
		if err != nil {
			t.Fatal(err)
		}
		md, err := Build(d)
		if err != nil {
			t.Fatal(err)
		}
		return md
	}
	t.Fatalf("%s has no variant %q", file, variant)
	return nil
}

// TestSurrogateOnUltimateBeamColumn: the surrogate method on the ultimate
// beam-column of the imperfection-comparison demo (the member at relative
// slenderness 1, pf about 1.6e-7) spends at most 500 model evaluations
// and its pf lies within the interval of the stored long reference run.
// The candidates are asked for CoV 0.008 (about 1e5 of them, no model
// evaluation each), so that the surrogate's own sampling error is small
// beside the reference's interval (CoV 0.012, half-width 2.35 %).
func TestSurrogateOnUltimateBeamColumn(t *testing.T) {
	if testing.Short() {
		t.Skip("runs the numerical beam-column some hundred times")
	}
	data, err := os.ReadFile("testdata/beam-column-reference.json")
	if err != nil {
		t.Fatal(err)
	}
	var ref beamReference
	if err := json.Unmarshal(data, &ref); err != nil {
		t.Fatal(err)
	}
	md := beamVariant(t, ref.Study, ref.Variant)
	if !md.Sim.Expensive {
		t.Error("the ultimate beam-column is not marked expensive")
	}
	s := md.SimSettings(sim.Settings{Method: sim.Surrogate, Samples: 500, Seed: md.Study.Analysis.Seed, AuxSamples: -1,
		TargetCoV: 0.008})
	r, err := sim.Run(context.Background(), md.Sim, &s)
	if err != nil {
		t.Fatal(err)
	}
	t.Logf("surrogate: pf %.4g in %.4g (CoV %.3g), %d evaluations, %s; reference %s: %.4g in %.4g", r.Pf, r.PfCI, r.PfCoV, r.Evaluations, r.Status, ref.Method, ref.Pf, ref.PfCI)
	if r.Evaluations > 500 || !r.Status.Trusted() {
		t.Errorf("%d model evaluations (at most 500), status %s: %s", r.Evaluations, r.Status, r.StatusReason)
	}
	if !(ref.PfCI[0] <= r.Pf && r.Pf <= ref.PfCI[1]) {
		t.Errorf("surrogate pf %.4g (in %.4g), want it within the reference's interval %.4g (pf %.4g)", r.Pf, r.PfCI, ref.PfCI, ref.Pf)
	}
}

// TestFORMOnUltimateBeamColumn: FORM with the study's settings for the
// ultimate beam-column (restarts screened, sim.FORMSettings.Screen) finds
// the design point of the demo member within 200 model evaluations, and
// its beta lies within 0.1 of the reference run's (the member's limit
// state is nearly linear in standard normal space, so FORM's
// approximation is close; 0.1 is a tolerance of common practice).
func TestFORMOnUltimateBeamColumn(t *testing.T) {
	if testing.Short() {
		t.Skip("runs the numerical beam-column some hundred times")
	}
	data, err := os.ReadFile("testdata/beam-column-reference.json")
	if err != nil {
		t.Fatal(err)
	}
	var ref beamReference
	if err := json.Unmarshal(data, &ref); err != nil {
		t.Fatal(err)
	}
	md := beamVariant(t, ref.Study, ref.Variant)
	f, err := sim.FORM(md.Sim, md.FORMSettings())
	if err != nil {
		t.Fatal(err)
	}
	refBeta := sim.BetaFromPf(ref.Pf)
	t.Logf("FORM beta %.4f in %d evaluations (%s); reference beta %.4f", f.Beta, f.Evaluations, f.Status, refBeta)
	if !f.Converged || f.Evaluations > 200 || math.Abs(f.Beta-refBeta) > 0.1 {
		t.Errorf("FORM: converged %v, beta %.4f after %d evaluations; want at most 200 and beta within 0.1 of %.4f", f.Converged, f.Beta, f.Evaluations, refBeta)
	}
}
