package column

import (
	"errors"
	"math"
)

// GovernsInteraction is the Governs of a load factor from the member
// interaction of EN 1993-1-1 6.3.3 (InteractionFactor); a first-yield
// load factor reports GovernsFirstYield.
const GovernsInteraction = "interaction"

// Errors of the load-factor models.
var (
	ErrBendingAxis = errors.New("column: bending axis must be Major or Minor")
	ErrBendingLoad = errors.New("column: axial load, end moments and lateral load must be finite numbers")
	ErrBendingSway = errors.New("column: a sway imperfection is not combined with end moments and lateral load; give the bending its own moments")
)

// Factor is a load factor: the factor on every action (axial load, end
// moments, lateral load) at which the member reaches its limit, the axis
// and mode that govern it, and the limit (Governs, as in Result). It is
// +Inf when no action loads the member.
type Factor struct {
	Factor  float64
	Axis    Axis
	Mode    Mode
	Governs string
}

// checkBending validates a load-factor evaluation's own inputs.
func checkBending(m *Member, n float64, b *Bending) error {
	if b.Axis != Major && b.Axis != Minor {
		return ErrBendingAxis
	}
	for _, x := range [...]float64{n, b.Top, b.Bottom, b.Lateral} {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return ErrBendingLoad
		}
	}
	if m.Sway != 0 && !b.Zero() {
		return ErrBendingSway
	}
	return nil
}

// FirstYieldFactor returns the load factor at first yield of a member
// under the axial compression n (N; a tension takes first-order moments)
// and the bending b: the factor lf on n, the end moments and the lateral
// load at which
//
//	lf n / A + M_max(lf) / W = fy
//
// about b.Axis, M_max the elastic second-order moment of the equivalent
// pinned member of length K L (SecondOrderMoment: the closed forms of
// Timoshenko & Gere, ch. 1) with the member's bow (amplified by
// 1/(1 - N/PE), as FirstYield does) and eccentricity (end moments N e)
// added on the side that makes the moment worse. The moment of a bow is
// combined by maximising the sum along the member, so it is exact, not
// the sum of the separate maxima. A class 4 section takes A_eff and W_eff.
//
// With axis Both the other axis and the modes that twist the section
// (with It given) are evaluated under the axial load alone (FirstYield,
// Twisting) and the smallest factor is reported. The root is found by
// Brent's method to about 1e-13 of the factor.
func FirstYieldFactor(m *Member, axis Axis, n float64, b *Bending) (Factor, error) {
	if err := checkBending(m, n, b); err != nil {
		return Factor{}, err
	}
	if axis != Both && axis != b.Axis {
		return Factor{}, ErrBendingAxis
	}
	if err := m.Validate(axis); err != nil {
		return Factor{}, err
	}
	res := Factor{Factor: firstYieldFactor(m, n, b), Axis: b.Axis, Mode: flexuralMode(b.Axis), Governs: GovernsFirstYield}
	if axis != Both || n <= 0 {
		return res, nil
	}
	o := 1 - b.Axis
	if f := firstYield(m, o) / n; f < res.Factor {
		res = Factor{Factor: f, Axis: o, Mode: flexuralMode(o), Governs: GovernsFirstYield}
	}
	if m.Props.It != 0 {
		if t := twisting(m, GovernsFirstYield); TwistingGoverns(m, t.N/n, res.Factor, res.Axis) {
			res = Factor{Factor: t.N / n, Axis: t.Axis, Mode: t.Mode, Governs: GovernsFirstYield}
		}
	}
	return res, nil
}

// fyFactor holds one first-yield load-factor evaluation about one axis.
type fyFactor struct {
	n, area, w, ei, l, ne, fy float64
	bow, ecc                  float64
	b                         *Bending
}

// moment returns the largest moment at the factor lf, the bow and the
// eccentricity on the worse side.
func (f *fyFactor) moment(lf float64) float64 {
	n := lf * f.n
	bm := bmoment{l: f.l, q: lf * f.b.Lateral}
	if n > 0 {
		bm.k = math.Sqrt(n / f.ei)
	}
	worst := 0.0
	for _, s := range [...]float64{1, -1} {
		bm.ma = lf*f.b.Bottom + s*n*f.ecc
		bm.mb = lf*f.b.Top + s*n*f.ecc
		bm.bow = 0
		if n > 0 && f.bow != 0 {
			bm.bow = s * n * f.bow / (1 - n/f.ne)
		}
		if v, _ := bm.max(); v > worst {
			worst = v
		}
		if f.ecc == 0 && f.bow == 0 {
			break
		}
	}
	return worst
}

// excess is the extreme-fibre stress over fy at the factor lf.
func (f *fyFactor) excess(lf float64) float64 {
	return math.Abs(lf*f.n)/f.area + f.moment(lf)/f.w - f.fy
}

// firstYieldFactor is FirstYieldFactor about b.Axis of a validated member.
func firstYieldFactor(m *Member, n float64, b *Bending) float64 {
	a := b.Axis
	p := &m.Props
	f := fyFactor{n: n, area: p.A, w: p.W[a], fy: m.Fy, b: b, bow: math.Abs(m.Bow), ecc: math.Abs(m.Ecc)}
	if f.w <= 0 {
		f.w = p.A * p.R[a] * p.R[a] / p.C[a]
	}
	f.ei = m.E * p.A * p.R[a] * p.R[a]
	f.l = m.K[a] * m.Length
	f.ne = math.Pi * math.Pi * f.ei / (f.l * f.l)
	if p.AEff > 0 {
		f.area, f.w = p.AEff, p.EffectiveModulus(a)
	}
	hi := math.Inf(1)
	if n > 0 {
		hi = math.Min(f.ne, f.area*f.fy) / n
		if f.ne <= f.area*f.fy {
			if b.Zero() && f.bow == 0 && f.ecc == 0 {
				return hi // a straight member buckles at PE
			}
			hi *= 1 - 1e-12
		}
	} else {
		// No compression: the moments are first order, linear in lf.
		s := f.excess(1) + f.fy
		if s <= 0 {
			return math.Inf(1)
		}
		return f.fy / s
	}
	u := func(lf float64) float64 { return f.excess(lf) }
	return brent(u, 0, hi, -f.fy, u(hi), 1e-13*hi)
}
