package modelerror

import (
	"strings"
	"testing"

	"strutrisk/internal/fixture"
)

// TestNoScatter: tests that all lie on b r_t (r_e = 2 r_t exactly, so b
// = 2 and V_delta = 0 by eqs. D.8 to D.13) give a study line the study
// accepts, b alone (a lognormal with cov 0 is refused), and a warning
// that such a database is more likely wrong than the model exact; tests
// that scatter keep the lognormal line and no warning.
func TestNoScatter(t *testing.T) {
	for _, c := range []struct {
		re       []float64
		line     string
		warnings int
	}{
		{[]float64{200, 400, 600}, "model_factor = 2", 1},
		{[]float64{210, 400, 590}, `model_factor = { dist = "lognormal"`, 0},
	} {
		f, err := Evaluate(c.re, []float64{100, 200, 300})
		if err != nil {
			t.Fatal(err)
		}
		line := f.ModelFactor()
		if !strings.HasPrefix(line, c.line) {
			t.Errorf("r_e %v: line %q, want it to start %q", c.re, line, c.line)
		}
		// The line must be one the study file takes.
		parseStudy(t, strings.Replace(fixture.Stocky, `model_factor = { dist = "lognormal", mean = 1.0, cov = 0.05 }`, line, 1))
		e := &Evaluation{Count: f.N, B: f.B, VDelta: f.V, ModelFactor: line, Rows: []Row{{Delta: 1}}}
		if got := strings.Count(e.Text(), "Warning: V_delta is"); got != c.warnings {
			t.Errorf("r_e %v: %d warnings of no scatter, want %d", c.re, got, c.warnings)
		}
	}
}
