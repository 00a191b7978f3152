package modelerror

import (
	"bytes"
	"fmt"
	"math"
	"strconv"

	"strutrisk/internal/study"
)

// Evaluation is the outcome of evaluating a study's model against a test
// database, as written to model-factor.json.
type Evaluation struct {
	// Study and Tests name the files; Model is the study's capacity model.
	Study string `json:"study"`
	Tests string `json:"tests"`
	Model string `json:"model"`
	// Count is the number of tests.
	Count int `json:"count"`
	// B and VDelta are b and V_delta (D.8.2.2 steps 2 to 5).
	B      float64 `json:"b"`
	VDelta float64 `json:"v_delta"`
	// ModelFactor is the study line of the fitted model factor.
	ModelFactor string `json:"model_factor"`
	// Rows are the tests, in N.
	Rows []Row `json:"rows"`
	// Design holds the design values when they were asked for.
	Design *Design `json:"design,omitempty"`
}

// Row is one evaluated test.
type Row struct {
	Name     string  `json:"name,omitempty"`
	Line     int     `json:"line"`
	Measured float64 `json:"r_e"`
	Theory   float64 `json:"r_t"`
	Delta    float64 `json:"delta"`
}

// Design is the characteristic and design resistance of the study's member
// at its nominal values with the fitted model error (D.8.2.2 step 7,
// D.8.3), in N.
type Design struct {
	Grt           float64        `json:"g_rt"`
	VRt           float64        `json:"v_rt"`
	Contributions []Contribution `json:"v_rt_parts"`
	Values
}

// Assess evaluates the study's model against the tests: r_t of each, the
// fit, and with design set the design values at the study's nominal
// values.
func Assess(st *study.Study, testsFile string, tests []Test, design bool) (*Evaluation, error) {
	rt, err := Theoretical(st, tests)
	if err != nil {
		return nil, err
	}
	re := make([]float64, len(tests))
	for i, t := range tests {
		re[i] = t.Measured
	}
	f, err := Evaluate(re, rt)
	if err != nil {
		return nil, err
	}
	e := &Evaluation{Study: st.File, Tests: testsFile, Model: st.Model.String(), Count: f.N,
		B: f.B, VDelta: f.V, ModelFactor: f.ModelFactor(), Rows: make([]Row, len(tests))}
	for i, t := range tests {
		e.Rows[i] = Row{Name: t.Name, Line: t.Line, Measured: re[i], Theory: rt[i], Delta: f.Delta[i]}
	}
	if design {
		grt, vrt, parts, err := Scatter(st)
		if err != nil {
			return nil, err
		}
		v, err := f.DesignValues(grt, vrt)
		if err != nil {
			return nil, err
		}
		e.Design = &Design{Grt: grt, VRt: vrt, Contributions: parts, Values: *v}
	}
	return e, nil
}

// Text is the evaluation for a terminal and summary file.
func (e *Evaluation) Text() string {
	var b bytes.Buffer
	fmt.Fprintf(&b, "Model uncertainty from tests (EN 1990 Annex D, D.8)\n")
	fmt.Fprintf(&b, "  study %s, model %s; %d tests from %s\n\n", e.Study, e.Model, e.Count, e.Tests)
	fmt.Fprintf(&b, "  mean-value correction b          %.4f   (r_e against r_t through the origin, D.8)\n", e.B)
	fmt.Fprintf(&b, "  coefficient of variation V_delta %.4f   (of the error term, D.13)\n", e.VDelta)
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, r := range e.Rows {
		lo, hi = math.Min(lo, r.Delta), math.Max(hi, r.Delta)
	}
	fmt.Fprintf(&b, "  error term delta ranges %.3f to %.3f\n\n", lo, hi)
	fmt.Fprintf(&b, "For the study ([capacity]):\n  %s\n", e.ModelFactor)
	if e.VDelta < noScatter {
		fmt.Fprintf(&b, "  Warning: V_delta is %.2g: every test lies on b r_t, which real tests do not; check the database\n  (repeated rows, r_e computed rather than measured) before taking a model factor without scatter.\n", e.VDelta)
	}
	if e.Count < 10 {
		fmt.Fprintf(&b, "  Only %d tests: V_delta is itself uncertain; D.8 advises more than 10, and the design values below take the\n  small number into account through k_n of Tables D.1 and D.2.\n", e.Count)
	}
	if d := e.Design; d != nil {
		fmt.Fprintf(&b, "\nResistance of the study's member at its nominal values (D.8.2.2 step 7, D.8.3):\n")
		fmt.Fprintf(&b, "  g_rt(X_m) %s kN; V_rt %.4f from the study's resistance inputs, first order, uncorrelated:\n", kN(d.Grt), d.VRt)
		for _, c := range d.Contributions {
			if c.LeftOut != "" {
				fmt.Fprintf(&b, "    %-36s left out: %s\n", c.Key, c.LeftOut)
				continue
			}
			fmt.Fprintf(&b, "    %-36s %.4f\n", c.Key, math.Abs(c.CoV))
		}
		fmt.Fprintf(&b, "  Q %.4f (alpha_rt %.3f, alpha_delta %.3f); k_n %.2f, k_d,n %.2f (Tables D.1, D.2, V_X unknown)\n", d.Q, d.AlphaRt, d.AlphaDelta, d.Kn, d.Kdn)
		fmt.Fprintf(&b, "  mean b g_rt(X_m)      %s kN\n", kN(d.Mean))
		fmt.Fprintf(&b, "  characteristic r_k    %s kN  (eq. D.17a)\n", kN(d.Characteristic))
		fmt.Fprintf(&b, "  design r_d            %s kN  (eq. D.21)\n", kN(d.Design))
		fmt.Fprintf(&b, "  gamma_M = r_k / r_d   %.3f\n", d.Ratio)
	}
	b.WriteString("\nCheck the picture of r_e against r_t before using these numbers: D.8 assumes one\nresistance function for every test and a lognormal error term (D.8.1, D.8.2.2 step 1).\n")
	return b.String()
}

// CSV lists the tests with r_e, r_t and delta.
func (e *Evaluation) CSV() []byte {
	var b bytes.Buffer
	b.WriteString("line,name,r_e (kN),r_t (kN),delta (-)\n")
	for _, r := range e.Rows {
		fmt.Fprintf(&b, "%d,%s,%s,%s,%s\n", r.Line, csvField(r.Name), g(r.Measured/1e3), g(r.Theory/1e3), g(r.Delta))
	}
	return b.Bytes()
}

func kN(x float64) string { return strconv.FormatFloat(x/1e3, 'f', 1, 64) }
func g(x float64) string  { return strconv.FormatFloat(x, 'g', 10, 64) }

// csvField quotes a name with a comma or a quote.
func csvField(s string) string {
	for _, c := range s {
		if c == ',' || c == '"' || c == '\n' {
			return strconv.Quote(s)
		}
	}
	return s
}
