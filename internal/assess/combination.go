package assess

import (
	"errors"
	"fmt"
	"math"
)

// Recommended partial factors and combination factor of the code check
// (recommended values; the National Annex may differ):
const (
	// GammaM0 and GammaM1 are the partial factors of the cross-section
	// and of member buckling resistance, EN 1993-1-1:2005 6.1 note 2B.
	GammaM0 = 1.0
	GammaM1 = 1.0
	// GammaG and GammaQ are the factors of unfavourable permanent and
	// variable actions, EN 1990:2002 Table A1.2(B), expression 6.10.
	GammaG = 1.35
	GammaQ = 1.5
	// GammaGFavourable is the factor of a favourable permanent action
	// (gamma_G,inf of EN 1990 Table A1.2(B)); a favourable variable
	// action takes 0.
	GammaGFavourable = 1.0
	// Psi0 is the combination factor of accompanying variable actions:
	// 0.7, the value of EN 1990 Table A1.1 for imposed loads of
	// categories A to D (snow below 1000 m takes 0.5, wind 0.6).
	Psi0 = 0.7
)

// Load is one action of a design combination: its name, its
// characteristic value (compression positive) and whether it is
// permanent.
type Load struct {
	Name           string
	Characteristic float64
	Permanent      bool
}

// LoadFactors are the factors of a design combination. Psi0 is the
// combination factor of every accompanying variable load but those named
// in Psi0By (by Load.Name): EN 1990 Table A1.1 gives each kind of action
// its own (imposed loads of categories A to D 0.7, storage 1.0, snow 0.5
// below 1000 m, wind 0.6).
type LoadFactors struct {
	GammaG, GammaQ, Psi0 float64
	Psi0By               map[string]float64
}

// psi0 returns the combination factor of the load named name.
func (f LoadFactors) psi0(name string) float64 {
	if v, ok := f.Psi0By[name]; ok {
		return v
	}
	return f.Psi0
}

// Combination is a design load by EN 1990 expression 6.10.
type Combination struct {
	// Design is the design value of the sum of the loads.
	Design float64
	// Leading is the name of the leading variable load, "" when no
	// variable load is unfavourable.
	Leading string
	// Factors holds the factor each load took, in the order of the loads:
	// gamma_G (unfavourable) or 1.0 (favourable) for a permanent load;
	// gamma_Q for the leading variable load, gamma_Q psi_0 for an
	// accompanying one, 0 for a favourable one.
	Factors []float64
}

// DesignLoad combines the loads by EN 1990:2002 expression 6.10 (Table
// A1.2(B)):
//
//	E_d = sum gamma_G,j G_k,j + gamma_Q Q_k,1 + sum_(i>1) gamma_Q psi_0 Q_k,i
//
// A load is unfavourable when its characteristic value is positive
// (compression). A favourable permanent load takes gamma_G,inf = 1.0, a
// favourable variable load 0. Each unfavourable variable load is tried as
// the leading one Q_k,1 and the largest design load is kept (the first of
// equal ones). An accompanying load takes its own psi_0 when
// LoadFactors.Psi0By names it.
func DesignLoad(loads []Load, f LoadFactors) (Combination, error) {
	if !(f.GammaG >= 1) || !(f.GammaQ >= 1) || !(f.Psi0 >= 0 && f.Psi0 <= 1) {
		return Combination{}, fmt.Errorf("assess: load factors gamma_G %g, gamma_Q %g must be 1 or more and psi_0 %g within 0 to 1", f.GammaG, f.GammaQ, f.Psi0)
	}
	for name, v := range f.Psi0By {
		if !(v >= 0 && v <= 1) {
			return Combination{}, fmt.Errorf("assess: psi_0 %g of %s must be within 0 to 1", v, name)
		}
	}
	if len(loads) == 0 {
		return Combination{}, errors.New("assess: a design combination needs at least one load")
	}
	c := Combination{Design: math.Inf(-1)}
	try := func(lead int) {
		fs := make([]float64, len(loads))
		sum := 0.0
		for i, l := range loads {
			fs[i] = factorOf(l, i == lead, f)
			sum += fs[i] * l.Characteristic
		}
		if sum > c.Design {
			c.Design, c.Factors, c.Leading = sum, fs, ""
			if lead >= 0 {
				c.Leading = loads[lead].Name
			}
		}
	}
	leads := 0
	for i, l := range loads {
		if !l.Permanent && l.Characteristic > 0 {
			try(i)
			leads++
		}
	}
	if leads == 0 {
		try(-1)
	}
	return c, nil
}

// factorOf is the factor of one load of expression 6.10.
func factorOf(l Load, leading bool, f LoadFactors) float64 {
	switch {
	case l.Permanent && l.Characteristic > 0:
		return f.GammaG
	case l.Permanent:
		return GammaGFavourable
	case l.Characteristic <= 0:
		return 0
	case leading:
		return f.GammaQ
	}
	return f.GammaQ * f.psi0(l.Name)
}
