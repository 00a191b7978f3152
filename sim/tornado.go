package sim

import (
	"errors"
	"fmt"
	"math"
	"sort"
	"sync"
)

// TornadoSettings control Tornado. Zero fields take their defaults.
type TornadoSettings struct {
	// Low and High are the fractiles each variable is swung between;
	// defaults 0.05 and 0.95. They must satisfy 0 < Low < High < 1.
	Low, High float64
	// Output is the index in Model.Outputs of the output swung, or -1 for
	// the limit state g itself. The zero value selects Outputs[0], so set
	// -1 explicitly for g.
	Output int
	// FORM, when set, also computes the reliability index by FORM with the
	// variable fixed at each of its two settings.
	FORM bool
	// FORMSettings are passed to FORM; nil means its defaults.
	FORMSettings *FORMSettings
}

// TornadoRow is one variable's bar of a tornado chart.
type TornadoRow struct {
	// Variable is the name of the swung variable.
	Variable string
	// LowValue and HighValue are the variable's values at the Low and High
	// fractiles.
	LowValue, HighValue float64
	// Low and High are the output with the variable at LowValue and at
	// HighValue, every other variable at its median.
	Low, High float64
	// LowBeta and HighBeta are the FORM reliability indices with the
	// variable fixed at LowValue and HighValue and the others random.
	// They are NaN when FORM was not requested or did not succeed.
	LowBeta, HighBeta float64
	// Base is the output with every variable at its median.
	Base float64
}

// Swing returns the length of the bar: the range spanned by Low, High and
// Base. For an output monotone in the variable it is |High - Low|; for a
// variable that acts by its magnitude (a bow as likely on either side of the
// member, median zero) both ends move the output the same way and the bar
// runs from Base to the farther end, so such a variable is not ranked as
// unimportant.
func (r TornadoRow) Swing() float64 {
	return math.Max(math.Max(r.High, r.Low), r.Base) - math.Min(math.Min(r.High, r.Low), r.Base)
}

// Tornado computes a one-at-a-time sensitivity ("tornado") of m: each random
// variable in turn is set to its Low and its High fractile while every other
// variable stays at its median, and the chosen output is evaluated. base is
// the output with every variable at its median. rows are sorted by swing,
// largest first (ties keep the order of m.Vars).
//
// With s.FORM set, the reliability index is also found by FORM for each
// setting, on a reduced model in which the variable is fixed (correlations
// involving it are dropped, so the others keep their marginal laws). A
// FORM failure leaves NaN in that row's betas and is not an error.
//
// Correlations are ignored when setting the fractiles: the chart shows the
// effect of each input alone. A nil s means the defaults with Output 0.
func Tornado(m *Model, s *TornadoSettings) (base float64, rows []TornadoRow, err error) {
	var st TornadoSettings
	if s != nil {
		st = *s
	}
	if st.Low == 0 {
		st.Low = 0.05
	}
	if st.High == 0 {
		st.High = 0.95
	}
	if !(st.Low > 0 && st.Low < st.High && st.High < 1) {
		return math.NaN(), nil, fmt.Errorf("sim: tornado fractiles low %v and high %v must satisfy 0 < low < high < 1", st.Low, st.High)
	}
	if err := checkSensitivityModel(m, st.Output); err != nil {
		return math.NaN(), nil, fmt.Errorf("sim: tornado: %w", err)
	}
	d := len(m.Vars)
	x := make([]float64, d)
	median := make([]float64, d)
	for i, v := range m.Vars {
		median[i] = v.Dist.Quantile(0.5)
	}
	var out []float64
	if len(m.Outputs) > 0 {
		out = make([]float64, len(m.Outputs))
	}
	eval := func() float64 {
		g := m.G(x, out)
		if st.Output < 0 {
			return g
		}
		return out[st.Output]
	}
	copy(x, median)
	base = eval()
	rows = make([]TornadoRow, d)
	for i, v := range m.Vars {
		r := TornadoRow{
			Variable:  v.Name,
			LowValue:  v.Dist.Quantile(st.Low),
			HighValue: v.Dist.Quantile(st.High),
			LowBeta:   math.NaN(),
			HighBeta:  math.NaN(),
			Base:      base,
		}
		copy(x, median)
		x[i] = r.LowValue
		r.Low = eval()
		x[i] = r.HighValue
		r.High = eval()
		if st.FORM {
			r.LowBeta = fixedFORM(m, i, r.LowValue, st.FORMSettings)
			r.HighBeta = fixedFORM(m, i, r.HighValue, st.FORMSettings)
		}
		rows[i] = r
	}
	sort.SliceStable(rows, func(a, b int) bool { return rows[a].Swing() > rows[b].Swing() })
	return base, rows, nil
}

