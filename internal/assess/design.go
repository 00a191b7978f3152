package assess

import (
	"errors"
	"math"

	"strutrisk/sim"
)

// The roles an input plays at the design point.
const (
	// Resistance: the margin grows with the input (FORM alpha > 0, i.e.
	// dg/dx > 0), so its design value lies below its median.
	Resistance = "resistance"
	// Action: the margin falls as the input grows (alpha < 0, dg/dx < 0),
	// so its design value lies above its median.
	Action = "action"
)

// Characteristic is an input's characteristic value and how it was taken
// (e.g. "5 % fractile").
type Characteristic struct {
	Value float64
	Basis string
}

// DesignValue is one input's design value at a reliability index, its
// characteristic value and the partial factor between them.
type DesignValue struct {
	// Name is the input's variable name.
	Name string
	// Alpha is its FORM sensitivity: the unit gradient of g in standard
	// normal space at the design point (positive for a resistance).
	Alpha float64
	// Role is Resistance or Action, by the sign of Alpha.
	Role string
	// Design is the design value; Fractile its non-exceedance
	// probability, Phi(-Alpha beta) for an independent input.
	Design, Fractile float64
	// Characteristic is the characteristic value, Basis how it was taken.
	Characteristic float64
	Basis          string
	// Factor is the partial factor: Characteristic / Design for a
	// resistance, Design / Characteristic for an action; NaN when the two
	// are not both of one sign and non-zero.
	Factor float64
}

// DesignValues returns the design values at the reliability index beta of
// the inputs of m, from the FORM sensitivities alpha of a design point
// (EN 1990:2002 Annex C, C.7: the design point moved along its own
// direction to the distance beta): u_d = -alpha beta in standard normal
// space, x_d its physical point. For an independent input this is
// x_d = F^-1(Phi(-alpha_i beta)); a correlated one follows the model's
// correlation (Nataf). char gives each input's characteristic value, in
// the order of m.Vars.
func DesignValues(m *sim.Model, alpha []float64, beta float64, char []Characteristic) ([]DesignValue, error) {
	n := len(m.Vars)
	if len(alpha) != n || len(char) != n {
		return nil, errors.New("assess: one alpha and one characteristic value per input are needed")
	}
	if math.IsNaN(beta) || math.IsInf(beta, 0) {
		return nil, errors.New("assess: design values need a finite reliability index")
	}
	t, err := sim.NewTransform(m)
	if err != nil {
		return nil, err
	}
	u := make([]float64, n)
	for i, a := range alpha {
		u[i] = -a * beta
	}
	x := make([]float64, n)
	t.ToX(x, u)
	out := make([]DesignValue, n)
	for i, v := range m.Vars {
		d := DesignValue{Name: v.Name, Alpha: alpha[i], Role: Resistance, Design: x[i], Fractile: v.Dist.CDF(x[i]),
			Characteristic: char[i].Value, Basis: char[i].Basis}
		if alpha[i] < 0 {
			d.Role = Action
		}
		d.Factor = PartialFactor(d.Role, d.Characteristic, d.Design)
		out[i] = d
	}
	return out, nil
}

// PartialFactor is x_k / x_d for a resistance and x_d / x_k for an action;
// NaN unless both are non-zero and of one sign.
func PartialFactor(role string, xk, xd float64) float64 {
	if !(xk*xd > 0) || math.IsInf(xk, 0) || math.IsInf(xd, 0) {
		return math.NaN()
	}
	if role == Action {
		return xd / xk
	}
	return xk / xd
}
