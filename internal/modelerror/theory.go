package modelerror

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/study"
)

// Theoretical returns r_t of each test: the study's capacity at the
// test's measured inputs, every input the test does not give at its
// nominal value, without the model factor (the factor is what the tests
// estimate). The test's settings are read as a variant's would be, so a
// value the study would refuse is refused with the test's line and
// column.
func Theoretical(st *study.Study, tests []Test) ([]float64, error) {
	if st.Bending != nil {
		return nil, errors.New("model uncertainty from tests: a study with [bending] has a load factor, not a resistance in force; use an axial study of the tested members")
	}
	rt := make([]float64, len(tests))
	for i, t := range tests {
		label := fmt.Sprintf("the test on line %d", t.Line)
		v, err := capacity(st, label, t.Sets)
		if err != nil {
			return nil, err
		}
		rt[i] = v
	}
	return rt, nil
}

// capacity is the nominal capacity of st with sets applied, model factor
// taken out.
func capacity(st *study.Study, label string, sets []study.Setting) (float64, error) {
	s, serr := st.With(label, sets)
	if serr != nil {
		return 0, serr
	}
	md, err := study.Build(s)
	if err != nil {
		return 0, fmt.Errorf("%s: %v", label, err)
	}
	n, err := md.Nominal()
	if err != nil {
		return 0, fmt.Errorf("%s: %v", label, err)
	}
	if !(n.Capacity > 0) || !(n.ModelFactor > 0) {
		return 0, fmt.Errorf("%s: the model gives no positive capacity (%g N)", label, n.Capacity)
	}
	return n.Capacity / n.ModelFactor, nil
}

// Contribution is one basic variable's share of V_rt.
type Contribution struct {
	// Key is the input's key path; CoV its contribution (dg/dx sigma / g).
	Key string  `json:"key"`
	CoV float64 `json:"cov"`
	// LeftOut says why the input is not in V_rt: an imperfection whose
	// mean is too near zero for a first-order derivative (the capacity
	// sees its magnitude, symmetric about zero). CoV is then 0.
	LeftOut string `json:"left_out,omitempty"`
}

// Scatter returns g_rt at the nominal values of the study, V_rt (the
// coefficient of variation of the theoretical resistance from the
// study's random resistance inputs, to first order with the inputs taken
// as uncorrelated, EN 1990 D.8.2.2 step 7, eq. D.18) and each input's
// contribution. Loads, the effect factor and the model factor are left
// out; so is an input whose distribution has no finite standard deviation.
func Scatter(st *study.Study) (grt, vrt float64, parts []Contribution, err error) {
	grt, err = capacity(st, "the study", nil)
	if err != nil {
		return 0, 0, nil, err
	}
	var sum float64
	for _, q := range st.Quantities {
		if !q.Random() || skipped(q.Path) {
			continue
		}
		m, sd := q.Dist.Mean(), q.Dist.StdDev()
		if math.IsNaN(sd) || math.IsInf(sd, 0) || sd == 0 || math.IsNaN(m) {
			continue
		}
		h := 0.1 * sd
		if (q.Relative || q.Lcr || strings.HasPrefix(q.Path, "imperfection.")) && m-h <= 0 {
			// An imperfection centred near zero: its first-order effect is
			// nil by symmetry of the magnitude, which first order cannot see.
			parts = append(parts, Contribution{Key: q.Path, LeftOut: "an imperfection centred near zero: first order cannot see it"})
			continue
		}
		up, err := capacity(st, "V_rt at "+q.Path, []study.Setting{set(q, m+h)})
		if err != nil {
			return 0, 0, nil, err
		}
		down, err := capacity(st, "V_rt at "+q.Path, []study.Setting{set(q, m-h)})
		if err != nil {
			return 0, 0, nil, err
		}
		c := (up - down) / (2 * h) * sd / grt
		parts = append(parts, Contribution{Key: q.Path, CoV: c})
		sum += c * c
	}
	return grt, math.Sqrt(sum), parts, nil
}

// skipped reports the inputs V_rt leaves out: actions and the factors.
func skipped(path string) bool {
	return strings.HasPrefix(path, "loads.") || strings.HasPrefix(path, "bending.") ||
		strings.HasSuffix(path, "model_factor") || strings.HasSuffix(path, "effect_factor")
}

// set writes x, in the program's units, as the fixed value of q.
func set(q *study.Quantity, x float64) study.Setting {
	var v any
	switch {
	case q.Lcr:
		v = fmt.Sprintf("Lcr/%.17g", 1/x)
	case q.Relative:
		v = fmt.Sprintf("L/%.17g", 1/x)
	case q.Dim == study.Dimensionless:
		v = x
	default:
		v = fmt.Sprintf("%.17g %s", x, study.InternalUnit(q.Dim))
	}
	return study.Setting{Key: q.Path, Value: v, At: q.Path}
}