// fixedFORM returns the FORM reliability index of m with variable i fixed
// at value, or NaN when FORM fails or no random variable is left.
func fixedFORM(m *Model, i int, value float64, s *FORMSettings) float64 {
	r := FixVariable(m, i, value)
	if len(r.Vars) == 0 {
		return math.NaN()
	}
	res, err := FORM(r, s)
	if err != nil || res == nil || !res.Converged {
		return math.NaN()
	}
	return res.Beta
}

// FixVariable returns a model equal to m with variable i removed from the
// random inputs and held at value: its G inserts value at position i before
// calling m.G. Correlations involving the variable are dropped and Linear is
// kept only when it concerns another variable (its index adjusted). The
// returned model's G is safe for concurrent use and does not allocate in
// the steady state.
func FixVariable(m *Model, i int, value float64) *Model {
	d := len(m.Vars)
	name := m.Vars[i].Name
	r := &Model{
		Vars:    append(append([]Variable(nil), m.Vars[:i]...), m.Vars[i+1:]...),
		Outputs: m.Outputs,
	}
	for _, c := range m.Corr {
		if c.A != name && c.B != name {
			r.Corr = append(r.Corr, c)
		}
	}
	pool := sync.Pool{New: func() any { b := make([]float64, d); return &b }}
	g := m.G
	r.G = func(x, out []float64) float64 {
		bp := pool.Get().(*[]float64)
		full := *bp
		copy(full, x[:i])
		full[i] = value
		copy(full[i+1:], x[i:])
		v := g(full, out)
		pool.Put(bp)
		return v
	}
	if m.Linear != nil && m.Linear.Index != i {
		li := m.Linear.Index
		split := m.Linear.Split
		ri := li
		if li > i {
			ri--
		}
		r.Linear = &Linear{Index: ri, Split: func(x []float64) (h, c float64) {
			bp := pool.Get().(*[]float64)
			full := *bp
			copy(full, x[:i])
			full[i] = value
			copy(full[i+1:], x[i:])
			h, c = split(full)
			pool.Put(bp)
			return h, c
		}}
	}
	return r
}

// errNoModel is returned for a nil or empty model.
var errNoModel = errors.New("model has no random variables or no limit state")

// checkSensitivityModel checks what Tornado and Sobol need of m: variables
// with distributions, a limit state, and a valid output index (-1 for g).
func checkSensitivityModel(m *Model, output int) error {
	if m == nil || len(m.Vars) == 0 || m.G == nil {
		return errNoModel
	}
	for i, v := range m.Vars {
		if v.Dist == nil {
			return fmt.Errorf("variable %d (%q) has no distribution", i, v.Name)
		}
	}
	if output < -1 || output >= len(m.Outputs) {
		if len(m.Outputs) == 0 {
			return fmt.Errorf("output index %d: the model has no named outputs, use -1 for the limit state", output)
		}
		return fmt.Errorf("output index %d out of range: use -1 for the limit state or 0..%d for %v", output, len(m.Outputs)-1, m.Outputs)
	}
	return nil
}
